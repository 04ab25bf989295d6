// The tank diagrams as geometry: where things sit, not how they look.
import { createElement } from "react";
import { Document, Page, renderToBuffer } from "@react-pdf/renderer";
import { describe, expect, it } from "vitest";
import {
  DIAGRAM_PALETTE,
  crossSectionDiagram,
  frameToX,
  profileLayout,
  regionsOfKind,
  shapeBounds,
  sideProfileDiagram,
  type TDiagram,
  type TShape,
  type TSideProfileInput,
} from "@/lib/diagram/tank-diagram";
import { PLATING_REGION_LABELS, TANK_KINDS, TANK_SIDES, type TTankKind } from "@/lib/vocabulary";
import { registerPdfFonts } from "@/templates/fonts";
import { TankDiagramPdf } from "@/templates/parts/tank-diagram-pdf";

const vessel: TSideProfileInput["vessel"] = {
  frameFirst: 0,
  frameLast: 250,
  midshipFromFrame: 80,
  midshipToFrame: 180,
  engineRoomFwdBulkheadFrame: 42,
  collisionBulkheadFrame: 238,
};
const bareVessel: TSideProfileInput["vessel"] = {
  frameFirst: -6,
  frameLast: 120,
  midshipFromFrame: null,
  midshipToFrame: null,
  engineRoomFwdBulkheadFrame: null,
  collisionBulkheadFrame: null,
};
const tank = { code: "DB3P", kind: "double_bottom_hopper_side" as TTankKind, frameFrom: 196, frameTo: 232 };

const profileOf = (input: Partial<TSideProfileInput> = {}) => sideProfileDiagram({ vessel, tank, landmarks: [], ...input });
const texts = (diagram: TDiagram) => diagram.shapes.filter((s): s is Extract<TShape, { type: "text" }> => s.type === "text");
const rects = (diagram: TDiagram, fill: string) =>
  diagram.shapes.filter((s): s is Extract<TShape, { type: "rect" }> => s.type === "rect" && s.fill === fill);
const lines = (diagram: TDiagram) => diagram.shapes.filter((s): s is Extract<TShape, { type: "line" }> => s.type === "line");
const verticalLinesAt = (diagram: TDiagram, x: number) => lines(diagram).filter((l) => l.x1 === x && l.x2 === x && l.y1 !== l.y2);
const tankBoxOf = (diagram: TDiagram) => {
  const [box, ...others] = rects(diagram, DIAGRAM_PALETTE.tank);
  expect(others).toHaveLength(0);
  if (!box) throw new Error("no tank box");
  return box;
};
const textAt = (diagram: TDiagram, text: string) => texts(diagram).filter((t) => t.text === text);

function expectInsideViewBox(diagram: TDiagram) {
  for (const shape of diagram.shapes) {
    const box = shapeBounds(shape);
    const where = JSON.stringify(shape);
    expect(box.x0, where).toBeGreaterThanOrEqual(0);
    expect(box.y0, where).toBeGreaterThanOrEqual(0);
    expect(box.x1, where).toBeLessThanOrEqual(diagram.width);
    expect(box.y1, where).toBeLessThanOrEqual(diagram.height);
  }
}

