// Password reset by e-mail against the running app and the local mail catcher:
// the link arrives, works once and within its hour, and the request never tells
// whether an address has an account.
import { createHash, randomBytes } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, passwordResetTokens, users } from "@/db/schema";
import { anonymousClient, signIn, trySignIn } from "../fixtures/http";
import { listMail, waitForMail } from "../fixtures/mail";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { testEnv } from "../fixtures/env";

type TError = { error: { code: string; message: string; issues: { path: string; message: string }[] } };

const SUBJECT = "choose a new password";
const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

let s: TScenario;
beforeAll(async () => {
  s = await buildScenario();
});

async function requestReset(email: string) {
  const res = await anonymousClient().request("/api/v1/password-reset", { method: "POST", json: { email } });
  return { status: res.status, body: (await res.json()) as { message: string } };
}

async function confirm(body: unknown) {
  const res = await anonymousClient().request("/api/v1/password-reset/confirm", { method: "POST", json: body });
  return { status: res.status, body: (await res.json()) as TError & { message?: string } };
}

/** Asks for a link and reads its token from the e-mail that arrives. */
async function linkFor(email: string, seen: string[] = []) {
  expect((await requestReset(email)).status).toBe(200);
  const mail = await waitForMail({ to: email, subjectIncludes: SUBJECT, excludeIds: seen });
  const match = /\/reset-password\?token=([A-Za-z0-9_-]{43})\b/.exec(mail.text);
  expect(match, mail.text).not.toBeNull();
  return { mail, token: match![1]!, link: match![0] };
}

async function page(token: string) {
  const res = await anonymousClient().request(`/reset-password?token=${encodeURIComponent(token)}`);
  return { status: res.status, html: await res.text() };
}

async function tokenRows(userId: string) {
  return testDb().select().from(passwordResetTokens).where(eq(passwordResetTokens.userId, userId));
}

