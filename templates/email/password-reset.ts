// The e-mail with a link to choose a new password. Plain text first; the HTML
// says the same, with no remote images or fonts.
import { escapeHtml as esc } from "./escape";

export type TPasswordResetEmail = {
  name: string;
  link: string;
  /** When the link stops working, e.g. "2026-03-14 10:30 UTC". */
  expires: string;
};

export function passwordResetEmail(m: TPasswordResetEmail) {
  const subject = "Tankwright: choose a new password";
  const text = [
    `Hello ${m.name},`,
    "",
    "Someone asked to reset the password of your Tankwright account. To choose a new password, open this link:",
    m.link,
    "",
    `The link works once, until ${m.expires}. Asking again sends a new link and stops this one.`,
    "",
    "If you did not ask for this, ignore this e-mail: your password stays as it is.",
    "",
    "Sent by Tankwright. Do not reply to this address.",
  ].join("\n");
  const html = `<!doctype html><html><body style="font-family: sans-serif; line-height: 1.4">
<p>Hello ${esc(m.name)},</p>
<p>Someone asked to reset the password of your Tankwright account. To choose a new password, open this link:</p>
<p><a href="${esc(m.link)}">${esc(m.link)}</a></p>
<p>The link works once, until ${esc(m.expires)}. Asking again sends a new link and stops this one.</p>
<p>If you did not ask for this, ignore this e-mail: your password stays as it is.</p>
<p style="color:#555">Sent by Tankwright. Do not reply to this address.</p>
</body></html>`;
  return { subject, text, html };
}
