import { requireActor } from "@/lib/auth/actor";
import { route } from "@/lib/http/route";
import { readInspectionView } from "@/lib/services/inspections";

export const GET = route<{ inspectionId: string }>(async (_req, { inspectionId }) => readInspectionView(await requireActor(), inspectionId));
