import { requireActor } from "@/lib/auth/actor";
import { AppError, issuesFromZod } from "@/lib/errors";
import { route } from "@/lib/http/route";
import { authorizeFleetQuery, getFleetOverviewAs } from "@/lib/services/fleet";

/** GET /api/v1/fleet?vessel=&rating=&dueWithin=&page=&pageSize= — the fleet overview, one page of tanks. */
export const GET = route(async (req) => {
  const actor = await requireActor();
  const parsed = await authorizeFleetQuery(actor, new URL(req.url).searchParams);
  if (!parsed.success) throw new AppError("bad_request", "The filters are not valid.", issuesFromZod(parsed.error.issues));
  return getFleetOverviewAs(actor, parsed.data);
});
