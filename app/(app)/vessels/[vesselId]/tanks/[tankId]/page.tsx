import type { Metadata } from "next";
import Link from "next/link";
import { deleteTankAction, mirrorTankAction, removeMemberAction, removeSpecialFrameAction, addMemberAction, addSpecialFrameAction } from "@/app/(app)/vessels/actions";
import { ActionButton } from "@/components/structure-map/action-button";
import { AddMemberForm, AddSpecialFrameForm } from "@/components/structure-map/member-forms";
import { TankDiagramSvg } from "@/components/structure-map/tank-diagram-svg";
import { TankPositionList } from "@/components/structure-map/tank-position-list";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { crossSectionDiagram, sideProfileDiagram } from "@/lib/diagram/tank-diagram";
import { canInspect } from "@/lib/services/inspections";
import { canEditStructure, readTank } from "@/lib/services/tanks";
import { describeMember, landmarkFrames } from "@/lib/structure/catalogue";
import { formatFrames } from "@/lib/structure/frames";
import { deriveTankPosition } from "@/lib/structure/position";
import { TANK_KIND_LABELS, TANK_SIDE_LABELS } from "@/lib/vocabulary";

export const metadata: Metadata = { title: "Tank" };

export default async function TankPage({ params }: { params: Promise<{ vesselId: string; tankId: string }> }) {
  const { vesselId, tankId } = await params;
  const actor = await pageActor();
  const { vessel, tank, rows, catalogue, roles } = await pageAuthorize(() => readTank(actor, vesselId, tankId));
  const canEdit = canEditStructure(roles);
  const position = deriveTankPosition(vessel, tank);
  const profile = sideProfileDiagram({ vessel, tank, landmarks: landmarkFrames(catalogue) });
  const section = crossSectionDiagram({ kind: tank.kind, side: tank.side });
  const ids = { $vesselId: vesselId, $tankId: tankId };
  const tankRef = { id: tank.id, vesselId, code: tank.code, frameFrom: tank.frameFrom, frameTo: tank.frameTo };
  return (
    <>
      <PageHeader
        title={tank.code}
        subtitle={
          <>
            {tank.name} · {TANK_SIDE_LABELS[tank.side]} · {TANK_KIND_LABELS[tank.kind]} · {formatFrames(tank.frameFrom, tank.frameTo)} ·{" "}
            <Link href={`/vessels/${vesselId}`} className="text-hull-700 underline">{vessel.name}</Link>
          </>
        }
        actions={
          <>
            {canInspect(roles) ? (
              <Link href={`/vessels/${vesselId}/inspections/new?tank=${tankId}`} className="rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold">Start an inspection</Link>
            ) : null}
            <Link href={`/vessels/${vesselId}/tanks/${tankId}/history`} className="rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold">History</Link>
            <Link href={`/vessels/${vesselId}/tanks/${tankId}/brief`} className="rounded-md bg-hull-700 px-3 py-2 text-sm font-semibold text-white hover:bg-hull-800">Pre-entry brief</Link>
            {canEdit ? <Link href={`/vessels/${vesselId}/tanks/${tankId}/edit`} className="rounded-md border border-slate-300 bg-white px-3 py-2 text-sm font-semibold">Edit tank</Link> : null}
          </>
        }
      />
      <div className="space-y-6">
        <section aria-label="Diagrams" className="grid gap-4 rounded-lg border border-slate-200 bg-white p-4 lg:grid-cols-[2fr_1fr]">
          <TankDiagramSvg diagram={profile} />
          <div className="mx-auto w-full max-w-xs">
            <TankDiagramSvg diagram={section} />
          </div>
        </section>
        <section aria-labelledby="position" className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 id="position" className="mb-2 text-lg font-semibold text-hull-900">Position along the ship</h2>
          <TankPositionList position={position} />
          {tank.heatedBoundary ? <p className="mt-2 text-sm"><span className="font-semibold">Heated boundary:</span> {tank.heatedBoundary}</p> : null}
          {tank.atWaterline ? <p className="mt-1 text-sm">Marked as at the waterline.</p> : null}
        </section>
        <section aria-labelledby="catalogue" className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 id="catalogue" className="mb-2 text-lg font-semibold text-hull-900">Member catalogue</h2>
          {rows.members.length ? (
            <ul className="mb-4 divide-y divide-slate-100">
              {rows.members.map((m) => (
                <li key={m.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                  <span>
                    {describeMember(m)}
                    {m.label ? <span className="text-slate-600"> · {m.label}</span> : null}
                  </span>
                  {canEdit ? <ActionButton action={removeMemberAction} fields={{ ...ids, memberId: m.id }} label="Remove" variant="danger" confirm={`Remove "${describeMember(m)}" from the catalogue?`} /> : null}
                </li>
              ))}
            </ul>
          ) : (
            <div className="mb-4"><Notice>No members catalogued yet: findings name their member from this list.</Notice></div>
          )}
          {canEdit ? <AddMemberForm action={addMemberAction} tank={tankRef} /> : null}
        </section>
        <section aria-labelledby="special" className="rounded-lg border border-slate-200 bg-white p-4">
          <h2 id="special" className="mb-2 text-lg font-semibold text-hull-900">Special frames</h2>
          {rows.specialFrames.length ? (
            <ul className="mb-4 divide-y divide-slate-100">
              {rows.specialFrames.map((s) => (
                <li key={s.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                  <span><span className="font-semibold">Fr. {s.frame}</span> — {s.note}</span>
                  {canEdit ? <ActionButton action={removeSpecialFrameAction} fields={{ ...ids, specialFrameId: s.id }} label="Remove" variant="danger" confirm={`Remove the note on Fr. ${s.frame}?`} /> : null}
                </li>
              ))}
            </ul>
          ) : (
            <p className="mb-4 text-sm text-slate-600">None noted.</p>
          )}
          {canEdit ? <AddSpecialFrameForm action={addSpecialFrameAction} tank={tankRef} /> : null}
        </section>
        {canEdit ? (
          <section aria-label="Tank actions" className="flex flex-wrap gap-3">
            {tank.side !== "centre" ? (
              <ActionButton action={mirrorTankAction} fields={ids} label={`Copy to the ${tank.side === "port" ? "starboard" : "port"} side`} />
            ) : null}
            <ActionButton action={deleteTankAction} fields={ids} label="Delete tank" variant="danger" confirm={`Delete ${tank.code} and its member catalogue?`} />
          </section>
        ) : null}
      </div>
    </>
  );
}
