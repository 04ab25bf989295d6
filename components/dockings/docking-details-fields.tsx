import { TextField } from "@/components/ui/field";

// The fields of a docking's details, shared by planning a docking and changing one.

export const DOCKING_FIELDS = [
  { name: "yard", label: "Yard", hint: "The repair yard's name" },
  { name: "place", label: "Place", hint: "Port or berth" },
  // Written as the product writes dates everywhere (2027-04-12), not in the browser's locale.
  { name: "plannedOn", label: "Planned date", hint: "YYYY-MM-DD, e.g. 2027-04-12", placeholder: "YYYY-MM-DD" },
  { name: "currency", label: "Currency", hint: "ISO 4217 code: USD, EUR, SGD …" },
  { name: "steelRatePerKg", label: "Steel renewal, per kg", inputMode: "decimal" },
  { name: "coatingRatePerM2", label: "Coating repair, per m²", inputMode: "decimal" },
  { name: "anodeRatePerPiece", label: "Anode renewal, per piece", inputMode: "decimal" },
  { name: "sedimentRatePerM3", label: "Sediment removal, per m³", inputMode: "decimal" },
] as const;

export type TDockingDraftField = (typeof DOCKING_FIELDS)[number]["name"];
/** What is typed in the fields, as typed. */
export type TDockingDraft = Record<TDockingDraftField, string>;
export type TDockingDraftErrors = Partial<Record<TDockingDraftField, string>>;
export const DOCKING_RATE_FIELDS = ["steelRatePerKg", "coatingRatePerM2", "anodeRatePerPiece", "sedimentRatePerM3"] as const;
export const EMPTY_DOCKING_DRAFT = Object.fromEntries(DOCKING_FIELDS.map((f) => [f.name, ""])) as TDockingDraft;

/** The yard, place, planned date, currency and unit rates, each with its message. */
export function DockingDetailsFields({ draft, errors, onChange }: { draft: TDockingDraft; errors: TDockingDraftErrors; onChange: (name: TDockingDraftField, value: string) => void }) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {DOCKING_FIELDS.map((f) => (
        <TextField
          key={f.name}
          label={f.label}
          name={f.name}
          hint={"hint" in f ? f.hint : undefined}
          type="text"
          placeholder={"placeholder" in f ? f.placeholder : undefined}
          inputMode={"inputMode" in f ? f.inputMode : undefined}
          value={draft[f.name]}
          error={errors[f.name]}
          onChange={(e) => onChange(f.name, e.target.value)}
        />
      ))}
    </div>
  );
}
