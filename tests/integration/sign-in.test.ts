import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { users } from "@/db/schema";
import { trySignIn } from "../fixtures/http";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
beforeAll(async () => {
  s = await buildScenario();
});

describe("sign-in", () => {
  it("accepts the right password and issues a session", async () => {
    const { signedIn } = await trySignIn(s.users.officer.email, PASSWORD);
    expect(signedIn).toBe(true);
  });

  it("gives the same refusal for a wrong password and for an unknown account", async () => {
    const wrong = await trySignIn(s.users.master.email, "not-the-password");
    const unknown = await trySignIn(`nobody-${s.run}@tests.tankwright.test`, "whatever-it-is");
    expect(wrong.signedIn).toBe(false);
    expect(unknown.signedIn).toBe(false);
    expect(new URL(wrong.url).searchParams.get("error")).toBe(new URL(unknown.url).searchParams.get("error"));
  });

  it("e-mail is matched without regard to case", async () => {
    const { signedIn } = await trySignIn(s.users.admin.email.toUpperCase(), PASSWORD);
    expect(signedIn).toBe(true);
  });

  it("after five failures in a row the account waits, even for the right password", async () => {
    const email = s.users.surveyor.email;
    for (let i = 0; i < 5; i++) expect((await trySignIn(email, `wrong-${i}`)).signedIn).toBe(false);
    const row = await testDb().query.users.findFirst({ where: eq(users.email, email) });
    expect(row!.failedSignIns).toBe(5);
    expect(row!.lockedUntil!.getTime()).toBeGreaterThan(Date.now() + 20_000);
    expect((await trySignIn(email, PASSWORD)).signedIn).toBe(false);

    // Once the wait is over the right password works again and the count starts afresh.
    await testDb().update(users).set({ lockedUntil: new Date(Date.now() - 1000) }).where(eq(users.email, email));
    expect((await trySignIn(email, PASSWORD)).signedIn).toBe(true);
    const after = await testDb().query.users.findFirst({ where: eq(users.email, email) });
    expect(after!.failedSignIns).toBe(0);
    expect(after!.lockedUntil).toBeNull();
  });

  it("a disabled account cannot sign in", async () => {
    await testDb().update(users).set({ disabledAt: new Date() }).where(eq(users.id, s.users.superintendent.id));
    expect((await trySignIn(s.users.superintendent.email, PASSWORD)).signedIn).toBe(false);
  });
});
