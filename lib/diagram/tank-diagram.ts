// The tank diagrams of the structure map and the reports, built as plain shapes.
// The page (SVG) and the PDF draw the same list, so both show the same picture;
// nothing here knows about React or fonts.
import {
  PLATING_REGION_LABELS,
  PLATING_REGIONS,
  TANK_KIND_LABELS,
  TANK_SIDE_LABELS,
  type TPlatingRegion,
  type TTankKind,
  type TTankSide,
} from "@/lib/vocabulary";

export type TShape =
  | { type: "rect"; x: number; y: number; width: number; height: number; fill: string; stroke?: string; strokeWidth?: number; dash?: string }
  | { type: "line"; x1: number; y1: number; x2: number; y2: number; stroke: string; strokeWidth: number; dash?: string }
  | { type: "polygon"; points: [number, number][]; fill: string; stroke?: string; strokeWidth?: number }
  | { type: "text"; x: number; y: number; text: string; size: number; anchor: "start" | "middle" | "end"; weight: "normal" | "bold"; fill: string };
export type TDiagram = { width: number; height: number; title: string; shapes: TShape[] };
export type TBox = { x0: number; y0: number; x1: number; y1: number };

type TText = Extract<TShape, { type: "text" }>;
type TPoint = [number, number];

export const DIAGRAM_PALETTE = {
  outline: "#26415f",
  structure: "#8b95a3",
  tank: "#d4e6f4",
  midship: "#f2e9d3",
  text: "#1e2631",
  marker: "#26415f",
  markerText: "#ffffff",
} as const;

// ---------------------------------------------------------------- text and bounds

const EDGE = 2;
// Labels are placed before any font is measured, so their widths are estimated
// from the average advance of Noto Sans, a little wide to stay on the safe side.
const CHAR_EM = 0.6;
const ASCENT_EM = 0.75;
const DESCENT_EM = 0.25;

function textWidth(text: string, size: number): number {
  return text.length * size * CHAR_EM;
}

/** The box a shape covers, strokes included; for text, the estimated extent. */
export function shapeBounds(shape: TShape): TBox {
  switch (shape.type) {
    case "rect": {
      const half = shape.stroke ? (shape.strokeWidth ?? 1) / 2 : 0;
      return { x0: shape.x - half, y0: shape.y - half, x1: shape.x + shape.width + half, y1: shape.y + shape.height + half };
    }
    case "line": {
      const half = shape.strokeWidth / 2;
      return {
        x0: Math.min(shape.x1, shape.x2) - half,
        y0: Math.min(shape.y1, shape.y2) - half,
        x1: Math.max(shape.x1, shape.x2) + half,
        y1: Math.max(shape.y1, shape.y2) + half,
      };
    }
    case "polygon": {
      const half = shape.stroke ? (shape.strokeWidth ?? 1) / 2 : 0;
      const box = boundsOfPoints(shape.points);
      return { x0: box.x0 - half, y0: box.y0 - half, x1: box.x1 + half, y1: box.y1 + half };
    }
    case "text": {
      const width = textWidth(shape.text, shape.size);
      const x0 = shape.anchor === "start" ? shape.x : shape.anchor === "middle" ? shape.x - width / 2 : shape.x - width;
      return { x0, y0: shape.y - shape.size * ASCENT_EM, x1: x0 + width, y1: shape.y + shape.size * DESCENT_EM };
    }
  }
}

function boundsOfPoints(points: TPoint[]): TBox {
  const xs = points.map(([x]) => x);
  const ys = points.map(([, y]) => y);
  return { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) };
}

function boxesOverlap(a: TBox, b: TBox): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

function label(
  x: number,
  y: number,
  text: string,
  size: number,
  style: { anchor?: TText["anchor"]; weight?: TText["weight"]; fill?: string } = {},
): TText {
  const { anchor = "middle", weight = "normal", fill = DIAGRAM_PALETTE.text } = style;
  return { type: "text", x, y, text, size, anchor, weight, fill };
}

