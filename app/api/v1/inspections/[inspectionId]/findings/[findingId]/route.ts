import { z } from "zod";
import { AppError } from "@/lib/errors";
import { inspectionWrite } from "@/lib/http/inspection-write";
import { route } from "@/lib/http/route";

type P = { inspectionId: string; findingId: string };
const checkId = (id: string) => {
  if (!z.uuid().safeParse(id).success) throw new AppError("not_found", "No such finding.");
};

/** Creates or updates the finding with this client-chosen id: a retried save never creates it twice. */
export const PUT = route<P>(async (req, { inspectionId, findingId }) => {
  checkId(findingId);
  return inspectionWrite(req, inspectionId, { kind: "finding", findingId });
});

export const DELETE = route<P>(async (req, { inspectionId, findingId }) => {
  checkId(findingId);
  return inspectionWrite(req, inspectionId, { kind: "delete-finding", findingId });
});
