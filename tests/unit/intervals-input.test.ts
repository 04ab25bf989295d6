// The interval settings: what the boxes say when refused, and how the fleet page
// speaks of the vessels with intervals of their own.
import { describe, expect, it } from "vitest";
import { monthsFromBox, vesselIntervalsSource, vesselsWithOwnIntervals } from "@/lib/office/interval-wording";
import { ZIntervalsInput } from "@/lib/schemas/intervals";

const messages = (input: unknown) => {
  const r = ZIntervalsInput.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")} ${i.message}`);
};

describe("interval boxes", () => {
  it("a non-number is told it must be a whole number of months, not that it is required", () => {
    expect(messages({ defaultMonths: monthsFromBox("abc"), belowGoodMonths: 6 })).toEqual(["defaultMonths must be a whole number of months"]);
    expect(messages({ defaultMonths: "12", belowGoodMonths: 6 })).toEqual(["defaultMonths must be a whole number of months"]); // a string over the API
    expect(messages({ defaultMonths: 12, belowGoodMonths: monthsFromBox("6.5") })).toEqual(["belowGoodMonths must be a whole number of months"]);
  });
  it("an empty box is required; zero is below the minimum", () => {
    expect(messages({ defaultMonths: monthsFromBox(""), belowGoodMonths: 6 })).toEqual(["defaultMonths is required: the interval for tanks rated GOOD in months"]);
    expect(messages({ defaultMonths: 12, belowGoodMonths: monthsFromBox("  ") })).toEqual(["belowGoodMonths is required: the interval for tanks below GOOD in months"]);
    expect(messages({ defaultMonths: monthsFromBox("0"), belowGoodMonths: 6 })[0]).toBe("defaultMonths must be at least 1 month");
  });
  it("reads a number with spaces around it", () => {
    expect(monthsFromBox(" 12 ")).toBe(12);
    expect(messages({ defaultMonths: monthsFromBox(" 12 "), belowGoodMonths: monthsFromBox("6") })).toEqual([]);
  });
});

describe("wording", () => {
  it("one vessel has its own, several have their own, none says nothing", () => {
    expect(vesselsWithOwnIntervals(1)).toBe("1 vessel has its own intervals");
    expect(vesselsWithOwnIntervals(2)).toBe("2 vessels have their own intervals");
    expect(vesselsWithOwnIntervals(0)).toBe("");
  });
  it("says whose intervals a chosen vessel uses", () => {
    expect(vesselIntervalsSource(true)).toBe("This vessel has its own intervals.");
    expect(vesselIntervalsSource(false)).toBe("This vessel uses the company's intervals.");
  });
});
