import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, specialFrames, tankMembers, tanks } from "@/db/schema";
import { signIn, type TClient } from "../fixtures/http";
import { pdfText } from "../fixtures/pdf";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let officer: TClient;
let master: TClient;
type TBody = { error?: { code: string; message: string; issues: { path: string }[] } } & Record<string, unknown>;

beforeAll(async () => {
  s = await buildScenario();
  officer = await signIn(s.users.officer.email, PASSWORD);
  master = await signIn(s.users.master.email, PASSWORD);
});

const tanksUrl = () => `/api/v1/vessels/${s.ownVessel.id}/tanks`;
const countTanks = () => testDb().$count(tanks, eq(tanks.vesselId, s.ownVessel.id));
const csv = (text: string) => ({ method: "POST", headers: { "content-type": "text/csv" }, body: text });
const HEADER = "code,name,side,kind,frame_from,frame_to,bottom_area_m2,at_waterline";

describe("CSV import of tanks", () => {
  it("a valid file: the preview writes nothing; the import writes every row", async () => {
    const file = `${HEADER}\nNo. 7 WBT P,No. 7 port,port,double_bottom,20,40,150,no\nNo. 7 WBT S,No. 7 starboard,starboard,double_bottom,20,40,150,no\n`;
    const before = await countTanks();
    const preview = await officer.request(`${tanksUrl()}/import`, csv(file));
    expect(preview.status).toBe(200);
    expect(((await preview.json()) as { ok: boolean }).ok).toBe(true);
    expect(await countTanks()).toBe(before);
    const commit = await officer.request(`${tanksUrl()}/import?commit=1`, csv(file));
    expect(commit.status).toBe(201);
    expect(((await commit.json()) as { created: number }).created).toBe(2);
    expect(await countTanks()).toBe(before + 2);
  });

  it("a file with one bad row: 422 with its line, and nothing written", async () => {
    const file = `${HEADER}\nNo. 8 WBT P,No. 8 port,port,double_bottom,41,60,150,no\nNo. 8 WBT S,No. 8 starboard,starboard,double_bottom,60,41,150,no\n`;
    const before = await countTanks();
    const res = await officer.request(`${tanksUrl()}/import?commit=1`, csv(file));
    expect(res.status).toBe(422);
    const body = (await res.json()) as { rows: { line: number; errors: { column: string }[] }[] };
    expect(body.rows.find((r) => r.line === 3)!.errors.map((e) => e.column)).toContain("frame_to");
    expect(await countTanks()).toBe(before);
  });

  it("a non-UTF-8 file, a wrong delimiter and 10 000 rows are refused without writing", async () => {
    const before = await countTanks();
    const latin1 = new Uint8Array([...new TextEncoder().encode(`${HEADER}\nA,Caf`), 0xe9, ...new TextEncoder().encode(",port,side,1,2,,no\n")]);
    const bad = await officer.request(`${tanksUrl()}/import?commit=1`, { method: "POST", headers: { "content-type": "text/csv" }, body: latin1 });
    expect(bad.status).toBe(422);
    expect(((await bad.json()) as { fileErrors: string[] }).fileErrors[0]).toMatch(/not UTF-8/);
    const semi = await officer.request(`${tanksUrl()}/import?commit=1`, csv("code;name;side;kind;frame_from;frame_to\nA;B;port;side;1;2\n"));
    expect(((await semi.json()) as { fileErrors: string[] }).fileErrors[0]).toMatch(/semicolons/);
    const many = Array.from({ length: 10_000 }, (_, i) => `T${i},Tank ${i},port,side,1,2,,no`).join("\n");
    const big = await officer.request(`${tanksUrl()}/import?commit=1`, csv(`${HEADER}\n${many}\n`));
    expect([413, 422]).toContain(big.status);
    expect(await countTanks()).toBe(before);
    // The server is still answering.
    expect((await officer.request(tanksUrl())).status).toBe(200);
  });

  it("another company's vessel → 404, and a surveyor may not import", async () => {
    const file = `${HEADER}\nX,X,port,side,1,2,,no\n`;
    expect((await officer.request(`/api/v1/vessels/${s.otherVessel.id}/tanks/import`, csv(file))).status).toBe(404);
    const surveyor = await signIn(s.users.surveyor.email, PASSWORD);
    expect((await surveyor.request(`${tanksUrl()}/import`, csv(file))).status).toBe(404);
  });
});

