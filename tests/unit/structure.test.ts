// The structure map's rules. Regions and concerns are common practice of tank
// inspection (no single published source); the thresholds are our settings.
import { describe, expect, it } from "vitest";
import { memberInputSchema, parseFrameList, specialFrameInputSchema, tankInputSchema } from "@/lib/schemas/tank";
import { checkMemberReference, memberConflict, memberMisfit, type TCatalogue, type TCatalogueMember } from "@/lib/structure/catalogue";
import { areasOfConcern, CONCERN_IDS, type TConcernContext } from "@/lib/structure/concerns";
import { frameRangeProblem, framesApart, spansOverlap } from "@/lib/structure/frames";
import { mirrorTankCode, mirrorTankInput } from "@/lib/structure/mirror";
import { deriveTankPosition, forwardRegionStartFrame, type TVesselFrames } from "@/lib/structure/position";

const vessel: TVesselFrames = { frameFirst: 0, frameLast: 280, midshipFromFrame: 98, midshipToFrame: 196, engineRoomFwdBulkheadFrame: 52, collisionBulkheadFrame: 262 };
const unknownVessel: TVesselFrames = { frameFirst: 0, frameLast: 280, midshipFromFrame: null, midshipToFrame: null, engineRoomFwdBulkheadFrame: null, collisionBulkheadFrame: null };
const paths = (r: { error?: { issues: { path: PropertyKey[] }[] } }) => r.error?.issues.map((i) => i.path.join(".")) ?? [];

describe("frame ranges", () => {
  it("overlap and distance", () => {
    expect(spansOverlap({ frameFrom: 10, frameTo: 20 }, { frameFrom: 20, frameTo: 30 })).toBe(true);
    expect(spansOverlap({ frameFrom: 10, frameTo: 19 }, { frameFrom: 20, frameTo: 30 })).toBe(false);
    expect(framesApart({ frameFrom: 54, frameTo: 100 }, 52)).toBe(2);
    expect(framesApart({ frameFrom: 54, frameTo: 100 }, 60)).toBe(0);
  });
  it("a range inside the tank passes; reversed or outside is explained", () => {
    const tank = { code: "No. 2 DB WBT P", frameFrom: 196, frameTo: 228 };
    expect(frameRangeProblem({ from: 212, to: 213 }, tank)).toBeNull();
    expect(frameRangeProblem({ from: 213, to: 212 }, tank)).toMatch(/must not be forward/);
    expect(frameRangeProblem({ from: 226, to: 230 }, tank)).toBe("Fr. 226–230 is outside No. 2 DB WBT P (Fr. 196–228)");
  });
});

describe("position along the ship, derived from frames", () => {
  it("midship region: sharing frames with the region, with the reason; touching its end frame does not count", () => {
    expect(deriveTankPosition(vessel, { frameFrom: 164, frameTo: 196 }).midship).toEqual({ applies: true, why: "Fr. 164–196 lies within the midship region (Fr. 98–196)." });
    expect(deriveTankPosition(vessel, { frameFrom: 196, frameTo: 228 }).midship).toEqual({ applies: false, why: "Fr. 196–228 lies outside the midship region (Fr. 98–196), touching it only at Fr. 196." });
    expect(deriveTankPosition(vessel, { frameFrom: 54, frameTo: 100 }).midship).toEqual({ applies: true, why: "Fr. 54–100 lies partly in the midship region (Fr. 98–196): Fr. 98–100." });
    expect(deriveTankPosition(vessel, { frameFrom: 197, frameTo: 228 }).midship.applies).toBe(false);
    expect(deriveTankPosition(unknownVessel, { frameFrom: 150, frameTo: 160 }).midship.why).toMatch(/do not give the midship region/);
  });
  it("next to the engine-room forward bulkhead: within 3 frames", () => {
    expect(deriveTankPosition(vessel, { frameFrom: 55, frameTo: 100 }).nearEngineRoom.applies).toBe(true);
    expect(deriveTankPosition(vessel, { frameFrom: 56, frameTo: 100 }).nearEngineRoom.applies).toBe(false);
    expect(deriveTankPosition(vessel, { frameFrom: 40, frameTo: 60 }).nearEngineRoom.why).toMatch(/at the engine-room forward bulkhead \(Fr\. 52\)/);
  });
  it("forward region: the foremost fifth of the frames", () => {
    expect(forwardRegionStartFrame(vessel)).toBe(224);
    expect(deriveTankPosition(vessel, { frameFrom: 196, frameTo: 224 }).forwardRegion.applies).toBe(false);
    expect(deriveTankPosition(vessel, { frameFrom: 196, frameTo: 228 }).forwardRegion.applies).toBe(true);
  });
  it("forward of the collision bulkhead by frames, or by the tank's own flag", () => {
    expect(deriveTankPosition(vessel, { frameFrom: 262, frameTo: 280 }).forwardOfCollisionBulkhead.applies).toBe(true);
    expect(deriveTankPosition(vessel, { frameFrom: 228, frameTo: 258 }).forwardOfCollisionBulkhead.applies).toBe(false);
    expect(deriveTankPosition(unknownVessel, { frameFrom: 262, frameTo: 280, atCollisionBulkhead: true }).forwardOfCollisionBulkhead.applies).toBe(true);
  });
});

