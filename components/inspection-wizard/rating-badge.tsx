import type { TRating } from "@/lib/calc/coating";

// Readable without colour: the word itself, and a pattern of bars (one for GOOD, two for FAIR, three for POOR).
const STYLE: Record<TRating, { className: string; bars: number }> = {
  GOOD: { className: "border-rating-good text-rating-good", bars: 1 },
  FAIR: { className: "border-rating-fair text-rating-fair", bars: 2 },
  POOR: { className: "border-rating-poor bg-red-50 text-rating-poor", bars: 3 },
};

export function RatingBadge({ rating }: { rating: TRating }) {
  const s = STYLE[rating];
  return (
    <span className={`inline-flex items-center gap-1 rounded border-2 px-1.5 py-0.5 text-xs font-bold ${s.className}`}>
      <span aria-hidden="true" className="inline-flex gap-px">
        {Array.from({ length: s.bars }, (_, i) => <span key={i} className="inline-block h-3 w-1 bg-current" />)}
      </span>
      {rating}
    </span>
  );
}
