import { inspectionWrite } from "@/lib/http/inspection-write";
import { route } from "@/lib/http/route";

/** Records an atmosphere test; a stop is followed by a new test, never by editing the old one. */
export const POST = route<{ inspectionId: string }>(async (req, { inspectionId }) => inspectionWrite(req, inspectionId, { kind: "reading" }));