describe("areas of concern, case by case (common practice)", () => {
  const ctx = (over: Partial<TConcernContext> & { frames?: [number, number] }): TConcernContext => {
    const [from, to] = over.frames ?? [120, 140];
    return { kind: "top_side", vesselType: "product_tanker", atWaterline: false, heatedBoundary: null, position: deriveTankPosition(vessel, { frameFrom: from, frameTo: to }), ...over };
  };
  const ids = (c: TConcernContext) => areasOfConcern(c).map((a) => a.id);
  const ALWAYS = ["coating-edges-welds-piping", "coating-anodes-sediment", "stiffness-changes"];

  it("every tank: coating at edges/welds/piping, coating/anodes/sediment, stiffness changes", () => {
    expect(ids(ctx({ frames: [10, 20], kind: "top_side" }))).toEqual(ALWAYS);
  });
  it("midship: bracket connections, with the frames either side of a crack", () => {
    const got = areasOfConcern(ctx({ frames: [120, 140] }));
    const midship = got.find((a) => a.id === "midship-brackets")!;
    expect(midship.lookFor).toMatch(/frames either side/);
    expect(midship.because).toMatch(/lies within the midship region/);
  });
  it("next to the engine room: diagonal cracks", () => {
    expect(ids(ctx({ frames: [54, 70] }))).toContain("engine-room-diagonal-cracks");
    expect(ids(ctx({ frames: [60, 70] }))).not.toContain("engine-room-diagonal-cracks");
  });
  it("bulk carrier double bottom: cracks between unevenly loaded holds; not on a tanker or in a peak", () => {
    expect(ids(ctx({ kind: "double_bottom_hopper", vesselType: "bulk_carrier" }))).toContain("uneven-hold-loading");
    expect(ids(ctx({ kind: "double_bottom_hopper", vesselType: "oil_tanker" }))).not.toContain("uneven-hold-loading");
    expect(ids(ctx({ kind: "fore_peak", vesselType: "bulk_carrier", frames: [262, 280] }))).not.toContain("uneven-hold-loading");
  });
  it("bottom plating: bell mouths; none in a top side tank", () => {
    expect(ids(ctx({ kind: "double_bottom" }))).toContain("bell-mouths");
    expect(ids(ctx({ kind: "top_side" }))).not.toContain("bell-mouths");
  });
  it("waterline: contact damage, by flag or by a side-shell kind", () => {
    expect(ids(ctx({ atWaterline: true }))).toContain("waterline-contact");
    expect(ids(ctx({ kind: "double_bottom_side" }))).toContain("waterline-contact");
    expect(ids(ctx({ kind: "double_bottom" }))).not.toContain("waterline-contact");
  });
  it("forward bottom: slamming, only where the tank has bottom plating", () => {
    expect(ids(ctx({ kind: "double_bottom_hopper", frames: [228, 258] }))).toContain("forward-slamming");
    expect(ids(ctx({ kind: "top_side", frames: [228, 258] }))).not.toContain("forward-slamming");
    expect(ids(ctx({ kind: "double_bottom_hopper", frames: [196, 224] }))).not.toContain("forward-slamming");
  });
  it("fore peak: anchor contact and the collision bulkhead", () => {
    const got = ids(ctx({ kind: "fore_peak", frames: [262, 280] }));
    expect(got).toEqual(expect.arrayContaining(["fore-peak-anchor", "forward-slamming", "bell-mouths"]));
  });
  it("heated boundary: accelerated corrosion, naming the boundary", () => {
    const got = areasOfConcern(ctx({ heatedBoundary: "aft bulkhead to No. 4 HFO tank" })).find((a) => a.id === "heated-boundary");
    expect(got?.because).toBe("Heated boundary: aft bulkhead to No. 4 HFO tank.");
    expect(ids(ctx({}))).not.toContain("heated-boundary");
  });
  it("every rule can be chosen by some tank", () => {
    const all = new Set([
      ...ids(ctx({ kind: "fore_peak", frames: [262, 280], vesselType: "bulk_carrier", atWaterline: true, heatedBoundary: "x" })),
      ...ids(ctx({ kind: "double_bottom_hopper", frames: [54, 120], vesselType: "bulk_carrier" })),
    ]);
    expect([...all].sort()).toEqual([...CONCERN_IDS].sort());
  });
});

