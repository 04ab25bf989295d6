// The notice to a class surveyor that a countersigned report was shared with them.
const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

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