/** Slides a label sideways until its estimated extent is inside the drawing. */
function keepInside(text: TText, width: number): TText {
  const box = shapeBounds(text);
  if (box.x0 < EDGE) return { ...text, x: text.x + EDGE - box.x0 };
  if (box.x1 > width - EDGE) return { ...text, x: text.x - (box.x1 - (width - EDGE)) };
  return text;
}

function polyline(points: TPoint[], stroke: string, strokeWidth: number, dash?: string): TShape[] {
  return points.slice(1).map(([x2, y2], i) => {
    const [x1, y1] = points[i] as TPoint;
    return { type: "line", x1, y1, x2, y2, stroke, strokeWidth, ...(dash ? { dash } : {}) };
  });
}

function mirrorShapes(shapes: TShape[], width: number): TShape[] {
  return shapes.map((shape): TShape => {
    switch (shape.type) {
      case "rect":
        return { ...shape, x: width - shape.x - shape.width };
      case "line":
        return { ...shape, x1: width - shape.x1, x2: width - shape.x2 };
      case "polygon":
        return { ...shape, points: shape.points.map(([x, y]): TPoint => [width - x, y]) };
      case "text": {
        const anchor = shape.anchor === "start" ? "end" : shape.anchor === "end" ? "start" : "middle";
        return { ...shape, x: width - shape.x, anchor };
      }
    }
  });
}

// ---------------------------------------------------------------- tank kinds, parts and regions

type TPeakKind = "fore_peak" | "aft_peak";
type TTankPart = "double_bottom" | "hopper" | "side" | "top_side";

function isPeak(kind: TTankKind): kind is TPeakKind {
  return kind === "fore_peak" || kind === "aft_peak";
}

const PARTS_OF_KIND: Record<Exclude<TTankKind, TPeakKind>, readonly TTankPart[]> = {
  double_bottom: ["double_bottom"],
  hopper: ["hopper"],
  side: ["side"],
  top_side: ["top_side"],
  double_bottom_hopper: ["double_bottom", "hopper"],
  double_bottom_side: ["double_bottom", "side"],
  hopper_side: ["hopper", "side"],
  double_bottom_hopper_side: ["double_bottom", "hopper", "side"],
};

// Common practice: the plating regions usually reported for each part of a tank.
const REGIONS_OF_PART: Record<TTankPart, readonly TPlatingRegion[]> = {
  double_bottom: ["inner_bottom", "bottom_shell"],
  hopper: ["lower_hopper", "side_shell", "bottom_shell"],
  side: ["side_shell", "longitudinal_bulkhead"],
  top_side: ["upper_hopper", "main_deck", "side_shell"],
};
const PEAK_REGIONS: readonly TPlatingRegion[] = ["side_shell", "transverse_bulkhead"];

/** The plating regions of a tank of this kind, in the vocabulary's order. */
export function regionsOfKind(kind: TTankKind): TPlatingRegion[] {
  if (isPeak(kind)) return [...PEAK_REGIONS];
  const parts = PARTS_OF_KIND[kind];
  return PLATING_REGIONS.filter((region) => parts.some((part) => REGIONS_OF_PART[part].includes(region)));
}

// ---------------------------------------------------------------- side profile

export type TSideProfileInput = {
  vessel: {
    frameFirst: number;
    frameLast: number;
    midshipFromFrame: number | null;
    midshipToFrame: number | null;
    engineRoomFwdBulkheadFrame: number | null;
    collisionBulkheadFrame: number | null;
  };
  tank: { code: string; kind: TTankKind; frameFrom: number; frameTo: number };
  landmarks: { frame: number; label: string }[];
  marks?: { frameFrom: number; frameTo: number; label: string }[];
};
export type TProfileLayout = { frameFirst: number; frameLast: number; xFirst: number; xLast: number };

