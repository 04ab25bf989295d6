// Sharing countersigned reports with class against the running app: the office
// shares, the surveyor sees exactly what was shared (and nothing else), reads
// the signed PDF, acknowledges once; the office sees who acknowledged when.
import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { coatingAreas, inspections, memberships, reportShares, users } from "@/db/schema";
import { anonymousClient, signIn, trySignIn, type TClient } from "../fixtures/http";
import { waitForMail } from "../fixtures/mail";
import { buildScenario, PASSWORD, testDb, type TScenario } from "../fixtures/scenario";
import { storeSignedReport } from "../fixtures/signed-report";

let s: TScenario;
let superintendent: TClient;
let surveyor: TClient;
let otherSurveyor: TClient;
let officer: TClient;
let shared = "";
let notShared = "";
const pdfOf = (label: string) => Buffer.from(`%PDF-1.7\n% ${label}\n%%EOF\n`, "latin1");
type TErr = { error: { message: string; issues: { path: string }[] } };
type TMine = { shares: { shareId: string; vessel: string; sha256: string | null; acknowledgedAt: string | null; rating: string | null }[] };

/** A countersigned inspection with its signed PDF in storage, as the rendering job leaves it. */
async function countersigned(inspectionId: string, vesselId: string, label: string) {
  await storeSignedReport({ orgId: s.org.id, vesselId, inspectionId, pdf: pdfOf(label), label });
}

beforeAll(async () => {
  s = await buildScenario();
  shared = s.inspectionOf(s.ownVessel.id);
  notShared = s.inspectionOf(s.siblingVessel.id);
  await countersigned(shared, s.ownVessel.id, "shared");
  await countersigned(notShared, s.siblingVessel.id, "not-shared");
  [superintendent, surveyor, otherSurveyor, officer] = await Promise.all([
    signIn(s.users.superintendent.email, PASSWORD), signIn(s.users.surveyor.email, PASSWORD), signIn(s.spare.email, PASSWORD), signIn(s.users.officer.email, PASSWORD),
  ]);
});

