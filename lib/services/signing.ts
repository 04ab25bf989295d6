import "server-only";
// The report's way to class: the officer signs and submits, the master returns
// it with comments or countersigns it, the countersigned report is rendered,
// fingerprinted, locked and sent; a correction is a new revision.
import { randomUUID } from "node:crypto";
import { db } from "@/db";
import { writeAudit } from "@/db/queries/audit";
import * as q from "@/db/queries/signing";
import type { TActor } from "@/lib/auth/actor";
import { authorizeInspection } from "@/lib/auth/authorize";
import { verifyPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import { reportFileName } from "@/lib/format";
import { validateInput } from "@/lib/http/route";
import { QUEUES, sendJob } from "@/lib/jobs/queue";
import { ZReturnInput, ZSignInput, type TSignInput } from "@/lib/schemas/signing";
import { signatureKey } from "@/lib/storage/keys";
import { deleteObjects, presignDownload, writeObject } from "@/lib/storage/s3";
import { sniffContentType } from "@/lib/uploads/sniff";
import { RESENDERS } from "./deliveries";
import { buildView, INSPECTORS } from "./inspections";
import { VESSEL_READERS } from "./vessels";

/** Only the vessel's master countersigns or returns a report. */
export const COUNTERSIGNERS = ["master"] as const;

const WRONG_PASSWORD = "The password is not right: your signature was not recorded.";

async function confirmPassword(actor: TActor, password: string) {
  const hash = await q.getOwnPasswordHash({ userId: actor.userId });
  if (!hash || !(await verifyPassword(hash, password))) {
    throw new AppError("forbidden", WRONG_PASSWORD, [{ path: "password", message: "is not right" }]);
  }
}

/** Everything that must hold before a report can be signed: no blockers, and the version the signer read. */
async function readForSigning(auth: Awaited<ReturnType<typeof authorizeInspection>>, inspectionId: string, version: number) {
  const view = await buildView(auth.orgId, inspectionId, auth.vessel, true);
  if (view.blockers.length) {
    throw new AppError("unprocessable", `The report cannot be signed yet: ${view.blockers.length} thing${view.blockers.length > 1 ? "s are" : " is"} missing.`,
      view.blockers.map((b) => ({ path: `${b.step}.${b.field}`, message: b.message })));
  }
  if (view.inspection.version !== version) {
    throw new AppError("conflict", "Someone else saved this inspection since you opened it. Reload it and read it again before signing.", [
      { path: "version", message: String(view.inspection.version) },
    ]);
  }
  return view;
}

/** Stores a drawn signature before the transaction; returns its key (removed again if the signing fails). */
async function storeDrawnSignature(input: TSignInput, ids: { orgId: string; vesselId: string; inspectionId: string; signatureId: string }) {
  if (!input.drawnSignature) return null;
  const bytes = Buffer.from(input.drawnSignature.slice(input.drawnSignature.indexOf(",") + 1), "base64");
  if (sniffContentType(bytes) !== "image/png") throw new AppError("unsupported_media_type", "The drawn signature is not a PNG image: draw it again.", [{ path: "drawnSignature", message: "is not a PNG image" }]);
  const key = signatureKey(ids);
  await writeObject({ key, body: bytes, contentType: "image/png" });
  return key;
}

async function sign(actor: TActor, inspectionId: string, body: unknown, kind: "officer" | "master") {
  const auth = await authorizeInspection({ actor, inspectionId, allow: kind === "officer" ? INSPECTORS : COUNTERSIGNERS });
  const input = validateInput(ZSignInput, body);
  await confirmPassword(actor, input.password);
  const view = await readForSigning(auth, inspectionId, input.version);
  if (kind === "master") {
    const officer = (await q.listSignatures({ orgId: auth.orgId, inspectionId })).find((s) => s.kind === "officer");
    if (officer?.userId === actor.userId) {
      throw new AppError("forbidden", "You signed this report as its author: the countersignature must come from the master, another person.");
    }
  }
  const signatureId = randomUUID();
  const drawnKey = await storeDrawnSignature(input, { orgId: auth.orgId, vesselId: auth.vessel.id, inspectionId, signatureId });
  try {
    const result = await db().transaction(async (tx) => {
      const now = new Date();
      const version = await q.transition(tx, {
        orgId: auth.orgId, inspectionId, version: input.version,
        ...(kind === "officer"
          ? { from: ["draft", "returned"] as const, to: "submitted" as const, set: { submittedAt: now } }
          : { from: ["submitted"] as const, to: "countersigned" as const, set: { countersignedAt: now, lockedAt: now } }),
      });
      const signature = await q.insertSignature(tx, {
        id: signatureId, orgId: auth.orgId, inspectionId, userId: actor.userId, kind,
        signerName: actor.name, signerRank: actor.rank, typedSignature: input.typedSignature, drawnSignatureKey: drawnKey,
      });
      await writeAudit(tx, {
        orgId: auth.orgId, actorUserId: actor.userId, action: kind === "officer" ? "inspection.submit" : "inspection.countersign",
        entity: "inspection", entityId: inspectionId, detail: { revision: view.inspection.revision, version },
      });
      return { version, status: kind === "officer" ? "submitted" : "countersigned", signedAt: signature.signedAt };
    });
    if (kind === "master") await sendJob(QUEUES.reportRender, { orgId: auth.orgId, inspectionId });
    return result;
  } catch (error) {
    if (drawnKey) await deleteObjects([drawnKey]).catch(() => undefined);
    throw error;
  }
}

/** The officer (or the master for a report of their own) signs and submits for countersigning. */
export const submitInspectionAs = (actor: TActor, inspectionId: string, body: unknown) => sign(actor, inspectionId, body, "officer");

/** The master countersigns: the report is locked and its PDF is rendered, stored and sent in the background. */
export const countersignInspectionAs = (actor: TActor, inspectionId: string, body: unknown) => sign(actor, inspectionId, body, "master");

/** The master sends a submitted report back to the officer with comments; it becomes editable again. */
export async function returnInspectionAs(actor: TActor, inspectionId: string, body: unknown) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: COUNTERSIGNERS });
  const input = validateInput(ZReturnInput, body);
  return db().transaction(async (tx) => {
    const version = await q.transition(tx, { orgId: auth.orgId, inspectionId, version: input.version, from: ["submitted"], to: "returned", set: { submittedAt: null } });
    await q.removeSignature(tx, { orgId: auth.orgId, inspectionId, kind: "officer" });
    await q.insertComment(tx, { orgId: auth.orgId, inspectionId, authorId: actor.userId, kind: "return", body: input.comments });
    await writeAudit(tx, { orgId: auth.orgId, actorUserId: actor.userId, action: "inspection.return", entity: "inspection", entityId: inspectionId, detail: { version } });
    return { version, status: "returned" as const };
  });
}

