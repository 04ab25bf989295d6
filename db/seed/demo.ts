// The demo scenario: a fictional ship manager with two fictional vessels. The
// IMO-style numbers start with 0 so that they pass the check digit yet belong
// to no ship. Nothing here is used as an expected value of the trade in tests.
import { eq } from "drizzle-orm";
import type { TDb } from "../client";
import * as s from "../schema";
import { insertMembership, insertOrganisation, insertTank, insertUser, insertVessel } from "./builders";

export const DEMO_ORG_SLUG = "lantern-reach";
export const DEMO_PASSWORD = "tankwright-demo";

export const DEMO_USERS = [
  { key: "officer", email: "officer@tankwright.test", name: "Maren Oduya", rank: "Chief Officer" },
  { key: "master", email: "master@tankwright.test", name: "Tomas Revell", rank: "Master" },
  { key: "superintendent", email: "super@tankwright.test", name: "Ilse Varga", rank: "Technical Superintendent" },
  { key: "surveyor", email: "surveyor@tankwright.test", name: "Dawit Lindqvist", rank: "Class Surveyor" },
  { key: "admin", email: "admin@tankwright.test", name: "Noor Castellan", rank: "Fleet Administrator" },
] as const;

/** Seeds the scenario once; returns false when it is already there. */
export async function seedDemo(db: TDb): Promise<boolean> {
  const existing = await db.query.organisations.findFirst({ where: eq(s.organisations.slug, DEMO_ORG_SLUG) });
  if (existing) return false;

  await db.transaction(async (tx) => {
    const org = await insertOrganisation(tx, { slug: DEMO_ORG_SLUG, name: "Lantern Reach Ship Management" });
    const orgId = org.id;

    const skerry = await insertVessel(tx, {
      orgId,
      name: "Skerry Lantern",
      imoNumber: "0617281",
      vesselType: "bulk_carrier",
      flag: "Fictional Registry",
      classSociety: "Demo Class",
      yearBuilt: 2011,
      frameFirst: 0,
      frameLast: 280,
      frameSpacingMm: 850,
      midshipFromFrame: 98,
      midshipToFrame: 196,
      engineRoomFwdBulkheadFrame: 52,
      collisionBulkheadFrame: 262,
      utcOffsetMinutes: 480,
    });
    const halcyon = await insertVessel(tx, {
      orgId,
      name: "Brisk Halcyon",
      imoNumber: "0246800",
      vesselType: "product_tanker",
      flag: "Fictional Registry",
      classSociety: "Demo Class",
      yearBuilt: 2015,
      frameFirst: 0,
      frameLast: 230,
      frameSpacingMm: 800,
      midshipFromFrame: 75,
      midshipToFrame: 160,
      engineRoomFwdBulkheadFrame: 40,
      collisionBulkheadFrame: 215,
      utcOffsetMinutes: -180,
    });

    const dbHopperMembers = [
      { kind: "bottom_girder" as const, numberFrom: 1, numberTo: 3, hasCentreGirder: true, label: "Bottom girders (CL girder + 3 side girders)" },
      { kind: "web_frame" as const, frames: [200, 204, 208, 212, 216, 220, 224], label: "Floors / web frames" },
      { kind: "longitudinal" as const, platingRegion: "inner_bottom" as const, numberFrom: 1, numberTo: 18 },
      { kind: "longitudinal" as const, platingRegion: "bottom_shell" as const, numberFrom: 1, numberTo: 20 },
      { kind: "longitudinal" as const, platingRegion: "lower_hopper" as const, numberFrom: 21, numberTo: 27 },
    ];
    for (const side of ["port", "starboard"] as const) {
      await insertTank(
        tx,
        {
          orgId, vesselId: skerry.id, code: `No. 2 DB WBT ${side === "port" ? "P" : "S"}`,
          name: `No. 2 double bottom and hopper ballast tank, ${side}`, side, kind: "double_bottom_hopper",
          frameFrom: 196, frameTo: 228, bottomAreaM2: 312, sortOrder: side === "port" ? 20 : 21,
        },
        dbHopperMembers,
        [{ frame: 212, note: "Deep floor with lightening holes blanked; ballast suction bell mouth aft of it" }],
      );
    }
    await insertTank(
      tx,
      {
        orgId, vesselId: skerry.id, code: "No. 4 TST P", name: "No. 4 top side ballast tank, port", side: "port",
        kind: "top_side", frameFrom: 132, frameTo: 164, bottomAreaM2: 96, sortOrder: 40,
      },
      [
        { kind: "web_frame", frames: [136, 140, 144, 148, 152, 156, 160], label: "Transverse web rings" },
        { kind: "longitudinal", platingRegion: "upper_hopper", numberFrom: 1, numberTo: 9 },
        { kind: "longitudinal", platingRegion: "main_deck", numberFrom: 1, numberTo: 12 },
        { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 40, numberTo: 44 },
      ],
    );
    await insertTank(
      tx,
      {
        orgId, vesselId: skerry.id, code: "FPT", name: "Fore peak tank", side: "centre", kind: "fore_peak",
        frameFrom: 262, frameTo: 280, bottomAreaM2: 44, atCollisionBulkhead: true, sortOrder: 90,
      },
      [
        { kind: "stringer_deck", numberFrom: 1, numberTo: 3, numbering: "from_top", label: "Stringer decks 1–3, from the top" },
        { kind: "web_frame", frames: [266, 270, 274], label: "Web frames" },
      ],
      [{ frame: 270, note: "Chain locker aft boundary steps here" }],
    );
    await insertTank(
      tx,
      {
        orgId, vesselId: halcyon.id, code: "No. 3 WBT P", name: "No. 3 ballast tank, port (double bottom + side)",
        side: "port", kind: "double_bottom_side", frameFrom: 100, frameTo: 125, bottomAreaM2: 210, atWaterline: true,
        heatedBoundary: "Inner side to No. 3 cargo tank P (heated cargo)", sortOrder: 30,
      },
      [
        { kind: "stringer_deck", numberFrom: 1, numberTo: 3, numbering: "from_top", label: "Side stringers 1–3, from the top" },
        { kind: "bottom_girder", numberFrom: 1, numberTo: 2, hasCentreGirder: false },
        { kind: "web_frame", frames: [104, 108, 112, 116, 120], label: "Web frames" },
        { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 20, numberTo: 38 },
        { kind: "longitudinal", platingRegion: "longitudinal_bulkhead", numberFrom: 1, numberTo: 16 },
        { kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 14 },
        { kind: "longitudinal", platingRegion: "inner_bottom", numberFrom: 1, numberTo: 12 },
      ],
    );
    await insertTank(tx, {
      orgId, vesselId: halcyon.id, code: "FPT", name: "Fore peak tank", side: "centre", kind: "fore_peak",
      frameFrom: 215, frameTo: 230, bottomAreaM2: 38, atCollisionBulkhead: true, sortOrder: 90,
    });

    const users: Record<string, string> = {};
    for (const u of DEMO_USERS) {
      users[u.key] = (await insertUser(tx, { email: u.email, name: u.name, rank: u.rank, password: DEMO_PASSWORD })).id;
    }
    await insertMembership(tx, { orgId, userId: users.officer!, role: "officer", vesselId: skerry.id });
    await insertMembership(tx, { orgId, userId: users.master!, role: "master", vesselId: skerry.id });
    await insertMembership(tx, { orgId, userId: users.superintendent!, role: "superintendent" });
    await insertMembership(tx, { orgId, userId: users.surveyor!, role: "surveyor" });
    await insertMembership(tx, { orgId, userId: users.admin!, role: "admin" });

    await tx.insert(s.inspectionIntervals).values({ orgId, defaultMonths: 12, belowGoodMonths: 6 });
    const validFrom = "2026-01-01";
    await tx.insert(s.costRates).values([
      { orgId, kind: "steel_per_kg", amount: 9.5, currency: "USD", place: "Demo repair yard", validFrom },
      { orgId, kind: "coating_per_m2", amount: 38, currency: "USD", place: "Demo repair yard", validFrom },
      { orgId, kind: "anode_per_piece", amount: 145, currency: "USD", place: "Demo repair yard", validFrom },
      { orgId, kind: "sediment_per_m3", amount: 60, currency: "USD", place: "Demo repair yard", validFrom },
    ]);
    await tx.insert(s.vesselRecipients).values([
      { orgId, vesselId: skerry.id, kind: "office", name: "Technical department", email: "technical@lantern-reach.test" },
      { orgId, vesselId: skerry.id, kind: "class", name: "Demo Class survey station", email: "survey@demo-class.test" },
    ]);
  });
  return true;
}
