// Atmosphere limits for entering a tank, as selectable rule sets. A reading
// outside a limit is a stop: do not enter; follow the ship's procedure, ventilate
// and test again. These limits help the record; they never authorise an entry.

export type TRuleSetId = "msc581" | "a1050";
export type TReading = { oxygenPct: number; flammableLflPct: number; h2sPpm: number; coPpm: number; co2Pct?: number | null };

/** Occupational exposure limits used for "50 % of the OEL" (memory; national limits may be lower: a company setting). */
export const DEFAULT_OEL = { h2sPpm: 5, coPpm: 20 } as const;

type TLimit = { key: keyof TReading; label: string; test: (v: number) => boolean; limitText: string };

export type TRuleSet = { id: TRuleSetId; name: string; source: string; limits: TLimit[] };

export function ruleSet(id: TRuleSetId, oel: { h2sPpm: number; coPpm: number } = DEFAULT_OEL): TRuleSet {
  const toxic = (key: "h2sPpm" | "coPpm", label: string, strict: boolean): TLimit => {
    const max = oel[key] / 2;
    return {
      key,
      label,
      test: (v) => (strict ? v < max : v <= max),
      limitText: `${strict ? "below" : "at most"} ${max} ppm (50 % of the exposure limit ${oel[key]} ppm)`,
    };
  };
  if (id === "msc581") {
    return {
      id,
      name: "IMO MSC.581(110) (in force from 3 December 2025)",
      source: "IMO Res. MSC.581(110): O₂ ≥ 20.9 %, CO₂ < 0.5 %, flammable < 1 % LFL, toxic < 50 % OEL",
      limits: [
        { key: "oxygenPct", label: "Oxygen", test: (v) => v >= 20.9, limitText: "at least 20.9 % by volume" },
        { key: "flammableLflPct", label: "Flammable gas", test: (v) => v < 1, limitText: "below 1 % LFL" },
        toxic("h2sPpm", "H₂S", true),
        toxic("coPpm", "CO", true),
        { key: "co2Pct", label: "CO₂", test: (v) => v < 0.5, limitText: "below 0.5 % by volume" },
      ],
    };
  }
  return {
    id,
    name: "IMO Res. A.1050(27)",
    source: "IMO Res. A.1050(27) §7.2: steady 21 % O₂, flammable ≤ 1 % LFL, toxic ≤ 50 % OEL",
    limits: [
      // "A steady 21 %": 20.8 % is the lowest reading we take as 21 % (our setting; national rules may set a range).
      { key: "oxygenPct", label: "Oxygen", test: (v) => v >= 20.8 && v <= 21.5, limitText: "a steady 21 % by volume (20.8–21.5 %)" },
      { key: "flammableLflPct", label: "Flammable gas", test: (v) => v <= 1, limitText: "at most 1 % LFL" },
      toxic("h2sPpm", "H₂S", false),
      toxic("coPpm", "CO", false),
    ],
  };
}

export type TAtmosphereVerdict = { enter: boolean; failures: { label: string; value: number; limitText: string }[] };

/** Whether a reading is inside every limit of the rule set; the failures say which and by what limit. */
export function judgeReading(reading: TReading, set: TRuleSet): TAtmosphereVerdict {
  const failures = set.limits.flatMap((l) => {
    const v = reading[l.key];
    if (v === undefined || v === null) return [];
    return l.test(v) ? [] : [{ label: l.label, value: v, limitText: l.limitText }];
  });
  return { enter: failures.length === 0, failures };
}

export const STOP_MESSAGE = "Do not enter. Follow the ship's enclosed-space procedure: ventilate, then test the atmosphere again and record the new test.";
