// The e-mail that carries a countersigned report to the office and to class.
// Plain text first; the HTML says the same, with no remote images or fonts.
import { escapeHtml as esc } from "./escape";

export type TSignedReportEmail = {
  vesselName: string; imoNumber: string; tankCode: string; tankName: string; inspectedOn: string; place: string;
  revision: number; sha256: string; verifyUrl: string; fileName: string;
  /** A download link when the PDF is too large to attach, with the time it stops working. */
  link: string | null; linkExpires: string | null;
};

export function signedReportEmail(m: TSignedReportEmail) {
  const subject = `Ballast tank report: ${m.vesselName} (IMO ${m.imoNumber}), tank ${m.tankCode}, ${m.inspectedOn}, revision ${m.revision}`;
  const how = m.link
    ? `The report is too large to attach. Download it here (the link works until ${m.linkExpires}):\n${m.link}`
    : `The signed report is attached: ${m.fileName}.`;
  const text = [
    `Inspection report of ballast tank ${m.tankCode} (${m.tankName}) of ${m.vesselName}, IMO ${m.imoNumber},`,
    `inspected on ${m.inspectedOn} at ${m.place}, revision ${m.revision}: signed by the officer and countersigned by the master.`,
    "",
    how,
    "",
    `SHA-256 fingerprint of the PDF: ${m.sha256}`,
    `Anyone can check that a copy is unchanged at ${m.verifyUrl}.`,
    "",
    "Sent by Tankwright on behalf of the vessel. Do not reply to this address.",
  ].join("\n");
  const html = `<!doctype html><html><body style="font-family: sans-serif; line-height: 1.4">
<p>Inspection report of ballast tank <strong>${esc(m.tankCode)}</strong> (${esc(m.tankName)}) of <strong>${esc(m.vesselName)}</strong>, IMO ${esc(m.imoNumber)},
inspected on ${esc(m.inspectedOn)} at ${esc(m.place)}, revision ${m.revision}: signed by the officer and countersigned by the master.</p>
<p>${m.link ? `The report is too large to attach. <a href="${esc(m.link)}">Download it</a> (the link works until ${esc(m.linkExpires ?? "")}).` : `The signed report is attached: ${esc(m.fileName)}.`}</p>
<p>SHA-256 fingerprint of the PDF: <code>${m.sha256}</code><br>Anyone can check that a copy is unchanged at <a href="${esc(m.verifyUrl)}">${esc(m.verifyUrl)}</a>.</p>
<p style="color:#555">Sent by Tankwright on behalf of the vessel. Do not reply to this address.</p>
</body></html>`;
  return { subject, text, html };
}
