import { z } from "zod";
import { checkImoNumber } from "@/lib/imo";
import { VESSEL_TYPES } from "@/lib/vocabulary";

const frame = z.coerce.number({ error: "must be a frame number" }).int("must be a whole frame number").min(-50).max(1000);
const optionalFrame = z.preprocess((v) => (v === "" || v === null ? undefined : v), frame.optional());
const optionalText = (max: number) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(max).optional());

/** The IMO number: seven digits whose last is the check digit; "IMO " in front is accepted. */
export const ZImoNumber = z.string({ error: "is required" }).transform((value, ctx) => {
  const result = checkImoNumber(value);
  if (!result.ok) {
    ctx.addIssue({ code: "custom", message: result.message });
    return z.NEVER;
  }
  return result.number;
});

const vesselFields = {
  name: z.string({ error: "is required" }).trim().min(2, "needs at least 2 characters").max(80),
  imoNumber: ZImoNumber,
  vesselType: z.enum(VESSEL_TYPES, { error: "is not a known vessel type" }),
  flag: optionalText(60),
  classSociety: optionalText(80),
  yearBuilt: z.preprocess(
    (v) => (v === "" || v === null ? undefined : v),
    z.coerce.number().int().min(1950, "must be 1950 or later").max(2100).optional(),
  ),
  frameFirst: frame,
  frameLast: frame,
  frameSpacingMm: z.preprocess(
    (v) => (v === "" || v === null ? undefined : v),
    z.coerce.number().int().min(300, "must be at least 300 mm").max(5000, "must be at most 5000 mm").optional(),
  ),
  midshipFromFrame: optionalFrame,
  midshipToFrame: optionalFrame,
  engineRoomFwdBulkheadFrame: optionalFrame,
  collisionBulkheadFrame: optionalFrame,
  utcOffsetMinutes: z.preprocess(
    (v) => (v === "" || v === null ? undefined : v),
    z.coerce.number().int().min(-720).max(840).optional(),
  ),
};

type TFrameFields = {
  frameFirst: number;
  frameLast: number;
  midshipFromFrame?: number;
  midshipToFrame?: number;
  engineRoomFwdBulkheadFrame?: number;
  collisionBulkheadFrame?: number;
};

/** Frames of the particulars must lie inside the vessel's frame numbering, in order. */
function checkFrames(v: TFrameFields, ctx: z.RefinementCtx) {
  if (v.frameFirst >= v.frameLast) {
    ctx.addIssue({ code: "custom", path: ["frameLast"], message: "must be greater than the first frame" });
    return;
  }
  const inside = (key: keyof TFrameFields) => {
    const f = v[key];
    if (f !== undefined && (f < v.frameFirst || f > v.frameLast)) {
      ctx.addIssue({ code: "custom", path: [key], message: `must lie between frames ${v.frameFirst} and ${v.frameLast}` });
    }
  };
  (["midshipFromFrame", "midshipToFrame", "engineRoomFwdBulkheadFrame", "collisionBulkheadFrame"] as const).forEach(inside);
  if ((v.midshipFromFrame === undefined) !== (v.midshipToFrame === undefined)) {
    ctx.addIssue({ code: "custom", path: ["midshipToFrame"], message: "give both ends of the midship region, or neither" });
  } else if (v.midshipFromFrame !== undefined && v.midshipToFrame !== undefined && v.midshipFromFrame >= v.midshipToFrame) {
    ctx.addIssue({ code: "custom", path: ["midshipToFrame"], message: "must be forward of (greater than) the aft end" });
  }
}

export const ZVesselInput = z.object(vesselFields).superRefine(checkFrames);
export type TVesselInput = z.infer<typeof ZVesselInput>;
