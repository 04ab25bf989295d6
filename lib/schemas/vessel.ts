import { z } from "zod";
import { checkImoNumber } from "@/lib/imo";
import { VESSEL_TYPES } from "@/lib/vocabulary";
import { numberFromForm, optionalText, wholeNumber } from "./common";

const frameNumber = wholeNumber("a frame number").min(-50, "must be −50 or more").max(1000, "must be 1000 or less");
const frame = z.preprocess(numberFromForm, frameNumber);
const optionalFrame = z.preprocess(numberFromForm, frameNumber.optional());
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
  yearBuilt: z.preprocess(numberFromForm, wholeNumber("a year").min(1950, "must be 1950 or later").max(2100).optional()),
  frameFirst: frame,
  frameLast: frame,
  frameSpacingMm: z.preprocess(
    numberFromForm,
    wholeNumber("a number of millimetres").min(300, "must be at least 300 mm").max(5000, "must be at most 5000 mm").optional(),
  ),
  midshipFromFrame: optionalFrame,
  midshipToFrame: optionalFrame,
  engineRoomFwdBulkheadFrame: optionalFrame,
  collisionBulkheadFrame: optionalFrame,
  utcOffsetMinutes: z.preprocess(
    numberFromForm,
    wholeNumber("a number of minutes").min(-720, "must be −720 or more").max(840, "must be 840 or less").optional(),
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
