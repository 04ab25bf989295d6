// When each tank is next due for inspection: the last countersigned inspection
// plus the company's interval, the shorter one when the coating is below GOOD,
// with the class-rule reasons a superintendent should see beside the date.
//
// Dates are ISO calendar dates (YYYY-MM-DD), read as days without a time zone.
// Months are calendar months, clamped to the end of the month when the day does
// not exist: 2026-01-31 + 1 month = 2026-02-28, 2024-01-31 + 1 month =
// 2024-02-29, 2025-08-31 + 6 months = 2026-02-28. A due date is "overdue" from
// the day after it: on the due date itself the tank is due in 0 days.
import type { TRating } from "@/lib/calc/coating";
import type { COATING_SYSTEMS, TInspectionStatus, TTankKind, TVesselType } from "@/lib/vocabulary";

export type TCoatingSystem = (typeof COATING_SYSTEMS)[number];
/** vesselOwn: the vessel's own row applies rather than the company's (absent: the company's). */
export type TIntervals = { defaultMonths: number; belowGoodMonths: number; vesselOwn?: boolean };

// ---------------------------------------------------------------- calendar dates

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const DAY_MS = 86_400_000;

function parseIsoDate(iso: string): { y: number; m: number; d: number } {
  const match = ISO_DATE.exec(iso);
  const [y, m, d] = match ? [Number(match[1]), Number(match[2]), Number(match[3])] : [0, 0, 0];
  if (!match || m < 1 || m > 12 || d < 1 || d > daysInMonth(y, m)) throw new RangeError(`"${iso}" is not a calendar date like 2026-03-14`);
  return { y, m, d };
}

const daysInMonth = (y: number, m: number) => new Date(Date.UTC(y, m, 0)).getUTCDate();
const dayNumber = (iso: string) => {
  const { y, m, d } = parseIsoDate(iso);
  return Date.UTC(y, m - 1, d) / DAY_MS;
};

/** Adds calendar months, clamping to the last day of a shorter month (2026-01-31 + 1 → 2026-02-28). */
export function addMonths(iso: string, months: number): string {
  if (!Number.isInteger(months)) throw new RangeError("months must be a whole number");
  const { y, m, d } = parseIsoDate(iso);
  const index = y * 12 + (m - 1) + months;
  const ny = Math.floor(index / 12);
  const nm = (index % 12) + 1;
  const nd = Math.min(d, daysInMonth(ny, nm));
  return `${String(ny).padStart(4, "0")}-${String(nm).padStart(2, "0")}-${String(nd).padStart(2, "0")}`;
}

/** Whole days from `from` to `to`; negative when `to` is earlier. */
export const daysBetween = (from: string, to: string) => dayNumber(to) - dayNumber(from);

// ---------------------------------------------------------------- which inspection counts

/** The latest countersigned inspection of a tank (by inspection date, then revision), or null. */
export function latestCountersigned<T extends { status: TInspectionStatus; inspectedOn: string; revision?: number }>(inspections: readonly T[]): T | null {
  let latest: T | null = null;
  for (const i of inspections) {
    if (i.status !== "countersigned") continue;
    const later = !latest || i.inspectedOn > latest.inspectedOn || (i.inspectedOn === latest.inspectedOn && (i.revision ?? 1) > (latest.revision ?? 1));
    if (later) latest = i;
  }
  return latest;
}

/** The intervals that apply to a vessel: its own row if the company set one, else the company's row (vesselId null). */
export function intervalsForVessel<T extends TIntervals & { vesselId: string | null }>(rows: readonly T[], vesselId: string): TIntervals | null {
  const row = rows.find((r) => r.vesselId === vesselId) ?? rows.find((r) => r.vesselId === null);
  return row ? { defaultMonths: row.defaultMonths, belowGoodMonths: row.belowGoodMonths, vesselOwn: row.vesselId !== null } : null;
}

// ---------------------------------------------------------------- class-rule reasons

export type TDueTank = { vesselType: TVesselType; tankKind: TTankKind; coatingSystem: TCoatingSystem };

export type TDueReason = {
  kind: "interval" | "not_rated" | "never_inspected" | "class_annual" | "class_may_be_annual";
  text: string;
  /** The published rule the reason rests on, where there is one. */
  source?: string;
};

const TANKERS: readonly TVesselType[] = ["oil_tanker", "product_tanker", "chemical_tanker"];
const ESP_CODE = "2011 ESP Code, IMO Res. A.1049(27)";
const BULK_RULE = "IMO Res. MSC.525(106)";
const BULK_RULE_FROM = "2024-07-01";

/**
 * The class-rule triggers for examining the tank at every annual survey:
 * - tankers (ESP Code; oil, product and chemical tankers alike): a ballast tank other than a double bottom with hard
 *   coating in POOR condition (not renewed), soft or semi-hard coating, or no
 *   hard coating; a double-bottom tank in that state may be examined annually.
 *   Only a plain double bottom counts as one: an L- or U-shaped tank reaches up
 *   the side and is treated as "other than a double bottom" (our choice, the
 *   stricter reading).
 * - bulk carriers surveyed on or after 1 July 2024 (MSC.525(106)): coating less
 *   than GOOD.
 * A missing rating gives no coating trigger here; the interval handles it.
 */
