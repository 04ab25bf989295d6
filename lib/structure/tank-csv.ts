// CSV import of a vessel's tank list: every row is checked with the tank
// schema; the preview lists each row's errors with its line number, and the
// import writes only when every row is valid.
import { parse } from "csv-parse/sync";
import { tankInputSchema, type TTankInput, type TVesselFrameLimits } from "@/lib/schemas/tank";

export const TANK_CSV_COLUMNS = [
  { name: "code", required: true, help: 'Tank code as painted on the manhole, e.g. "No. 3 WBT P"; unique on the vessel' },
  { name: "name", required: true, help: "Full name" },
  { name: "side", required: true, help: "port, starboard or centre (P, S, C also accepted)" },
  { name: "kind", required: true, help: "double_bottom, hopper, side, top_side, fore_peak, aft_peak, double_bottom_hopper, double_bottom_side, hopper_side, double_bottom_hopper_side" },
  { name: "frame_from", required: true, help: "Aft frame (whole number inside the vessel's frames)" },
  { name: "frame_to", required: true, help: "Forward frame, greater than frame_from" },
  { name: "bottom_area_m2", required: false, help: "Bottom area in m² (for sediment volumes)" },
  { name: "coating_system", required: false, help: "hard (default), semi_hard, soft or none" },
  { name: "heated_boundary", required: false, help: "Which boundary is shared with a heated tank, if any" },
  { name: "at_waterline", required: false, help: "yes or no (default no)" },
  { name: "at_collision_bulkhead", required: false, help: "yes or no (default no)" },
  { name: "note", required: false, help: "Free note" },
] as const;

export const TANK_CSV_MAX_BYTES = 512 * 1024;
export const TANK_CSV_MAX_ROWS = 500;

const FIELD_OF: Record<string, string> = {
  code: "code", name: "name", side: "side", kind: "kind", frame_from: "frameFrom", frame_to: "frameTo",
  bottom_area_m2: "bottomAreaM2", coating_system: "coatingSystem", heated_boundary: "heatedBoundary",
  at_waterline: "atWaterline", at_collision_bulkhead: "atCollisionBulkhead", note: "note",
};
const COLUMN_OF = Object.fromEntries(Object.entries(FIELD_OF).map(([c, f]) => [f, c]));
const SIDE_LETTERS: Record<string, string> = { p: "port", s: "starboard", c: "centre", center: "centre" };

export type TCsvRow = { line: number; code: string; input?: TTankInput; errors: { column: string; message: string }[] };
export type TCsvPreview = { ok: boolean; fileErrors: string[]; rows: TCsvRow[] };

const fail = (message: string): TCsvPreview => ({ ok: false, fileErrors: [message], rows: [] });

function decodeUtf8(bytes: Uint8Array): { text: string } | { error: string } {
  const decoder = new TextDecoder("utf-8", { fatal: true });
  try {
    return { text: decoder.decode(bytes) };
  } catch {
    // Find the line with the bad byte: UTF-8 never uses 0x0a inside a character, so lines decode on their own.
    let line = 1;
    let start = 0;
    for (let i = 0; i <= bytes.length; i++) {
      if (i === bytes.length || bytes[i] === 0x0a) {
        try {
          decoder.decode(bytes.subarray(start, i));
        } catch {
          break;
        }
        line++;
        start = i + 1;
      }
    }
    return { error: `The file is not UTF-8 text (a byte on line ${line} is not). Save it as "CSV UTF-8" and try again.` };
  }
}

