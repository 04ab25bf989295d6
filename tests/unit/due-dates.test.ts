// Due dates of tank inspections. Each expected value names its source or is
// worked by hand in the comment beside it.
import { describe, expect, it } from "vitest";
import { addMonths, annualExaminationTriggers, daysBetween, intervalsForVessel, isDueWithin, latestCountersigned, nextInspectionDue, type TDueTank } from "@/lib/office/due-dates";

const intervals = { defaultMonths: 12, belowGoodMonths: 6 };
const bulkSide: TDueTank = { vesselType: "bulk_carrier", tankKind: "top_side", coatingSystem: "hard" };
const tankerSide: TDueTank = { vesselType: "oil_tanker", tankKind: "side", coatingSystem: "hard" };
const tankerDoubleBottom: TDueTank = { vesselType: "oil_tanker", tankKind: "double_bottom", coatingSystem: "hard" };
const boxShip: TDueTank = { vesselType: "container_ship", tankKind: "side", coatingSystem: "hard" };

describe("calendar months with end-of-month clamping (common practice)", () => {
  it("keeps the day of the month where it exists", () => {
    expect(addMonths("2026-03-14", 12)).toBe("2027-03-14"); // March 14 + 12 months = next March 14
    expect(addMonths("2025-12-15", 1)).toBe("2026-01-15"); // December + 1 crosses into January of the next year
  });
  it("clamps to the last day of a shorter month", () => {
    expect(addMonths("2026-01-31", 1)).toBe("2026-02-28"); // Feb 2026 has 28 days: 31 → 28
    expect(addMonths("2025-08-31", 6)).toBe("2026-02-28"); // Aug + 6 = Feb 2026; 31 → 28
    expect(addMonths("2026-05-31", 1)).toBe("2026-06-30"); // June has 30 days: 31 → 30
    expect(addMonths("2026-03-31", -1)).toBe("2026-02-28"); // backwards as well
  });
  it("knows leap years (Gregorian calendar, ISO 8601)", () => {
    expect(addMonths("2024-01-31", 1)).toBe("2024-02-29"); // 2024 is divisible by 4: February has 29 days
    expect(addMonths("2024-02-29", 12)).toBe("2025-02-28"); // 2025 is not a leap year: 29 → 28
  });
  it("counts days between dates", () => {
    expect(daysBetween("2026-01-01", "2026-03-01")).toBe(59); // 31 (January) + 28 (February)
    expect(daysBetween("2024-02-28", "2024-03-01")).toBe(2); // 28 → 29 → 1 March in a leap year
    expect(daysBetween("2026-03-02", "2026-02-28")).toBe(-2); // earlier date: negative
  });
  it("refuses what is not a calendar date", () => {
    expect(() => addMonths("2026-02-30", 1)).toThrow(/not a calendar date/);
    expect(() => addMonths("14/03/2026", 1)).toThrow(/not a calendar date/);
    expect(() => daysBetween("2026-13-01", "2026-01-01")).toThrow(/not a calendar date/);
  });
});

