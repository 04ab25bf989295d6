// The notice to a vessel's officers and master that the office commented on a report.
import { escapeHtml as esc } from "./escape";

export function commentNoticeEmail(m: { author: string; vesselName: string; tankCode: string; inspectedOn: string; findingNumber: number | null; body: string; url: string }) {
  const about = m.findingNumber ? `finding ${m.findingNumber} of the report` : "the report";
  const subject = `Comment from the office: ${m.vesselName}, tank ${m.tankCode}, ${m.inspectedOn}`;
  const text = [`${m.author} commented on ${about} of tank ${m.tankCode}, ${m.vesselName}, inspected on ${m.inspectedOn}:`, "", m.body, "", `Read it in Tankwright: ${m.url}`, "", "Sent by Tankwright. Do not reply to this address."].join("\n");
  const html = `<!doctype html><html><body style="font-family: sans-serif; line-height: 1.4">
<p>${esc(m.author)} commented on ${esc(about)} of tank ${esc(m.tankCode)}, ${esc(m.vesselName)}, inspected on ${esc(m.inspectedOn)}:</p>
<blockquote style="border-left:3px solid #999;padding-left:8px;white-space:pre-line">${esc(m.body)}</blockquote>
<p><a href="${esc(m.url)}">Read it in Tankwright</a></p>
<p style="color:#555">Sent by Tankwright. Do not reply to this address.</p></body></html>`;
  return { subject, text, html };
}
