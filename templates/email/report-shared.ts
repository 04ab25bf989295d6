// The notice to a class surveyor that a countersigned report was shared with them.
import { escapeHtml as esc } from "./escape";

export function reportSharedEmail(m: { company: string; vesselName: string; tankCode: string; inspectedOn: string; revision: number; url: string; sharedBy: string }) {
  const subject = `Report shared with you: ${m.vesselName}, tank ${m.tankCode}, ${m.inspectedOn}, revision ${m.revision}`;
  const text = [
    `${m.sharedBy} of ${m.company} shared a countersigned ballast tank report with you:`,
    `${m.vesselName}, tank ${m.tankCode}, inspected on ${m.inspectedOn}, revision ${m.revision}.`,
    "",
    `Read it and acknowledge it here (sign in first): ${m.url}`,
    "",
    "Sent by Tankwright. Do not reply to this address.",
  ].join("\n");
  const html = `<!doctype html><html><body style="font-family: sans-serif; line-height: 1.4">
<p>${esc(m.sharedBy)} of ${esc(m.company)} shared a countersigned ballast tank report with you: <strong>${esc(m.vesselName)}</strong>, tank ${esc(m.tankCode)}, inspected on ${esc(m.inspectedOn)}, revision ${m.revision}.</p>
<p><a href="${esc(m.url)}">Read it and acknowledge it</a> (sign in first).</p>
<p style="color:#555">Sent by Tankwright. Do not reply to this address.</p></body></html>`;
  return { subject, text, html };
}

/** An invitation to a class surveyor who has no account yet: a report is waiting, and a link to choose a password. */
export function surveyorInvitationEmail(m: { company: string; invitedBy: string; name: string; link: string; vesselName: string; tankCode: string }) {
  const subject = `${m.company} shared a ballast tank report with you in Tankwright`;
  const text = [
    `Dear ${m.name},`,
    "",
    `${m.invitedBy} of ${m.company} shared a countersigned ballast tank report with you (${m.vesselName}, tank ${m.tankCode}) and invited you to Tankwright to read it.`,
    "",
    `Choose your password here (the link works once, for 7 days): ${m.link}`,
    "Then sign in with this e-mail address: the report is under \"Reports shared with you\".",
    "",
    "Sent by Tankwright. Do not reply to this address.",
  ].join("\n");
  const html = `<!doctype html><html><body style="font-family: sans-serif; line-height: 1.4">
<p>Dear ${esc(m.name)},</p>
<p>${esc(m.invitedBy)} of ${esc(m.company)} shared a countersigned ballast tank report with you (${esc(m.vesselName)}, tank ${esc(m.tankCode)}) and invited you to Tankwright to read it.</p>
<p><a href="${esc(m.link)}">Choose your password</a> (the link works once, for 7 days), then sign in with this e-mail address: the report is under "Reports shared with you".</p>
<p style="color:#555">Sent by Tankwright. Do not reply to this address.</p></body></html>`;
  return { subject, text, html };
}