const catalogue: TCatalogue = {
  tank: { code: "No. 3 WBT P", frameFrom: 100, frameTo: 125 },
  members: [
    { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 20, numberTo: 38, numbering: null, frames: null, hasCentreGirder: null },
    { kind: "stringer_deck", platingRegion: null, numberFrom: 1, numberTo: 3, numbering: "from_top", frames: null, hasCentreGirder: null },
    { kind: "bottom_girder", platingRegion: null, numberFrom: 1, numberTo: 2, numbering: null, frames: null, hasCentreGirder: true },
    { kind: "web_frame", platingRegion: null, numberFrom: null, numberTo: null, numbering: null, frames: [104, 108, 112], hasCentreGirder: null },
  ],
  specialFrames: [],
};

describe("member catalogue: is this member inside this tank?", () => {
  const ref = (over: object) => checkMemberReference(catalogue, { frameFrom: 112, frameTo: 113, memberKind: "longitudinal", platingRegion: "side_shell", memberNumber: 27, ...over });
  it("accepts a longitudinal of a catalogued set", () => expect(ref({})).toBeNull());
  it("refuses a number outside the set, naming the set", () => {
    expect(ref({ memberNumber: 39 })).toEqual({ path: "memberNumber", message: "No. 3 WBT P has side shell longitudinals 20–38, not 39" });
  });
  it("refuses a region with no longitudinals, and frames outside the tank", () => {
    expect(ref({ platingRegion: "inner_bottom" })?.path).toBe("platingRegion");
    expect(ref({ frameFrom: 98, frameTo: 101 })?.path).toBe("frameFrom");
  });
  it("stringers and girders by number; 0 is the centre girder where there is one", () => {
    expect(ref({ memberKind: "stringer_deck", memberNumber: 3, platingRegion: null })).toBeNull();
    expect(ref({ memberKind: "stringer_deck", memberNumber: 4, platingRegion: null })?.message).toMatch(/stringer decks 1–3, not 4/);
    expect(ref({ memberKind: "bottom_girder", memberNumber: 0, platingRegion: null })).toBeNull();
  });
  it("web frames by the frame they stand at", () => {
    expect(ref({ memberKind: "web_frame", memberNumber: 108 })).toBeNull();
    expect(ref({ memberKind: "web_frame", memberNumber: 110 })?.message).toMatch(/web frames at Fr\. 104, 108, 112, not at Fr\. 110/);
    expect(ref({ memberKind: "web_frame", memberNumber: null, frameFrom: 112, frameTo: 112 })).toBeNull();
  });
  it("members without numbers (brackets, manholes, bell mouths) need only the frames", () => {
    expect(ref({ memberKind: "bell_mouth", memberNumber: null })).toBeNull();
  });

  const m = (over: Partial<TCatalogueMember>): TCatalogueMember => ({ kind: "longitudinal", platingRegion: "side_shell", numberFrom: 1, numberTo: 5, numbering: null, frames: null, hasCentreGirder: null, ...over });
  it("refuses overlapping ranges of the same member set; other regions may reuse numbers", () => {
    expect(memberConflict(catalogue.members, m({ numberFrom: 30, numberTo: 40 }))).toMatch(/overlaps the existing side shell longitudinals 20–38/);
    expect(memberConflict(catalogue.members, m({ numberFrom: 39, numberTo: 40 }))).toBeNull();
    expect(memberConflict(catalogue.members, m({ platingRegion: "inner_bottom", numberFrom: 20, numberTo: 30 }))).toBeNull();
    expect(memberConflict(catalogue.members, m({ kind: "web_frame", platingRegion: null, numberFrom: null, numberTo: null, frames: [112, 116] }))).toMatch(/Fr\. 112/);
  });
});

describe("members a tank of its kind can have (common practice)", () => {
  it("stringer decks in side tanks and peaks, girders in double bottoms and peaks, longitudinals of the kind's plating", () => {
    expect(memberMisfit("double_bottom_hopper", { kind: "stringer_deck" })?.message).toMatch(/has no stringer decks/);
    expect(memberMisfit("fore_peak", { kind: "stringer_deck" })).toBeNull();
    expect(memberMisfit("top_side", { kind: "bottom_girder" })?.path).toBe("kind");
    expect(memberMisfit("double_bottom", { kind: "longitudinal", platingRegion: "main_deck" })?.path).toBe("platingRegion");
    expect(memberMisfit("double_bottom", { kind: "longitudinal", platingRegion: "inner_bottom" })).toBeNull();
  });
});