// Rows from the top: bulkhead names, midship name, markers, the hull, the frame
// scale, then the tank's end frames on a dimension line.
const PROFILE = {
  width: 720,
  height: 220,
  xFirst: 40,
  xLast: 684,
  bulkheadLabelY: 12,
  bandTop: 16,
  midshipLabelY: 25,
  markerTop: 28,
  markerSize: 11,
  deckY: 48,
  keelY: 160,
  sternOverhang: 22,
  bowOverhang: 26,
  scaleY: 170,
  scaleLabelY: 185,
  dimensionY: 200,
} as const;

/** Where the tank sits in the depth of the hull, as fractions from the deck down. */
const PROFILE_BAND: Record<TTankPart, [number, number]> = {
  top_side: [0, 0.3],
  side: [0, 1],
  hopper: [0.6, 0.86],
  double_bottom: [0.86, 1],
};

const SCALE_STEPS = [1, 2, 5, 10, 20, 25, 50, 100, 200, 500, 1000];
const MIN_TICK_SPACING = 32;

export function profileLayout(vessel: { frameFirst: number; frameLast: number }): TProfileLayout {
  return { frameFirst: vessel.frameFirst, frameLast: vessel.frameLast, xFirst: PROFILE.xFirst, xLast: PROFILE.xLast };
}

export function frameToX(layout: TProfileLayout, frame: number): number {
  const share = (frame - layout.frameFirst) / (layout.frameLast - layout.frameFirst);
  return layout.xFirst + share * (layout.xLast - layout.xFirst);
}

/** Frames outside the ship (a typing slip) are drawn at the nearest end. */
function drawnX(layout: TProfileLayout, frame: number): number {
  return frameToX(layout, Math.min(Math.max(frame, layout.frameFirst), layout.frameLast));
}

/** The tank code inside its box, smaller if need be; above the box when even 7-unit text will not fit. */
function codeLabel(box: TBox, code: string): TText {
  const room = box.x1 - box.x0 - 4;
  let size = 10;
  while (size > 7 && textWidth(code, size) > room) size -= 0.5;
  if (textWidth(code, size) <= room) return label((box.x0 + box.x1) / 2, (box.y0 + box.y1) / 2 + size / 3, code, size, { weight: "bold" });
  return label((box.x0 + box.x1) / 2, box.y0 - 4, code, 9, { weight: "bold" });
}

export function sideProfileDiagram(input: TSideProfileInput): TDiagram {
  const { vessel, tank } = input;
  const layout = profileLayout(vessel);
  const box = tankBox(layout, tank.kind, tank.frameFrom, tank.frameTo);
  const code = keepInside(codeLabel(box, tank.code), PROFILE.width);
  const shapes: TShape[] = [
    ...midshipBand(layout, vessel),
    hullOutline(layout),
    { type: "rect", x: box.x0, y: box.y0, width: box.x1 - box.x0, height: box.y1 - box.y0, fill: DIAGRAM_PALETTE.tank, stroke: DIAGRAM_PALETTE.outline, strokeWidth: 1.2 },
    ...landmarkTicks(layout, box, shapeBounds(code), tank, input.landmarks),
    ...bulkheads(layout, vessel),
    code,
    ...frameScale(layout),
    ...tankEndFrames(box, tank.frameFrom, tank.frameTo),
    ...markers(layout, input.marks ?? []),
  ];
  return { width: PROFILE.width, height: PROFILE.height, title: `Side profile: ${tank.code}, Fr. ${tank.frameFrom}–${tank.frameTo}`, shapes };
}

function tankBox(layout: TProfileLayout, kind: TTankKind, frameFrom: number, frameTo: number): TBox {
  const bands: [number, number][] = isPeak(kind) ? [[0, 1]] : PARTS_OF_KIND[kind].map((part) => PROFILE_BAND[part]);
  const depth = PROFILE.keelY - PROFILE.deckY;
  return {
    x0: drawnX(layout, frameFrom),
    x1: drawnX(layout, frameTo),
    y0: PROFILE.deckY + depth * Math.min(...bands.map(([top]) => top)),
    y1: PROFILE.deckY + depth * Math.max(...bands.map(([, bottom]) => bottom)),
  };
}

