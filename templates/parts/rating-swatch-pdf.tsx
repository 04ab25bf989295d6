import { Line, Rect, Svg } from "@react-pdf/renderer";
import type { TRating } from "@/lib/calc/coating";

const SIDE = 7;
const STEP = 2.5;
const INK = "#1e293b";

/** Segments of the 45° lines x + y = c (or x − y = c when `flip`) that fall inside the square, every STEP along the diagonal. */
function hatch(flip: boolean) {
  const lines: { x1: number; y1: number; x2: number; y2: number }[] = [];
  for (let c = STEP; c < 2 * SIDE; c += STEP) {
    const [a, b] = c <= SIDE ? [{ x: 0, y: c }, { x: c, y: 0 }] : [{ x: c - SIDE, y: SIDE }, { x: SIDE, y: c - SIDE }];
    lines.push(flip ? { x1: a.x, y1: SIDE - a.y, x2: b.x, y2: SIDE - b.y } : { x1: a.x, y1: a.y, x2: b.x, y2: b.y });
  }
  return lines;
}

/**
 * The web's rating swatch (components/ui/rating-mark.tsx) in React-PDF: GOOD an
 * empty square, FAIR single hatching, POOR cross-hatching, so the rating reads
 * in grey-scale print as well as from its word.
 */
export function RatingSwatchPdf({ rating }: { rating: TRating }) {
  const lines = rating === "GOOD" ? [] : rating === "FAIR" ? hatch(false) : [...hatch(false), ...hatch(true)];
  return (
    <Svg width={SIDE + 1} height={SIDE + 1} viewBox={`-0.5 -0.5 ${SIDE + 1} ${SIDE + 1}`}>
      {lines.map((l, i) => <Line key={i} {...l} stroke={INK} strokeWidth={0.7} />)}
      <Rect x={0} y={0} width={SIDE} height={SIDE} fill="none" stroke={INK} strokeWidth={0.9} />
    </Svg>
  );
}
