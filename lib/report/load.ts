import "server-only";
// Gathers everything the report shows: the inspection as the inspection page
// computes it, the company's name, the signatures with their drawn images and
// each photo's report-variant bytes from storage.
import { getOrganisation } from "@/db/queries/organisations";
import { listPhotos } from "@/db/queries/photos";
import { getInspectionSummary, listSignatures } from "@/db/queries/signing";
import { getVessel } from "@/db/queries/vessels";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection } from "@/lib/auth/authorize";
import { AppError } from "@/lib/errors";
import { buildView } from "@/lib/services/inspections";
import { VESSEL_READERS } from "@/lib/services/vessels";
import { readObject } from "@/lib/storage/s3";
import { landmarkFrames } from "@/lib/structure/catalogue";
import { assembleReport } from "./assemble";
import type { TReportData, TReportSource, TReportSourceFinding } from "./types";

const MAX_PHOTO_BYTES = 8 * 1024 * 1024;
const MAX_SIGNATURE_BYTES = 1024 * 1024;
/** Photos read from storage at once. */
const READ_LANES = 6;

async function mapLimited<T, R>(items: readonly T[], lanes: number, work: (item: T) => Promise<R>): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  await Promise.all(Array.from({ length: Math.min(lanes, items.length) }, async () => {
    while (next < items.length) {
      const i = next++;
      out[i] = await work(items[i]!);
    }
  }));
  return out;
}

/**
 * The report of an inspection as it stands now. `photoBytes: false` leaves the
 * photos' bytes in storage (the HTML preview loads them by URL).
 */
export async function loadReportData({ orgId, inspectionId, photoBytes = true }: { orgId: string; inspectionId: string; photoBytes?: boolean }): Promise<TReportData> {
  const row = await getInspectionSummary({ orgId, inspectionId });
  if (!row) throw new AppError("not_found", "No such inspection.");
  const vessel = await getVessel({ orgId, vesselId: row.vesselId });
  if (!vessel) throw new AppError("not_found", "No such inspection.");
  const [view, org, signatureRows, photoRows] = await Promise.all([
    buildView(orgId, inspectionId, vessel, false),
    getOrganisation({ orgId }),
    listSignatures({ orgId, inspectionId }),
    listPhotos({ orgId, inspectionId }),
  ]);
  const reportKeys = new Map(photoRows.map((p) => [p.id, p.reportKey]));
  const ready = view.photos.filter((p) => p.status === "ready" && reportKeys.get(p.id));
  const jpegs = photoBytes ? await mapLimited(ready, READ_LANES, (p) => readObject(reportKeys.get(p.id)!, MAX_PHOTO_BYTES)) : ready.map(() => null);
  const drawn = await Promise.all(signatureRows.map((s) => (s.drawnSignatureKey ? readObject(s.drawnSignatureKey, MAX_SIGNATURE_BYTES) : null)));
  const cost = view.sediment.cost;
  const source: TReportSource = {
    company: org?.name ?? "",
    generatedAt: new Date(),
    inspection: view.inspection,
    vessel,
    tank: view.tank,
    landmarks: landmarkFrames(view.catalogue),
    entry: view.entry,
    ruleSet: view.ruleSet,
    readings: view.readings,
    findings: view.findings as TReportSourceFinding[],
    coating: view.coating,
    tankRating: view.tankRating,
    twentyPercentRule: view.twentyPercentRule,
    anodes: view.anodes,
    anodeProjection: view.anodeProjection,
    anodeThresholdPct: view.anodeThresholdPct,
    anodeWarning: view.anodeWarning,
    sediment: { zones: view.sediment.zones, rate: cost ? { amount: cost.ratePerM3, currency: cost.currency, place: cost.place } : null },
    notInspected: view.notInspected,
    photos: ready.map((p, i) => ({ ...p, src: p.reportUrl!, jpeg: jpegs[i] ?? null })),
    signatures: signatureRows.map((s, i) => ({ ...s, drawnPng: drawn[i] ?? null })),
    blockers: view.blockers,
  };
  return assembleReport(source);
}

/** The report for someone who may read the vessel's reports (its officer and master, the office). */
export async function loadReportDataAs(actor: TActor, inspectionId: string, opts: { photoBytes?: boolean } = {}) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  return loadReportData({ orgId: auth.orgId, inspectionId, photoBytes: opts.photoBytes });
}