// The keel runs from the first frame to the last; stern and stem overhang it.
function hullOutline(layout: TProfileLayout): TShape {
  const { xFirst: aft, xLast: fwd } = layout;
  const { deckY, keelY, sternOverhang, bowOverhang } = PROFILE;
  return {
    type: "polygon",
    points: [
      [aft - sternOverhang, deckY],
      [fwd + bowOverhang, deckY],
      [fwd, keelY],
      [aft, keelY],
      [aft - sternOverhang, deckY + (keelY - deckY) * 0.3],
    ],
    fill: "none",
    stroke: DIAGRAM_PALETTE.outline,
    strokeWidth: 1.6,
  };
}

function midshipBand(layout: TProfileLayout, vessel: TSideProfileInput["vessel"]): TShape[] {
  if (vessel.midshipFromFrame === null || vessel.midshipToFrame === null) return [];
  const x0 = drawnX(layout, vessel.midshipFromFrame);
  const x1 = drawnX(layout, vessel.midshipToFrame);
  return [
    { type: "rect", x: x0, y: PROFILE.bandTop, width: x1 - x0, height: PROFILE.keelY - PROFILE.bandTop, fill: DIAGRAM_PALETTE.midship },
    keepInside(label((x0 + x1) / 2, PROFILE.midshipLabelY, "Midship region", 8), PROFILE.width),
  ];
}

function bulkheads(layout: TProfileLayout, vessel: TSideProfileInput["vessel"]): TShape[] {
  const known = [
    { frame: vessel.engineRoomFwdBulkheadFrame, name: "ER fwd bhd" },
    { frame: vessel.collisionBulkheadFrame, name: "Coll. bhd" },
  ];
  return known.flatMap(({ frame, name }): TShape[] => {
    if (frame === null) return [];
    const x = drawnX(layout, frame);
    return [
      { type: "line", x1: x, y1: PROFILE.bandTop, x2: x, y2: PROFILE.keelY, stroke: DIAGRAM_PALETTE.outline, strokeWidth: 1, dash: "5 3" },
      keepInside(label(x, PROFILE.bulkheadLabelY, name, 8), PROFILE.width),
    ];
  });
}

// Ticks always; a label only where it fits inside the box clear of the code and
// of the labels already placed, so crowded web frames stay readable.
function landmarkTicks(
  layout: TProfileLayout,
  box: TBox,
  codeBox: TBox,
  tank: TSideProfileInput["tank"],
  landmarks: TSideProfileInput["landmarks"],
): TShape[] {
  const inside = landmarks.filter(({ frame }) => frame >= tank.frameFrom && frame <= tank.frameTo).sort((a, b) => a.frame - b.frame);
  const taken: TBox[] = [codeBox];
  const shapes: TShape[] = [];
  for (const landmark of inside) {
    const x = drawnX(layout, landmark.frame);
    shapes.push({ type: "line", x1: x, y1: box.y1 - 6, x2: x, y2: box.y1, stroke: DIAGRAM_PALETTE.outline, strokeWidth: 1 });
    const text = label(x, box.y1 - 9, landmark.label, 7);
    const bounds = shapeBounds(text);
    const fits = bounds.x0 >= box.x0 + 2 && bounds.x1 <= box.x1 - 2 && bounds.y0 >= box.y0 + 2;
    if (fits && !taken.some((other) => boxesOverlap(bounds, other))) {
      shapes.push(text);
      taken.push(bounds);
    }
  }
  return shapes;
}

