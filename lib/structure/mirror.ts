// "Copy to the other side": a port tank's definition as the starboard tank, or the reverse.
import type { TTankSide } from "@/lib/vocabulary";

const OTHER: Partial<Record<TTankSide, TTankSide>> = { port: "starboard", starboard: "port" };
const LETTER: Record<"port" | "starboard", string> = { port: "P", starboard: "S" };

/** "No. 3 WBT P" → "No. 3 WBT S", "2P" → "2S", "No. 3 (Port)" → "No. 3 (Starboard)"; otherwise the side is appended. */
export function mirrorTankCode(code: string, from: "port" | "starboard"): string {
  const to = from === "port" ? "starboard" : "port";
  const word = new RegExp(`\\b${from}\\b`, "i");
  if (word.test(code)) return code.replace(word, (m) => (m[0] === m[0]!.toUpperCase() ? to[0]!.toUpperCase() + to.slice(1) : to));
  const letter = new RegExp(`(^|[\\s(\\d.-])${LETTER[from]}(\\)?)$`);
  if (letter.test(code)) return code.replace(letter, `$1${LETTER[to]}$2`);
  return `${code} ${LETTER[to]}`;
}

function mirrorWords(text: string, from: "port" | "starboard"): string {
  const to = from === "port" ? "starboard" : "port";
  return text.replace(new RegExp(`\\b${from}\\b`, "gi"), (m) => (m[0] === m[0]!.toUpperCase() ? to[0]!.toUpperCase() + to.slice(1) : to));
}

type TTankLike = {
  code: string; name: string; side: TTankSide; kind: string; frameFrom: number; frameTo: number; bottomAreaM2: number | null;
  coatingSystem: string; heatedBoundary: string | null; atWaterline: boolean; atCollisionBulkhead: boolean; note: string | null;
};

/** The other side's tank as raw input for the tank schema, or null for a centre tank. */
export function mirrorTankInput(t: TTankLike) {
  const side = OTHER[t.side];
  if (!side || t.side === "centre") return null;
  const from = t.side;
  return {
    code: mirrorTankCode(t.code, from),
    name: mirrorWords(t.name, from),
    side,
    kind: t.kind,
    frameFrom: t.frameFrom,
    frameTo: t.frameTo,
    bottomAreaM2: t.bottomAreaM2 ?? undefined,
    coatingSystem: t.coatingSystem,
    heatedBoundary: t.heatedBoundary ? mirrorWords(t.heatedBoundary, from) : undefined,
    atWaterline: t.atWaterline,
    atCollisionBulkhead: t.atCollisionBulkhead,
    note: t.note ?? undefined,
  };
}
