"use client";

import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { STEPS, type TStep } from "@/lib/inspection/blockers";
import { formatFrames } from "@/lib/structure/frames";
import { INSPECTION_STATUS_LABELS, PLACE_KIND_LABELS } from "@/lib/vocabulary";
import { AnodesStep } from "./anodes-step";
import { CoatingStep } from "./coating-step";
import { EntryStep } from "./entry-step";
import { FindingsStep } from "./findings-step";
import { NotInspectedStep } from "./not-inspected-step";
import { PhotosStep } from "./photos-step";
import { RemarksStep } from "./remarks-step";
import { ReviewStep } from "./review-step";
import { SedimentStep } from "./sediment-step";
import { SyncProvider, useSync } from "./sync";
import type { TView } from "./types";

export function InspectionWizard({ initial, step, signerName }: { initial: TView; step: TStep; signerName?: string }) {
  const [client] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 5_000, refetchOnWindowFocus: true, retry: 3 } } }));
  return (
    <QueryClientProvider client={client}>
      <SyncProvider inspectionId={initial.inspection.id} initialVersion={initial.inspection.version}>
        <WizardBody initial={initial} initialStep={step} signerName={signerName} />
      </SyncProvider>
    </QueryClientProvider>
  );
}

function WizardBody({ initial, initialStep, signerName }: { initial: TView; initialStep: TStep; signerName?: string }) {
  const id = initial.inspection.id;
  const query = useQuery<TView>({
    queryKey: ["inspection", id],
    queryFn: async () => {
      const res = await fetch(`/api/v1/inspections/${id}`);
      if (!res.ok) throw new Error(`HTTP ${res.status}`);
      return (await res.json()) as TView;
    },
    initialData: initial,
  });
  const view = query.data;
  const [step, setStep] = useState<TStep>(initialStep);
  const go = (next: string, field?: string) => {
    setStep(next as TStep);
    window.history.replaceState(null, "", `?step=${next}${field ? `#${field}` : ""}`);
    window.setTimeout(() => (field ? document.getElementById(field)?.focus() : window.scrollTo({ top: 0 })), 50);
  };
  const blockersOf = (s: TStep) => view.blockers.filter((b) => b.step === s).length;
  const index = STEPS.findIndex((s) => s.id === step);

  const header = (
    <div>
      <h1 className="text-2xl font-bold text-hull-900">{view.tank.code} · {view.inspection.inspectedOn}</h1>
      <p className="text-sm text-slate-600">
        {view.vessel.name} · {view.tank.name} · {formatFrames(view.tank.frameFrom, view.tank.frameTo)} · {PLACE_KIND_LABELS[view.inspection.placeKind]}, {view.inspection.place} · team {view.inspection.team.join(", ")} · revision {view.inspection.revision} · {INSPECTION_STATUS_LABELS[view.inspection.status]}
      </p>
    </div>
  );
  if (!view.editable) {
    const draft = view.inspection.status === "draft" || view.inspection.status === "returned";
    return (
      <div className="space-y-4">
        <header>{header}</header>
        <Notice tone="info" title={`This inspection is ${INSPECTION_STATUS_LABELS[view.inspection.status].toLowerCase()}`}>
          {draft ? "Only the vessel's officers and master edit a draft; you can read it here." : view.inspection.status === "submitted" ? "It is locked while the master reads it: it is countersigned, or returned to the officer with comments." : "It is locked: a correction is a new revision."}{" "}
          <a className="underline" href={`/inspections/${view.inspection.id}/report`}>Read the whole report</a>
        </Notice>
        <ReviewStep view={view} go={() => undefined} />
      </div>
    );
  }
  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-start justify-between gap-3">
        {header}
        <SaveStatus />
      </header>
      <ConflictPanel view={view} />
      <nav aria-label="Steps" className="overflow-x-auto">
        <ol className="flex min-w-max gap-1">
          {STEPS.map((s, i) => {
            const n = blockersOf(s.id);
            return (
              <li key={s.id}>
                <a
                  href={`?step=${s.id}`}
                  onClick={(e) => { e.preventDefault(); go(s.id); }}
                  aria-current={s.id === step ? "step" : undefined}
                  className={`block rounded-md border px-3 py-2 text-sm ${s.id === step ? "border-hull-700 bg-hull-700 text-white" : "border-slate-300 bg-white text-slate-800 hover:border-hull-600"}`}
                >
                  <span className="font-semibold">{i + 1}. {s.label}</span>
                  <span className="block text-xs">{s.id === "review" || s.id === "remarks" ? "\u00a0" : n ? `${n} to do` : "✔ complete"}</span>
                </a>
              </li>
            );
          })}
        </ol>
      </nav>
      <section aria-label={STEPS[index]!.label} className="rounded-lg border border-slate-200 bg-slate-50 p-4">
        <h2 className="mb-3 text-lg font-semibold text-hull-900">{STEPS[index]!.label}</h2>
        {step === "entry" ? <EntryStep view={view} /> : null}
        {step === "findings" ? <FindingsStep view={view} /> : null}
        {step === "coating" ? <CoatingStep view={view} /> : null}
        {step === "anodes" ? <AnodesStep view={view} /> : null}
        {step === "sediment" ? <SedimentStep view={view} /> : null}
        {step === "not-inspected" ? <NotInspectedStep view={view} /> : null}
        {step === "photos" ? <PhotosStep view={view} /> : null}
        {step === "remarks" ? <RemarksStep view={view} /> : null}
        {step === "review" ? <ReviewStep view={view} go={go} signerName={signerName} /> : null}
      </section>
      <div className="flex justify-between">
        <Button type="button" variant="secondary" disabled={index === 0} onClick={() => go(STEPS[index - 1]!.id)}>← Back</Button>
        <Button type="button" disabled={index === STEPS.length - 1} onClick={() => go(STEPS[index + 1]!.id)}>Next →</Button>
      </div>
    </div>
  );
}