function frameScale(layout: TProfileLayout): TShape[] {
  const pxPerFrame = (layout.xLast - layout.xFirst) / (layout.frameLast - layout.frameFirst);
  const step = SCALE_STEPS.find((s) => s * pxPerFrame >= MIN_TICK_SPACING) ?? (SCALE_STEPS.at(-1) as number);
  const shapes: TShape[] = [
    { type: "line", x1: layout.xFirst, y1: PROFILE.scaleY, x2: layout.xLast, y2: PROFILE.scaleY, stroke: DIAGRAM_PALETTE.structure, strokeWidth: 1 },
    label(6, PROFILE.scaleY + 3, "Aft", 8, { anchor: "start" }),
    label(PROFILE.width - 6, PROFILE.scaleY + 3, "Fwd", 8, { anchor: "end" }),
  ];
  for (let frame = Math.ceil(layout.frameFirst / step) * step; frame <= layout.frameLast; frame += step) {
    const x = frameToX(layout, frame);
    shapes.push(
      { type: "line", x1: x, y1: PROFILE.scaleY, x2: x, y2: PROFILE.scaleY + 5, stroke: DIAGRAM_PALETTE.structure, strokeWidth: 1 },
      keepInside(label(x, PROFILE.scaleLabelY, String(frame), 8), PROFILE.width),
    );
  }
  return shapes;
}

/**
 * A dimension line under the scale with the tank's end frames beyond its ends;
 * an end frame with no room there (a peak at the end of the ship) hangs under
 * the line instead, flush with its end.
 */
function tankEndFrames(box: TBox, frameFrom: number, frameTo: number): TShape[] {
  const y = PROFILE.dimensionY;
  const stroke = DIAGRAM_PALETTE.outline;
  const endLabel = (x: number, text: string, outward: 1 | -1): TText => {
    const beyond = label(x + outward * 4, y + 3, text, 9, { anchor: outward > 0 ? "start" : "end", weight: "bold" });
    const bounds = shapeBounds(beyond);
    if (bounds.x0 >= EDGE && bounds.x1 <= PROFILE.width - EDGE) return beyond;
    return keepInside(label(x, y + 14, text, 9, { anchor: outward > 0 ? "end" : "start", weight: "bold" }), PROFILE.width);
  };
  return [
    { type: "line", x1: box.x0, y1: y, x2: box.x1, y2: y, stroke, strokeWidth: 1 },
    { type: "line", x1: box.x0, y1: y - 4, x2: box.x0, y2: y + 4, stroke, strokeWidth: 1 },
    { type: "line", x1: box.x1, y1: y - 4, x2: box.x1, y2: y + 4, stroke, strokeWidth: 1 },
    endLabel(box.x0, `Fr. ${frameFrom}`, -1),
    endLabel(box.x1, `Fr. ${frameTo}`, 1),
  ];
}

// Numbered markers above the deck, taken from aft forward; one that would cover
// the marker before it moves forward and keeps a pin to its true frame.
function markers(layout: TProfileLayout, marks: NonNullable<TSideProfileInput["marks"]>): TShape[] {
  const size = PROFILE.markerSize;
  const spanY = PROFILE.deckY - 3;
  const sorted = [...marks].sort((a, b) => a.frameFrom + a.frameTo - (b.frameFrom + b.frameTo));
  const shapes: TShape[] = [];
  let previousRight = -Infinity;
  for (const mark of sorted) {
    const x0 = drawnX(layout, mark.frameFrom);
    const x1 = drawnX(layout, mark.frameTo);
    const at = (x0 + x1) / 2;
    const centre = Math.min(Math.max(at, previousRight + 2 + size / 2, EDGE + size / 2), PROFILE.width - EDGE - size / 2);
    previousRight = centre + size / 2;
    shapes.push(
      { type: "line", x1: x0, y1: spanY, x2: x1, y2: spanY, stroke: DIAGRAM_PALETTE.marker, strokeWidth: 2 },
      { type: "line", x1: centre, y1: PROFILE.markerTop + size, x2: at, y2: spanY, stroke: DIAGRAM_PALETTE.marker, strokeWidth: 0.8 },
      { type: "rect", x: centre - size / 2, y: PROFILE.markerTop, width: size, height: size, fill: DIAGRAM_PALETTE.marker },
      label(centre, PROFILE.markerTop + size / 2 + 2.5, mark.label, 7, { weight: "bold", fill: DIAGRAM_PALETTE.markerText }),
    );
  }
  return shapes;
}

