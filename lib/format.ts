// Display formats: dates are unambiguous (2026-03-14), times say their offset.

/** "UTC+08:00", "UTC−03:00", "UTC+05:30". */
export function formatUtcOffset(minutes: number): string {
  const sign = minutes < 0 ? "−" : "+";
  const abs = Math.abs(minutes);
  const hh = String(Math.floor(abs / 60)).padStart(2, "0");
  const mm = String(abs % 60).padStart(2, "0");
  return `UTC${sign}${hh}:${mm}`;
}

/** ISO calendar date of an instant in UTC, or at a ship's offset when given. */
export function formatDate(at: Date, offsetMinutes = 0): string {
  return new Date(at.getTime() + offsetMinutes * 60_000).toISOString().slice(0, 10);
}

/** "2026-03-14 09:30 UTC" or, with the ship's offset, "2026-03-14 17:30 (UTC+08:00)". */
export function formatDateTime(at: Date, offsetMinutes?: number | null): string {
  const shifted = new Date(at.getTime() + (offsetMinutes ?? 0) * 60_000).toISOString();
  const text = `${shifted.slice(0, 10)} ${shifted.slice(11, 16)}`;
  return offsetMinutes === undefined || offsetMinutes === null ? `${text} UTC` : `${text} (${formatUtcOffset(offsetMinutes)})`;
}

/** The file name a report is saved and attached under: vessel, tank and revision, in characters every mail client accepts. */
export function reportFileName(v: { vesselName: string; tankCode: string; revision: number; draft?: boolean }): string {
  const clean = (s: string) => s.normalize("NFKD").replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "");
  return `TW-${clean(v.vesselName)}-${clean(v.tankCode)}-rev${v.revision}${v.draft ? "-draft" : ""}.pdf`;
}

/**
 * A money amount in its currency ("$1,054.00", "¥3,250"): the currency's minor
 * unit at least; a unit rate may carry up to four decimals ("$4.125").
 */
export function formatMoney(amount: number, currency: string, { rate = false }: { rate?: boolean } = {}): string {
  const minor = new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
  return new Intl.NumberFormat("en", { style: "currency", currency, minimumFractionDigits: minor, maximumFractionDigits: rate ? Math.max(minor, 4) : minor }).format(amount);
}