function SaveStatus() {
  const s = useSync();
  const [, rerender] = useState(0);
  useEffect(() => {
    const t = window.setInterval(() => rerender((x) => x + 1), 15_000);
    return () => window.clearInterval(t);
  }, []);
  let text = "All changes saved";
  let tone = "text-green-800 border-green-700";
  if (s.signedOut) [text, tone] = ["Signed out: sign in again in another tab; your changes are kept here", "text-red-800 border-red-700"];
  else if (s.offline) [text, tone] = [`Offline: ${s.pending} change${s.pending === 1 ? "" : "s"} kept on this device, sent when the connection is back`, "text-amber-900 border-amber-600"];
  else if (s.pending || s.waiting) [text, tone] = [`Saving ${s.pending + s.waiting} change${s.pending + s.waiting === 1 ? "" : "s"}…`, "text-slate-700 border-slate-400"];
  else if (Object.keys(s.refused).length) [text, tone] = ["Some changes were refused: see the marked fields", "text-red-800 border-red-700"];
  return <p role="status" data-testid="save-status" className={`rounded-md border-2 px-3 py-1.5 text-sm font-semibold ${tone}`}>{text}</p>;
}

function ConflictPanel({ view }: { view: TView }) {
  const s = useSync();
  if (!s.conflict) return null;
  const part = s.conflict.entry.part;
  const theirs = partOfView(view, part);
  return (
    <div role="alert" className="rounded-lg border-2 border-amber-600 bg-amber-50 p-4">
      <p className="font-semibold">{s.conflict.message}</p>
      <div className="mt-2 grid gap-3 sm:grid-cols-2">
        <div><p className="text-sm font-semibold">Yours (not saved)</p><pre className="max-h-64 overflow-auto rounded bg-white p-2 text-xs">{JSON.stringify(s.conflict.entry.body, null, 2)}</pre></div>
        <div><p className="text-sm font-semibold">Saved by the other person</p><pre className="max-h-64 overflow-auto rounded bg-white p-2 text-xs">{JSON.stringify(theirs, null, 2)}</pre></div>
      </div>
      <div className="mt-3 flex gap-2">
        <Button type="button" onClick={() => s.resolveConflict("mine")}>Keep mine</Button>
        <Button type="button" variant="secondary" onClick={() => s.resolveConflict("theirs")}>Take theirs</Button>
      </div>
    </div>
  );
}

function partOfView(view: TView, part: string): unknown {
  if (part.startsWith("finding:")) return view.findings.find((f) => f.id === part.slice(8)) ?? "(deleted)";
  const map: Record<string, unknown> = {
    entry: view.entry, coating: view.coating.map(({ rating: _r, rustGrade: _g, ...c }) => c), anodes: view.anodes, sediment: view.sediment.zones,
    "not-inspected": view.notInspected, remarks: view.inspection.remarks, "findings-flag": { noFindings: view.inspection.noFindings },
  };
  return map[part] ?? null;
}
