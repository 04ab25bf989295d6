import { z } from "zod";
import { ROLES, VESSEL_ROLES } from "@/lib/vocabulary";
import { optionalText } from "./common";

export const ZMembershipInput = z
  .object({
    role: z.enum(ROLES, { error: "is not a known role" }),
    vesselId: z.preprocess((v) => (v === "" || v === null ? undefined : v), z.uuid("must be a vessel id").optional()),
  })
  .superRefine((v, ctx) => {
    const perVessel = (VESSEL_ROLES as readonly string[]).includes(v.role);
    if (perVessel && !v.vesselId) {
      ctx.addIssue({ code: "custom", path: ["vesselId"], message: "an officer or master role needs its vessel" });
    }
    if (!perVessel && v.vesselId) {
      ctx.addIssue({ code: "custom", path: ["vesselId"], message: "this role applies company-wide: leave the vessel empty" });
    }
  });
export type TMembershipInput = z.infer<typeof ZMembershipInput>;

/** The rule for every password a person chooses (new account, reset). */
export const ZNewPassword = z.string({ error: "is required" }).min(12, "needs at least 12 characters").max(200, "may have at most 200 characters");

export const ZUserInput = z
  .object({
    email: z.email("must be an e-mail address").trim().toLowerCase().max(320),
    name: z.string({ error: "is required" }).trim().min(2, "needs at least 2 characters").max(120),
    rank: optionalText(60),
    password: ZNewPassword,
  })
  .and(ZMembershipInput);
export type TUserInput = z.infer<typeof ZUserInput>;
