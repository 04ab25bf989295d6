// A vessel's report recipients through the API: the office keeps the list, the
// ship reads it, another company's vessel does not exist for the caller.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { listRecipientsForDelivery } from "@/db/queries/recipients";
import { auditLog, vesselRecipients } from "@/db/schema";
import { RECIPIENTS_PER_VESSEL } from "@/lib/schemas/recipient";
import { signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

type TRecipient = { id: string; kind: "office" | "class"; name: string | null; email: string };
type TError = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

let s: TScenario;
let superintendent: TClient;
let admin: TClient;
let officer: TClient;
let master: TClient;
let otherAdmin: TClient;
const base = (vesselId: string) => `/api/v1/vessels/${vesselId}/recipients`;

async function add(client: TClient, vesselId: string, body: unknown) {
  return client.request(base(vesselId), { method: "POST", json: body });
}

beforeAll(async () => {
  s = await buildScenario();
  [superintendent, admin, officer, master, otherAdmin] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD),
    signIn(s.users.admin.email, PASSWORD),
    signIn(s.users.officer.email, PASSWORD),
    signIn(s.users.master.email, PASSWORD),
    signIn(s.otherAdmin.email, PASSWORD),
  ]);
});

describe("vessel recipients", () => {
  let office: TRecipient;

  it("the superintendent adds an office address, kept in lower case, with an audit-log row", async () => {
    const res = await add(superintendent, s.ownVessel.id, { kind: "office", name: "  Technical department ", email: " Technical@Own-Co.test " });
    expect(res.status).toBe(201);
    office = ((await res.json()) as { recipient: TRecipient }).recipient;
    expect(office).toMatchObject({ kind: "office", name: "Technical department", email: "technical@own-co.test" });
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entity, "vessel_recipient"), eq(auditLog.entityId, office.id)));
    expect(audit.map((a) => [a.action, a.actorUserId])).toEqual([["create", s.users.superintendent.id]]);
  });

  it("the admin adds a class address without a name", async () => {
    const res = await add(admin, s.ownVessel.id, { kind: "class", name: "", email: "survey@class-station.test" });
    expect(res.status).toBe(201);
    expect(((await res.json()) as { recipient: TRecipient }).recipient).toMatchObject({ kind: "class", name: null });
  });

  it("the vessel's officer and master read the list (office first) but may not change it", async () => {
    for (const client of [officer, master]) {
      const res = await client.request(base(s.ownVessel.id));
      expect(res.status).toBe(200);
      const body = (await res.json()) as { recipients: TRecipient[]; canEdit: boolean };
      expect(body.recipients.map((r) => r.email)).toEqual(["technical@own-co.test", "survey@class-station.test"]);
      expect(body.canEdit).toBe(false);
    }
    const sup = (await (await superintendent.request(base(s.ownVessel.id))).json()) as { canEdit: boolean };
    expect(sup.canEdit).toBe(true);
  });

  it("the same address twice on one vessel is refused with 409, whatever its case", async () => {
    const res = await add(admin, s.ownVessel.id, { kind: "class", email: "TECHNICAL@own-co.test" });
    expect(res.status).toBe(409);
    const body = (await res.json()) as TError;
    expect(body.error.message).toBe("technical@own-co.test is already a recipient of this vessel.");
    expect(body.error.issues).toEqual([{ path: "email", message: "is already a recipient of this vessel" }]);
  });

  it("the same address on another vessel of the company is fine", async () => {
    expect((await add(admin, s.siblingVessel.id, { kind: "office", email: "technical@own-co.test" })).status).toBe(201);
  });

  it("a malformed e-mail, an unknown kind and a long name are 400 naming each field", async () => {
    const res = await add(superintendent, s.ownVessel.id, { kind: "owner", name: "x".repeat(121), email: "technical at own-co" });
    expect(res.status).toBe(400);
    const body = (await res.json()) as TError;
    expect(body.error.issues.map((i) => i.path).sort()).toEqual(["email", "kind", "name"]);
    const missing = (await (await add(superintendent, s.ownVessel.id, { kind: "office" })).json()) as TError;
    expect(missing.error.issues).toEqual([{ path: "email", message: "is required" }]);
  });

  it("an officer or master may not add, edit or remove (403)", async () => {
    for (const client of [officer, master]) {
      expect((await add(client, s.ownVessel.id, { kind: "office", email: "ship@own-co.test" })).status).toBe(403);
      expect((await client.request(`${base(s.ownVessel.id)}/${office.id}`, { method: "PUT", json: { kind: "class", email: "x@own-co.test" } })).status).toBe(403);
      expect((await client.request(`${base(s.ownVessel.id)}/${office.id}`, { method: "DELETE" })).status).toBe(403);
    }
    // A refused caller learns nothing from validation: 403 before the body is judged.
    expect((await add(officer, s.ownVessel.id, { kind: "nonsense" })).status).toBe(403);
  });

  it("another company's vessel does not exist for the caller (404), and nothing is written", async () => {
    expect((await add(otherAdmin, s.ownVessel.id, { kind: "office", email: "intruder@other-co.test" })).status).toBe(404);
    expect((await otherAdmin.request(base(s.ownVessel.id))).status).toBe(404);
    expect((await otherAdmin.request(`${base(s.ownVessel.id)}/${office.id}`, { method: "DELETE" })).status).toBe(404);
    expect((await add(admin, s.otherVessel.id, { kind: "office", email: "intruder@own-co.test" })).status).toBe(404);
    expect(await testDb().$count(vesselRecipients, eq(vesselRecipients.email, "intruder@other-co.test"))).toBe(0);
  });

  it("a recipient is reached only through its own vessel", async () => {
    const res = await admin.request(`${base(s.siblingVessel.id)}/${office.id}`, { method: "PUT", json: { kind: "class", email: "moved@own-co.test" } });
    expect(res.status).toBe(404);
    expect((await admin.request(`${base(s.ownVessel.id)}/not-an-id`, { method: "DELETE" })).status).toBe(404);
  });

  it("the office edits a recipient; a clash with another address on the vessel is 409", async () => {
    const res = await superintendent.request(`${base(s.ownVessel.id)}/${office.id}`, { method: "PUT", json: { kind: "office", name: "Fleet technical", email: "Fleet@Own-Co.test" } });
    expect(res.status).toBe(200);
    expect(((await res.json()) as { recipient: TRecipient }).recipient).toMatchObject({ id: office.id, name: "Fleet technical", email: "fleet@own-co.test" });
    const clash = await superintendent.request(`${base(s.ownVessel.id)}/${office.id}`, { method: "PUT", json: { kind: "office", email: "survey@class-station.test" } });
    expect(clash.status).toBe(409);
  });

  it("the delivery job reads the vessel's addresses, scoped to its company", async () => {
    const own = await listRecipientsForDelivery({ orgId: s.org.id, vesselId: s.ownVessel.id });
    expect(own.map((r) => r.email)).toEqual(["fleet@own-co.test", "survey@class-station.test"]);
    expect(await listRecipientsForDelivery({ orgId: s.otherOrg.id, vesselId: s.ownVessel.id })).toEqual([]);
  });

  it("the office removes a recipient; removing it again is 404", async () => {
    const url = `${base(s.ownVessel.id)}/${office.id}`;
    expect((await admin.request(url, { method: "DELETE" })).status).toBe(200);
    expect((await admin.request(url, { method: "DELETE" })).status).toBe(404);
    const list = (await (await officer.request(base(s.ownVessel.id))).json()) as { recipients: TRecipient[] };
    expect(list.recipients.map((r) => r.email)).toEqual(["survey@class-station.test"]);
    expect(await testDb().$count(auditLog, and(eq(auditLog.entityId, office.id), eq(auditLog.action, "delete")))).toBe(1);
  });

  it(`a vessel keeps at most ${RECIPIENTS_PER_VESSEL} recipients, even when additions arrive at the same moment`, async () => {
    // The sibling vessel has one recipient from above; 25 more are sent at once.
    const results = await Promise.all(
      Array.from({ length: 25 }, (_, i) => add(superintendent, s.siblingVessel.id, { kind: i % 2 ? "class" : "office", email: `crowd-${i}@own-co.test` })),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((c) => c === 201).length).toBe(RECIPIENTS_PER_VESSEL - 1);
    expect(statuses.filter((c) => c === 409).length).toBe(25 - (RECIPIENTS_PER_VESSEL - 1));
    expect(await testDb().$count(vesselRecipients, eq(vesselRecipients.vesselId, s.siblingVessel.id))).toBe(RECIPIENTS_PER_VESSEL);
    const refused = (await (await add(superintendent, s.siblingVessel.id, { kind: "office", email: "one-more@own-co.test" })).json()) as TError;
    expect(refused.error.message).toBe(`This vessel already has ${RECIPIENTS_PER_VESSEL} recipients, the most it can have; remove one first.`);
  });
});
