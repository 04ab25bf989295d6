// Refusing vague free text: a deterministic rule set. Text that only says that
// something is somewhere or somehow is refused unless the structured fields
// already pin down where and how much; the message says what to add.

export type TPinned = { location: boolean; extent: boolean };
export type TVagueness = { ok: true } | { ok: false; message: string };

const normalise = (text: string) => text.toLowerCase().replace(/[’']/g, "'").replace(/\s+/g, " ").trim();

/** Phrases that point elsewhere instead of describing. */
const DEFERRALS = [/\bsee (the )?(photo|picture|image|attached|report|sketch)s?\b/, /\bas (before|previous(ly)?|last time|per (last|previous) (report|inspection))\b/, /\bsame as (before|last|previous)\b/, /\bno change\b/, /\brefer to\b/, /\bditto\b/];
/** Judgements without an observation. */
const JUDGEMENTS = /\b(bad|poor|fair|good|ok|okay|satisfactory|unsatisfactory|acceptable|terrible|not good|needs? attention|needs? repair)\b/;
/** Vague places. */
const VAGUE_PLACE = /\b(in (the )?tank|somewhere|some places|in places|here and there|various (places|locations|areas)|several (places|locations|areas)|throughout|all over|everywhere|general(ly)?|random(ly)?)\b/;
/** Vague amounts. */
const VAGUE_AMOUNT = /\b(some|a few|few|several|minor|slight(ly)?|light|heavy|heavily|lots? of|a lot|much|many|moderate|extensive|severe|small|big|large)\b/;

/** Words that name a place in the tank. */
const PLACE_WORDS = /\b(fr\.?|frames?|long(itudinal|l)?s?|stringers?|girders?|web( frames?)?|floors?|brackets?|bulkheads?|bhd|plating|shell|inner bottom|hopper|top ?side|deck|manholes?|bell ?mouths?|toes?|heels?|flanges?|webs?|face ?plates?|scallops?|weld(s| seams?)?|stiffeners?|pipes?|piping|ladders?|sounding|suction|aft|forward|fwd|port|starboard|stbd|upper|lower|centre|center)\b/;
/** Numbers with a unit, dimensions or counts that give an extent. */
const EXTENT = /(\d+(\.\d+)?\s*(mm|cm|m|m2|m²|%|pcs|pieces|nos?\b)|\d+\s*[x×]\s*\d+|\b\d+\s+(places|locations|spots|pits|cracks|dents))/;

const STOP_WORDS = new Set(["the", "a", "an", "in", "of", "on", "at", "is", "are", "was", "were", "and", "or", "with", "to", "there", "it", "this", "that", "found", "noted", "observed", "seen"]);

/** The words left once vague places, vague amounts, judgements and filler are taken out. */
function substance(t: string): string[] {
  let rest = t;
  for (const re of [VAGUE_PLACE, VAGUE_AMOUNT, JUDGEMENTS]) rest = rest.replace(new RegExp(re.source, "g"), " ");
  return rest.split(/[^a-z0-9²%.-]+/).filter((w) => w.length > 1 && !STOP_WORDS.has(w));
}

export const FREE_TEXT_HINT = "Say what you saw, where (frames, member) and how much (mm, m², %, count).";

/** Checks a free-text description against the vagueness rules. */
export function checkFreeText(text: string, pinned: TPinned, what = "The description"): TVagueness {
  const t = normalise(text);
  if (!t) return { ok: false, message: `${what} is empty. ${FREE_TEXT_HINT}` };
  for (const d of DEFERRALS) {
    if (d.test(t)) return { ok: false, message: `${what} points elsewhere ("${t.match(d)![0]}"). Write down what you saw here; a photo or an earlier report is not a description.` };
  }
  const hasPlace = pinned.location || PLACE_WORDS.test(t);
  const hasExtent = pinned.extent || EXTENT.test(t);
  const words = t.split(" ").filter((w) => w.length > 1);
  const judgement = t.match(JUDGEMENTS);
  if (judgement && words.length <= 4 && !EXTENT.test(t)) {
    return { ok: false, message: `${what} only judges ("${judgement[0]}"). Describe the defect instead: what it is, where and how large.` };
  }
  if (substance(t).length < 2 && (t.match(VAGUE_PLACE) || t.match(VAGUE_AMOUNT))) {
    return { ok: false, message: `${what} only says that there is ${substance(t)[0] ?? "something"} somewhere. Describe what you saw: its form, where on the member and how large.` };
  }
  const place = t.match(VAGUE_PLACE);
  if (place && !hasPlace) return { ok: false, message: `${what} says "${place[0]}" without a place. Add the frames and the member.` };
  const amount = t.match(VAGUE_AMOUNT);
  if (amount && !hasExtent) return { ok: false, message: `${what} says "${amount[0]}" without an extent. Add the size in mm, the area in m² or %, or the count.` };
  if (words.length < 3 && !(pinned.location && pinned.extent)) {
    return { ok: false, message: `${what} is too short to find and price. ${FREE_TEXT_HINT}` };
  }
  return { ok: true };
}
