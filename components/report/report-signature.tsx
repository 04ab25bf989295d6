import type { TReportSignature } from "@/lib/report/types";

export function ReportSignature({ sig }: { sig: TReportSignature }) {
  return (
    <div className="signature">
      <b>{sig.role}</b>
      <div className="mark">
        {sig.drawnPng ? (
          // eslint-disable-next-line @next/next/no-img-element -- a small PNG inlined as a data URL
          <img src={`data:image/png;base64,${Buffer.from(sig.drawnPng).toString("base64")}`} alt={`Signature of ${sig.name}`} />
        ) : sig.typedSignature ? (
          <span className="typed">{sig.typedSignature}</span>
        ) : (
          <span className="note">{sig.signed ? "" : "Not signed yet"}</span>
        )}
      </div>
      <dl className="kv" style={{ gridTemplateColumns: "70px 1fr" }}>
        <dt>Name</dt><dd>{sig.name || "—"}</dd>
        <dt>Rank</dt><dd>{sig.rank || "—"}</dd>
        <dt>Signed</dt><dd>{sig.signedAt || "—"}</dd>
      </dl>
    </div>
  );
}
