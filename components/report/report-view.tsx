// The report as a printable HTML page: the same TReportData and the same texts
// as the PDF (templates/report.tsx), laid out for a screen and for printing.
import type { ReactNode } from "react";
import { TankDiagramSvg } from "@/components/structure-map/tank-diagram-svg";
import { RatingMark } from "@/components/ui/rating-mark";
import type { TReportData } from "@/lib/report/types";
import { KeyValues } from "./key-values";
import { reportCss } from "./report-styles";
import { ReportPhotoPage } from "./report-photo-page";
import { ReportSignature } from "./report-signature";
import { RichTextHtml } from "./rich-text-html";

function Table<T>({ head, rows, cells, rowKey }: { head: string[]; rows: T[]; cells: (row: T) => ReactNode[]; rowKey: (row: T, i: number) => string }) {
  return (
    <table>
      <thead>
        <tr>{head.map((h) => <th key={h}>{h}</th>)}</tr>
      </thead>
      <tbody>
        {rows.map((r, i) => (
          <tr key={rowKey(r, i)}>{cells(r).map((c, j) => <td key={j}>{c}</td>)}</tr>
        ))}
      </tbody>
    </table>
  );
}

export function ReportView({ data, toolbar }: { data: TReportData; toolbar?: ReactNode }) {
  const footer = `${data.company} · ${data.title} · IMO ${data.vessel.imoNumber}${data.draftMark ? ` · ${data.draftMark}` : ""}`;
  return (
    <article className="tw-report" aria-label={data.title}>
      <style>{reportCss({ running: data.running, footer })}</style>
      {toolbar}
      <h1>{data.title}</h1>
      <p className="subtitle">{data.vessel.name} · {data.tank.label}</p>
      {data.draftMark ? <p className="draft">{data.draftMark}: this report may still change.</p> : null}
      <div className="box"><KeyValues rows={data.cover} /></div>

      <h2>Summary</h2>
      <KeyValues rows={data.summaryRows} />
      {data.blockers.length ? (
        <div className="blockers">
          <b>Still missing before it can be signed ({data.blockers.length})</b>
          <ul>{data.blockers.map((b) => <li key={b}>{b}</li>)}</ul>
        </div>
      ) : null}

      <h2>Tank diagram and findings</h2>
      <div className="diagrams">
        <div className="profile"><TankDiagramSvg diagram={data.diagrams.profile} /></div>
        <TankDiagramSvg diagram={data.diagrams.section} />
        <p className="note">{data.diagrams.profile.title}. Numbered markers are the findings at their frames. {data.diagrams.section.title}; plating regions with findings in bold.</p>
      </div>

      <h2>Entry record</h2>
      {data.entry ? (
        <>
          <KeyValues rows={data.entry.rows} />
          <p className="note">Limits: {data.entry.limits.map(([k, v]) => `${k} ${v}`).join("; ")}.</p>
          <Table
            head={["Tested", "O2", "Flammable", "H2S", "CO", "CO2", "Measured by", "Verdict"]}
            rows={data.readings}
            rowKey={(r, i) => `${r.testedAt}-${i}`}
            cells={(r) => [r.testedAt, r.oxygen, r.flammable, r.h2s, r.co, r.co2, r.measuredBy, <span key="v" className={r.enter ? undefined : "stop"}>{r.verdict}</span>]}
          />
        </>
      ) : <p className="note">No entry record.</p>}

      <h2>Findings</h2>
      {data.findings.length ? (
        <>
          <Table
            head={["No.", "Frames", "Member", "Defect and description", "Dimensions", "Repair", "Weight"]}
            rows={data.findings}
            rowKey={(f) => f.id}
            cells={(f) => [f.number, f.frames, f.member, <span key="d"><b>{f.type}.</b> {f.description}</span>, f.dimensions, f.repair, f.weight]}
          />
          <p className="total">{data.findingsTotal}</p>
        </>
      ) : <p className="note">{data.findingsNote}</p>}

      <h2>Coating</h2>
      {data.coating.length ? (
        <Table
          head={["Area", "Breakdown", "Rusted", "Hard scale", "Edges", "Rust grade", "Rating", "Decided by"]}
          rows={data.coating}
          rowKey={(c) => c.area}
          cells={(c) => [c.area, c.breakdown, c.rusted, c.hardScale, c.edges, c.rustGrade, <RatingMark key="r" kind={c.rating} />, c.decidedBy]}
        />
      ) : <p className="note">No coating areas recorded.</p>}
      <p className="note">{data.coatingNote}</p>

      <h2>Anodes</h2>
      {data.anodes ? (
        <>
          <KeyValues rows={data.anodes.rows} />
          {data.anodes.warning ? <p className="warning">{data.anodes.warning}</p> : null}
        </>
      ) : <p className="note">Anodes not recorded.</p>}

      <h2>Sediment</h2>
      {data.sediment.zones.length ? (
        <>
          <Table
            head={["Zone", "Frames", "Depth", "Area", "Volume"]}
            rows={data.sediment.zones}
            rowKey={(z, i) => `${z.label}-${i}`}
            cells={(z) => [z.label, z.frames, z.depth, z.area, z.volume]}
          />
          <p className="total">Total {data.sediment.total}</p>
          {data.sediment.cost ? <p className="note">{data.sediment.cost}</p> : null}
        </>
      ) : <p className="note">{data.sediment.note}</p>}

      <h2>Areas not inspected</h2>
      {data.notInspected.length ? (
        <Table
          head={["Frames", "Member or region", "Reason", "Suspected"]}
          rows={data.notInspected}
          rowKey={(a, i) => `${a.frames}-${i}`}
          cells={(a) => [a.frames, a.member, a.reason, a.suspected]}
        />
      ) : <p className="note">{data.notInspectedNote}</p>}

      <h2>Remarks</h2>
      {data.remarks ? <RichTextHtml doc={data.remarks} /> : <p className="note">No remarks.</p>}

      <h2>Signatures</h2>
      <div className="signatures">
        {data.signatures.map((sig) => <ReportSignature key={sig.role} sig={sig} />)}
      </div>
      <p className="note">Times in UTC. This report records the inspection; it does not replace the company&apos;s safety management system, the flag state&apos;s rules or the ship&apos;s own procedures.</p>

      {data.photoPages.map((indexes, p) => (
        <ReportPhotoPage key={p} first={p === 0} photos={indexes.map((i) => data.photos[i]!)} />
      ))}
    </article>
  );
}
