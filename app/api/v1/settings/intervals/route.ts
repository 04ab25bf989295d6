import { requireActor } from "@/lib/auth/actor";
import { readJsonValue, route } from "@/lib/http/route";
import { clearVesselIntervalsAs, listIntervalsAs, setIntervalsAs } from "@/lib/services/intervals";

/** The company's inspection intervals and the vessels that have their own (office). */
export const GET = route(async () => listIntervalsAs(await requireActor()));

/** Sets the company's intervals, or one vessel's (with vesselId). */
export const PUT = route(async (req) => setIntervalsAs(await requireActor(), await readJsonValue(req)));

/** A vessel goes back to the company's intervals: ?vesselId=… */
export const DELETE = route(async (req) => clearVesselIntervalsAs(await requireActor(), new URL(req.url).searchParams.get("vesselId")));