// ---------------------------------------------------------------- cross-section

export type TCrossSectionInput = { kind: TTankKind; side: TTankSide; highlight?: TPlatingRegion[] };

// Section points are [u, v]: u from the side shell (0) to the centreline (1),
// v from the keel (0) to the main deck (1). A frame maps them onto the drawing.
type TSectionFrame = { sideX: number; centreX: number };
type TSectionPart = { area: TPoint[]; plates: Partial<Record<TPlatingRegion, TPoint[]>> };

const SECTION = { width: 300, height: 220, deckY: 36, keelY: 190, labelSize: 8 } as const;
const PORT_HALF: TSectionFrame = { sideX: 72, centreX: 250 };
const LEFT_OF_CENTRE: TSectionFrame = { sideX: 58, centreX: 150 };

const SHELL: TPoint[] = [[0, 1], [0, 0.06], [0.06, 0], [1, 0]];
const DECK: TPoint[] = [[0, 1], [1, 1]];
const TOP_SIDE_FLOOR: TPoint[] = [[0, 0.74], [0.16, 0.74]];
const HOPPER_INNER: TPoint[] = [[1, 0.12], [0.38, 0.12], [0.16, 0.3], [0.16, 0.74], [0.42, 0.9], [0.42, 1]];
const HOPPER_DIVIDERS: TPoint[][] = [[[0.38, 0], [0.38, 0.12]], [[0, 0.3], [0.16, 0.3]], TOP_SIDE_FLOOR];
/** The L-shaped tank turns the bilge without a hopper slope. */
const L_INNER: TPoint[] = [[1, 0.12], [0.22, 0.12], [0.16, 0.18], [0.16, 0.74], [0.42, 0.9], [0.42, 1]];

const HOPPER_PARTS: Record<TTankPart, TSectionPart> = {
  double_bottom: {
    area: [[0.38, 0], [1, 0], [1, 0.12], [0.38, 0.12]],
    plates: { inner_bottom: [[0.38, 0.12], [1, 0.12]], bottom_shell: [[0.38, 0], [1, 0]] },
  },
  hopper: {
    area: [[0, 0.06], [0.06, 0], [0.38, 0], [0.38, 0.12], [0.16, 0.3], [0, 0.3]],
    plates: { lower_hopper: [[0.38, 0.12], [0.16, 0.3]], side_shell: [[0, 0.06], [0, 0.3]], bottom_shell: [[0, 0.06], [0.06, 0], [0.38, 0]] },
  },
  side: {
    area: [[0, 0.3], [0.16, 0.3], [0.16, 0.74], [0, 0.74]],
    plates: { side_shell: [[0, 0.3], [0, 0.74]], longitudinal_bulkhead: [[0.16, 0.3], [0.16, 0.74]] },
  },
  top_side: {
    area: [[0, 0.74], [0.16, 0.74], [0.42, 0.9], [0.42, 1], [0, 1]],
    plates: { upper_hopper: [[0.16, 0.74], [0.42, 0.9], [0.42, 1]], main_deck: [[0, 1], [0.42, 1]], side_shell: [[0, 0.74], [0, 1]] },
  },
};
const L_TANK: TSectionPart = {
  area: [[0, 0.06], [0.06, 0], [1, 0], [1, 0.12], [0.22, 0.12], [0.16, 0.18], [0.16, 0.74], [0, 0.74]],
  plates: {
    inner_bottom: [[0.22, 0.12], [1, 0.12]],
    bottom_shell: [[0, 0.06], [0.06, 0], [1, 0]],
    side_shell: [[0, 0.06], [0, 0.74]],
    longitudinal_bulkhead: [[0.16, 0.18], [0.16, 0.74]],
  },
};

