import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import type { TServed, TSignedReportFingerprint } from "@/lib/schemas/responses";
import { readSigningStateAs, signedReportUrlAs } from "@/lib/services/signing";

type P = { inspectionId: string };

/** The signed PDF (a short-lived link to storage), or with ?format=json its fingerprint and size. */
export const GET = route<P>(async (req, { inspectionId }) => {
  const actor = await requireActor();
  if (new URL(req.url).searchParams.get("format") === "json") {
    const state = await readSigningStateAs(actor, inspectionId);
    return { report: state.report } satisfies TServed<TSignedReportFingerprint>;
  }
  return NextResponse.redirect(await signedReportUrlAs(actor, inspectionId), 302);
});
