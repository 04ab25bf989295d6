"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ZFindingsFlagInput } from "@/lib/schemas/inspection";
import { describeMember } from "@/lib/structure/catalogue";
import { FindingEditor, newFindingDraft, type TFindingDraft } from "./finding-editor";
import { Check } from "./inputs";
import { useSync } from "./sync";
import { partUrl, type TView } from "./types";
import { usePart } from "./use-part";

type TServerFinding = TView["findings"][number];

function toDraft(f: TServerFinding): TFindingDraft {
  const d: Record<string, string> = { id: f.id, type: f.type, memberKind: f.memberKind, repairKind: f.repairKind, frameFrom: String(f.frameFrom), frameTo: String(f.frameTo), description: f.description };
  for (const k of ["platingRegion", "memberNumber", "positionDetail", "lengthMm", "widthMm", "depthMm", "pitDepthMm", "affectedLengthMm", "asBuiltThicknessMm", "measuredThicknessMm"] as const) {
    if (f[k] !== null && f[k] !== undefined) d[k] = String(f[k]);
  }
  for (const [k, v] of Object.entries((f.repair ?? {}) as Record<string, unknown>)) if (k !== "kind" && v !== undefined && v !== null) d[k === "shape" ? "r_shape" : `r_${k}`] = String(v);
  return d as TFindingDraft;
}

export function FindingsStep({ view }: { view: TView }) {
  const sync = useSync();
  const id = view.inspection.id;
  const [list, setList] = useState<TFindingDraft[]>(() => {
    const server = view.findings.map(toDraft);
    const known = new Set(server.map((f) => f.id));
    const local = Object.entries(sync.drafts.all())
      .filter(([part, d]) => part.startsWith("finding:") && d.dirty && !known.has(part.slice(8)))
      .map(([, d]) => d.value as TFindingDraft);
    return [...server, ...local];
  });
  const flag = usePart<{ noFindings: boolean }>({ part: "findings-flag", url: partUrl(id, "findings-flag"), initial: { noFindings: view.inspection.noFindings }, schema: ZFindingsFlagInput, toBody: (v) => v, delayMs: 0 });
  const numberOf = new Map(view.findings.map((f) => [f.id, f.number]));

  function remove(f: TFindingDraft) {
    if (!window.confirm("Remove this finding?")) return;
    sync.drafts.drop(`finding:${f.id}`);
    if (numberOf.has(f.id)) sync.enqueue({ part: `finding:${f.id}`, url: `/api/v1/inspections/${id}/findings/${f.id}`, method: "DELETE", body: {} });
    setList(list.filter((x) => x.id !== f.id));
  }

  return (
    <div className="space-y-4">
      <p className="text-sm text-slate-700">
        Pin every finding to frames and a member of {view.tank.code}&apos;s catalogue: {view.catalogue.members.map(describeMember).join("; ") || "no members catalogued yet"}.
      </p>
      {list.map((f) => (
        <FindingEditor key={f.id} inspectionId={id} catalogue={view.catalogue} initial={f} number={numberOf.get(f.id) ?? null} onRemove={() => remove(f)} />
      ))}
      <div className="flex flex-wrap items-center gap-4">
        <Button type="button" onClick={() => setList([...list, newFindingDraft()])}>Add a finding</Button>
        {list.length === 0 ? <Check id="noFindings" label="No findings in this tank" checked={flag.value.noFindings} onChange={(x) => flag.update({ noFindings: x })} /> : null}
      </div>
    </div>
  );
}
