// Personal API tokens: made by an admin or superintendent for themselves, shown once,
// stored as SHA-256 only, sent as `Authorization: Bearer tw_…`, acting with the
// owner's current roles; revoked, forged or malformed tokens are refused with 401.
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { apiTokens, auditLog, users } from "@/db/schema";
import { insertMembership, insertUser } from "@/db/seed/builders";
import { anonymousClient, signIn, type TClient } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

type TError = { error: { code: string; message: string } };
type TCreated = { apiToken: { id: string; name: string; createdAt: string; lastUsedAt: string | null; revokedAt: string | null }; token: string };

let s: TScenario;
let superintendent: TClient;
let admin: TClient;
let officer: TClient;
const anonymous = anonymousClient();
const sha256 = (text: string) => createHash("sha256").update(text, "utf8").digest("hex");
const bearer = (token: string, path: string, init: RequestInit & { json?: unknown } = {}) =>
  anonymous.request(path, { ...init, headers: { ...(init.headers as Record<string, string>), authorization: `Bearer ${token}` } });

async function createToken(client: TClient, name: string): Promise<TCreated> {
  const res = await client.request("/api/v1/me/tokens", { method: "POST", json: { name } });
  expect(res.status).toBe(201);
  return (await res.json()) as TCreated;
}

beforeAll(async () => {
  s = await buildScenario();
  [superintendent, admin, officer] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD),
    signIn(s.users.admin.email, PASSWORD),
    signIn(s.users.officer.email, PASSWORD),
  ]);
});

describe("personal API tokens", () => {
  let created: TCreated;

  it("creates a token, shows it once and stores only its SHA-256, with an audit-log row", async () => {
    created = await createToken(superintendent, "  Planned maintenance system ");
    expect(created.token).toMatch(/^tw_[A-Za-z0-9_-]{43}$/);
    expect(created.apiToken.name).toBe("Planned maintenance system");
    const [row] = await testDb().select().from(apiTokens).where(eq(apiTokens.id, created.apiToken.id));
    expect(row!.tokenHash).toBe(sha256(created.token));
    expect(JSON.stringify(row)).not.toContain(created.token.slice(3));
    expect(row!.userId).toBe(s.users.superintendent.id);
    expect(row!.orgId).toBe(s.org.id);
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, created.apiToken.id), eq(auditLog.action, "api_token_created")));
    expect(audit).toHaveLength(1);

    const list = (await (await superintendent.request("/api/v1/me/tokens")).json()) as { tokens: Record<string, unknown>[] };
    expect(list.tokens.map((t) => t.id)).toContain(created.apiToken.id);
    expect(JSON.stringify(list)).not.toContain(created.token);
    expect(list.tokens[0]).not.toHaveProperty("tokenHash");
  });

  it("refuses a blank name with 400 naming the field", async () => {
    const res = await superintendent.request("/api/v1/me/tokens", { method: "POST", json: { name: "  " } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TError).error.message).toContain("name");
  });

  it("a Bearer token lists vessels with its owner's rights, and marks the token used at most once a minute", async () => {
    const res = await bearer(created.token, "/api/v1/vessels");
    expect(res.status).toBe(200);
    const ids = ((await res.json()) as { vessels: { id: string }[] }).vessels.map((v) => v.id);
    expect(ids).toEqual(expect.arrayContaining([s.ownVessel.id, s.siblingVessel.id]));
    expect(ids).not.toContain(s.otherVessel.id);
    expect((await bearer(created.token, `/api/v1/vessels/${s.otherVessel.id}`)).status).toBe(404);
    // Creating a vessel is for admins: the superintendent's token may not either.
    expect((await bearer(created.token, "/api/v1/vessels", { method: "POST", json: {} })).status).toBe(403);
    const me = (await (await bearer(created.token, "/api/v1/me")).json()) as { user: { id: string } };
    expect(me.user.id).toBe(s.users.superintendent.id);

    const [first] = await testDb().select().from(apiTokens).where(eq(apiTokens.id, created.apiToken.id));
    expect(first!.lastUsedAt).not.toBeNull();
    await bearer(created.token, "/api/v1/vessels");
    const [second] = await testDb().select().from(apiTokens).where(eq(apiTokens.id, created.apiToken.id));
    expect(second!.lastUsedAt!.getTime()).toBe(first!.lastUsedAt!.getTime());
  });

  it("a token cannot manage tokens: that needs a signed-in session", async () => {
    const res = await bearer(created.token, "/api/v1/me/tokens", { method: "POST", json: { name: "Another" } });
    expect(res.status).toBe(403);
    expect(((await res.json()) as TError).error.message).toMatch(/signed in/);
  });

  it("an officer cannot create tokens (403), nor list them", async () => {
    const res = await officer.request("/api/v1/me/tokens", { method: "POST", json: { name: "Mine" } });
    expect(res.status).toBe(403);
    expect((await officer.request("/api/v1/me/tokens")).status).toBe(403);
  });

  it("another user's token id is 404 and stays active", async () => {
    const res = await admin.request(`/api/v1/me/tokens/${created.apiToken.id}`, { method: "DELETE" });
    expect(res.status).toBe(404);
    expect((await admin.request("/api/v1/me/tokens/not-a-uuid", { method: "DELETE" })).status).toBe(404);
    expect((await bearer(created.token, "/api/v1/vessels")).status).toBe(200);
  });

  it("a revoked token is refused with 401 and a clear message; the revocation is audited", async () => {
    const res = await superintendent.request(`/api/v1/me/tokens/${created.apiToken.id}`, { method: "DELETE" });
    expect(res.status).toBe(200);
    expect(((await res.json()) as { token: { revokedAt: string | null } }).token.revokedAt).not.toBeNull();
    const refused = await bearer(created.token, "/api/v1/vessels");
    expect(refused.status).toBe(401);
    expect(((await refused.json()) as TError).error.message).toMatch(/revoked/);
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, created.apiToken.id), eq(auditLog.action, "api_token_revoked")));
    expect(audit).toHaveLength(1);
  });

  it("a forged or malformed token is 401 with a clear message", async () => {
    const forged = `tw_${"A".repeat(43)}`;
    const unknown = await bearer(forged, "/api/v1/vessels");
    expect(unknown.status).toBe(401);
    expect(((await unknown.json()) as TError).error.message).toMatch(/not known/);
    const malformed = await anonymous.request("/api/v1/vessels", { headers: { authorization: "Bearer not-a-token" } });
    expect(malformed.status).toBe(401);
    expect(((await malformed.json()) as TError).error.message).toMatch(/Bearer tw_/);
    const basic = await anonymous.request("/api/v1/vessels", { headers: { authorization: "Basic dXNlcjpwYXNz" } });
    expect(basic.status).toBe(401);
  });

  it("the token of a disabled owner is 401", async () => {
    const db = testDb();
    const u = await insertUser(db, { email: `token-owner-${s.run}@tests.tankwright.test`, name: "Token owner", password: PASSWORD });
    await insertMembership(db, { orgId: s.org.id, userId: u.id, role: "admin" });
    const { token } = await createToken(await signIn(u.email, PASSWORD), "Soon disabled");
    expect((await bearer(token, "/api/v1/vessels")).status).toBe(200);
    await db.update(users).set({ disabledAt: new Date() }).where(eq(users.id, u.id));
    const res = await bearer(token, "/api/v1/vessels");
    expect(res.status).toBe(401);
    expect(((await res.json()) as TError).error.message).toMatch(/disabled/);
  });
});
