/** Text placed into an e-mail's HTML body: the characters HTML would read as markup, escaped. */
export const escapeHtml = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