/** Where a region's label goes: a point of the box around its plates (0..1 across, 0..1 down), then an offset. */
const LABEL_PLACES: Record<Exclude<TPlatingRegion, "transverse_bulkhead">, { fx: number; fy: number; dx: number; dy: number; anchor: TText["anchor"] }> = {
  inner_bottom: { fx: 0.5, fy: 0, dx: 0, dy: -5, anchor: "middle" },
  bottom_shell: { fx: 0.5, fy: 1, dx: 0, dy: 12, anchor: "middle" },
  lower_hopper: { fx: 0.5, fy: 0.15, dx: 0, dy: 0, anchor: "start" },
  side_shell: { fx: 0, fy: 0.5, dx: -5, dy: 3, anchor: "end" },
  longitudinal_bulkhead: { fx: 1, fy: 0.5, dx: 5, dy: 3, anchor: "start" },
  upper_hopper: { fx: 1, fy: 0.5, dx: 5, dy: 3, anchor: "start" },
  main_deck: { fx: 0.5, fy: 0, dx: 0, dy: -5, anchor: "middle" },
};

/** The peak's shell seen end on (left half), with a vertex at each stringer deck. */
const PEAK_SHELL: TPoint[] = [[0, 1], [0.03, 0.68], [0.14, 0.36], [0.46, 0.06], [0.62, 0], [1, 0]];
const PEAK_STRINGERS: TPoint[][] = [[[0.03, 0.68], [1, 0.68]], [[0.14, 0.36], [1, 0.36]]];
const PEAK_FRAME: TSectionFrame = { sideX: 60, centreX: 150 };

function toXY(frame: TSectionFrame, [u, v]: TPoint): TPoint {
  return [frame.sideX + u * (frame.centreX - frame.sideX), SECTION.keelY - v * (SECTION.keelY - SECTION.deckY)];
}

export function crossSectionDiagram(input: TCrossSectionInput): TDiagram {
  const { kind, side, highlight = [] } = input;
  const portView = isPeak(kind) ? peakView(kind, side, highlight) : halfSectionView(kind, side === "centre", highlight);
  return {
    width: SECTION.width,
    height: SECTION.height,
    title: `Cross-section looking forward: ${TANK_KIND_LABELS[kind]}, ${TANK_SIDE_LABELS[side].toLowerCase()}`,
    shapes: side === "starboard" ? mirrorShapes(portView, SECTION.width) : portView,
  };
}

/** The port half of the section; a centre tank also gets the mirrored starboard half. */
function halfSectionView(kind: Exclude<TTankKind, TPeakKind>, acrossCentreline: boolean, highlight: TPlatingRegion[]): TShape[] {
  const frame = acrossCentreline ? LEFT_OF_CENTRE : PORT_HALF;
  const at = (point: TPoint) => toXY(frame, point);
  const lShaped = kind === "double_bottom_side";
  const parts = lShaped ? [L_TANK] : PARTS_OF_KIND[kind].map((part) => HOPPER_PARTS[part]);
  const regions = regionsOfKind(kind);
  const half: TShape[] = [
    ...parts.map((part): TShape => ({ type: "polygon", points: part.area.map(at), fill: DIAGRAM_PALETTE.tank })),
    ...(lShaped ? [TOP_SIDE_FLOOR] : HOPPER_DIVIDERS).flatMap((divider) => polyline(divider.map(at), DIAGRAM_PALETTE.structure, 0.8)),
    ...polyline((lShaped ? L_INNER : HOPPER_INNER).map(at), DIAGRAM_PALETTE.outline, 1.2),
    ...polyline(SHELL.map(at), DIAGRAM_PALETTE.outline, 1.8),
    ...polyline(DECK.map(at), DIAGRAM_PALETTE.outline, 1.8),
    ...regions
      .filter((region) => highlight.includes(region))
      .flatMap((region) => platesOf(parts, region).flatMap((plate) => polyline(plate.map(at), DIAGRAM_PALETTE.outline, 3.5))),
  ];
  const labels = regions.flatMap((region) => {
    const plates = platesOf(parts, region).map((plate) => plate.map(at));
    return region === "transverse_bulkhead" || plates.length === 0 ? [] : [regionLabel(region, boundsOfPoints(plates.flat()), highlight)];
  });
  return [
    ...half,
    ...(acrossCentreline ? mirrorShapes(half, SECTION.width) : []),
    ...centreline(frame.centreX),
    ...labels,
  ];
}

