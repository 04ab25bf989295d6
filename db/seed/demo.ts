// The demo scenario: a fictional ship manager with two fictional vessels. The
// IMO-style numbers start with 0 so that they pass the check digit yet belong
// to no ship. Nothing here is used as an expected value of the trade in tests.
import { and, eq } from "drizzle-orm";
import type { TDb } from "../client";
import * as s from "../schema";
import { insertMembership, insertOrganisation, insertTank, insertUser, insertVessel } from "./builders";
import { fillInspection } from "./complete-inspection";
import { sedimentVolumeM3 } from "@/lib/calc/sediment";

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

    await seedSkerryLanternTanks(tx, orgId, skerry.id);
    await seedBriskHalcyonTanks(tx, orgId, halcyon.id);

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
      { orgId, vesselId: halcyon.id, kind: "office", name: "Technical department", email: "technical@lantern-reach.test" },
      { orgId, vesselId: halcyon.id, kind: "office", name: "Marine HSEQ", email: "hseq@lantern-reach.test" },
      { orgId, vesselId: halcyon.id, kind: "class", name: "Demo Class survey station", email: "survey@demo-class.test" },
    ]);

    // An inspection with every step complete, ready for the officer to sign and the master to countersign.
    const tank = await tx.query.tanks.findFirst({ where: (t, { and, eq: is }) => and(is(t.vesselId, skerry.id), is(t.code, "No. 3 DB WBT P")) });
    const [ready] = await tx.insert(s.inspections).values({
      orgId, vesselId: skerry.id, tankId: tank!.id, inspectedOn: "2026-11-28", placeKind: "port", place: "Port Averly, berth 6",
      team: ["Maren Oduya, Chief Officer", "Pell Arkady, Bosun"], createdBy: users.officer!,
    }).returning();
    await fillInspection(tx, { orgId, inspectionId: ready!.id, frameFrom: tank!.frameFrom, testedAt: new Date("2026-11-28T00:45:00Z"), measuredBy: "Maren Oduya", standbyPerson: "Pell Arkady, Bosun" });

    // An earlier report, signed and countersigned: the fleet overview, the tank history and the work list start from it.
    // Its PDF is rendered by the app's worker when it starts (countersigned reports without a PDF are queued).
    const earlierTank = await tx.query.tanks.findFirst({ where: (t, { and, eq: is }) => and(is(t.vesselId, skerry.id), is(t.code, "No. 2 DB WBT P")) });
    const signedAt = new Date("2026-05-13T02:10:00Z");
    const [earlier] = await tx.insert(s.inspections).values({
      orgId, vesselId: skerry.id, tankId: earlierTank!.id, inspectedOn: "2026-05-12", placeKind: "anchorage", place: "Averly Roads anchorage",
      team: ["Maren Oduya, Chief Officer", "Pell Arkady, Bosun"], createdBy: users.officer!,
    }).returning();
    await fillInspection(tx, { orgId, inspectionId: earlier!.id, frameFrom: earlierTank!.frameFrom, testedAt: new Date("2026-05-12T01:30:00Z"), measuredBy: "Maren Oduya", standbyPerson: "Pell Arkady, Bosun" });
    await tx.update(s.inspections).set({ status: "countersigned", submittedAt: signedAt, countersignedAt: signedAt, lockedAt: signedAt, version: 3 }).where(eq(s.inspections.id, earlier!.id));
    await tx.insert(s.signatures).values([
      { orgId, inspectionId: earlier!.id, userId: users.officer!, kind: "officer", signerName: "Maren Oduya", signerRank: "Chief Officer", typedSignature: "Maren Oduya", signedAt },
      { orgId, inspectionId: earlier!.id, userId: users.master!, kind: "master", signerName: "Tomas Revell", signerRank: "Master", typedSignature: "Tomas Revell", signedAt },
    ]);

    // Two older reports of the same tank, so that its history has a trend: the shell plating's breakdown
    // growing (1.5 → 2.5 → 4 %), the anodes wasting about 10 % a year (10 → 20 → 30 %, so the company's 50 %
    // renewal threshold is projected two years on), sediment building up (0.4 → 0.7 → 1.0 m³), and the same
    // two coating findings found again at the same frames (marked recurring).
    for (const old of [
      { inspectedOn: "2024-05-20", signedAt: new Date("2024-05-21T03:00:00Z"), shellPct: 1.5, wastagePct: 10, depthMm: 20, place: "Port Averly, berth 2" },
      { inspectedOn: "2025-05-15", signedAt: new Date("2025-05-16T02:40:00Z"), shellPct: 2.5, wastagePct: 20, depthMm: 35, place: "Averly Roads anchorage" },
    ]) {
      const [row] = await tx.insert(s.inspections).values({
        orgId, vesselId: skerry.id, tankId: earlierTank!.id, inspectedOn: old.inspectedOn, placeKind: "anchorage", place: old.place,
        team: ["Maren Oduya, Chief Officer", "Pell Arkady, Bosun"], createdBy: users.officer!,
      }).returning();
      await fillInspection(tx, { orgId, inspectionId: row!.id, frameFrom: earlierTank!.frameFrom, testedAt: new Date(`${old.inspectedOn}T01:30:00Z`), measuredBy: "Maren Oduya", standbyPerson: "Pell Arkady, Bosun" });
      await tx.update(s.coatingAreas).set({ breakdownPct: old.shellPct, rustedPct: old.shellPct / 2 }).where(and(eq(s.coatingAreas.inspectionId, row!.id), eq(s.coatingAreas.area, "shell_plating")));
      await tx.update(s.anodeRecords).set({ meanWastagePct: old.wastagePct, minWastagePct: old.wastagePct / 2, maxWastagePct: old.wastagePct * 2, toRenewCount: 0 }).where(eq(s.anodeRecords.inspectionId, row!.id));
      await tx.update(s.sedimentZones).set({ depthMm: old.depthMm, volumeM3: sedimentVolumeM3({ depthMm: old.depthMm, areaM2: 20 }) }).where(eq(s.sedimentZones.inspectionId, row!.id));
      await tx.update(s.inspections).set({ status: "countersigned", submittedAt: old.signedAt, countersignedAt: old.signedAt, lockedAt: old.signedAt, version: 3 }).where(eq(s.inspections.id, row!.id));
      await tx.insert(s.signatures).values([
        { orgId, inspectionId: row!.id, userId: users.officer!, kind: "officer", signerName: "Maren Oduya", signerRank: "Chief Officer", typedSignature: "Maren Oduya", signedAt: old.signedAt },
        { orgId, inspectionId: row!.id, userId: users.master!, kind: "master", signerName: "Tomas Revell", signerRank: "Master", typedSignature: "Tomas Revell", signedAt: old.signedAt },
      ]);
    }
  });
  return true;
}

