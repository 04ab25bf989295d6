import "server-only";
// /verify: is this file (or fingerprint) a signed Tankwright report? Open to
// anyone who holds a copy; it answers only which report it is, never its content.
import { createHash } from "node:crypto";
import * as q from "@/db/queries/signing";
import { AppError } from "@/lib/errors";
import { validateInput } from "@/lib/http/route";
import { VERIFY_MAX_BYTES, ZVerifyInput } from "@/lib/schemas/signing";
import { sniffContentType } from "@/lib/uploads/sniff";

export type TVerifyAnswer =
  | { known: false; fingerprint: string; message: string }
  | {
      known: true; fingerprint: string; message: string;
      report: { vesselName: string; imoNumber: string; tankCode: string; tankName: string; inspectedOn: string; revision: number; countersignedAt: Date | null; current: boolean; newerRevision: number | null };
    };

export async function verifyFingerprint(body: unknown): Promise<TVerifyAnswer> {
  const { fingerprint } = validateInput(ZVerifyInput, body);
  const row = await q.unsafeFindSignedReportBySha({ sha256: fingerprint });
  if (!row) {
    return { known: false, fingerprint, message: "This is not a signed Tankwright report: no report with this fingerprint was issued. A copy that was changed in any way, even re-saved, has a different fingerprint." };
  }
  const newer = row.newerRevision === null ? null : Number(row.newerRevision);
  return {
    known: true, fingerprint,
    message: newer
      ? `A signed Tankwright report, unchanged: ${row.vesselName}, tank ${row.tankCode}, inspected ${row.inspectedOn}, revision ${row.revision}. Revision ${newer} has since corrected it.`
      : `A signed Tankwright report, unchanged: ${row.vesselName}, tank ${row.tankCode}, inspected ${row.inspectedOn}, revision ${row.revision}.`,
    report: {
      vesselName: row.vesselName, imoNumber: row.imoNumber, tankCode: row.tankCode, tankName: row.tankName, inspectedOn: row.inspectedOn,
      revision: row.revision, countersignedAt: row.countersignedAt, current: newer === null, newerRevision: newer,
    },
  };
}

/** A PDF sent for checking: refused when too large or not a PDF, otherwise hashed and looked up. */
export async function verifyFile(bytes: Uint8Array): Promise<TVerifyAnswer> {
  if (bytes.length > VERIFY_MAX_BYTES) throw new AppError("payload_too_large", `The file is larger than ${VERIFY_MAX_BYTES / 1024 / 1024} MB: a signed report is much smaller. Check that you chose the right file.`);
  if (bytes.length === 0) throw new AppError("bad_request", "The file is empty.", [{ path: "file", message: "is empty" }]);
  if (sniffContentType(bytes) !== "application/pdf") throw new AppError("unsupported_media_type", "This file is not a PDF: only the PDF of a signed report can be checked.", [{ path: "file", message: "is not a PDF" }]);
  return verifyFingerprint({ fingerprint: createHash("sha256").update(bytes).digest("hex") });
}