export function parseTankCsv(bytes: Uint8Array, ctx: { vessel: TVesselFrameLimits; existingCodes: string[] }): TCsvPreview {
  if (bytes.length === 0) return fail("The file is empty.");
  if (bytes.length > TANK_CSV_MAX_BYTES) return fail(`The file is larger than ${TANK_CSV_MAX_BYTES / 1024} KB; a tank list is far smaller. Check that it is the right file.`);
  const decoded = decodeUtf8(bytes);
  if ("error" in decoded) return fail(decoded.error);

  let records: string[][];
  try {
    records = parse(decoded.text, { bom: true, skip_empty_lines: true, trim: true, relax_column_count: true, delimiter: "," });
  } catch (e) {
    const line = (e as { lines?: number }).lines;
    return fail(`The file is not valid CSV${line ? ` near line ${line}` : ""}: ${(e as Error).message.split(":")[0]}.`);
  }
  const [header, ...data] = records;
  if (!header) return fail("The file has no header line.");
  const columns = header.map((h) => h.trim().toLowerCase());
  if (columns.length === 1 && /[;\t|]/.test(header[0] ?? "")) {
    return fail("The columns are separated by semicolons or tabs; use commas (export as \"CSV UTF-8 (comma delimited)\").");
  }
  const known = new Set(TANK_CSV_COLUMNS.map((c) => c.name));
  const unknown = columns.filter((c) => !known.has(c as never));
  const missing = TANK_CSV_COLUMNS.filter((c) => c.required && !columns.includes(c.name)).map((c) => c.name);
  const dupes = columns.filter((c, i) => columns.indexOf(c) !== i);
  const headerErrors = [
    ...(missing.length ? [`The header lacks the column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}.`] : []),
    ...(unknown.length ? [`The header has unknown column${unknown.length > 1 ? "s" : ""} ${unknown.join(", ")}; the columns are ${TANK_CSV_COLUMNS.map((c) => c.name).join(", ")}.`] : []),
    ...(dupes.length ? [`The header repeats ${[...new Set(dupes)].join(", ")}.`] : []),
  ];
  if (headerErrors.length) return { ok: false, fileErrors: headerErrors, rows: [] };
  if (data.length === 0) return fail("The file has a header but no tank rows.");
  if (data.length > TANK_CSV_MAX_ROWS) return fail(`The file has ${data.length} rows; at most ${TANK_CSV_MAX_ROWS} tanks can be imported at once.`);

  const schema = tankInputSchema(ctx.vessel);
  const seen = new Map<string, number>();
  const existing = new Set(ctx.existingCodes.map((c) => c.toLowerCase()));
  const rows: TCsvRow[] = data.map((cells, i) => {
    const line = i + 2;
    const errors: TCsvRow["errors"] = [];
    if (cells.length !== columns.length) errors.push({ column: "(row)", message: `has ${cells.length} values; the header has ${columns.length}` });
    const raw: Record<string, unknown> = {};
    columns.forEach((c, j) => {
      let value: string = cells[j] ?? "";
      if (c === "side") value = SIDE_LETTERS[value.toLowerCase()] ?? value.toLowerCase();
      if (c === "kind" || c === "coating_system") value = value.toLowerCase();
      if ((c === "at_waterline" || c === "at_collision_bulkhead") && !/^(yes|no|true|false|1|0|)$/i.test(value)) {
        errors.push({ column: c, message: "must be yes or no" });
      }
      raw[FIELD_OF[c]!] = c === "at_waterline" || c === "at_collision_bulkhead" ? /^(yes|true|1)$/i.test(value) : value;
    });
    const parsed = schema.safeParse(raw);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) errors.push({ column: COLUMN_OF[String(issue.path[0])] ?? "(row)", message: issue.message });
    }
    const code = String(raw.code ?? "").trim();
    if (code) {
      const key = code.toLowerCase();
      if (existing.has(key)) errors.push({ column: "code", message: `"${code}" is already a tank of this vessel` });
      if (seen.has(key)) errors.push({ column: "code", message: `"${code}" is also on line ${seen.get(key)}` });
      else seen.set(key, line);
    }
    return { line, code, input: errors.length ? undefined : parsed.data, errors };
  });
  return { ok: rows.every((r) => r.errors.length === 0), fileErrors: [], rows };
}
