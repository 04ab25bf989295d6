import "server-only";
import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/actor";
import { readJsonValue } from "./route";
import { writeInspectionAs } from "@/lib/services/inspections";

/** Runs one inspection write from a request: JSON body with `version`, optional Idempotency-Key header. */
export async function inspectionWrite(req: Request, inspectionId: string, mutation: Parameters<typeof writeInspectionAs>[2]) {
  const actor = await requireActor();
  const body = req.method === "DELETE" && req.headers.get("content-length") === "0" ? {} : await readJsonValue(req);
  const key = req.headers.get("idempotency-key");
  const result = await writeInspectionAs(actor, inspectionId, mutation, body, key && key.length <= 100 ? key : null);
  return NextResponse.json(result.body, { status: result.status });
}