describe("tank and member schemas", () => {
  const schema = tankInputSchema({ frameFirst: 0, frameLast: 280 });
  const tank = { code: "No. 3 WBT P", name: "No. 3 ballast tank port", side: "port", kind: "double_bottom_side", frameFrom: "100", frameTo: "125" };
  it("accepts a valid tank from form strings", () => {
    const r = schema.safeParse({ ...tank, atWaterline: "on", bottomAreaM2: "210.5" });
    expect(r.data).toMatchObject({ frameFrom: 100, frameTo: 125, atWaterline: true, atCollisionBulkhead: false, bottomAreaM2: 210.5, coatingSystem: "hard" });
  });
  it("refuses reversed frames and frames outside the vessel, naming the field", () => {
    expect(paths(schema.safeParse({ ...tank, frameFrom: "125", frameTo: "100" }))).toEqual(["frameTo"]);
    expect(paths(schema.safeParse({ ...tank, frameTo: "290" }))).toEqual(["frameTo"]);
    expect(paths(schema.safeParse({ ...tank, frameFrom: "" }))).toEqual(["frameFrom"]);
    expect(paths(schema.safeParse({ ...tank, bottomAreaM2: "-4" }))).toEqual(["bottomAreaM2"]);
  });
  const members = memberInputSchema({ code: "No. 3 WBT P", frameFrom: 100, frameTo: 125 });
  it("a longitudinal set needs its region and numbers; numbers in order", () => {
    expect(paths(members.safeParse({ kind: "longitudinal", numberFrom: "1", numberTo: "9" }))).toEqual(["platingRegion"]);
    expect(paths(members.safeParse({ kind: "longitudinal", platingRegion: "side_shell", numberFrom: "9", numberTo: "1" }))).toEqual(["numberTo"]);
  });
  it("web frames as a list or a stepped range, inside the tank", () => {
    expect(parseFrameList("104-120/4")).toEqual([104, 108, 112, 116, 120]);
    expect(parseFrameList("104, 108;112")).toEqual([104, 108, 112]);
    expect(paths(members.safeParse({ kind: "web_frame", frames: "96, 104" }))).toEqual(["frames"]);
    expect(paths(members.safeParse({ kind: "web_frame", frames: "every fourth" }))).toEqual(["frames"]);
  });
  it("stringer decks say from which end they are numbered", () => {
    expect(paths(members.safeParse({ kind: "stringer_deck", numberFrom: "1", numberTo: "3" }))).toEqual(["numbering"]);
  });
  it("a special frame lies inside the tank and says what differs", () => {
    const sf = specialFrameInputSchema({ code: "T", frameFrom: 100, frameTo: 125 });
    expect(paths(sf.safeParse({ frame: "130", note: "deep floor" }))).toEqual(["frame"]);
    expect(paths(sf.safeParse({ frame: "110", note: "" }))).toEqual(["note"]);
  });
});

describe("copy to the other side", () => {
  it.each([
    ["No. 3 WBT P", "port", "No. 3 WBT S"],
    ["No. 3 WBT S", "starboard", "No. 3 WBT P"],
    ["3P", "port", "3S"],
    ["No. 2 TST (P)", "port", "No. 2 TST (S)"],
    ["No. 4 WBT Port", "port", "No. 4 WBT Starboard"],
    ["WB4", "port", "WB4 S"],
  ] as const)("%s (%s) → %s", (code, side, expected) => {
    expect(mirrorTankCode(code, side)).toBe(expected);
  });
  it("mirrors side and name, keeps frames; a centre tank has no other side", () => {
    const t = { code: "No. 3 WBT P", name: "No. 3 ballast tank, port", side: "port" as const, kind: "double_bottom_side", frameFrom: 100, frameTo: 125, bottomAreaM2: 210, coatingSystem: "hard", heatedBoundary: "Inner side to No. 3 cargo tank port", atWaterline: true, atCollisionBulkhead: false, note: null };
    expect(mirrorTankInput(t)).toMatchObject({ code: "No. 3 WBT S", name: "No. 3 ballast tank, starboard", side: "starboard", frameFrom: 100, frameTo: 125, heatedBoundary: "Inner side to No. 3 cargo tank starboard" });
    expect(mirrorTankInput({ ...t, side: "centre" })).toBeNull();
  });
});
