import { formatUtcOffset } from "@/lib/format";

type TVessel = {
  flag: string | null;
  classSociety: string | null;
  yearBuilt: number | null;
  frameFirst: number;
  frameLast: number;
  frameSpacingMm: number | null;
  midshipFromFrame: number | null;
  midshipToFrame: number | null;
  engineRoomFwdBulkheadFrame: number | null;
  collisionBulkheadFrame: number | null;
  utcOffsetMinutes: number | null;
};

export function VesselParticulars({ vessel: v }: { vessel: TVessel }) {
  const rows: [string, string][] = [
    ["Flag", v.flag ?? "—"],
    ["Class", v.classSociety ?? "—"],
    ["Built", v.yearBuilt?.toString() ?? "—"],
    ["Frames", `Fr. ${v.frameFirst} – Fr. ${v.frameLast}`],
    ["Frame spacing", v.frameSpacingMm ? `${v.frameSpacingMm} mm` : "—"],
    ["Midship region", v.midshipFromFrame !== null && v.midshipToFrame !== null ? `Fr. ${v.midshipFromFrame} – Fr. ${v.midshipToFrame}` : "—"],
    ["Engine-room fwd bulkhead", v.engineRoomFwdBulkheadFrame !== null ? `Fr. ${v.engineRoomFwdBulkheadFrame}` : "—"],
    ["Collision bulkhead", v.collisionBulkheadFrame !== null ? `Fr. ${v.collisionBulkheadFrame}` : "—"],
    ["Ship's time", v.utcOffsetMinutes !== null ? formatUtcOffset(v.utcOffsetMinutes) : "not set"],
  ];
  return (
    <section aria-labelledby="particulars-heading" className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id="particulars-heading" className="mb-2 text-lg font-semibold text-hull-900">
        Particulars
      </h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {rows.map(([k, val]) => (
          <div key={k} className="contents">
            <dt className="text-slate-600">{k}</dt>
            <dd className="font-medium">{val}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
