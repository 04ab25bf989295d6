import { describe, expect, it } from "vitest";
import { judgeReading, ruleSet } from "@/lib/safety/atmosphere";
import { checkFreeText } from "@/lib/rules/vagueness";

const clean = { oxygenPct: 20.9, flammableLflPct: 0, h2sPpm: 0, coPpm: 0 };

describe("entry atmosphere (IMO Res. MSC.581(110); IMO Res. A.1050(27) §7.2)", () => {
  it("O₂ 20.8 % → no entry under MSC.581 (worked check)", () => {
    const v = judgeReading({ ...clean, oxygenPct: 20.8 }, ruleSet("msc581"));
    expect(v.enter).toBe(false);
    expect(v.failures[0]).toMatchObject({ label: "Oxygen", value: 20.8 });
  });
  it("LFL exactly 1 % → no entry under MSC.581, allowed under A.1050 (worked check)", () => {
    expect(judgeReading({ ...clean, oxygenPct: 21, flammableLflPct: 1 }, ruleSet("msc581")).enter).toBe(false);
    expect(judgeReading({ ...clean, oxygenPct: 21, flammableLflPct: 1 }, ruleSet("a1050")).enter).toBe(true);
  });
  it("CO₂ 0.5 % → no entry under MSC.581", () => {
    expect(judgeReading({ ...clean, co2Pct: 0.5 }, ruleSet("msc581")).enter).toBe(false);
  });
  it("toxic gases at 50 % of the exposure limit (OEL values from memory, a setting)", () => {
    expect(judgeReading({ ...clean, h2sPpm: 2.5 }, ruleSet("msc581")).enter).toBe(false);
    expect(judgeReading({ ...clean, oxygenPct: 21, h2sPpm: 2.5 }, ruleSet("a1050")).enter).toBe(true);
    expect(judgeReading({ ...clean, coPpm: 10, h2sPpm: 1 }, ruleSet("msc581", { h2sPpm: 5, coPpm: 25 })).enter).toBe(true);
  });
});

describe("vague free text (our own phrase lists)", () => {
  const unpinned = { location: false, extent: false };
  const pinned = { location: true, extent: true };
  it.each([
    "some corrosion in the tank",
    "bad condition",
    "see photo",
    "As before.",
    "Corrosion here and there",
    "heavy rust",
    "crack",
    "poor",
    "same as last report",
  ])("refuses %j when nothing pins it down", (text) => {
    expect(checkFreeText(text, unpinned).ok).toBe(false);
  });
  it.each([
    "Crack 40 mm at the lower bracket toe of side longitudinal 27, frame 112",
    "Pitting up to 3 mm deep over 0.5 m² of the bottom shell between frames 204 and 208",
    "Coating breakdown 15 % along the weld seam to stringer 2, aft part",
    "Dent 300 x 200 mm, 25 mm deep, side shell between frames 120-121",
  ])("accepts %j", (text) => {
    expect(checkFreeText(text, unpinned).ok).toBe(true);
  });
  it("accepts a short description when the fields already give the place and the size", () => {
    expect(checkFreeText("Crack through the weld, opening visible", pinned).ok).toBe(true);
    expect(checkFreeText("some pitting around the bell mouth", { location: true, extent: true }).ok).toBe(true);
  });
  it("refuses text that only says something is somewhere, even when the fields give the place and size", () => {
    expect(checkFreeText("some corrosion in the tank", pinned)).toMatchObject({ ok: false, message: expect.stringMatching(/only says that there is corrosion somewhere/) });
    expect(checkFreeText("heavy rust here and there", pinned).ok).toBe(false);
  });
  it("still refuses a pointer elsewhere or a bare judgement, whatever the fields say", () => {
    expect(checkFreeText("see photo", pinned)).toMatchObject({ ok: false, message: expect.stringMatching(/points elsewhere/) });
    expect(checkFreeText("bad condition", pinned)).toMatchObject({ ok: false, message: expect.stringMatching(/only judges/) });
  });
  it("says what to add", () => {
    expect(checkFreeText("some corrosion of the lower hopper plating", { location: true, extent: false })).toMatchObject({ ok: false, message: expect.stringMatching(/mm, the area in m² or %/) });
    expect(checkFreeText("heavy corrosion", { location: false, extent: true })).toMatchObject({ ok: false, message: expect.stringMatching(/where on the member and how large/) });
  });
});
