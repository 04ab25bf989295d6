// Recurring findings, hand-made cases. The rule (same tank, overlapping frames,
// same member kind / number / plating region, same finding type) is our
// setting (common practice: a defect "found again at the same place").
import { describe, expect, it } from "vitest";
import { framesOverlap, markRecurring, type TRecurringFinding } from "@/lib/office/recurring";

const base: TRecurringFinding = { id: "", tankId: "T1", inspectionId: "", inspectedOn: "", type: "pitting", frameFrom: 40, frameTo: 44, memberKind: "plating", memberNumber: null, platingRegion: "bottom_shell" };
const f = (id: string, inspectionId: string, inspectedOn: string, over: Partial<TRecurringFinding> = {}): TRecurringFinding => ({ ...base, id, inspectionId, inspectedOn, ...over });

describe("framesOverlap", () => {
  it("shares a frame at the ends, not when apart", () => {
    expect(framesOverlap({ frameFrom: 40, frameTo: 44 }, { frameFrom: 44, frameTo: 50 })).toBe(true);
    expect(framesOverlap({ frameFrom: 40, frameTo: 44 }, { frameFrom: 41, frameTo: 42 })).toBe(true);
    expect(framesOverlap({ frameFrom: 40, frameTo: 44 }, { frameFrom: 45, frameTo: 50 })).toBe(false);
  });
});

describe("markRecurring", () => {
  it("marks a later finding at overlapping frames on the same member, pointing at the latest earlier one", () => {
    const marks = markRecurring([
      f("a1", "I1", "2024-03-01"),
      f("b1", "I2", "2025-03-01", { frameFrom: 43, frameTo: 46 }),
      f("c1", "I3", "2026-03-01", { frameFrom: 46, frameTo: 48 }),
    ]);
    expect(marks.get("a1")).toBeUndefined();
    expect(marks.get("b1")).toBe("a1");
    expect(marks.get("c1")).toBe("b1"); // overlaps b1 (46) but not a1 (40–44)
  });

  it("does not mark another type, member kind, member number, plating region, tank or frames apart", () => {
    const marks = markRecurring([
      f("a", "I1", "2024-03-01", { memberKind: "longitudinal", memberNumber: 7, platingRegion: null }),
      f("type", "I2", "2025-03-01", { type: "coating_breakdown", memberKind: "longitudinal", memberNumber: 7, platingRegion: null }),
      f("kind", "I2", "2025-03-01", { memberKind: "web_frame", memberNumber: 7, platingRegion: null }),
      f("number", "I2", "2025-03-01", { memberKind: "longitudinal", memberNumber: 8, platingRegion: null }),
      f("region", "I2", "2025-03-01", { memberKind: "longitudinal", memberNumber: 7, platingRegion: "bottom_shell" }),
      f("tank", "I9", "2025-03-01", { tankId: "T2", memberKind: "longitudinal", memberNumber: 7, platingRegion: null }),
      f("apart", "I2", "2025-03-01", { memberKind: "longitudinal", memberNumber: 7, platingRegion: null, frameFrom: 50, frameTo: 52 }),
      f("same", "I2", "2025-03-01", { memberKind: "longitudinal", memberNumber: 7, platingRegion: null, frameFrom: 44, frameTo: 45 }),
    ]);
    expect([...marks.entries()]).toEqual([["same", "a"]]);
  });

  it("never marks findings of the same inspection, nor an earlier one by a later one", () => {
    const marks = markRecurring([f("x", "I1", "2024-03-01"), f("y", "I1", "2024-03-01", { frameFrom: 42, frameTo: 43 }), f("z", "I0", "2023-01-01", { frameFrom: 90, frameTo: 91 })]);
    expect(marks.size).toBe(0);
  });
});