/** A correction of a countersigned report: a new draft revision with everything copied. */
export async function reviseInspectionAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: INSPECTORS });
  return db().transaction((tx) => q.copyAsRevision(tx, { orgId: auth.orgId, inspectionId, actorUserId: actor.userId }));
}

/** Signatures, return comments, revisions and the signed PDF's fingerprint, for the inspection page. */
export async function readSigningStateAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  const scope = { orgId: auth.orgId, inspectionId };
  const [signatures, returnComments, file, self] = await Promise.all([q.listSignatures(scope), q.listReturnComments(scope), q.getReportFile(scope), q.getInspectionSummary(scope)]);
  const revisions = self ? await q.listRevisions({ orgId: auth.orgId, seriesId: self.seriesId }) : [];
  const has = (allowed: readonly string[]) => auth.roles.some((r) => allowed.includes(r));
  const officer = signatures.find((s) => s.kind === "officer");
  const awaitingMaster = self?.status === "submitted" && has(COUNTERSIGNERS) && officer?.userId !== actor.userId;
  return {
    /** The next steps this user may take, by the same rules the routes enforce. */
    may: {
      countersign: awaitingMaster,
      returnIt: awaitingMaster,
      revise: self?.status === "countersigned" && has(INSPECTORS) && revisions.at(-1)?.id === inspectionId,
      resend: has(RESENDERS),
    },
    signatures: signatures.map((s) => ({ kind: s.kind, signerName: s.signerName, signerRank: s.signerRank, typedSignature: s.typedSignature, drawn: Boolean(s.drawnSignatureKey), signedAt: s.signedAt, userId: s.userId })),
    returnComments,
    report: file ? { sha256: file.sha256, sizeBytes: file.sizeBytes, createdAt: file.createdAt } : null,
    revisions,
    roles: auth.roles,
  };
}
export type TSigningState = Awaited<ReturnType<typeof readSigningStateAs>>;

/** A short-lived link to the signed PDF of a countersigned revision. */
export async function signedReportUrlAs(actor: TActor, inspectionId: string) {
  const auth = await authorizeInspection({ actor, inspectionId, allow: VESSEL_READERS });
  const [file, ins] = await Promise.all([q.getReportFile({ orgId: auth.orgId, inspectionId }), q.getInspectionSummary({ orgId: auth.orgId, inspectionId })]);
  if (!file || !ins) throw new AppError("not_found", "There is no signed PDF of this inspection yet: it is made once the master countersigns, within a minute.");
  return presignDownload({ key: file.objectKey, fileName: reportFileName({ vesselName: ins.vesselName, tankCode: ins.tankCode, revision: ins.revision }), contentType: "application/pdf" });
}
