import type { ReactElement } from "react";
import type { TDiagram, TShape } from "@/lib/diagram/tank-diagram";

export function TankDiagramSvg({ diagram }: { diagram: TDiagram }) {
  return (
    <svg
      viewBox={`0 0 ${diagram.width} ${diagram.height}`}
      role="img"
      aria-label={diagram.title}
      width="100%"
      fontFamily="Noto Sans"
      className="block h-auto w-full"
    >
      <title>{diagram.title}</title>
      {diagram.shapes.map(svgShape)}
    </svg>
  );
}

function svgShape(shape: TShape, key: number): ReactElement {
  switch (shape.type) {
    case "rect":
      return (
        <rect
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
        <line
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
        <polygon
          key={key}
          points={shape.points.map(([x, y]) => `${x},${y}`).join(" ")}
          fill={shape.fill}
          stroke={shape.stroke}
          strokeWidth={shape.strokeWidth}
          strokeLinejoin="round"
        />
      );
    case "text":
      return (
        <text key={key} x={shape.x} y={shape.y} fontSize={shape.size} fontWeight={shape.weight} textAnchor={shape.anchor} fill={shape.fill}>
          {shape.text}
        </text>
      );
  }
}