describe("next inspection due (company intervals: 12 months default, 6 below GOOD)", () => {
  it("GOOD coating takes the default interval", () => {
    const due = nextInspectionDue({ tank: bulkSide, last: { inspectedOn: "2025-03-14", rating: "GOOD" }, intervals, today: "2026-01-10" });
    expect(due.intervalMonths).toBe(12);
    expect(due.dueOn).toBe("2026-03-14"); // 2025-03-14 + 12 months
    expect(due.daysUntilDue).toBe(63); // 21 (Jan 10 → 31) + 28 (February) + 14 (March)
    expect(due.overdue).toBe(false);
    expect(due.status).toBe("not_due");
    expect(due.reasons.map((r) => r.kind)).toEqual(["interval"]);
  });

  it("FAIR coating takes the shorter interval and is overdue two days after the clamped due date", () => {
    const due = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2025-08-31", rating: "FAIR" }, intervals, today: "2026-03-02" });
    expect(due.intervalMonths).toBe(6);
    expect(due.dueOn).toBe("2026-02-28"); // 2025-08-31 + 6 months = 2026-02-31 → clamped to 28
    expect(due.daysUntilDue).toBe(-2); // Feb 28 → Mar 2 is 2 days past
    expect(due.overdue).toBe(true);
    expect(due.status).toBe("overdue");
    // The tank takes the rating of its worst area, and that area sets how often it is examined (IMO MSC.1/Circ.1330 §4.2.1)
    expect(due.reasons[0]).toMatchObject({ kind: "interval", source: "IMO MSC.1/Circ.1330 §4.2.1" });
    expect(due.reasons[0]?.text).toContain("6 months");
  });

  it("is due, not overdue, on the due date itself; overdue from the next day", () => {
    const last = { inspectedOn: "2025-06-15", rating: "POOR" as const };
    const onDay = nextInspectionDue({ tank: boxShip, last, intervals, today: "2025-12-15" }); // 2025-06-15 + 6 months
    expect(onDay.daysUntilDue).toBe(0);
    expect(onDay.overdue).toBe(false);
    const dayAfter = nextInspectionDue({ tank: boxShip, last, intervals, today: "2025-12-16" });
    expect(dayAfter.daysUntilDue).toBe(-1);
    expect(dayAfter.overdue).toBe(true);
  });

  it("an inspection without a coating rating takes the shorter interval until it is rated", () => {
    const due = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2026-01-10", rating: null }, intervals, today: "2026-01-10" });
    expect(due.dueOn).toBe("2026-07-10"); // 2026-01-10 + 6 months
    expect(due.daysUntilDue).toBe(181); // 21 (Jan 10 → 31) + 28 + 31 + 30 + 31 + 30 + 10 (Feb–Jun, then July 10)
    expect(due.reasons.map((r) => r.kind)).toEqual(["not_rated"]);
  });

  it("uses the shorter of the two intervals, even if the company set them the wrong way round", () => {
    const due = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2026-01-10", rating: "POOR" }, intervals: { defaultMonths: 6, belowGoodMonths: 9 }, today: "2026-01-10" });
    expect(due.intervalMonths).toBe(6); // min(6, 9)
  });

  it("a tank never inspected has no due date and is always due", () => {
    const due = nextInspectionDue({ tank: boxShip, last: null, intervals, today: "2026-01-10" });
    expect(due).toMatchObject({ status: "never_inspected", lastInspectedOn: null, dueOn: null, daysUntilDue: null, overdue: false, intervalMonths: null });
    expect(due.reasons.map((r) => r.kind)).toEqual(["never_inspected"]);
    expect(isDueWithin(due, 0)).toBe(true);
  });

  it("'due within N days' includes the Nth day, overdue tanks and never-inspected tanks", () => {
    const last = { inspectedOn: "2025-03-14", rating: "GOOD" as const };
    expect(isDueWithin(nextInspectionDue({ tank: boxShip, last, intervals, today: "2026-02-12" }), 30)).toBe(true); // 16 (Feb 12 → 28) + 14 = 30 days
    expect(isDueWithin(nextInspectionDue({ tank: boxShip, last, intervals, today: "2026-02-11" }), 30)).toBe(false); // 31 days
    expect(isDueWithin(nextInspectionDue({ tank: boxShip, last, intervals, today: "2026-04-01" }), 30)).toBe(true); // overdue
  });

  it("refuses intervals that are not whole months above 0", () => {
    expect(() => nextInspectionDue({ tank: boxShip, last: null, intervals: { defaultMonths: 0, belowGoodMonths: 6 }, today: "2026-01-10" })).toThrow(/defaultMonths/);
    expect(() => nextInspectionDue({ tank: boxShip, last: null, intervals: { defaultMonths: 12, belowGoodMonths: 1.5 }, today: "2026-01-10" })).toThrow(/belowGoodMonths/);
  });
});

describe("class-rule annual examination triggers", () => {
  const kinds = (tank: TDueTank, rating: "GOOD" | "FAIR" | "POOR" | null, today = "2026-01-10") => annualExaminationTriggers({ tank, rating, today }).map((r) => `${r.kind} ${r.source}`);

  it("bulk carrier: coating less than GOOD, surveys on or after 1 July 2024 (IMO Res. MSC.525(106))", () => {
    expect(kinds(bulkSide, "FAIR")).toEqual(["class_annual IMO Res. MSC.525(106)"]);
    expect(kinds(bulkSide, "POOR")).toEqual(["class_annual IMO Res. MSC.525(106)"]);
    expect(kinds(bulkSide, "GOOD")).toEqual([]);
    expect(kinds(bulkSide, "FAIR", "2024-07-01")).toEqual(["class_annual IMO Res. MSC.525(106)"]); // the first day it applies
    expect(kinds(bulkSide, "FAIR", "2024-06-30")).toEqual([]); // before 1 July 2024
  });

  it("tanker, ballast tank other than a double bottom: hard coating POOR, soft or semi-hard, or no hard coating (2011 ESP Code, IMO Res. A.1049(27))", () => {
    const esp = "2011 ESP Code, IMO Res. A.1049(27)";
    expect(kinds(tankerSide, "POOR")).toEqual([`class_annual ${esp}`]);
    expect(kinds(tankerSide, "FAIR")).toEqual([]); // hard coating FAIR is not a trigger for tankers
    expect(kinds({ ...tankerSide, coatingSystem: "soft" }, "GOOD")).toEqual([`class_annual ${esp}`]);
    expect(kinds({ ...tankerSide, coatingSystem: "semi_hard" }, null)).toEqual([`class_annual ${esp}`]);
    expect(kinds({ ...tankerSide, coatingSystem: "none" }, null)).toEqual([`class_annual ${esp}`]);
    expect(kinds({ ...tankerSide, vesselType: "product_tanker" }, "POOR")).toEqual([`class_annual ${esp}`]);
  });

  it("tanker, double-bottom tank: the same conditions mean it may be examined annually (2011 ESP Code, IMO Res. A.1049(27))", () => {
    expect(kinds(tankerDoubleBottom, "POOR")).toEqual(["class_may_be_annual 2011 ESP Code, IMO Res. A.1049(27)"]);
    expect(kinds({ ...tankerDoubleBottom, tankKind: "double_bottom_side" }, "POOR")).toEqual(["class_annual 2011 ESP Code, IMO Res. A.1049(27)"]); // L-shaped: treated as other than a double bottom (our stricter reading)
  });

  it("other ship types have no class trigger here: the company interval alone applies", () => {
    expect(kinds(boxShip, "POOR")).toEqual([]);
  });

  it("the due date carries the triggers, and a never-inspected tank with soft coating shows its trigger", () => {
    const due = nextInspectionDue({ tank: tankerSide, last: { inspectedOn: "2025-09-01", rating: "POOR" }, intervals, today: "2026-01-10" });
    expect(due.dueOn).toBe("2026-03-01"); // 2025-09-01 + 6 months
    expect(due.reasons.map((r) => r.kind)).toEqual(["interval", "class_annual"]);
    const never = nextInspectionDue({ tank: { ...tankerSide, coatingSystem: "soft" }, last: null, intervals, today: "2026-01-10" });
    expect(never.reasons.map((r) => r.kind)).toEqual(["never_inspected", "class_annual"]);
  });
});

