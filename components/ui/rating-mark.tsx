import type { TRating } from "@/lib/calc/coating";

// A rating is read from its words; the swatch adds a pattern that survives
// grey-scale printing and colour blindness: GOOD an empty square, FAIR single
// hatching, POOR cross-hatching. Without a rating the outline is dashed: never
// inspected is empty, inspected but not rated (no coating record) carries a
// solid dot in the middle, the report that exists.
export type TRatingMarkKind = TRating | "unrated" | "never";

const LABEL: Record<TRatingMarkKind, string> = { GOOD: "GOOD", FAIR: "FAIR", POOR: "POOR", unrated: "Not rated", never: "Never inspected" };

export function RatingSwatch({ kind }: { kind: TRatingMarkKind }) {
  const id = `rating-pattern-${kind}`;
  const hatched = kind === "FAIR" || kind === "POOR";
  return (
    <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" className="inline-block shrink-0 align-[-2px] text-slate-800" data-swatch={kind}>
      {hatched ? (
        <defs>
          <pattern id={id} width="4" height="4" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2="4" stroke="currentColor" strokeWidth="1.4" />
            {kind === "POOR" ? <line x1="0" y1="0" x2="4" y2="0" stroke="currentColor" strokeWidth="1.4" /> : null}
          </pattern>
        </defs>
      ) : null}
      <rect
        x="0.75"
        y="0.75"
        width="12.5"
        height="12.5"
        fill={hatched ? `url(#${id})` : "none"}
        stroke="currentColor"
        strokeWidth="1.5"
        strokeDasharray={kind === "unrated" || kind === "never" ? "2 2" : undefined}
      />
      {kind === "unrated" ? <circle cx="7" cy="7" r="2.5" fill="currentColor" /> : null}
    </svg>
  );
}

export function RatingMark({ kind }: { kind: TRatingMarkKind }) {
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap font-semibold" data-rating={kind}>
      <RatingSwatch kind={kind} />
      {LABEL[kind]}
    </span>
  );
}
