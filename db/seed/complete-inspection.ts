// Fills an inspection with everything a report needs, so that it has no
// blockers and can be signed: the demo's ready-to-submit inspection and the
// tests of signing. Quantities are computed by lib/, as the wizard does.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import * as s from "@/db/schema";
import { sedimentVolumeM3 } from "@/lib/calc/sediment";
import { repairQuantities } from "@/lib/inspection/quantities";
import { COATING_AREAS } from "@/lib/vocabulary";
import type { TWriter } from "./builders";

export async function fillInspection(
  w: TWriter,
  v: { orgId: string; inspectionId: string; frameFrom: number; testedAt: Date; measuredBy: string; standbyPerson: string },
) {
  const { orgId, inspectionId } = v;
  const [entry] = await w
    .insert(s.entryRecords)
    .values({ orgId, inspectionId, ruleSet: "msc581", permitRef: "EP-2026-207", standbyPerson: v.standbyPerson, ventilation: "Two fans, 24 hours before entry", rescueEquipmentReady: true, communicationsTested: true })
    .onConflictDoUpdate({ target: s.entryRecords.inspectionId, set: { permitRef: "EP-2026-207", standbyPerson: v.standbyPerson, rescueEquipmentReady: true, communicationsTested: true } })
    .returning();
  await w.insert(s.atmosphereReadings).values({ orgId, entryRecordId: entry!.id, testedAt: v.testedAt, oxygenPct: 20.9, flammableLflPct: 0, h2sPpm: 0, coPpm: 0, measuredBy: v.measuredBy, instrument: "Four-gas meter" });

  const touchUp = { kind: "coating_touch_up" as const, areaM2: 2.5 };
  const edges = { kind: "coating_touch_up" as const, areaM2: 1.2 };
  await w.insert(s.findings).values([
    {
      id: randomUUID(), orgId, inspectionId, number: 1, type: "coating_breakdown", frameFrom: v.frameFrom + 2, frameTo: v.frameFrom + 5, memberKind: "plating", platingRegion: "inner_bottom",
      lengthMm: 2500, widthMm: 1000, description: "Coating broken down over 2.5 × 1.0 m of inner bottom plating beside the aft manhole, light rust, no pitting",
      repairKind: "coating_touch_up", repair: touchUp, ...repairQuantities(touchUp),
    },
    {
      id: randomUUID(), orgId, inspectionId, number: 2, type: "coating_breakdown", frameFrom: v.frameFrom + 8, frameTo: v.frameFrom + 9, memberKind: "plating", platingRegion: "bottom_shell",
      lengthMm: 1200, widthMm: 1000, description: "Coating broken down along the weld of the bottom shell seam, 1.2 m long, rust streaks only",
      repairKind: "coating_touch_up", repair: edges, ...repairQuantities(edges),
    },
  ]);
  await w.insert(s.coatingAreas).values(COATING_AREAS.map((area, i) => ({ orgId, inspectionId, area, breakdownPct: i === 0 ? 4 : 1, rustedPct: i === 0 ? 2 : 0.5, hardScalePct: 0 })));
  await w.insert(s.anodeRecords).values({ orgId, inspectionId, installedCount: 12, inspectedCount: 12, meanWastagePct: 30, minWastagePct: 20, maxWastagePct: 55, toRenewCount: 1 });
  await w.insert(s.sedimentZones).values({ id: randomUUID(), orgId, inspectionId, label: "Bottom between the floors, aft end", depthMm: 50, areaM2: 20, lengthM: 5, breadthM: 4, volumeM3: sedimentVolumeM3({ depthMm: 50, areaM2: 20 }) });
  await w
    .update(s.inspections)
    .set({
      allAreasInspected: true,
      remarks: {
        type: "doc",
        content: [
          { type: "heading", attrs: { level: 3 }, content: [{ type: "text", text: "Access" }] },
          { type: "paragraph", content: [{ type: "text", text: "Tank ventilated for 24 hours before entry; " }, { type: "text", marks: [{ type: "bold" }], text: "all readings within limits" }, { type: "text", text: "." }] },
          { type: "bulletList", content: [{ type: "listItem", content: [{ type: "paragraph", content: [{ type: "text", text: "Aft manhole used for entry and exit." }] }] }] },
        ],
      },
    })
    .where(and(eq(s.inspections.orgId, orgId), eq(s.inspections.id, inspectionId)));
}
