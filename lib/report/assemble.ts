// Lays a report's source out for reading: every text the PDF and the HTML
// preview show is made here once, from the values lib/ computed.
import { roundKg } from "@/lib/calc/steel";
import { diminutionPct } from "@/lib/calc/thickness";
import { crossSectionDiagram, sideProfileDiagram } from "@/lib/diagram/tank-diagram";
import { formatDateTime, reportFileName } from "@/lib/format";
import type { TRepair } from "@/lib/schemas/inspection";
import { formatFrames } from "@/lib/structure/frames";
import {
  COATING_AREA_LABELS,
  FINDING_TYPE_LABELS,
  INSPECTION_STATUS_LABELS,
  MEMBER_KIND_LABELS,
  NOT_INSPECTED_REASON_LABELS,
  PHOTO_KIND_LABELS,
  PLACE_KIND_LABELS,
  PLATING_REGION_LABELS,
  REPAIR_KIND_LABELS,
  TANK_KIND_LABELS,
  TANK_SIDE_LABELS,
  type TCoatingArea,
  type TMemberKind,
  type TPlatingRegion,
} from "@/lib/vocabulary";
import { photoPages } from "./photo-pages";
import { summarizeReport } from "./summary";
import type { TKeyValue, TReportData, TReportSource, TReportSourceFinding, TRichDoc } from "./types";

export const REPORT_TITLE = "Ballast tank inspection report";
export const DRAFT_MARK = "DRAFT — not countersigned";

/** A measured value as recorded: at most `digits` decimals, no trailing zeros. */
export function num(v: number, digits = 1): string {
  return String(Number(v.toFixed(digits)));
}
const pct = (v: number | null | undefined) => (v === null || v === undefined ? "—" : `${num(v)} %`);
const mm = (v: number) => `${num(v)} mm`;
const money = (amount: number, currency: string) => `${amount.toLocaleString("en", { maximumFractionDigits: 2 })} ${currency}`;
const yesNo = (v: boolean | null) => (v === null ? "not stated" : v ? "yes" : "no");
const time = (at: Date | string) => formatDateTime(new Date(at));
/** "H₂S" as "H2S": the report's font files have no subscript digits. */
const plainDigits = (text: string) => text.replace(/[\u2080-\u2089]/g, (d) => String(d.charCodeAt(0) - 0x2080));

export function memberText(m: { memberKind: TMemberKind | null; memberNumber: number | null; platingRegion: TPlatingRegion | null }): string {
  const kind = m.memberKind ? `${MEMBER_KIND_LABELS[m.memberKind]}${m.memberNumber !== null ? ` ${m.memberNumber}` : ""}` : "";
  const region = m.platingRegion ? PLATING_REGION_LABELS[m.platingRegion] : "";
  if (kind && region) return `${kind}, ${region.toLowerCase()}`;
  return kind || region || "—";
}

export function weightText(kg: number | null): string {
  return kg === null || kg === undefined ? "—" : `${roundKg(kg)} kg`;
}

export function dimensionsText(f: TReportSourceFinding): string {
  const parts: string[] = [];
  if (f.lengthMm !== null) parts.push(`L ${mm(f.lengthMm)}`);
  if (f.widthMm !== null) parts.push(`W ${mm(f.widthMm)}`);
  if (f.depthMm !== null) parts.push(`depth ${mm(f.depthMm)}`);
  if (f.pitDepthMm !== null) parts.push(`pit depth ${mm(f.pitDepthMm)}`);
  if (f.affectedLengthMm !== null) parts.push(`affected length ${mm(f.affectedLengthMm)}`);
  if (f.asBuiltThicknessMm !== null && f.measuredThicknessMm !== null) {
    parts.push(`t ${num(f.asBuiltThicknessMm)} → ${num(f.measuredThicknessMm)} mm (−${num(diminutionPct(f.asBuiltThicknessMm, f.measuredThicknessMm))} %)`);
  } else if (f.measuredThicknessMm !== null) parts.push(`t measured ${mm(f.measuredThicknessMm)}`);
  return parts.join(", ") || "—";
}

const pieces = (n: number) => `${n} pc${n === 1 ? "" : "s"}`;