describe("side profile", () => {
  it("is about 720 × 220 and titled with the tank", () => {
    const diagram = profileOf();
    expect(diagram.width).toBe(720);
    expect(diagram.height).toBe(220);
    expect(diagram.title).toContain("DB3P");
  });

  it("maps frames to x linearly, frameFirst and frameLast to the edges of the drawing area", () => {
    const layout = profileLayout(vessel);
    expect(frameToX(layout, vessel.frameFirst)).toBe(layout.xFirst);
    expect(frameToX(layout, vessel.frameLast)).toBe(layout.xLast);
    expect(layout.xFirst).toBeGreaterThan(0);
    expect(layout.xLast).toBeLessThan(720);
    const step = frameToX(layout, 1) - frameToX(layout, 0);
    for (const frame of [-3, 17, 125, 249.5]) {
      expect(frameToX(layout, frame + 1) - frameToX(layout, frame)).toBeCloseTo(step, 9);
    }
    expect(frameToX(layout, 125)).toBeCloseTo((layout.xFirst + layout.xLast) / 2, 9);
  });

  it("the frame scale runs between the same edges", () => {
    const layout = profileLayout(vessel);
    const scale = lines(profileOf()).find((l) => l.y1 === l.y2 && l.x1 === layout.xFirst && l.x2 === layout.xLast);
    expect(scale).toBeDefined();
  });

  it("labels the scale at round frames: every 20 on a 250-frame ship, every 10 on a 120-frame one", () => {
    const labelsOf = (diagram: TDiagram) => texts(diagram).map((t) => t.text).filter((t) => /^-?\d+$/.test(t));
    expect(labelsOf(profileOf())).toEqual(["0", "20", "40", "60", "80", "100", "120", "140", "160", "180", "200", "220", "240"]);
    expect(labelsOf(sideProfileDiagram({ vessel: bareVessel, tank: { ...tank, frameFrom: 40, frameTo: 60 }, landmarks: [] }))).toEqual([
      "0", "10", "20", "30", "40", "50", "60", "70", "80", "90", "100", "110", "120",
    ]);
  });

  it("the tank box spans exactly frameToX(frameFrom)..frameToX(frameTo)", () => {
    const layout = profileLayout(vessel);
    const box = tankBoxOf(profileOf());
    expect(box.x).toBe(frameToX(layout, 196));
    expect(box.x + box.width).toBeCloseTo(frameToX(layout, 232), 9);
  });

  it("places the box by kind: double bottom low, top side high, side full depth, combinations as the union", () => {
    const boxOf = (kind: TTankKind) => {
      const box = tankBoxOf(profileOf({ tank: { ...tank, kind } }));
      return { top: box.y, bottom: box.y + box.height };
    };
    const side = boxOf("side");
    const doubleBottom = boxOf("double_bottom");
    const hopper = boxOf("hopper");
    const topSide = boxOf("top_side");
    expect(doubleBottom.bottom).toBe(side.bottom);
    expect(doubleBottom.top).toBeGreaterThan((side.top + side.bottom) / 2);
    expect(topSide.top).toBe(side.top);
    expect(topSide.bottom).toBeLessThan((side.top + side.bottom) / 2);
    expect(hopper.bottom).toBeLessThanOrEqual(doubleBottom.top);
    expect(hopper.top).toBeGreaterThan(topSide.bottom);
    expect(boxOf("double_bottom_hopper")).toEqual({ top: hopper.top, bottom: doubleBottom.bottom });
    for (const kind of ["double_bottom_side", "hopper_side", "double_bottom_hopper_side", "fore_peak", "aft_peak"] as const) {
      expect(boxOf(kind), kind).toEqual(side);
    }
  });

  it("shows the tank code and the end frames as text", () => {
    const diagram = profileOf();
    expect(textAt(diagram, "DB3P")).toHaveLength(1);
    expect(textAt(diagram, "Fr. 196")).toHaveLength(1);
    expect(textAt(diagram, "Fr. 232")).toHaveLength(1);
  });

  it("draws the midship band and the bulkheads at their frames", () => {
    const layout = profileLayout(vessel);
    const diagram = profileOf();
    const [band] = rects(diagram, DIAGRAM_PALETTE.midship);
    expect(band?.x).toBe(frameToX(layout, 80));
    expect((band?.x ?? 0) + (band?.width ?? 0)).toBeCloseTo(frameToX(layout, 180), 9);
    expect(textAt(diagram, "Midship region")).toHaveLength(1);
    expect(verticalLinesAt(diagram, frameToX(layout, 42))).toHaveLength(1);
    expect(verticalLinesAt(diagram, frameToX(layout, 238))).toHaveLength(1);
    expect(textAt(diagram, "ER fwd bhd")).toHaveLength(1);
    expect(textAt(diagram, "Coll. bhd")).toHaveLength(1);
  });

  it("leaves out the band and the bulkheads the vessel does not have", () => {
    const diagram = sideProfileDiagram({ vessel: bareVessel, tank: { ...tank, frameFrom: 40, frameTo: 60 }, landmarks: [] });
    expect(rects(diagram, DIAGRAM_PALETTE.midship)).toHaveLength(0);
    for (const name of ["Midship region", "ER fwd bhd", "Coll. bhd"]) expect(textAt(diagram, name)).toHaveLength(0);
    expect(lines(diagram).filter((l) => l.dash !== undefined)).toHaveLength(0);
  });

  it("keeps every landmark tick but drops labels that would overlap", () => {
    const layout = profileLayout(vessel);
    const landmarks = [160, 161, 180, 200].map((frame) => ({ frame, label: `Fr. ${frame}` }));
    const diagram = profileOf({ tank: { ...tank, frameFrom: 150 }, landmarks });
    const box = tankBoxOf(diagram);
    for (const { frame } of landmarks) {
      const ticks = verticalLinesAt(diagram, frameToX(layout, frame)).filter((l) => Math.max(l.y1, l.y2) === box.y + box.height);
      expect(ticks, `tick at ${frame}`).toHaveLength(1);
    }
    expect(textAt(diagram, "Fr. 160")).toHaveLength(1);
    expect(textAt(diagram, "Fr. 161")).toHaveLength(0);
    expect(textAt(diagram, "Fr. 180")).toHaveLength(1);
    expect(textAt(diagram, "Fr. 200")).toHaveLength(1);
    const kept = ["Fr. 160", "Fr. 180", "Fr. 200", "DB3P"].map((text) => shapeBounds(textAt(diagram, text)[0] as TShape));
    for (const [i, a] of kept.entries()) {
      for (const b of kept.slice(i + 1)) expect(a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1).toBe(false);
    }
  });

  it("drops landmark labels where the box is too shallow, keeps the ticks", () => {
    const diagram = profileOf({ tank: { ...tank, kind: "double_bottom" }, landmarks: [{ frame: 210, label: "Fr. 210" }] });
    expect(textAt(diagram, "Fr. 210")).toHaveLength(0);
    expect(verticalLinesAt(diagram, frameToX(profileLayout(vessel), 210))).toHaveLength(1);
  });

  it("puts numbered marks at their frames", () => {
    const layout = profileLayout(vessel);
    const diagram = profileOf({ marks: [{ frameFrom: 200, frameTo: 204, label: "1" }] });
    expect(textAt(diagram, "1")[0]?.x).toBeCloseTo(frameToX(layout, 202), 9);
    const span = lines(diagram).find((l) => l.y1 === l.y2 && l.x1 === frameToX(layout, 200));
    expect(span?.x2).toBe(frameToX(layout, 204));
  });

  it("keeps every shape inside the view box, also for peaks at the ends, odd frames and crowded marks", () => {
    const marks = [0, 1, 2, 248, 249, 250].map((frame, i) => ({ frameFrom: frame, frameTo: frame, label: String(i + 1) }));
    const landmarks = [0, 3, 6, 240, 244, 250].map((frame) => ({ frame, label: `Fr. ${frame}` }));
    for (const kind of TANK_KINDS) {
      for (const [frameFrom, frameTo] of [[0, 12], [238, 250], [120, 121], [-20, 270]] as const) {
        expectInsideViewBox(profileOf({ tank: { code: "No. 1 PEAK TANK (CENTRE)", kind, frameFrom, frameTo }, landmarks, marks }));
      }
    }
    expectInsideViewBox(sideProfileDiagram({ vessel: bareVessel, tank: { ...tank, frameFrom: -6, frameTo: 4 }, landmarks: [] }));
  });
});

