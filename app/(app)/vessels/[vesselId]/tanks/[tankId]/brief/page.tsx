import type { Metadata } from "next";
import { TankDiagramSvg } from "@/components/structure-map/tank-diagram-svg";
import { TankPositionList } from "@/components/structure-map/tank-position-list";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { briefOf } from "@/lib/services/brief";

export const metadata: Metadata = { title: "Pre-entry brief" };

export default async function BriefPage({ params }: { params: Promise<{ vesselId: string; tankId: string }> }) {
  const { vesselId, tankId } = await params;
  const actor = await pageActor();
  const { brief, profile, section, drawings } = await pageAuthorize(() => briefOf(actor, vesselId, tankId));
  return (
    <>
      <PageHeader
        title={brief.title}
        actions={
          <a href={`/api/v1/vessels/${vesselId}/tanks/${tankId}/brief.pdf`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800" download>
            Download PDF to print
          </a>
        }
      />
      <div className="space-y-5">
        <Notice tone="caution" title="Enclosed space">{brief.caution}</Notice>
        <section className="grid gap-4 rounded-lg border border-slate-200 bg-white p-4 lg:grid-cols-[1fr_2fr]">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            {brief.particulars.map(([k, v]) => (
              <div key={k} className="contents"><dt className="text-slate-600">{k}</dt><dd className="font-medium">{v}</dd></div>
            ))}
          </dl>
          <div className="space-y-3">
            <TankDiagramSvg diagram={profile} />
            <div className="max-w-sm"><TankDiagramSvg diagram={section} /></div>
          </div>
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Position along the ship</h2>
          <TankPositionList position={brief.position} />
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Member catalogue</h2>
          <ul className="list-disc pl-5 text-sm">{brief.members.map((m) => <li key={m}>{m}</li>)}</ul>
          {brief.specialFrames.length ? <ul className="mt-2 list-disc pl-5 text-sm">{brief.specialFrames.map((m) => <li key={m}>{m}</li>)}</ul> : null}
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Areas of concern</h2>
          <ul className="space-y-3">
            {brief.concerns.map((c) => (
              <li key={c.id}>
                <p className="font-semibold">{c.title}</p>
                <p className="text-sm">Look for: {c.lookFor}</p>
                <p className="text-xs text-slate-600">Why: {c.why} Here: {c.because}</p>
              </li>
            ))}
          </ul>
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Look again</h2>
          <p className="text-sm text-slate-600">{brief.previousLabel}</p>
          <ul className="mt-2 space-y-2 text-sm">
            {brief.lookAgain.map((f) => (
              <li key={f.number}><span className="font-semibold">#{f.number} {f.where}</span> — {f.what}. {f.lookAt}.</li>
            ))}
          </ul>
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Drawings of the vessel</h2>
          {drawings.length ? (
            <ul className="list-disc pl-5 text-sm">{drawings.map((d) => <li key={d.url}>{d.kind}: <a href={d.url} target="_blank" rel="noreferrer" className="text-hull-800 underline">{d.title}</a></li>)}</ul>
          ) : (
            <p className="text-sm text-slate-600">No drawings uploaded for this vessel; they are added on the vessel&apos;s page.</p>
          )}
        </section>
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 className="mb-2 text-lg font-semibold text-hull-900">Before entry</h2>
          <ul className="list-disc space-y-1 pl-5 text-sm">{brief.precautions.map((p) => <li key={p}>{p}</li>)}</ul>
        </section>
      </div>
    </>
  );
}