describe("which inspection and which intervals count", () => {
  it("the latest countersigned inspection, by date then revision; drafts, returned and superseded ones do not count", () => {
    const list = [
      { id: "a", status: "countersigned" as const, inspectedOn: "2025-03-14", revision: 1 },
      { id: "b", status: "superseded" as const, inspectedOn: "2025-09-01", revision: 1 },
      { id: "c", status: "countersigned" as const, inspectedOn: "2025-09-01", revision: 2 },
      { id: "d", status: "draft" as const, inspectedOn: "2026-01-05", revision: 1 },
      { id: "e", status: "returned" as const, inspectedOn: "2026-01-06", revision: 1 },
    ];
    expect(latestCountersigned(list)?.id).toBe("c");
    expect(latestCountersigned(list.filter((i) => i.status !== "countersigned"))).toBeNull();
  });

  it("a vessel's own intervals win over the company's; none set → null", () => {
    const rows = [
      { vesselId: null, defaultMonths: 12, belowGoodMonths: 6 },
      { vesselId: "v2", defaultMonths: 6, belowGoodMonths: 3 },
    ];
    expect(intervalsForVessel(rows, "v2")).toEqual({ defaultMonths: 6, belowGoodMonths: 3, vesselOwn: true });
    expect(intervalsForVessel(rows, "v1")).toEqual({ defaultMonths: 12, belowGoodMonths: 6, vesselOwn: false });
    expect(intervalsForVessel([], "v1")).toBeNull();
  });
});

describe("the reason says whose interval applies: the vessel's own row or the company's", () => {
  const own = { defaultMonths: 6, belowGoodMonths: 3, vesselOwn: true };
  it("a vessel's own row: GOOD takes its 6 months, FAIR and unrated its shorter 3", () => {
    // GOOD: 2025-12-31 + 6 months = 2026-06-30 (the vessel's default)
    const good = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2025-12-31", rating: "GOOD" }, intervals: own, today: "2026-03-10" });
    expect(good.dueOn).toBe("2026-06-30");
    expect(good.reasons[0]?.text).toBe("Coating GOOD: the vessel's own interval of 6 months applies.");
    // FAIR: 2025-11-30 + 3 months = 2026-02-28 (clamped), the vessel's below-GOOD interval
    const fair = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2025-11-30", rating: "FAIR" }, intervals: own, today: "2026-03-10" });
    expect(fair.dueOn).toBe("2026-02-28");
    expect(fair.reasons[0]?.text).toBe("Coating FAIR, below GOOD (the tank takes the rating of its worst area): the vessel's own shorter interval of 3 months applies.");
    expect(fair.reasons[0]?.text).not.toContain("company");
    const unrated = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2026-01-10", rating: null }, intervals: own, today: "2026-03-10" });
    expect(unrated.reasons[0]?.text).toBe("The last inspection recorded no coating condition: the vessel's own shorter interval of 3 months applies until the coating is rated.");
  });
  it("the company's row (vesselOwn false or absent) says the company's", () => {
    const fair = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2025-08-31", rating: "FAIR" }, intervals: { ...intervals, vesselOwn: false }, today: "2026-03-02" });
    expect(fair.reasons[0]?.text).toBe("Coating FAIR, below GOOD (the tank takes the rating of its worst area): the company's shorter interval of 6 months applies.");
    const good = nextInspectionDue({ tank: boxShip, last: { inspectedOn: "2025-03-14", rating: "GOOD" }, intervals, today: "2026-01-10" });
    expect(good.reasons[0]?.text).toBe("Coating GOOD: the company's interval of 12 months applies.");
  });
});
