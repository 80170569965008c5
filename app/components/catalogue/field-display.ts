// Stored field values (SI numbers, point lists, price breaks) as a practitioner reads them, with units.
import { INTAKE_FORMATS, type ColumnSpec } from "#app/domain/intake/columns.ts";
import { LIFECYCLE_LABELS, type Lifecycle } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";
import { showValue } from "#app/components/ui/format.ts";

const SPECS = new Map<string, ColumnSpec>();
for (const format of Object.values(INTAKE_FORMATS)) {
  for (const spec of format.columns) if (!SPECS.has(spec.field)) SPECS.set(spec.field, spec);
}
const GAIN = INTAKE_FORMATS.parts.groups.find((g) => g.prefix === "gain")!;
const SAT = INTAKE_FORMATS.parts.groups.find((g) => g.prefix === "sat")!;

const GROUP_LABELS: Record<string, string> = { gainPoints: "gain points", saturationPoints: "saturation points", priceBreaks: "price breaks" };

const FIELD_ORDER = new Map<string, number>(
  [...INTAKE_FORMATS.parts.columns.map((c) => c.field), "gainPoints", "saturationPoints", ...INTAKE_FORMATS.offers.columns.map((c) => c.field), "priceBreaks"].map(
    (field, i) => [field, i] as [string, number],
  ),
);

/** Fields in the order of the intake format (identity, ratings, thermal, points, lifecycle), unknown ones last. */
export function inFieldOrder<T extends { field: string }>(changes: readonly T[]): T[] {
  const rank = (field: string) => FIELD_ORDER.get(field) ?? Number.MAX_SAFE_INTEGER;
  return [...changes].sort((a, b) => rank(a.field) - rank(b.field));
}

export function fieldLabel(field: string): string {
  const label = SPECS.get(field)?.label ?? GROUP_LABELS[field] ?? field;
  return /^[a-z][A-Z]/.test(label) ? label : label.charAt(0).toUpperCase() + label.slice(1);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function num(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

function formatGainPoint(point: Record<string, unknown>): string {
  const ic = num(point.icAmps);
  const hfe = [point.hfeMin, point.hfeTyp, point.hfeMax].map((v) => (num(v) === null ? "–" : String(v))).join("/");
  const vce = num(point.vceVolts);
  const temp = num(point.tempC);
  return `hFE ${hfe} at ${ic === null ? "?" : formatQuantity(ic, "current")}${vce === null ? "" : `, ${formatQuantity(vce, "voltage")}`}${temp === null ? "" : `, ${formatQuantity(temp, "temperature")}`}`;
}

function formatSaturationPoint(point: Record<string, unknown>): string {
  const v = (key: string, dimension: "voltage" | "current") => {
    const n = num(point[key]);
    return n === null ? null : formatQuantity(n, dimension);
  };
  const parts = [
    v("vceSatMaxVolts", "voltage") ? `VCE(sat) ≤ ${v("vceSatMaxVolts", "voltage")}` : null,
    v("vceSatTypVolts", "voltage") ? `typ ${v("vceSatTypVolts", "voltage")}` : null,
    v("vbeSatVolts", "voltage") ? `VBE(sat) ${v("vbeSatVolts", "voltage")}` : null,
  ].filter(Boolean);
  return `${parts.join(", ") || "no voltage"} at ${v("icAmps", "current") ?? "?"}${v("ibAmps", "current") ? ` / IB ${v("ibAmps", "current")}` : ""}`;
}

function formatPriceBreak(point: Record<string, unknown>, currency?: string): string {
  return `${String(point.quantity)}+ ${String(point.unitPrice)}${currency ? ` ${currency}` : ""}`;
}

/** One field's value for before → after tables. */
export function formatFieldValue(field: string, value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  if (Array.isArray(value)) {
    if (value.length === 0) return "none";
    const items = value.filter(isRecord);
    if (field === "gainPoints") return items.map(formatGainPoint).join("; ");
    if (field === "saturationPoints") return items.map(formatSaturationPoint).join("; ");
    if (field === "priceBreaks") return items.map((p) => formatPriceBreak(p)).join(" · ");
    return showValue(value);
  }
  if (field === "lifecycle" && typeof value === "string" && value in LIFECYCLE_LABELS) return LIFECYCLE_LABELS[value as Lifecycle];
  if (field === "polarity" && typeof value === "string") return value.toUpperCase();
  const spec = SPECS.get(field) ?? GAIN.columns.find((c) => c.field === field) ?? SAT.columns.find((c) => c.field === field);
  if (spec && spec.type.kind === "quantity" && typeof value === "number") return formatQuantity(value, spec.type.dimension, { digits: 6 });
  return showValue(value);
}

/** A new offer in one line: supplier, stock and price breaks in its currency. */
export function offerSummary(fields: ReadonlyArray<{ field: string; after: unknown }>): string {
  const value = (name: string) => fields.find((f) => f.field === name)?.after;
  const currency = typeof value("currency") === "string" ? (value("currency") as string) : "";
  const breaks = Array.isArray(value("priceBreaks"))
    ? (value("priceBreaks") as unknown[])
        .filter(isRecord)
        .map((b) => `${String(b.quantity)}+ ${String(b.unitPrice)}`)
        .join(", ")
    : "";
  const stock = num(value("stock"));
  return [
    typeof value("supplier") === "string" ? (value("supplier") as string) : null,
    stock === null ? null : `${stock.toLocaleString("en-GB")} in stock`,
    breaks ? `${breaks}${currency ? ` ${currency}` : ""}` : null,
  ]
    .filter(Boolean)
    .join(" · ");
}
