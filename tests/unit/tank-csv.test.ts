import { describe, expect, it } from "vitest";
import { parseTankCsv, TANK_CSV_MAX_ROWS } from "@/lib/structure/tank-csv";

const ctx = { vessel: { frameFirst: 0, frameLast: 230 }, existingCodes: ["FPT"] };
const bytes = (text: string) => new TextEncoder().encode(text);
const HEADER = "code,name,side,kind,frame_from,frame_to,bottom_area_m2,at_waterline";

describe("tank CSV", () => {
  it("reads a valid file, with a BOM, P/S letters and yes/no", () => {
    const r = parseTankCsv(bytes(`\uFEFF${HEADER}\nNo. 5 WBT P,No. 5 port,P,double_bottom_side,62,82,168,yes\nNo. 5 WBT S,No. 5 starboard,starboard,DOUBLE_BOTTOM_SIDE,62,82,168,no\n`), ctx);
    expect(r.ok).toBe(true);
    expect(r.rows.map((row) => row.input)).toMatchObject([
      { code: "No. 5 WBT P", side: "port", frameFrom: 62, atWaterline: true },
      { code: "No. 5 WBT S", side: "starboard", kind: "double_bottom_side", atWaterline: false },
    ]);
  });

  it("lists every bad row with its line number and column", () => {
    const r = parseTankCsv(bytes(`${HEADER}\nA,Tank A,port,side,10,20,,no\nB,Tank B,aft,side,30,20,,maybe\nFPT,Again,centre,fore_peak,215,230,,no\nA,Twice,port,side,40,50,,no\n`), ctx);
    expect(r.ok).toBe(false);
    expect(r.rows[0]!.errors).toEqual([]);
    const line3 = r.rows.find((row) => row.line === 3)!;
    expect(line3.errors.map((e) => e.column).sort()).toEqual(["at_waterline", "frame_to", "side"]);
    expect(r.rows.find((row) => row.line === 4)!.errors[0]!.message).toMatch(/already a tank of this vessel/);
    expect(r.rows.find((row) => row.line === 5)!.errors[0]!.message).toMatch(/also on line 2/);
  });

  it("refuses a wrong header, naming the missing and unknown columns", () => {
    const r = parseTankCsv(bytes("code,name,side,type,from,to\nA,B,port,side,1,2\n"), ctx);
    expect(r.ok).toBe(false);
    expect(r.fileErrors.join(" ")).toMatch(/lacks the columns kind, frame_from, frame_to/);
    expect(r.fileErrors.join(" ")).toMatch(/unknown columns type, from, to/);
  });

  it("recognises a semicolon-separated file", () => {
    const r = parseTankCsv(bytes("code;name;side;kind;frame_from;frame_to\nA;B;port;side;1;2\n"), ctx);
    expect(r.fileErrors[0]).toMatch(/semicolons or tabs; use commas/);
  });

  it("refuses a byte that is not UTF-8, with its line", () => {
    const latin1 = new Uint8Array([...bytes(`${HEADER}\nA,Tank `), 0xe9, ...bytes(",port,side,1,2,,no\n")]);
    const r = parseTankCsv(latin1, ctx);
    expect(r.fileErrors[0]).toMatch(/not UTF-8 text \(a byte on line 2 is not\)/);
  });

  it("refuses 10 000 rows without reading them as tanks", () => {
    const rows = Array.from({ length: 10_000 }, (_, i) => `T${i},Tank ${i},port,side,1,2,,no`).join("\n");
    const r = parseTankCsv(bytes(`${HEADER}\n${rows}\n`), ctx);
    expect(r.ok).toBe(false);
    expect(r.fileErrors[0]).toMatch(/larger than|at most/);
    expect(r.rows).toEqual([]);
    expect(TANK_CSV_MAX_ROWS).toBeLessThan(10_000);
  });

  it("an empty file, a header alone, and broken quoting each get a message", () => {
    expect(parseTankCsv(new Uint8Array(), ctx).fileErrors[0]).toMatch(/empty/);
    expect(parseTankCsv(bytes(`${HEADER}\n`), ctx).fileErrors[0]).toMatch(/no tank rows/);
    expect(parseTankCsv(bytes(`${HEADER}\n"A,B,port,side,1,2,,no\n`), ctx).fileErrors[0]).toMatch(/not valid CSV/);
  });
});
