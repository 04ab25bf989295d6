import type { ReactElement } from "react";
import { Line, Polygon, Rect, Svg, Text as SvgText } from "@react-pdf/renderer";
import type { TDiagram, TShape } from "@/lib/diagram/tank-diagram";
import { PDF_FONT_FAMILY } from "../fonts";

/** A tank diagram at the given width in points; the height follows the diagram's proportions. */
export function TankDiagramPdf({ diagram, width }: { diagram: TDiagram; width: number }) {
  return (
    <Svg width={width} height={(width * diagram.height) / diagram.width} viewBox={`0 0 ${diagram.width} ${diagram.height}`}>
      {diagram.shapes.map(pdfShape)}
    </Svg>
  );
}

function pdfShape(shape: TShape, key: number): ReactElement {
  switch (shape.type) {
    case "rect":
      return (
        <Rect
          key={key}
          x={shape.x}
          y={shape.y}
          width={shape.width}
          height={shape.height}
          fill={shape.fill}
          stroke={shape.stroke}
          strokeWidth={shape.strokeWidth}
          strokeDasharray={shape.dash}
        />
      );
    case "line":
      return (
        <Line
          key={key}
          x1={shape.x1}
          y1={shape.y1}
          x2={shape.x2}
          y2={shape.y2}
          stroke={shape.stroke}
          strokeWidth={shape.strokeWidth}
          strokeDasharray={shape.dash}
        />
      );
    case "polygon":
      return (
        <Polygon
          key={key}
          points={shape.points.map(([x, y]) => `${x},${y}`).join(" ")}
          fill={shape.fill}
          stroke={shape.stroke}
          strokeWidth={shape.strokeWidth}
          strokeLinejoin="round"
        />
      );
    case "text":
      // Font settings go in `style`: React-PDF loads only fonts named in styles, and
      // SVG text whose font was never loaded is silently left out of the page.
      return (
        <SvgText
          key={key}
          x={shape.x}
          y={shape.y}
          fill={shape.fill}
          textAnchor={shape.anchor}
          style={{ fontFamily: PDF_FONT_FAMILY, fontSize: shape.size, fontWeight: shape.weight }}
        >
          {shape.text}
        </SvgText>
      );
  }
}
