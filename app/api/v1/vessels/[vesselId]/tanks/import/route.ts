import { requireActor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { route } from "@/lib/http/route";
import { importTanksAs } from "@/lib/services/tanks";
import { TANK_CSV_MAX_BYTES } from "@/lib/structure/tank-csv";

/**
 * CSV import of tanks. The body is the CSV file itself (text/csv).
 * `?commit=1` writes when every row is valid; without it the answer is only the preview.
 */
export const POST = route<{ vesselId: string }>(async (req, { vesselId }) => {
  const actor = await requireActor();
  if (Number(req.headers.get("content-length") ?? 0) > TANK_CSV_MAX_BYTES) {
    throw new AppError("payload_too_large", `The file is larger than ${TANK_CSV_MAX_BYTES / 1024} KB.`);
  }
  const bytes = new Uint8Array(await req.arrayBuffer());
  const commit = new URL(req.url).searchParams.get("commit") === "1";
  const result = await importTanksAs(actor, vesselId, bytes, commit);
  const status = result.ok ? (commit ? 201 : 200) : 422;
  return Response.json({ ...result, rows: result.rows.map(({ input: _input, ...row }) => row) }, { status });
});