type TTx = Parameters<Parameters<TDb["transaction"]>[0]>[0];
type TMember = NonNullable<Parameters<typeof insertTank>[2]>[number];

const everyFourth = (from: number, to: number) => {
  const out: number[] = [];
  for (let f = Math.ceil((from + 2) / 4) * 4; f < to; f += 4) out.push(f);
  return out;
};

/** A port and a starboard tank with the same members. */
async function insertPair(
  tx: TTx,
  base: { orgId: string; vesselId: string; number: number; prefix: string; name: string; kind: Parameters<typeof insertTank>[1]["kind"]; frameFrom: number; frameTo: number; bottomAreaM2: number; atWaterline?: boolean; heatedBoundary?: string },
  members: TMember[],
  special: { frame: number; note: string }[] = [],
) {
  for (const side of ["port", "starboard"] as const) {
    const letter = side === "port" ? "P" : "S";
    await insertTank(
      tx,
      {
        orgId: base.orgId, vesselId: base.vesselId, code: `No. ${base.number} ${base.prefix} ${letter}`,
        name: `No. ${base.number} ${base.name}, ${side}`, side, kind: base.kind, frameFrom: base.frameFrom, frameTo: base.frameTo,
        bottomAreaM2: base.bottomAreaM2, atWaterline: base.atWaterline ?? false,
        heatedBoundary: base.heatedBoundary ? base.heatedBoundary.replace("{S}", letter) : null,
        sortOrder: base.frameFrom * 2 + (side === "port" ? 0 : 1),
      },
      members,
      special,
    );
  }
}

