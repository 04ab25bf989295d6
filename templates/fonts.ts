// Registers the shipped Noto Sans files with React-PDF. Each file covers one
// script subset, so each subset is its own family and text styles name them
// all as a fallback chain (without it non-Latin text comes out as garbage).
import path from "node:path";
import { Font } from "@react-pdf/renderer";

const FONT_DIR = path.join(process.cwd(), "fonts");
const SUBSETS = [
  ["Noto Sans", "latin"],
  ["Noto Sans Latin Ext", "latin-ext"],
  ["Noto Sans Greek", "greek"],
  ["Noto Sans Cyrillic", "cyrillic"],
] as const;

export const PDF_FONT_FAMILY = SUBSETS.map(([family]) => family);

let registered = false;
export function registerPdfFonts() {
  if (registered) return;
  for (const [family, subset] of SUBSETS) {
    Font.register({
      family,
      fonts: [
        { src: path.join(FONT_DIR, `noto-sans-${subset}-400-normal.ttf`), fontWeight: 400 },
        { src: path.join(FONT_DIR, `noto-sans-${subset}-700-normal.ttf`), fontWeight: 700 },
        ...(subset === "latin" ? [{ src: path.join(FONT_DIR, "noto-sans-latin-400-italic.ttf"), fontWeight: 400, fontStyle: "italic" as const }] : []),
      ],
    });
  }
  // Words are not hyphenated in reports: a frame number split across lines misleads.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
