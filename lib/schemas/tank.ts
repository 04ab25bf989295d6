import { z } from "zod";
import { COATING_SYSTEMS, MEMBER_KINDS, PLATING_REGIONS, STRINGER_NUMBERING, TANK_KINDS, TANK_SIDES } from "@/lib/vocabulary";
import { formatFrames } from "@/lib/structure/frames";
import { numberFromForm, optionalText, wholeNumber } from "./common";

const checkbox = z.preprocess((v) => v === true || v === "on" || v === "true" || v === "yes" || v === "1", z.boolean());
const frameNumber = wholeNumber("a frame number").min(-50, "must be −50 or more").max(1000, "must be 1000 or less");

export type TVesselFrameLimits = { frameFirst: number; frameLast: number };

const tankFields = {
  code: z.string({ error: "is required" }).trim().min(1, "is required").max(30, "must be at most 30 characters"),
  name: z.string({ error: "is required" }).trim().min(2, "needs at least 2 characters").max(120),
  side: z.enum(TANK_SIDES, { error: "must be port, starboard or centre" }),
  kind: z.enum(TANK_KINDS, { error: "is not a known tank kind" }),
  frameFrom: z.preprocess(numberFromForm, frameNumber),
  frameTo: z.preprocess(numberFromForm, frameNumber),
  bottomAreaM2: z.preprocess(
    numberFromForm,
    z.number({ error: "must be a number of square metres" }).positive("must be more than 0").max(10_000, "must be at most 10 000 m²").optional(),
  ),
  coatingSystem: z.preprocess((v) => (v === "" || v === undefined ? "hard" : v), z.enum(COATING_SYSTEMS, { error: "must be hard, semi_hard, soft or none" })),
  heatedBoundary: optionalText(200),
  atWaterline: checkbox,
  atCollisionBulkhead: checkbox,
  note: optionalText(1000),
};

/** Runs a cross-field check as soon as the fields it reads are numbers, even if other fields failed. */
const whenNumbers = (...keys: string[]) => ({
  when: (payload: { value: unknown }) => keys.every((k) => typeof (payload.value as Record<string, unknown> | null)?.[k] === "number"),
});

/** A tank's definition, checked against its vessel's frames: one schema for the form, the API and CSV rows. */
export function tankInputSchema(vessel: TVesselFrameLimits) {
  return z.object(tankFields).superRefine((t, ctx) => {
    if (t.frameFrom >= t.frameTo) {
      ctx.addIssue({ code: "custom", path: ["frameTo"], message: "must be forward of (greater than) the aft frame" });
    }
    for (const key of ["frameFrom", "frameTo"] as const) {
      if (t[key] < vessel.frameFirst || t[key] > vessel.frameLast) {
        ctx.addIssue({ code: "custom", path: [key], message: `must lie inside the vessel's frames (${formatFrames(vessel.frameFirst, vessel.frameLast)})` });
      }
    }
  }, whenNumbers("frameFrom", "frameTo"));
}
export type TTankInput = z.infer<ReturnType<typeof tankInputSchema>>;

/** Web frames given as "200, 204, 208" or as a stepped range "200-224/4". */
export function parseFrameList(v: unknown): unknown {
  if (Array.isArray(v)) return v;
  if (typeof v !== "string") return v;
  const text = v.trim();
  if (!text) return undefined;
  const stepped = /^(-?\d+)\s*[-–]\s*(-?\d+)\s*\/\s*(\d+)$/.exec(text);
  if (stepped) {
    const [from, to, step] = [Number(stepped[1]), Number(stepped[2]), Number(stepped[3])];
    if (step <= 0 || to < from || (to - from) / step > 500) return text;
    const out: number[] = [];
    for (let f = from; f <= to; f += step) out.push(f);
    return out;
  }
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  return parts.every((p) => /^-?\d+$/.test(p)) ? parts.map(Number) : text;
}

const memberNumber = wholeNumber("a member number").min(0, "must be 0 or more").max(999, "must be 999 or less");

/** One entry of a tank's member catalogue; what it needs depends on its kind. */
export function memberInputSchema(tank: { frameFrom: number; frameTo: number; code: string }) {
  return z
    .object({
      kind: z.enum(["longitudinal", "stringer_deck", "bottom_girder", "web_frame"] as const satisfies readonly (typeof MEMBER_KINDS)[number][], {
        error: "must be longitudinals, stringer decks, bottom girders or web frames",
      }),
      platingRegion: z.preprocess((v) => (v === "" ? undefined : v), z.enum(PLATING_REGIONS, { error: "is not a known plating region" }).optional()),
      numberFrom: z.preprocess(numberFromForm, memberNumber.optional()),
      numberTo: z.preprocess(numberFromForm, memberNumber.optional()),
      numbering: z.preprocess((v) => (v === "" ? undefined : v), z.enum(STRINGER_NUMBERING, { error: "must be from_top or from_bottom" }).optional()),
      frames: z.preprocess(parseFrameList, z.array(frameNumber, { error: "must be frame numbers such as 200, 204, 208 or a range such as 200-224/4" }).max(200).optional()),
      hasCentreGirder: z.preprocess((v) => (v === undefined || v === "" ? undefined : v === true || v === "on" || v === "true"), z.boolean().optional()),
      label: optionalText(120),
      note: optionalText(500),
    })
    .superRefine((m, ctx) => {
      const need = (key: "platingRegion" | "numberFrom" | "numberTo" | "numbering" | "frames", message: string) => {
        if (m[key] === undefined) ctx.addIssue({ code: "custom", path: [key], message });
      };
      if (m.kind === "longitudinal") {
        need("platingRegion", "is required: which plating the longitudinals stiffen");
        need("numberFrom", "is required: the first longitudinal number");
        need("numberTo", "is required: the last longitudinal number");
      }
      if (m.kind === "stringer_deck") {
        need("numberFrom", "is required: usually 1");
        need("numberTo", "is required: the number of the last stringer deck");
        need("numbering", "is required: counted from the top or from the bottom");
      }
      if (m.kind === "bottom_girder") {
        need("numberFrom", "is required: the first side girder number (1)");
        need("numberTo", "is required: the last side girder number");
      }
      if (m.kind === "web_frame") need("frames", "is required: the frames at which the web frames stand");
      if (m.numberFrom !== undefined && m.numberTo !== undefined && m.numberFrom > m.numberTo) {
        ctx.addIssue({ code: "custom", path: ["numberTo"], message: "must not be less than the first number" });
      }
      const outside = (m.frames ?? []).filter((f) => f < tank.frameFrom || f > tank.frameTo);
      if (outside.length) {
        ctx.addIssue({ code: "custom", path: ["frames"], message: `Fr. ${outside.join(", ")} outside ${tank.code} (${formatFrames(tank.frameFrom, tank.frameTo)})` });
      }
    });
}
export type TMemberInput = z.infer<ReturnType<typeof memberInputSchema>>;

export function specialFrameInputSchema(tank: { frameFrom: number; frameTo: number; code: string }) {
  return z.object({
    frame: z.preprocess(
      numberFromForm,
      frameNumber.refine((f) => f >= tank.frameFrom && f <= tank.frameTo, `must lie inside ${tank.code} (${formatFrames(tank.frameFrom, tank.frameTo)})`),
    ),
    note: z.string({ error: "is required" }).trim().min(3, "is required: what makes this frame different").max(300),
  });
}
