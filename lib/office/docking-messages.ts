// The messages of a refused docking write, in words: each field by the name
// the forms give it, with its own message ("Adjusted quantity cannot be
// negative; Reason is required: say why the quantity was changed."). The
// issues keep their paths (items.0.adjustedQuantity) for the forms to place
// each message beside its field.
import type { TIssue } from "@/lib/errors";

/** The fields of the docking forms and bodies, as the forms label them. */
export const DOCKING_FIELD_LABELS: Record<string, string> = {
  yard: "Yard",
  place: "Place",
  plannedOn: "Planned date",
  currency: "Currency",
  steelRatePerKg: "Steel renewal rate per kg",
  coatingRatePerM2: "Coating repair rate per m²",
  anodeRatePerPiece: "Anode renewal rate per piece",
  sedimentRatePerM3: "Sediment removal rate per m³",
  items: "Items",
  id: "Item",
  included: "Included",
  adjustedQuantity: "Adjusted quantity",
  adjustmentReason: "Reason",
  description: "Description",
  tankId: "Tank",
  quantity: "Quantity",
  unit: "Unit",
  unitRate: "Unit rate",
  reason: "Reason",
  status: "Status",
  itemIds: "Items",
  done: "Done",
};

/** "Adjusted quantity", or "Item 2, adjusted quantity" when a body decides on several items. */
export function fieldLabel(path: string, severalItems = false): string {
  const parts = path.split(".");
  const item = parts.length >= 3 && (parts[0] === "items" || parts[0] === "itemIds") && /^\d+$/.test(parts[1]!) ? Number(parts[1]) + 1 : null;
  const field = item === null ? parts[0]! : parts[2]!;
  const label = DOCKING_FIELD_LABELS[field] ?? (field === "(body)" ? "The request" : field);
  return item !== null && severalItems ? `Item ${item}, ${label.toLowerCase()}` : label;
}

/** A message that reads on from the field's name ("cannot be negative") follows it; an instruction ("name the yard") follows a colon. */
const READS_ON = /^(is|are|must|cannot|can|only|has|should|needs?)\b/;

/**
 * One sentence over every issue, each field named in words with its own
 * message. `itemCount`: how many items the body decides on; with more than one
 * (or an issue past the first item), an item's field says which item.
 */
export function describeIssues(issues: readonly TIssue[], itemCount = 1): string {
  const severalItems = itemCount > 1 || issues.some((i) => /^items\.([1-9]\d*)\./.test(i.path));
  const parts = issues.map((i) => {
    const label = fieldLabel(i.path, severalItems);
    return READS_ON.test(i.message) ? `${label} ${i.message}` : `${label}: ${i.message}`;
  });
  const text = [...new Set(parts)].join("; ");
  return text ? `${text}${/[.!?]$/.test(text) ? "" : "."}` : "The request is not valid.";
}
