// The office's comments on a report or a finding: written by the superintendent
// (also on a signed report, which they do not change), read by the vessel's
// officer and master, who are told by e-mail; refused with a clear message otherwise.
import { eq } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { comments, findings, inspections } from "@/db/schema";
import { fillInspection } from "@/db/seed/complete-inspection";
import { signIn, type TClient } from "../fixtures/http";
import { waitForMail } from "../fixtures/mail";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";

let s: TScenario;
let superintendent: TClient;
let officer: TClient;
let master: TClient;
let inspectionId = "";
type TList = { comments: { body: string; findingNumber: number | null; authorName: string }[]; canComment: boolean };

beforeAll(async () => {
  s = await buildScenario();
  inspectionId = s.inspectionOf(s.ownVessel.id);
  await fillInspection(testDb(), { orgId: s.org.id, inspectionId, frameFrom: s.tankOf(s.ownVessel.id).frameFrom, testedAt: new Date("2026-11-20T08:00:00Z"), measuredBy: "T", standbyPerson: "T" });
  await testDb().update(inspections).set({ status: "countersigned", lockedAt: new Date() }).where(eq(inspections.id, inspectionId));
  [superintendent, officer, master] = await Promise.all([signIn(s.users.superintendent.email, PASSWORD), signIn(s.users.officer.email, PASSWORD), signIn(s.users.master.email, PASSWORD)]);
});

describe("comments from the office", () => {
  it("the superintendent comments on a finding of a signed report; the ship reads it and is told by e-mail", async () => {
    const [second] = await testDb().select().from(findings).where(eq(findings.inspectionId, inspectionId)).orderBy(findings.number).offset(1).limit(1);
    const version = (await testDb().query.inspections.findFirst({ where: eq(inspections.id, inspectionId) }))!.version;
    const res = await superintendent.request(`/api/v1/inspections/${inspectionId}/comments`, { method: "POST", json: { body: "Price this touch-up with the next docking's coating work.", findingId: second!.id } });
    expect(res.status).toBe(201);
    // The scenario's vessel has one officer and one master with addresses: two people told.
    expect(((await res.json()) as { notified: number }).notified).toBe(2);
    // The signed report itself is unchanged.
    expect((await testDb().query.inspections.findFirst({ where: eq(inspections.id, inspectionId) }))!.version).toBe(version);
    for (const reader of [officer, master]) {
      const list = (await (await reader.request(`/api/v1/inspections/${inspectionId}/comments`)).json()) as TList;
      expect(list.canComment).toBe(false);
      expect(list.comments.map((c) => [c.findingNumber, c.body])).toEqual([[2, "Price this touch-up with the next docking's coating work."]]);
    }
    for (const to of [s.users.officer.email, s.users.master.email]) {
      const mail = await waitForMail({ to, subjectIncludes: "Comment from the office" });
      expect(mail.text).toMatch(/finding 2 of the report/);
    }
  });

  it("refuses an officer (403), an empty comment (400), a finding of another report (400); nothing is stored", async () => {
    const before = await testDb().$count(comments, eq(comments.inspectionId, inspectionId));
    expect((await officer.request(`/api/v1/inspections/${inspectionId}/comments`, { method: "POST", json: { body: "An officer's note" } })).status).toBe(403);
    expect((await superintendent.request(`/api/v1/inspections/${inspectionId}/comments`, { method: "POST", json: { body: " " } })).status).toBe(400);
    const foreign = await superintendent.request(`/api/v1/inspections/${inspectionId}/comments`, { method: "POST", json: { body: "About another finding", findingId: randomUUID() } });
    expect(foreign.status).toBe(400);
    expect(await testDb().$count(comments, eq(comments.inspectionId, inspectionId))).toBe(before);
  });
});