describe("plating regions of each tank kind", () => {
  // Common practice: these are the usual plating regions reported for each tank kind.
  it.each([
    ["double_bottom", ["inner_bottom", "bottom_shell"]],
    ["hopper", ["bottom_shell", "lower_hopper", "side_shell"]],
    ["side", ["side_shell", "longitudinal_bulkhead"]],
    ["top_side", ["side_shell", "upper_hopper", "main_deck"]],
    ["fore_peak", ["side_shell", "transverse_bulkhead"]],
    ["aft_peak", ["side_shell", "transverse_bulkhead"]],
    ["double_bottom_hopper", ["inner_bottom", "bottom_shell", "lower_hopper", "side_shell"]],
    ["double_bottom_side", ["inner_bottom", "bottom_shell", "side_shell", "longitudinal_bulkhead"]],
    ["hopper_side", ["bottom_shell", "lower_hopper", "side_shell", "longitudinal_bulkhead"]],
    ["double_bottom_hopper_side", ["inner_bottom", "bottom_shell", "lower_hopper", "side_shell", "longitudinal_bulkhead"]],
  ] as const)("%s → %j (common practice)", (kind, regions) => {
    expect(regionsOfKind(kind)).toEqual(regions);
  });
});

describe("cross-section", () => {
  const everyView = TANK_KINDS.flatMap((kind) => TANK_SIDES.map((side) => ({ kind, side })));

  it("is about 300 × 220", () => {
    const diagram = crossSectionDiagram({ kind: "hopper", side: "port" });
    expect([diagram.width, diagram.height]).toEqual([300, 220]);
  });

  it.each(everyView)("$kind, $side: labels each plating region of the kind, inside the view box, without overlaps", ({ kind, side }) => {
    const diagram = crossSectionDiagram({ kind, side });
    const labels = texts(diagram).map((t) => t.text);
    for (const region of regionsOfKind(kind)) expect(labels).toContain(PLATING_REGION_LABELS[region]);
    expect(diagram.shapes.some((s) => s.type === "polygon" && s.fill === DIAGRAM_PALETTE.tank)).toBe(true);
    expectInsideViewBox(diagram);
    const boxes = texts(diagram).map(shapeBounds);
    for (const [i, a] of boxes.entries()) {
      for (const b of boxes.slice(i + 1)) expect(a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1).toBe(false);
    }
  });

  it("draws peaks end on with their stringer decks and name", () => {
    expect(texts(crossSectionDiagram({ kind: "fore_peak", side: "centre" })).map((t) => t.text)).toEqual(
      expect.arrayContaining(["Fore peak", "Stringer decks"]),
    );
    expect(texts(crossSectionDiagram({ kind: "aft_peak", side: "centre" })).map((t) => t.text)).toContain("Aft peak");
  });

  it.each(TANK_KINDS)("%s: the starboard drawing is the port one mirrored (x → width − x)", (kind) => {
    const port = crossSectionDiagram({ kind, side: "port" });
    const starboard = crossSectionDiagram({ kind, side: "starboard" });
    const w = port.width;
    const mirrored = port.shapes.map((shape): TShape => {
      switch (shape.type) {
        case "rect":
          return { ...shape, x: w - shape.x - shape.width };
        case "line":
          return { ...shape, x1: w - shape.x1, x2: w - shape.x2 };
        case "polygon":
          return { ...shape, points: shape.points.map(([x, y]): [number, number] => [w - x, y]) };
        case "text":
          return { ...shape, x: w - shape.x, anchor: ({ start: "end", middle: "middle", end: "start" } as const)[shape.anchor] };
      }
    });
    expect(starboard.shapes).toEqual(mirrored);
  });

  it("draws a port tank on the left (looking forward) and a centre tank across the centreline", () => {
    const fillXs = (diagram: TDiagram) =>
      diagram.shapes.flatMap((s) => (s.type === "polygon" && s.fill === DIAGRAM_PALETTE.tank ? s.points.map(([x]) => x) : []));
    expect(Math.max(...fillXs(crossSectionDiagram({ kind: "side", side: "port" })))).toBeLessThan(150);
    const centre = fillXs(crossSectionDiagram({ kind: "double_bottom", side: "centre" }));
    expect(Math.min(...centre)).toBeLessThan(150);
    expect(Math.max(...centre)).toBeGreaterThan(150);
  });

  it("sets highlighted regions in bold and thickens their plating", () => {
    const plain = crossSectionDiagram({ kind: "double_bottom", side: "port" });
    const marked = crossSectionDiagram({ kind: "double_bottom", side: "port", highlight: ["inner_bottom"] });
    expect(textAt(marked, "Inner bottom")[0]?.weight).toBe("bold");
    expect(textAt(marked, "Bottom shell")[0]?.weight).toBe("normal");
    expect(textAt(plain, "Inner bottom")[0]?.weight).toBe("normal");
    const widest = (diagram: TDiagram) => Math.max(...lines(diagram).map((l) => l.strokeWidth));
    expect(widest(marked)).toBeGreaterThan(widest(plain));
  });
});