describe("sharing a report with class", () => {
  it("refuses what it must: an officer (403), a draft (409), someone who is not a surveyor (400)", async () => {
    const body = { surveyorUserId: s.users.surveyor.id };
    expect((await officer.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: body })).status).toBe(403);
    const [draft] = await testDb().insert(inspections).values({ orgId: s.org.id, vesselId: s.ownVessel.id, tankId: s.tankOf(s.ownVessel.id).id, inspectedOn: "2026-11-25", placeKind: "port", place: "Test port", team: ["T"] }).returning();
    expect((await superintendent.request(`/api/v1/inspections/${draft!.id}/shares`, { method: "POST", json: body })).status).toBe(409);
    const notSurveyor = await superintendent.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: { surveyorUserId: s.users.officer.id } });
    expect(notSurveyor.status).toBe(400);
    expect(((await notSurveyor.json()) as TErr).error.issues[0]!.path).toBe("surveyorUserId");
    expect(await testDb().$count(reportShares, eq(reportShares.orgId, s.org.id))).toBe(0);
  });

  it("the superintendent shares one report; the surveyor is told by e-mail", async () => {
    const res = await superintendent.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: { surveyorUserId: s.users.surveyor.id } });
    expect(res.status).toBe(201);
    const mail = await waitForMail({ to: s.users.surveyor.email, subjectIncludes: s.ownVessel.name });
    expect(mail.text).toMatch(/\/shared/);
    // Sharing again changes nothing.
    expect(((await (await superintendent.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: { surveyorUserId: s.users.surveyor.id } })).json()) as { shared: boolean }).shared).toBe(false);
  });

  it("the surveyor sees exactly what was shared, reads its signed PDF, and nothing else", async () => {
    // The signed report's coating: shell plating 4 % breakdown is FAIR (3–20 %), the rest 1 % GOOD; the tank takes
    // its worst area (IMO MSC.1/Circ.1330 §4.1.3 Table 1), so the surveyor's list says FAIR.
    await testDb().insert(coatingAreas).values([
      { orgId: s.org.id, inspectionId: shared, area: "shell_plating", breakdownPct: 4, rustedPct: 0, hardScalePct: 0 },
      { orgId: s.org.id, inspectionId: shared, area: "bulkhead_plating", breakdownPct: 1, rustedPct: 0, hardScalePct: 0 },
    ]);
    const mine = (await (await surveyor.request("/api/v1/shares")).json()) as TMine;
    expect(mine.shares.map((x) => x.vessel)).toEqual([s.ownVessel.name]);
    const share = mine.shares[0]!;
    expect(share.rating).toBe("FAIR");
    expect(share.sha256).toBe(createHash("sha256").update(pdfOf("shared")).digest("hex"));
    const pdf = await surveyor.request(`/api/v1/shares/${share.shareId}/report`);
    expect(pdf.status).toBe(302);
    expect(Buffer.from(await (await fetch(pdf.headers.get("location")!)).arrayBuffer()).equals(pdfOf("shared"))).toBe(true);
    // The other report, the inspection itself, and another surveyor's view of this share: not found.
    expect((await surveyor.request(`/api/v1/inspections/${notShared}/signed-report`)).status).toBe(404);
    expect((await surveyor.request(`/api/v1/inspections/${shared}`)).status).toBe(404);
    expect((await otherSurveyor.request(`/api/v1/shares/${share.shareId}/report`)).status).toBe(404);
    expect(((await (await otherSurveyor.request("/api/v1/shares")).json()) as TMine).shares).toEqual([]);
    expect((await surveyor.request(`/api/v1/shares/${crypto.randomUUID()}/report`)).status).toBe(404);
  });

  it("the surveyor acknowledges once with a comment; the superintendent sees who and when", async () => {
    const { shares } = (await (await surveyor.request("/api/v1/shares")).json()) as TMine;
    const id = shares[0]!.shareId;
    expect((await otherSurveyor.request(`/api/v1/shares/${id}/acknowledge`, { method: "POST", json: {} })).status).toBe(404);
    const ack = await surveyor.request(`/api/v1/shares/${id}/acknowledge`, { method: "POST", json: { comment: "Received; to be reviewed at the annual survey." } });
    expect(ack.status).toBe(200);
    expect((await surveyor.request(`/api/v1/shares/${id}/acknowledge`, { method: "POST", json: {} })).status).toBe(409);
    const seen = (await (await superintendent.request(`/api/v1/inspections/${shared}/shares`)).json()) as { shares: { surveyorEmail: string; acknowledgedAt: string | null; acknowledgementComment: string | null }[] };
    expect(seen.shares).toHaveLength(1);
    expect(seen.shares[0]).toMatchObject({ surveyorEmail: s.users.surveyor.email, acknowledgementComment: "Received; to be reviewed at the annual survey." });
    expect(seen.shares[0]!.acknowledgedAt).not.toBeNull();
  });

  it("the superintendent withdraws the share; the surveyor no longer sees it", async () => {
    const { shares } = (await (await superintendent.request(`/api/v1/inspections/${shared}/shares`)).json()) as { shares: { id: string }[] };
    expect((await officer.request(`/api/v1/inspections/${shared}/shares/${shares[0]!.id}`, { method: "DELETE" })).status).toBe(403);
    expect((await superintendent.request(`/api/v1/inspections/${shared}/shares/${shares[0]!.id}`, { method: "DELETE" })).status).toBe(200);
    expect(((await (await surveyor.request("/api/v1/shares")).json()) as TMine).shares).toEqual([]);
  });

  it("invites a surveyor who has no account: the e-mail's link sets a password, and the report is waiting", async () => {
    const email = `new-surveyor-${s.run}@society.tankwright.test`;
    const res = await superintendent.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: { email, name: "New Surveyor" } });
    expect(res.status).toBe(201);
    expect(((await res.json()) as { invited: boolean }).invited).toBe(true);
    const user = (await testDb().query.users.findFirst({ where: eq(users.email, email) }))!;
    expect((await testDb().select().from(memberships).where(eq(memberships.userId, user.id))).map((m) => [m.orgId, m.role])).toEqual([[s.org.id, "surveyor"]]);
    const mail = await waitForMail({ to: email, subjectIncludes: "shared a ballast tank report" });
    const token = decodeURIComponent(mail.text.match(/reset-password\?token=([A-Za-z0-9_%-]+)/)![1]!);
    // No password works until the surveyor chooses one.
    expect((await trySignIn(email, "")).signedIn).toBe(false);
    // The link sets a first password, and says so (not "a new password").
    const html = await (await anonymousClient().request(`/reset-password?token=${encodeURIComponent(token)}`)).text();
    expect(html).toContain("Choose your password");
    expect(html).not.toContain("Choose a new password");
    const set = await anonymousClient().request("/api/v1/password-reset/confirm", { method: "POST", json: { token, password: "surveyor-chosen-password", passwordAgain: "surveyor-chosen-password" } });
    expect(set.status).toBe(200);
    expect(((await set.json()) as { message: string }).message).toBe("Your password is set. Sign in with it.");
    const invited = await signIn(email, "surveyor-chosen-password");
    expect(((await (await invited.request("/api/v1/shares")).json()) as TMine).shares.map((x) => x.vessel)).toEqual([s.ownVessel.name]);
  });

  it("refuses to invite an address whose account is not a surveyor's (400), and creates nothing", async () => {
    const before = await testDb().$count(reportShares, eq(reportShares.inspectionId, shared));
    const res = await superintendent.request(`/api/v1/inspections/${shared}/shares`, { method: "POST", json: { email: s.users.officer.email, name: "Test officer" } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as TErr).error.issues[0]!.path).toBe("email");
    expect(await testDb().$count(reportShares, eq(reportShares.inspectionId, shared))).toBe(before);
  });
});
