// The intake templates' example rows, taken from the demo's own invented families: one generated part (a case-rated
// TO-126 part, so that every parts column has a value) and one of its demo offers. Each cell is spelled as the format
// documentation prints quantities (formatQuantity with 6 digits), keyed by the template's column name.
import { groupColumnName, INTAKE_FORMATS, type ColumnSpec } from "#app/domain/intake/columns.ts";
import { partKey } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";
import { demoOffers } from "./offers.ts";
import { demoParts } from "./parts.ts";

export const TEMPLATE_EXAMPLE_PART_NUMBER = "TW-G3152";
export const TEMPLATE_EXAMPLE_SUPPLIER = "Larkspur Component Supply";

function spellCell(spec: ColumnSpec, value: unknown): string {
  if (value === null || value === undefined) throw new Error(`the template example has no value for ${spec.name}`);
  if (typeof value !== "number") {
    return spec.type.kind === "choice" ? (spec.type.choices.find((c) => c.toLowerCase() === String(value)) ?? String(value)) : String(value);
  }
  return spec.type.kind === "quantity" ? formatQuantity(value, spec.type.dimension, { digits: 6 }) : String(value);
}

function exampleRow(kind: "parts" | "offers", fields: Record<string, unknown>, points: Record<string, Record<string, unknown>>) {
  const format = INTAKE_FORMATS[kind];
  const row: Record<string, string> = {};
  for (const column of format.columns) row[column.name] = spellCell(column, fields[column.field]);
  for (const group of format.groups) {
    // An alternative spelling of other columns (hFE as "100-300") is left out of the template, as the template does.
    for (const column of group.columns) if (!column.alternative) row[groupColumnName(group, 1, column)] = spellCell(column, points[group.prefix][column.field]);
  }
  return row;
}

const part = demoParts.find((candidate) => candidate.partNumber === TEMPLATE_EXAMPLE_PART_NUMBER)!;
const offer = demoOffers.find(
  (row) => partKey(row.manufacturer, row.partNumber) === partKey(part.manufacturer, part.partNumber) && row.offer.supplier === TEMPLATE_EXAMPLE_SUPPLIER,
)!;
/** The gain point that quotes min, typ and max, so the example shows all three. */
const gainPoint = part.gainPoints.find((point) => point.hfeMin !== null && point.hfeTyp !== null && point.hfeMax !== null)!;

/** Template column name (gain and saturation columns as gain1_*, sat1_*) → example cell of the parts template. */
export const partsTemplateExample: Record<string, string> = exampleRow("parts", { ...part }, { gain: { ...gainPoint }, sat: { ...part.saturationPoints[0] } });

/** Template column name (price breaks as break1_*) → example cell of the offers template. */
export const offersTemplateExample: Record<string, string> = exampleRow(
  "offers",
  { manufacturer: offer.manufacturer, partNumber: offer.partNumber, ...offer.offer },
  { break: { ...offer.offer.priceBreaks[0] } },
);