export function repairText(r: TRepair, coatingRepairM2: number | null): string {
  const coating = coatingRepairM2 ? `; coating ${num(coatingRepairM2, 2)} m²` : "";
  switch (r.kind) {
    case "insert_plate":
      return `Insert plate ${num(r.lengthMm)} × ${num(r.widthMm)} × ${num(r.thicknessMm)} mm, ${pieces(r.pieces)}${coating}`;
    case "bracket_renewal": {
      const size = r.shape === "triangular" && r.sideAMm && r.sideBMm && r.sideCMm
        ? `triangular ${num(r.sideAMm)} × ${num(r.sideBMm)} × ${num(r.sideCMm)} mm`
        : r.lengthMm && r.widthMm ? `${num(r.lengthMm)} × ${num(r.widthMm)} mm` : r.shape;
      return `Bracket renewal, ${size}, t ${num(r.thicknessMm)} mm, ${pieces(r.pieces)}${coating}`;
    }
    case "profile_renewal": {
      const section = r.kgPerM
        ? `${num(r.kgPerM)} kg/m`
        : r.webHeightMm && r.webThicknessMm
          ? `web ${num(r.webHeightMm)} × ${num(r.webThicknessMm)}${r.flangeWidthMm && r.flangeThicknessMm ? `, flange ${num(r.flangeWidthMm)} × ${num(r.flangeThicknessMm)}` : ""} mm`
          : "";
      return `Profile renewal ${mm(r.lengthMm)}${section ? `, ${section}` : ""}, ${pieces(r.pieces)}${coating}`;
    }
    case "fairing":
      return `Fairing ${num(r.lengthMm)} × ${num(r.widthMm)} mm${coating}`;
    case "coating_touch_up":
      return `Coating touch-up ${num(r.areaM2, 2)} m²`;
    case "monitor_only":
      return REPAIR_KIND_LABELS.monitor_only;
  }
}

function richDoc(v: unknown): TRichDoc | null {
  if (!v || typeof v !== "object" || (v as { type?: unknown }).type !== "doc") return null;
  const doc = v as TRichDoc;
  const hasText = (n: { text?: string; content?: unknown[] }): boolean => Boolean(n.text?.trim()) || (n.content ?? []).some((c) => hasText(c as never));
  return hasText(doc) ? doc : null;
}

