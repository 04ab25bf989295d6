import { AppError } from "@/lib/errors";
import { inspectionWrite } from "@/lib/http/inspection-write";
import { route } from "@/lib/http/route";
import { SECTIONS, type TSection } from "@/lib/services/inspections";

/** Saves one part of an inspection: header, entry, coating, anodes, sediment, not-inspected, remarks, findings-flag. */
export const PUT = route<{ inspectionId: string; section: string }>(async (req, { inspectionId, section }) => {
  if (!(SECTIONS as readonly string[]).includes(section)) throw new AppError("not_found", `No such part of an inspection: ${section}.`);
  return inspectionWrite(req, inspectionId, { kind: "section", section: section as TSection });
});