export function annualExaminationTriggers({ tank, rating, today }: { tank: TDueTank; rating: TRating | null; today: string }): TDueReason[] {
  const reasons: TDueReason[] = [];
  if (TANKERS.includes(tank.vesselType)) {
    const condition =
      tank.coatingSystem === "none"
        ? "has no hard coating"
        : tank.coatingSystem === "soft" || tank.coatingSystem === "semi_hard"
          ? `has ${tank.coatingSystem === "soft" ? "soft" : "semi-hard"} coating`
          : rating === "POOR"
            ? "has hard coating in POOR condition (unless it has been renewed)"
            : null;
    if (condition) {
      const doubleBottom = tank.tankKind === "double_bottom";
      reasons.push(
        doubleBottom
          ? { kind: "class_may_be_annual", text: `This double-bottom ballast tank ${condition}: the surveyor may examine it at every annual survey.`, source: ESP_CODE }
          : { kind: "class_annual", text: `This ballast tank ${condition}: it is examined at every annual survey.`, source: ESP_CODE },
      );
    }
  }
  if (tank.vesselType === "bulk_carrier" && (rating === "FAIR" || rating === "POOR") && today >= BULK_RULE_FROM) {
    reasons.push({ kind: "class_annual", text: `The coating is ${rating}, less than GOOD: on a bulk carrier the tank is examined at every annual survey.`, source: BULK_RULE });
  }
  return reasons;
}

// ---------------------------------------------------------------- the due date

export type TDueStatus = "never_inspected" | "overdue" | "not_due";
export type TDueDate = {
  status: TDueStatus;
  lastInspectedOn: string | null;
  rating: TRating | null;
  intervalMonths: number | null;
  dueOn: string | null;
  /** Days from today to the due date: 0 on the day, negative once overdue; null when never inspected. */
  daysUntilDue: number | null;
  overdue: boolean;
  reasons: TDueReason[];
};

/**
 * The next inspection of a tank. `last` is its latest countersigned inspection
 * (see `latestCountersigned`) with the tank's rating from that inspection's
 * worst area (`rateTank`), or null when it has none. The interval is the
 * company default for GOOD coating and the shorter one below GOOD; when the
 * inspection recorded no coating rating, the shorter one applies until it is
 * rated (our choice: an unknown rating is not taken as GOOD).
 */
export function nextInspectionDue({ tank, last, intervals, today }: { tank: TDueTank; last: { inspectedOn: string; rating: TRating | null } | null; intervals: TIntervals; today: string }): TDueDate {
  for (const [name, v] of Object.entries({ defaultMonths: intervals.defaultMonths, belowGoodMonths: intervals.belowGoodMonths })) if (!Number.isInteger(v) || v <= 0) throw new RangeError(`${name} must be a whole number of months above 0`);
  parseIsoDate(today); // a malformed "today" is refused even when there is no due date to compare it with
  if (!last) {
    return {
      status: "never_inspected",
      lastInspectedOn: null,
      rating: null,
      intervalMonths: null,
      dueOn: null,
      daysUntilDue: null,
      overdue: false,
      reasons: [{ kind: "never_inspected", text: "No countersigned inspection on record: inspect the tank at the first opportunity." }, ...annualExaminationTriggers({ tank, rating: null, today })],
    };
  }
  const shorter = Math.min(intervals.belowGoodMonths, intervals.defaultMonths);
  const whose = intervals.vesselOwn ? "the vessel's own" : "the company's";
  const reasons: TDueReason[] = [];
  let intervalMonths: number;
  if (last.rating === "GOOD") {
    intervalMonths = intervals.defaultMonths;
    reasons.push({ kind: "interval", text: `Coating GOOD: ${whose} interval of ${months(intervalMonths)} applies.` });
  } else if (last.rating === null) {
    intervalMonths = shorter;
    reasons.push({ kind: "not_rated", text: `The last inspection recorded no coating condition: ${whose} shorter interval of ${months(intervalMonths)} applies until the coating is rated.` });
  } else {
    intervalMonths = shorter;
    reasons.push({
      kind: "interval",
      text: `Coating ${last.rating}, below GOOD (the tank takes the rating of its worst area): ${whose} shorter interval of ${months(intervalMonths)} applies.`,
      source: "IMO MSC.1/Circ.1330 §4.2.1",
    });
  }
  reasons.push(...annualExaminationTriggers({ tank, rating: last.rating, today }));
  const dueOn = addMonths(last.inspectedOn, intervalMonths);
  const daysUntilDue = daysBetween(today, dueOn);
  return { status: daysUntilDue < 0 ? "overdue" : "not_due", lastInspectedOn: last.inspectedOn, rating: last.rating, intervalMonths, dueOn, daysUntilDue, overdue: daysUntilDue < 0, reasons };
}

const months = (n: number) => `${n} month${n === 1 ? "" : "s"}`;

/** For the "due within N days" filter: overdue and never-inspected tanks are always due. */
export function isDueWithin(due: TDueDate, days: number): boolean {
  return due.daysUntilDue === null || due.daysUntilDue <= days;
}