describe("password reset by e-mail", () => {
  it("the link in the e-mail sets a new password once; then the new password signs in and the old one does not", async () => {
    const user = s.users.officer;
    // Someone who has signed in before forgets the password (a never-used account is told "Choose your password").
    expect((await trySignIn(user.email, PASSWORD)).signedIn).toBe(true);
    const { mail, token } = await linkFor(user.email);
    expect(mail.text).toContain(`${testEnv().baseUrl}/reset-password?token=${token}`);
    expect(mail.html).toContain(`/reset-password?token=${token}`);
    // No remote images or fonts in the HTML body.
    expect(mail.html).not.toMatch(/<img|@import|@font-face|url\(/i);

    // Only the SHA-256 of the token is stored, and it expires after one hour (common practice for reset links).
    const [row] = await tokenRows(user.id);
    expect(row!.tokenHash).toBe(sha256(token));
    expect(JSON.stringify(await tokenRows(user.id))).not.toContain(token);
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeGreaterThan(3600_000 - 5_000);
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeLessThanOrEqual(3600_000 + 5_000);

    const form = await page(token);
    expect(form.status).toBe(200);
    expect(form.html).toContain("Type the new password twice");
    expect(form.html).toContain(user.email);

    // The new password follows the account rules and is typed twice; a refusal changes nothing.
    const short = await confirm({ token, password: "too-short", passwordAgain: "too-short" });
    expect(short.status).toBe(400);
    expect(short.body.error.issues.map((i) => i.path)).toContain("password");
    const mismatch = await confirm({ token, password: "new-harbour-lantern-42", passwordAgain: "new-harbour-lantern-43" });
    expect(mismatch.status).toBe(400);
    expect(mismatch.body.error.issues.map((i) => i.path)).toEqual(["passwordAgain"]);
    expect((await tokenRows(user.id))[0]!.usedAt).toBeNull();

    const ok = await confirm({ token, password: "new-harbour-lantern-42", passwordAgain: "new-harbour-lantern-42" });
    expect(ok.status).toBe(200);
    expect(ok.body.message).toMatch(/password has been changed/);
    expect((await trySignIn(user.email, PASSWORD)).signedIn).toBe(false);
    expect((await trySignIn(user.email, "new-harbour-lantern-42")).signedIn).toBe(true);

    // The same link again: refused, the password stays as set.
    const again = await confirm({ token, password: "another-password-99", passwordAgain: "another-password-99" });
    expect(again.status).toBe(400);
    expect(again.body.error.message).toMatch(/already used/);
    expect((await trySignIn(user.email, "another-password-99")).signedIn).toBe(false);
    expect((await trySignIn(user.email, "new-harbour-lantern-42")).signedIn).toBe(true);
    expect((await page(token)).html).toContain("already used");

    const audit = await testDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entity, "user"), eq(auditLog.entityId, user.id), eq(auditLog.action, "password_reset")));
    expect(audit).toHaveLength(1);
    expect(audit[0]!.orgId).toBe(s.org.id);
    expect(audit[0]!.actorUserId).toBe(user.id);
  });

  it("a session signed in before the reset is ended; one signed in after it works (a lost or exposed password is shut out)", async () => {
    const user = s.otherAdmin; // an account no other test here resets
    const before = await signIn(user.email, PASSWORD);
    expect((await before.request("/api/v1/vessels")).status).toBe(200);
    const pageBefore = await before.request("/fleet", { redirect: "manual" });
    expect(pageBefore.status).toBe(200);

    await sleep(5); // the reset is stamped after the sign-in, to the millisecond
    const { token } = await linkFor(user.email);
    expect((await confirm({ token, password: "quay-side-lantern-77", passwordAgain: "quay-side-lantern-77" })).status).toBe(200);

    const refused = await before.request("/api/v1/vessels");
    expect(refused.status).toBe(401);
    expect(((await refused.json()) as TError).error.message).toMatch(/password was changed\): sign in again\.$/);
    const pageAfter = await before.request("/fleet", { redirect: "manual" });
    expect(pageAfter.status).toBe(307);
    expect(pageAfter.headers.get("location")).toContain("/sign-in");

    const after = await signIn(user.email, "quay-side-lantern-77");
    expect((await after.request("/api/v1/vessels")).status).toBe(200);
  });

  it("an expired link is refused with its reason and changes nothing", async () => {
    const user = s.users.master;
    const { token } = await linkFor(user.email);
    await testDb().update(passwordResetTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(passwordResetTokens.tokenHash, sha256(token)));
    const res = await confirm({ token, password: "late-but-long-enough", passwordAgain: "late-but-long-enough" });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired/);
    expect((await page(token)).html).toContain("has expired");
    expect((await trySignIn(user.email, PASSWORD)).signedIn).toBe(true);
    expect((await trySignIn(user.email, "late-but-long-enough")).signedIn).toBe(false);
  });

  it("a forged or mangled token is refused with the same message and changes nothing", async () => {
    for (const token of [randomBytes(32).toString("base64url"), "abc", "", "x".repeat(43) + "'--"]) {
      const res = await confirm({ token, password: "forged-attempt-0001", passwordAgain: "forged-attempt-0001" });
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(/not valid/);
      expect((await page(token)).html).toContain("not valid");
    }
    expect((await confirm("not an object")).status).toBe(400);
    expect((await trySignIn(s.users.admin.email, PASSWORD)).signedIn).toBe(true);
  });

  it("a newer link replaces the older one", async () => {
    const user = s.users.admin;
    const first = await linkFor(user.email);
    const second = await linkFor(user.email, [first.mail.id]);
    expect(second.token).not.toBe(first.token);
    const old = await confirm({ token: first.token, password: "from-the-old-link-1", passwordAgain: "from-the-old-link-1" });
    expect(old.status).toBe(400);
    expect(old.body.error.message).toMatch(/newer link replaced it/);
    const res = await confirm({ token: second.token, password: "from-the-new-link-2", passwordAgain: "from-the-new-link-2" });
    expect(res.status).toBe(200);
    expect((await trySignIn(user.email, "from-the-new-link-2")).signedIn).toBe(true);
  });

  it("an unknown or disabled address gets the same answer as a known one, and no e-mail", async () => {
    const unknown = `nobody-${s.run}@tests.tankwright.test`;
    await testDb().update(users).set({ disabledAt: new Date() }).where(eq(users.id, s.spare.id));
    const known = s.users.superintendent.email;
    const answers = [await requestReset(unknown), await requestReset(s.spare.email), await requestReset(known)];
    expect(answers[0]).toEqual(answers[2]);
    expect(answers[1]).toEqual(answers[2]);
    expect(answers[0]!.status).toBe(200);
    // The known address's mail arrives; by then the others would have too.
    await waitForMail({ to: known, subjectIncludes: SUBJECT });
    await sleep(500);
    expect(await listMail({ to: unknown })).toEqual([]);
    expect(await listMail({ to: s.spare.email })).toEqual([]);
    expect(await tokenRows(s.spare.id)).toEqual([]);
  });

  it("a malformed address is refused as such (which reveals nothing about accounts)", async () => {
    const res = await anonymousClient().request("/api/v1/password-reset", { method: "POST", json: { email: "not-an-address" } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TError).error.issues.map((i) => i.path)).toEqual(["email"]);
  });

  it("more than three requests within 15 minutes for one address are quietly ignored", async () => {
    const email = s.users.surveyor.email;
    const answers = [];
    for (let i = 0; i < 5; i++) answers.push(await requestReset(email));
    for (const a of answers) expect(a).toEqual(answers[0]);
    const until = Date.now() + 15_000;
    while ((await listMail({ to: email, subjectIncludes: SUBJECT })).length < 3 && Date.now() < until) await sleep(250);
    await sleep(1000);
    expect(await listMail({ to: email, subjectIncludes: SUBJECT })).toHaveLength(3);
    expect(await tokenRows(s.users.surveyor.id)).toHaveLength(3);
  });

  it("the sign-in page links to the request page", async () => {
    const signIn = await (await anonymousClient().request("/sign-in")).text();
    expect(signIn).toContain('href="/forgot-password"');
    const res = await anonymousClient().request("/forgot-password");
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("Forgot your password?");
  });
});