async function seedSkerryLanternTanks(tx: TTx, orgId: string, vesselId: string) {
  const holds: [number, number, number][] = [
    [1, 228, 258], [2, 196, 228], [3, 164, 196], [4, 132, 164], [5, 100, 132], [6, 54, 100],
  ];
  for (const [n, from, to] of holds) {
    await insertPair(
      tx,
      { orgId, vesselId, number: n, prefix: "DB WBT", name: "double bottom and hopper ballast tank", kind: "double_bottom_hopper", frameFrom: from, frameTo: to, bottomAreaM2: Math.round((to - from) * 9.75) },
      [
        { kind: "bottom_girder", numberFrom: 1, numberTo: 3, hasCentreGirder: true, label: "Centre girder (0) and side girders 1–3" },
        { kind: "web_frame", frames: everyFourth(from, to), label: "Solid floors" },
        { kind: "longitudinal", platingRegion: "inner_bottom", numberFrom: 1, numberTo: 18 },
        { kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 20 },
        { kind: "longitudinal", platingRegion: "lower_hopper", numberFrom: 21, numberTo: 27 },
      ],
      n === 2 ? [{ frame: 212, note: "Deep floor with lightening holes blanked; ballast suction bell mouth aft of it" }] : [],
    );
    if (n >= 2 && n <= 5) {
      await insertPair(
        tx,
        { orgId, vesselId, number: n, prefix: "TST", name: "top side ballast tank", kind: "top_side", frameFrom: from, frameTo: to, bottomAreaM2: Math.round((to - from) * 3) },
        [
          { kind: "web_frame", frames: everyFourth(from, to), label: "Transverse web rings" },
          { kind: "longitudinal", platingRegion: "upper_hopper", numberFrom: 1, numberTo: 9 },
          { kind: "longitudinal", platingRegion: "main_deck", numberFrom: 1, numberTo: 12 },
          { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 40, numberTo: 44 },
        ],
      );
    }
  }
  await insertTank(
    tx,
    { orgId, vesselId, code: "FPT", name: "Fore peak tank", side: "centre", kind: "fore_peak", frameFrom: 262, frameTo: 280, bottomAreaM2: 44, atCollisionBulkhead: true, sortOrder: 900 },
    [
      { kind: "stringer_deck", numberFrom: 1, numberTo: 3, numbering: "from_top", label: "Stringer decks 1–3, from the top" },
      { kind: "web_frame", frames: [266, 270, 274], label: "Web frames" },
      { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 1, numberTo: 14 },
    ],
    [{ frame: 270, note: "Chain locker aft boundary steps here" }],
  );
  await insertTank(
    tx,
    { orgId, vesselId, code: "APT", name: "Aft peak tank", side: "centre", kind: "aft_peak", frameFrom: 0, frameTo: 8, bottomAreaM2: 30, sortOrder: 0 },
    [{ kind: "stringer_deck", numberFrom: 1, numberTo: 2, numbering: "from_top", label: "Stringer decks 1–2, from the top" }],
    [{ frame: 4, note: "Stern tube bulkhead recess" }],
  );
}

async function seedBriskHalcyonTanks(tx: TTx, orgId: string, vesselId: string) {
  const tanks: [number, number, number][] = [
    [1, 185, 210], [2, 160, 185], [3, 135, 160], [4, 110, 135], [5, 85, 110], [6, 60, 85], [7, 42, 60],
  ];
  for (const [n, from, to] of tanks) {
    await insertPair(
      tx,
      {
        orgId, vesselId, number: n, prefix: "WBT", name: "ballast tank (double bottom and side)", kind: "double_bottom_side",
        frameFrom: from, frameTo: to, bottomAreaM2: Math.round((to - from) * 8.4), atWaterline: true,
        heatedBoundary: n >= 2 && n <= 6 ? `Inner side to No. ${n} cargo tank {S} (heated cargo)` : undefined,
      },
      [
        { kind: "stringer_deck", numberFrom: 1, numberTo: 3, numbering: "from_top", label: "Side stringers 1–3, from the top" },
        { kind: "bottom_girder", numberFrom: 1, numberTo: 2, hasCentreGirder: false },
        { kind: "web_frame", frames: everyFourth(from, to), label: "Web frames" },
        { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 20, numberTo: 38 },
        { kind: "longitudinal", platingRegion: "longitudinal_bulkhead", numberFrom: 1, numberTo: 16 },
        { kind: "longitudinal", platingRegion: "bottom_shell", numberFrom: 1, numberTo: 14 },
        { kind: "longitudinal", platingRegion: "inner_bottom", numberFrom: 1, numberTo: 12 },
      ],
    );
  }
  await insertTank(
    tx,
    { orgId, vesselId, code: "FPT", name: "Fore peak tank", side: "centre", kind: "fore_peak", frameFrom: 215, frameTo: 230, bottomAreaM2: 38, atCollisionBulkhead: true, sortOrder: 900 },
    [
      { kind: "stringer_deck", numberFrom: 1, numberTo: 2, numbering: "from_top" },
      { kind: "web_frame", frames: [219, 223, 227] },
    ],
  );
  await insertTank(
    tx,
    { orgId, vesselId, code: "APT", name: "Aft peak tank", side: "centre", kind: "aft_peak", frameFrom: 0, frameTo: 6, bottomAreaM2: 24, sortOrder: 0 },
    [{ kind: "stringer_deck", numberFrom: 1, numberTo: 2, numbering: "from_top" }],
  );
}
