// How the fleet page speaks of the vessels that have inspection intervals of their own.

/** "1 vessel has its own intervals", "2 vessels have their own intervals"; "" for none. */
export function vesselsWithOwnIntervals(count: number): string {
  if (count <= 0) return "";
  return count === 1 ? "1 vessel has its own intervals" : `${count} vessels have their own intervals`;
}

/** Says whose intervals a vessel chosen in the settings form uses. */
export const vesselIntervalsSource = (own: boolean) => (own ? "This vessel has its own intervals." : "This vessel uses the company's intervals.");

/** A box's text as the schema's input: empty is missing, anything else is read as a number (NaN when it is not one). */
export const monthsFromBox = (text: string): number | undefined => (text.trim() === "" ? undefined : Number(text));
