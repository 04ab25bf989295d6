"use client";
// A history plot drawn by recharts in the browser, from the same layout as the
// static SVG: its ticks, colours, dash patterns, markers and labels. Recharts
// draws nothing on the server, so until hydration (and without JavaScript) the
// static SVG passed as children stays in its place.
import { useSyncExternalStore, type ReactNode } from "react";
import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { PROJECTION_COLOUR, PROJECTION_DASH, THRESHOLD_COLOUR, THRESHOLD_DASH, type TChartLayout } from "@/lib/office/history-chart";
import { chartRows, dateToMs, formatChartValue, msToDate, PROJECTION_KEY, type TChartRow } from "@/lib/office/history-chart-rows";
import { ChartMarker } from "./chart-marker";

const AXIS = { fontSize: 12, fill: "#0f172a" };
type TLabelBox = { viewBox?: { x?: number; y?: number; width?: number; height?: number } };
/** Labels where the static SVG puts them: the threshold's above its left end, the projection's above-left of the projected point. */
const thresholdLabel = (text: string) => ({ viewBox }: TLabelBox) => <text x={(viewBox?.x ?? 0) + 4} y={(viewBox?.y ?? 0) - 4} {...AXIS}>{text}</text>;
const projectionLabel = (text: string) => ({ viewBox: b }: TLabelBox) => (
  <text x={(b?.x ?? 0) + (b?.width ?? 0) / 2 - 8} y={(b?.y ?? 0) + (b?.height ?? 0) / 2 - 6} textAnchor="end" {...AXIS}>{text}</text>
);
const noSubscription = () => () => {};
/** False on the server and during hydration, true once the browser has taken over. */
const useHydrated = () => useSyncExternalStore(noSubscription, () => true, () => false);

function ChartTooltip({ chart, active, payload }: { chart: TChartLayout; active?: boolean; payload?: ReadonlyArray<{ payload?: unknown }> }) {
  const row = payload?.[0]?.payload as TChartRow | undefined;
  if (!active || !row) return null;
  const measured = chart.lines.filter((l) => typeof row[l.key] === "number");
  const projected = !measured.length && typeof row[PROJECTION_KEY] === "number";
  return (
    <div className="rounded border border-slate-300 bg-white px-3 py-2 text-sm shadow-sm" data-tooltip={row.date}>
      <p className="font-semibold text-hull-900">{row.date}</p>
      <ul>
        {measured.map((l) => (
          <li key={l.key} className="flex items-center gap-2">
            <svg width="28" height="10" aria-hidden="true"><line x1={0} x2={28} y1={5} y2={5} stroke={l.colour} strokeWidth={2} strokeDasharray={l.dash || undefined} /><ChartMarker shape={l.marker} x={14} y={5} colour={l.colour} /></svg>
            {l.label}: {formatChartValue(chart, row[l.key] as number)}
          </li>
        ))}
        {projected ? <li>Projected: {formatChartValue(chart, row[PROJECTION_KEY] as number)} ({chart.threshold?.label ?? "threshold"})</li> : null}
      </ul>
    </div>
  );
}

function ChartLegend({ chart }: { chart: TChartLayout }) {
  const swatch = (stroke: string, dash: string, marker?: ReactNode) => (
    <svg width="30" height="12" aria-hidden="true"><line x1={1} x2={29} y1={6} y2={6} stroke={stroke} strokeWidth={2} strokeDasharray={dash || undefined} />{marker}</svg>
  );
  return (
    <ul className="flex flex-wrap justify-center gap-x-5 gap-y-1 pt-1 text-xs text-slate-900">
      {chart.lines.map((l) => (
        <li key={l.key} className="flex items-center gap-1.5">{swatch(l.colour, l.dash, <ChartMarker shape={l.marker} x={15} y={6} colour={l.colour} />)}{l.label}</li>
      ))}
      {chart.threshold ? <li className="flex items-center gap-1.5">{swatch(THRESHOLD_COLOUR, THRESHOLD_DASH)}{chart.threshold.label}</li> : null}
      {chart.projection ? <li className="flex items-center gap-1.5">{swatch(PROJECTION_COLOUR, PROJECTION_DASH)}Projection (least squares)</li> : null}
    </ul>
  );
}

export function HistoryChart({ chart, children }: { chart: TChartLayout; children: ReactNode }) {
  const hydrated = useHydrated();
  if (!hydrated) return <>{children}</>;
  const { rows, xTicks, xDomain, yTicks, yDomain } = chartRows(chart);
  return (
    <div className="w-full max-w-3xl" data-chart="interactive">
      <ResponsiveContainer width="100%" aspect={chart.width / chart.height}>
        <LineChart data={rows} role="img" title={chart.title} margin={{ top: 16, right: 44, bottom: 8, left: 16 }}>
          <CartesianGrid vertical={false} stroke="#e2e8f0" />
          <XAxis
            dataKey="t"
            type="number"
            domain={xDomain}
            ticks={xTicks}
            tickFormatter={msToDate}
            tick={AXIS}
            stroke="#0f172a"
            height={44}
            label={{ value: chart.xLabel, position: "insideBottomRight", offset: 0, ...AXIS }}
          />
          <YAxis domain={yDomain} ticks={yTicks} tick={AXIS} stroke="#0f172a" width={48} label={{ value: chart.yLabel, angle: -90, position: "insideLeft", offset: -8, style: { textAnchor: "middle" }, ...AXIS }} />
          <Tooltip content={(p) => <ChartTooltip chart={chart} active={p.active} payload={p.payload} />} isAnimationActive={false} />
          <Legend content={() => <ChartLegend chart={chart} />} verticalAlign="bottom" />
          {chart.threshold ? (
            <ReferenceLine y={chart.threshold.value} stroke={THRESHOLD_COLOUR} strokeWidth={1.5} strokeDasharray={THRESHOLD_DASH} label={thresholdLabel(chart.threshold.label)} />
          ) : null}
          {chart.projection ? (
            <>
              <Line dataKey={PROJECTION_KEY} name="Projection" stroke={PROJECTION_COLOUR} strokeWidth={1.5} strokeDasharray={PROJECTION_DASH} dot={false} activeDot={false} connectNulls isAnimationActive={false} />
              <ReferenceLine segment={[{ x: dateToMs(chart.projection.to.date), y: 0 }, { x: dateToMs(chart.projection.to.date), y: chart.projection.to.value }]} stroke={PROJECTION_COLOUR} strokeDasharray={PROJECTION_DASH} />
              <ReferenceDot x={dateToMs(chart.projection.to.date)} y={chart.projection.to.value} r={4} fill="white" stroke={PROJECTION_COLOUR} strokeWidth={1.5} label={projectionLabel(chart.projection.label)} />
            </>
          ) : null}
          {chart.lines.map((l) => (
            <Line
              key={l.key}
              dataKey={l.key}
              name={l.label}
              stroke={l.colour}
              strokeWidth={2}
              strokeDasharray={l.dash || undefined}
              connectNulls
              isAnimationActive={false}
              dot={({ cx, cy, index, payload }) =>
                cx == null || cy == null ? null : <ChartMarker key={`${l.key}-${index}`} shape={l.marker} x={cx} y={cy} colour={l.colour} data-series={l.key} data-date={(payload as TChartRow).date} />
              }
              activeDot={({ cx, cy }) => (cx == null || cy == null ? null : <circle cx={cx} cy={cy} r={8} fill="none" stroke={l.colour} strokeWidth={1.5} />)}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