describe("PDF rendering", () => {
  registerPdfFonts();
  const render = () =>
    renderToBuffer(
      createElement(
        Document,
        null,
        createElement(
          Page,
          { size: "A4" },
          createElement(TankDiagramPdf, { diagram: profileOf({ landmarks: [{ frame: 210, label: "Fr. 210" }] }), width: 523 }),
          createElement(TankDiagramPdf, { diagram: crossSectionDiagram({ kind: "hopper", side: "starboard" }), width: 230 }),
        ),
      ),
    );

  it("renders TankDiagramPdf into a PDF", async () => {
    const buffer = await render();
    expect(buffer.subarray(0, 4).toString("latin1")).toBe("%PDF");
  });

  it("the PDF carries the tank code, the frame labels and the region labels as text", async () => {
    const { getDocument } = await import("pdfjs-dist/legacy/build/pdf.mjs");
    const pdf = await getDocument({ data: new Uint8Array(await render()) }).promise;
    const content = await (await pdf.getPage(1)).getTextContent();
    const strings = content.items.flatMap((item) => ("str" in item ? [item.str] : []));
    expect(strings).toEqual(expect.arrayContaining(["DB3P", "Fr. 196", "Fr. 232", "Fr. 210", "Lower hopper", "Side shell"]));
  });
});

describe("tank code label", () => {
  it("fits inside a narrow tank box by a smaller size, or sits above the box", () => {
    const vessel = { frameFirst: 0, frameLast: 280, midshipFromFrame: null, midshipToFrame: null, engineRoomFwdBulkheadFrame: null, collisionBulkheadFrame: null };
    for (const [from, to] of [[100, 132], [140, 150], [140, 142]] as const) {
      const d = sideProfileDiagram({ vessel, tank: { code: "No. 5 DB WBT P", kind: "double_bottom", frameFrom: from, frameTo: to }, landmarks: [] });
      const code = d.shapes.find((s) => s.type === "text" && s.text === "No. 5 DB WBT P")!;
      const box = d.shapes.find((s) => s.type === "rect" && s.fill === DIAGRAM_PALETTE.tank) as Extract<TShape, { type: "rect" }>;
      const b = shapeBounds(code);
      const inside = b.x0 >= box.x && b.x1 <= box.x + box.width;
      const above = b.y1 <= box.y;
      expect(inside || above, `Fr. ${from}–${to}`).toBe(true);
    }
  });
});