function platesOf(parts: TSectionPart[], region: TPlatingRegion): TPoint[][] {
  return parts.flatMap((part) => {
    const plate = part.plates[region];
    return plate ? [plate] : [];
  });
}

function regionLabel(region: Exclude<TPlatingRegion, "transverse_bulkhead">, box: TBox, highlight: TPlatingRegion[]): TText {
  const place = LABEL_PLACES[region];
  const x = box.x0 + place.fx * (box.x1 - box.x0) + place.dx;
  const y = box.y0 + place.fy * (box.y1 - box.y0) + place.dy;
  const weight = highlight.includes(region) ? "bold" : "normal";
  return keepInside(label(x, y, PLATING_REGION_LABELS[region], SECTION.labelSize, { anchor: place.anchor, weight }), SECTION.width);
}

function centreline(x: number): TShape[] {
  return [
    { type: "line", x1: x, y1: SECTION.deckY - 10, x2: x, y2: SECTION.keelY + 6, stroke: DIAGRAM_PALETTE.structure, strokeWidth: 0.8, dash: "8 3 2 3" },
    label(x, SECTION.deckY - 14, "CL", 8),
  ];
}

/** Peaks are drawn end on, both sides of the ship; a side tank fills its own half only. */
function peakView(kind: TPeakKind, side: TTankSide, highlight: TPlatingRegion[]): TShape[] {
  const at = (point: TPoint) => toXY(PEAK_FRAME, point);
  const shell = PEAK_SHELL.map(at);
  const halfArea: TShape = { type: "polygon", points: [...shell, at([1, 1])], fill: DIAGRAM_PALETTE.tank };
  const halfShell = (ofTank: boolean) => [
    ...polyline(shell, DIAGRAM_PALETTE.outline, ofTank && highlight.includes("side_shell") ? 3.5 : 1.8),
    ...polyline([at([0, 1]), at([1, 1])], DIAGRAM_PALETTE.outline, 1.8),
  ];
  const stringers = PEAK_STRINGERS.flatMap((stringer) => polyline(stringer.map(at), DIAGRAM_PALETTE.outline, 1, "4 2"));
  const weightOf = (region: TPlatingRegion) => (highlight.includes(region) ? "bold" : "normal");
  const [sideX, sideY] = at([0.08, 0.52]);
  const [centreX, stringerY] = at([1, 0.68]);
  const [, bulkheadY] = at([1, 0.52]);
  return [
    halfArea,
    ...(side === "centre" ? mirrorShapes([halfArea], SECTION.width) : []),
    ...stringers,
    ...mirrorShapes(stringers, SECTION.width),
    ...halfShell(true),
    ...mirrorShapes(halfShell(side === "centre"), SECTION.width),
    label(centreX, 20, kind === "fore_peak" ? "Fore peak" : "Aft peak", 10, { weight: "bold" }),
    label(centreX, stringerY - 4, "Stringer decks", SECTION.labelSize),
    label(centreX, bulkheadY + 3, PLATING_REGION_LABELS.transverse_bulkhead, SECTION.labelSize, { weight: weightOf("transverse_bulkhead") }),
    keepInside(label(sideX - 5, sideY + 3, PLATING_REGION_LABELS.side_shell, SECTION.labelSize, { anchor: "end", weight: weightOf("side_shell") }), SECTION.width),
  ];
}
