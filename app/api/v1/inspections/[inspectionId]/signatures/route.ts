import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import type { TServed, TSigningStateResponse } from "@/lib/schemas/responses";
import { readSigningStateAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** Signatures, the master's return comments, the signed PDF's fingerprint and every revision of the report. */
export const GET = route<P>(async (_req, { inspectionId }) => {
  const { roles: _roles, ...state } = await readSigningStateAs(await requireActor(), inspectionId);
  return { ...state, signatures: state.signatures.map(({ userId: _u, ...sig }) => sig) } satisfies TServed<TSigningStateResponse>;
});