export function assembleReport(src: TReportSource): TReportData {
  const { inspection, vessel, tank } = src;
  const countersigned = inspection.status === "countersigned";
  const summary = summarizeReport({ findings: src.findings, anodes: src.anodes, sediment: src.sediment, notInspected: src.notInspected });
  const findingNumber = new Map(src.findings.map((f) => [f.id, f.number]));
  const tankLabel = `${tank.code} — ${tank.name}`;
  const worst = src.tankRating ? src.coating.find((c) => c.area === src.tankRating!.worstArea) : undefined;

  const cover: TKeyValue[] = [
    ["Company", src.company],
    ["Vessel", vessel.name],
    ["IMO number", vessel.imoNumber],
    ["Tank", tankLabel],
    ["Tank particulars", `${TANK_KIND_LABELS[tank.kind]}, ${TANK_SIDE_LABELS[tank.side].toLowerCase()}, ${formatFrames(tank.frameFrom, tank.frameTo)}${tank.bottomAreaM2 ? `, bottom area ${num(tank.bottomAreaM2)} m²` : ""}`],
    ["Date of inspection", inspection.inspectedOn],
    ["Place", `${PLACE_KIND_LABELS[inspection.placeKind]}: ${inspection.place}`],
    ["Team", inspection.team.join(", ") || "—"],
    ["Status", INSPECTION_STATUS_LABELS[inspection.status]],
    ["Revision", String(inspection.revision)],
    ["Rendered", time(src.generatedAt)],
  ];

  const summaryRows: TKeyValue[] = [
    [
      "Coating of the tank",
      src.tankRating && worst
        ? `${src.tankRating.rating} — worst area ${COATING_AREA_LABELS[worst.area]}: breakdown ${pct(worst.breakdownPct)}, rusted ${pct(worst.rustedPct)}, hard scale ${pct(worst.hardScalePct)}; decided by ${src.tankRating.decidedBy}`
        : "not rated",
    ],
    [
      "Findings",
      summary.findings
        ? `${summary.findings}: ${summary.findingsByType.map((t) => `${t.label} ${t.count}`).join(", ")}`
        : inspection.noFindings ? "none: no defects found" : "none recorded",
    ],
    ["Steel renewal", `${weightText(summary.steelKg)} (${num(summary.steelKg / 1000, 3)} t)`],
    ["Coating repair", `${num(summary.coatingRepairM2, 2)} m²`],
    ["Anodes to renew", summary.anodesToRenew === null ? "not recorded" : `${summary.anodesToRenew} of ${src.anodes!.inspectedCount} inspected (mean wastage ${pct(src.anodes!.meanWastagePct)})`],
    [
      "Sediment",
      `${num(summary.sedimentM3, 2)} m³${summary.sedimentCost ? `; removal about ${money(summary.sedimentCost.amount, summary.sedimentCost.currency)}` : ""}`,
    ],
    [
      "Areas not inspected",
      summary.notInspected
        ? `${summary.notInspected}: ${src.notInspected.map((a) => `${formatFrames(a.frameFrom, a.frameTo)} (${NOT_INSPECTED_REASON_LABELS[a.reason]})`).join("; ")}`
        : inspection.allAreasInspected ? "none: every area inspected" : "not stated",
    ],
  ];

  const profile = sideProfileDiagram({
    vessel,
    tank,
    landmarks: src.landmarks,
    marks: src.findings.map((f) => ({ frameFrom: f.frameFrom, frameTo: f.frameTo, label: String(f.number) })),
  });
  const highlight = [...new Set(src.findings.flatMap((f) => (f.platingRegion ? [f.platingRegion] : [])))];
  const section = crossSectionDiagram({ kind: tank.kind, side: tank.side, highlight });

  const signatureOf = (kind: "officer" | "master") => {
    const s = src.signatures.find((x) => x.kind === kind);
    const role = kind === "officer" ? "Officer in charge of the inspection" : "Master (countersignature)";
    if (!s) return { role, signed: false, name: "", rank: "", signedAt: "", typedSignature: null, drawnPng: null };
    return { role, signed: true, name: s.signerName, rank: s.signerRank ?? "", signedAt: time(s.signedAt), typedSignature: s.typedSignature, drawnPng: s.drawnPng };
  };

  const rate = src.sediment.rate;
  return {
    inspectionId: inspection.id,
    title: REPORT_TITLE,
    company: src.company,
    status: inspection.status,
    statusLabel: INSPECTION_STATUS_LABELS[inspection.status],
    revision: inspection.revision,
    draftMark: countersigned ? null : DRAFT_MARK,
    generatedAt: time(src.generatedAt),
    fileName: reportFileName({ vesselName: vessel.name, tankCode: tank.code, revision: inspection.revision, draft: !countersigned }),
    vessel: { name: vessel.name, imoNumber: vessel.imoNumber },
    tank: { code: tank.code, name: tank.name, label: tankLabel },
    running: `${vessel.name} · ${tank.code} ${tank.name} · Rev. ${inspection.revision}`,
    cover,
    summary,
    summaryRows,
    diagrams: { profile, section },
    entry: src.entry
      ? {
          rows: [
            ["Permit", src.entry.permitRef ?? "—"],
            ["Standby person", src.entry.standbyPerson ?? "—"],
            ["Ventilation", src.entry.ventilation ?? "—"],
            ["Rescue equipment ready", yesNo(src.entry.rescueEquipmentReady)],
            ["Communications tested", yesNo(src.entry.communicationsTested)],
            ["Atmosphere rule set", plainDigits(src.ruleSet.name)],
          ],
          limits: src.ruleSet.limits.map((l) => [plainDigits(l.label), plainDigits(l.limitText)]),
        }
      : null,
    readings: src.readings.map((r) => ({
      testedAt: formatDateTime(new Date(r.testedAt), vessel.utcOffsetMinutes),
      oxygen: pct(r.oxygenPct),
      flammable: `${num(r.flammableLflPct)} % LFL`,
      h2s: `${num(r.h2sPpm)} ppm`,
      co: `${num(r.coPpm)} ppm`,
      co2: pct(r.co2Pct),
      measuredBy: r.instrument ? `${r.measuredBy} (${r.instrument})` : r.measuredBy,
      enter: r.verdict.enter,
      verdict: r.verdict.enter ? "Within limits" : plainDigits(`STOP: ${r.verdict.failures.map((x) => `${x.label} ${num(x.value)} (limit ${x.limitText})`).join("; ")}`),
    })),
    findings: src.findings.map((f) => ({
      id: f.id,
      number: f.number,
      type: FINDING_TYPE_LABELS[f.type],
      frames: formatFrames(f.frameFrom, f.frameTo),
      member: memberText(f) + (f.positionDetail ? `; ${f.positionDetail}` : ""),
      description: f.description,
      dimensions: dimensionsText(f),
      repair: repairText({ ...(f.repair as object), kind: f.repairKind } as TRepair, f.coatingRepairM2),
      weight: weightText(f.steelWeightKg),
    })),
    findingsNote: src.findings.length ? null : inspection.noFindings ? "No defects were found." : "No findings recorded.",
    findingsTotal: `Total steel ${weightText(summary.steelKg)}; coating repair ${num(summary.coatingRepairM2, 2)} m²`,
    coating: src.coating.map((c) => ({
      area: COATING_AREA_LABELS[c.area as TCoatingArea] + (c.location ? ` (${c.location})` : ""),
      breakdown: pct(c.breakdownPct),
      rusted: pct(c.rustedPct),
      hardScale: pct(c.hardScalePct),
      edges: pct(c.edgesRustedPct),
      rustGrade: String(c.rustGrade),
      rating: c.rating.rating,
      decidedBy: c.rating.decidedBy,
    })),
    coatingNote:
      `GOOD / FAIR / POOR by the thresholds of the IACS definitions; rust grade on the ASTM D610 scale (10 best). ` +
      (src.twentyPercentRule === "wording" ? "Exactly 20 % breakdown is rated POOR (company setting)." : "Exactly 20 % breakdown is rated FAIR (company setting)."),
    anodes: src.anodes
      ? {
          rows: [
            ["Kind", src.anodes.anodeKind ?? "not stated"],
            ["Installed / inspected", `${src.anodes.installedCount} / ${src.anodes.inspectedCount}`],
            ["Mean wastage", pct(src.anodes.meanWastagePct)],
            ["Least / most wasted", `${pct(src.anodes.minWastagePct)} / ${pct(src.anodes.maxWastagePct)}`],
            ["To renew", `${src.anodes.toRenewCount} (renewal at ${pct(src.anodeThresholdPct)} wastage)`],
            ["Look unused", yesNo(src.anodes.appearUnused)],
            [
              "Projection",
              src.anodeProjection
                ? `mean wastage reaches ${pct(src.anodeThresholdPct)} about ${src.anodeProjection.date} (${num(src.anodeProjection.ratePctPerYear)} % a year)`
                : "not enough history to project",
            ],
            ...(src.anodes.note ? [["Note", src.anodes.note] as TKeyValue] : []),
          ],
          warning: src.anodeWarning,
        }
      : null,
    sediment: {
      zones: src.sediment.zones.map((z) => ({
        label: z.label,
        frames: z.frameFrom !== null && z.frameTo !== null ? formatFrames(z.frameFrom, z.frameTo) : "—",
        depth: mm(z.depthMm),
        area: `${num(z.areaM2, 2)} m²`,
        volume: `${num(z.volumeM3, 2)} m³`,
      })),
      total: `${num(summary.sedimentM3, 2)} m³`,
      cost: summary.sedimentCost && rate
        ? `Removal about ${money(summary.sedimentCost.amount, summary.sedimentCost.currency)} at ${money(rate.amount, rate.currency)} per m³${rate.place ? ` (${rate.place})` : ""}`
        : null,
      note: src.sediment.zones.length ? null : inspection.noSediment ? "No sediment in the tank." : "No sediment recorded.",
    },
    notInspected: src.notInspected.map((a) => ({
      frames: formatFrames(a.frameFrom, a.frameTo),
      member: memberText(a),
      reason: NOT_INSPECTED_REASON_LABELS[a.reason],
      suspected: a.suspected ?? "—",
    })),
    notInspectedNote: src.notInspected.length ? null : inspection.allAreasInspected ? "Every area of the tank was inspected." : "Not stated.",
    remarks: richDoc(inspection.remarks),
    photos: src.photos.map((p, i) => {
      const finding = p.findingId ? findingNumber.get(p.findingId) : undefined;
      const place = p.caption && p.frameFrom !== null && p.frameTo !== null ? [formatFrames(p.frameFrom, p.frameTo), memberText(p)] : ["not captioned"];
      return {
        id: p.id,
        number: i + 1,
        kind: p.kind,
        heading: [`Photo ${i + 1}`, PHOTO_KIND_LABELS[p.kind], ...place, ...(finding !== undefined ? [`Finding ${finding}`] : [])].join(" · "),
        caption: p.caption ?? "",
        src: p.src,
        jpeg: p.jpeg,
        width: p.width,
        height: p.height,
      };
    }),
    photoPages: photoPages(src.photos),
    signatures: [signatureOf("officer"), signatureOf("master")],
    blockers: countersigned ? [] : src.blockers.map((b) => b.message),
  };
}
