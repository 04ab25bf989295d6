"use client";

import { SignForm } from "@/components/signing/sign-form";
import { Notice } from "@/components/ui/notice";
import { RatingMark } from "@/components/ui/rating-mark";
import { roundKg } from "@/lib/calc/steel";
import { formatFrames } from "@/lib/structure/frames";
import { COATING_AREA_LABELS, FINDING_TYPE_LABELS, MEMBER_KIND_LABELS, NOT_INSPECTED_REASON_LABELS, PHOTO_KIND_LABELS, REPAIR_KIND_LABELS } from "@/lib/vocabulary";
import { useSync } from "./sync";
import type { TView } from "./types";

export function ReviewStep({ view, go, signerName }: { view: TView; go: (step: string, field?: string) => void; signerName?: string }) {
  const steel = view.findings.reduce((s, f) => s + (f.steelWeightKg ?? 0), 0);
  const coatingRepair = view.findings.reduce((s, f) => s + (f.coatingRepairM2 ?? 0), 0);
  return (
    <div className="space-y-5">
      {!view.editable ? null : view.blockers.length ? (
        <Notice tone="error" title={`${view.blockers.length} thing${view.blockers.length > 1 ? "s" : ""} to complete before the report can be submitted`}>
          <ul className="list-disc pl-5">
            {view.blockers.map((b) => (
              <li key={b.message}>
                <a className="underline" href={`?step=${b.step}#${b.field}`} onClick={(e) => { e.preventDefault(); go(b.step, b.field); }}>{b.message}</a>
              </li>
            ))}
          </ul>
        </Notice>
      ) : (
        <Notice tone="success" title="Ready to submit">Every step is complete. Read the summary below, then sign and submit it for the master&apos;s countersignature.</Notice>
      )}
      {view.editable && !view.blockers.length && signerName !== undefined ? <SubmitWhenSaved view={view} signerName={signerName} /> : null}
      <section className="grid gap-3 rounded-lg border border-slate-200 bg-white p-4 sm:grid-cols-2">
        <p>Coating: {view.tankRating ? <><RatingMark kind={view.tankRating.rating} /> — worst area {COATING_AREA_LABELS[view.tankRating.worstArea as keyof typeof COATING_AREA_LABELS]}: {view.tankRating.decidedBy}</> : "not rated yet"}</p>
        <p>Findings: {view.findings.length} · steel {roundKg(steel)} kg ({(steel / 1000).toFixed(3)} t) · coating repair {coatingRepair.toFixed(2)} m²</p>
        <p>Anodes: {view.anodes ? `${view.anodes.meanWastagePct} % mean wastage, ${view.anodes.toRenewCount} to renew` : "not recorded"}</p>
        <p>Sediment: {view.sediment.totalM3.toFixed(2)} m³{view.sediment.cost ? ` · about ${view.sediment.cost.amount.toLocaleString("en")} ${view.sediment.cost.currency} to remove` : ""}</p>
        <p>Not inspected: {view.notInspected.length ? view.notInspected.map((a) => `${formatFrames(a.frameFrom, a.frameTo)} (${NOT_INSPECTED_REASON_LABELS[a.reason]})`).join("; ") : view.inspection.allAreasInspected ? "every area inspected" : "not stated"}</p>
      </section>
      {view.findings.length ? (
        <section className="rounded-lg border border-slate-200 bg-white p-4">
          <h3 className="mb-2 font-semibold text-hull-900">Findings</h3>
          <ol className="space-y-1 text-sm">
            {view.findings.map((f) => (
              <li key={f.id}>
                <span className="font-semibold">#{f.number} {FINDING_TYPE_LABELS[f.type]}</span> · {formatFrames(f.frameFrom, f.frameTo)} · {MEMBER_KIND_LABELS[f.memberKind]}{f.memberNumber !== null ? ` ${f.memberNumber}` : ""} — {f.description} · {REPAIR_KIND_LABELS[f.repairKind]}{f.steelWeightKg ? ` · ${roundKg(f.steelWeightKg)} kg` : ""}
              </li>
            ))}
          </ol>
        </section>
      ) : null}
      {view.photos.length ? (
        <section className="rounded-lg border border-slate-200 bg-white p-4" aria-label="Photos in report order">
          <h3 className="mb-2 font-semibold text-hull-900">Photos ({view.photos.length}), in report order</h3>
          <ol className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {view.photos.map((p, i) => {
              const finding = view.findings.find((f) => f.id === p.findingId);
              return (
                <li key={p.id} className={`text-sm ${p.kind === "close_up" ? "border-l-4 border-slate-300 pl-2" : ""}`}>
                  {/* eslint-disable-next-line @next/next/no-img-element -- a short-lived storage URL */}
                  {p.thumbUrl ? <img src={p.thumbUrl} alt={p.caption ?? `Photo ${i + 1}`} className="mb-1 w-full rounded border border-slate-200" loading="lazy" /> : null}
                  <span className="font-semibold">{i + 1}. {p.caption ? PHOTO_KIND_LABELS[p.kind] : "Not captioned"}</span>
                  {p.caption ? <> · {formatFrames(p.frameFrom!, p.frameTo!)} · {MEMBER_KIND_LABELS[p.memberKind!]}{p.memberNumber !== null ? ` ${p.memberNumber}` : ""}{finding ? ` · finding ${finding.number}` : ""} — {p.caption}</> : null}
                </li>
              );
            })}
          </ol>
        </section>
      ) : null}
    </div>
  );
}

/** The officer signs only what the server holds: not while a change is still on its way. */
function SubmitWhenSaved({ view, signerName }: { view: TView; signerName: string }) {
  const sync = useSync();
  if (sync.pending || sync.waiting || sync.conflict) return <Notice tone="info">Waiting for your last changes to be saved before you can sign.</Notice>;
  return <SignForm inspectionId={view.inspection.id} action="submit" signerName={signerName} onDone={() => window.location.assign(`/inspections/${view.inspection.id}?step=review`)} />;
}
