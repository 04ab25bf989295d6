import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { sharedReportUrlAs } from "@/lib/services/shares";

type P = { shareId: string };

/** The shared report's signed PDF (a short-lived link), for the surveyor it was shared with. */
export const GET = route<P>(async (_req, { shareId }) => NextResponse.redirect(await sharedReportUrlAs(await requireActor(), shareId), 302));
