// Small display helpers shared by the catalogue and intake pages.

/** A timestamp as `2026-03-01 14:05` (UTC), the way the tables show it. */
export function formatWhen(value: string | Date | null | undefined): string {
  if (value == null) return "—";
  const date = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(date.getTime())) return String(value);
  return `${date.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

/** A date alone, `2026-03-01`. */
export function formatDay(value: string | Date | null | undefined): string {
  if (value == null) return "—";
  const date = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(date.getTime())) return String(value);
  return date.toISOString().slice(0, 10);
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** A stored value of any shape as one line of text; empty values show as a dash. */
export function showValue(value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  if (typeof value === "string") return value;
  if (typeof value === "number" || typeof value === "boolean") return String(value);
  if (Array.isArray(value)) return value.length === 0 ? "—" : value.map(showValue).join("; ");
  if (typeof value === "object") {
    return Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== null && v !== undefined)
      .map(([k, v]) => `${k} ${showValue(v)}`)
      .join(", ");
  }
  return String(value);
}

/** A unit price: at least two decimals, up to four for sub-unit prices (0.085 EUR, 1.20 EUR). */
export function formatMoney(amount: number, currency: string): string {
  const fixed = amount.toFixed(amount < 1 ? 4 : 2);
  const trimmed = amount < 1 ? fixed.replace(/(\.\d\d\d*?)0+$/, "$1") : fixed;
  return `${trimmed} ${currency}`;
}

export function formatCount(value: number): string {
  return value.toLocaleString("en-GB");
}
