// Numbers in check summaries, in engineering notation with the unit (d3-format's SI prefixes).
import { format, formatLocale } from "d3-format";

// An ASCII minus keeps summaries searchable and exportable; d3 uses U+2212 otherwise.
const si = formatLocale({ decimal: ".", thousands: ",", grouping: [3], currency: ["", ""], minus: "-" }).format(".3~s");
const plain = format(".3~r");

/** e.g. formatValue(0.00025, "A") -> "250 µA"; units without SI prefixes (°C, %, ratios) print plainly. */
export function formatValue(value: number, unit: string): string {
  if (!Number.isFinite(value)) return value > 0 ? `∞ ${unit}`.trim() : `-∞ ${unit}`.trim();
  if (unit === "°C" || unit === "°C/W" || unit === "" || unit === "%") {
    return `${plain(value).replace("−", "-")}${unit === "" ? "" : unit === "%" ? "%" : ` ${unit}`}`;
  }
  const text = si(value);
  const prefix = /[a-zµ]$/i.test(text) ? text.slice(-1) : "";
  return `${prefix ? text.slice(0, -1) : text} ${prefix}${unit}`;
}

/** A fraction as a whole percentage, e.g. 0.234 -> "23%". */
export function formatPercent(fraction: number): string {
  return `${Math.round(fraction * 100)}%`;
}