describe("tanks and their member catalogue", () => {
  let tankId = "";
  it("creates a tank; a duplicate code → 409 naming the field", async () => {
    const body = { code: "No. 9 WBT P", name: "No. 9 port", side: "port", kind: "double_bottom_side", frameFrom: 150, frameTo: 170, bottomAreaM2: 120, atWaterline: true };
    const res = await officer.request(tanksUrl(), { method: "POST", json: body });
    expect(res.status).toBe(201);
    tankId = ((await res.json()) as { tank: { id: string } }).tank.id;
    const again = await master.request(tanksUrl(), { method: "POST", json: body });
    expect(again.status).toBe(409);
    expect(((await again.json()) as TBody).error!.issues.map((i) => i.path)).toContain("code");
  });

  it("refuses reversed frames and frames outside the vessel, naming the field", async () => {
    const res = await officer.request(tanksUrl(), { method: "POST", json: { code: "Z", name: "Zed", side: "port", kind: "side", frameFrom: 190, frameTo: 250 } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TBody).error!.issues.map((i) => i.path)).toEqual(["frameTo"]);
  });

  it("adds members; an overlapping set or a number outside its set is refused", async () => {
    const url = `${tanksUrl()}/${tankId}/members`;
    expect((await officer.request(url, { method: "POST", json: { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 20, numberTo: 38 } })).status).toBe(201);
    expect((await officer.request(url, { method: "POST", json: { kind: "web_frame", frames: "154-166/4" } })).status).toBe(201);
    expect((await officer.request(url, { method: "POST", json: { kind: "stringer_deck", numberFrom: 1, numberTo: 3, numbering: "from_top" } })).status).toBe(201);
    const overlap = await officer.request(url, { method: "POST", json: { kind: "longitudinal", platingRegion: "side_shell", numberFrom: 30, numberTo: 44 } });
    expect(overlap.status).toBe(409);
    const outside = await officer.request(url, { method: "POST", json: { kind: "web_frame", frames: "146, 150" } });
    expect(outside.status).toBe(400);
    expect(((await outside.json()) as TBody).error!.issues.map((i) => i.path)).toEqual(["frames"]);
    const misfit = await officer.request(url, { method: "POST", json: { kind: "longitudinal", platingRegion: "main_deck", numberFrom: 1, numberTo: 9 } });
    expect(misfit.status).toBe(422);
    expect(((await misfit.json()) as TBody).error!.issues.map((i) => i.path)).toEqual(["platingRegion"]);
    const sf = await officer.request(`${tanksUrl()}/${tankId}/special-frames`, { method: "POST", json: { frame: 160, note: "Sounding pipe striker plate here" } });
    expect(sf.status).toBe(201);
    expect(await testDb().$count(tankMembers, eq(tankMembers.tankId, tankId))).toBe(3);
  });

  it("copy to the other side mirrors the definition and the catalogue", async () => {
    const res = await officer.request(`${tanksUrl()}/${tankId}/mirror`, { method: "POST" });
    expect(res.status).toBe(201);
    const twin = ((await res.json()) as { tank: { id: string; code: string; side: string; frameFrom: number } }).tank;
    expect(twin).toMatchObject({ code: "No. 9 WBT S", side: "starboard", frameFrom: 150 });
    expect(await testDb().$count(tankMembers, eq(tankMembers.tankId, twin.id))).toBe(3);
    expect(await testDb().$count(specialFrames, eq(specialFrames.tankId, twin.id))).toBe(1);
    expect((await officer.request(`${tanksUrl()}/${tankId}/mirror`, { method: "POST" })).status).toBe(409);
  });

  it("a shrunk frame range that would strand catalogued frames is refused", async () => {
    const res = await officer.request(`${tanksUrl()}/${tankId}`, {
      method: "PATCH",
      json: { code: "No. 9 WBT P", name: "No. 9 port", side: "port", kind: "double_bottom_side", frameFrom: 150, frameTo: 158 },
    });
    expect(res.status).toBe(409);
    const row = await testDb().query.tanks.findFirst({ where: eq(tanks.id, tankId) });
    expect(row!.frameTo).toBe(170);
  });

  it("writes are in the audit log", async () => {
    const rows = await testDb().select().from(auditLog).where(and(eq(auditLog.entity, "tank"), eq(auditLog.entityId, tankId)));
    expect(rows.map((r) => r.action)).toContain("create");
  });

  it("the brief PDF holds the tank code, its frames and its areas of concern", async () => {
    const res = await officer.request(`${tanksUrl()}/${tankId}/brief.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const text = await pdfText(new Uint8Array(await res.arrayBuffer()));
    expect(text).toContain("No. 9 WBT P");
    expect(text).toContain("Fr. 150–170");
    // Frames 150–170 of the scenario vessel (midship 60–140): outside midship; at the waterline by flag.
    expect(text).toContain("Contact damage at the waterline");
    expect(text).toContain("Coating at edges, welds and piping");
    expect(text).not.toContain("Bracket connections near deck and bottom");
    expect(text).toMatch(/enclosed-\s?space entry procedure/);
    expect(text).toMatch(/page 1 of \d/);
  });

  it("deleting the tank removes its catalogue; another vessel's tank id → 404", async () => {
    const other = await testDb().query.tanks.findFirst({ where: eq(tanks.vesselId, s.otherVessel.id) });
    expect((await officer.request(`${tanksUrl()}/${other!.id}`)).status).toBe(404);
    expect((await officer.request(`/api/v1/vessels/${s.otherVessel.id}/tanks/${other!.id}`)).status).toBe(404);
    expect((await officer.request(`${tanksUrl()}/${tankId}`, { method: "DELETE" })).status).toBe(200);
    expect(await testDb().$count(tankMembers, eq(tankMembers.tankId, tankId))).toBe(0);
  });
});
