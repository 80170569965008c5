// Writes parts and offers as intake files that parse back to the same values (demo data, exports).
import Papa from "papaparse";
import type { Offer, PartSpec } from "../part";
import { groupColumnName, INTAKE_FORMATS, type ColumnSpec, type IntakeFormat } from "./columns";

type Values = Record<string, unknown>;

/** A parts file: one row per part, as many gain and saturation point columns as the longest list needs. */
export function writePartsCsv(parts: readonly PartSpec[]): string {
  return writeRows(INTAKE_FORMATS.parts, parts.map((part) => ({ fields: part as unknown as Values, points: part as unknown as Values })));
}

/** An offers file: one row per part and supplier, as many price break columns as needed. */
export function writeOffersCsv(rows: ReadonlyArray<{ manufacturer: string; partNumber: string; offer: Offer }>): string {
  return writeRows(
    INTAKE_FORMATS.offers,
    rows.map(({ manufacturer, partNumber, offer }) => {
      const fields = { manufacturer, partNumber, ...offer } as Values;
      return { fields, points: fields };
    }),
  );
}

function writeRows(format: IntakeFormat, rows: Array<{ fields: Values; points: Values }>): string {
  const header = format.columns.map((c) => c.name);
  const pointCounts = format.groups.map((g) => Math.max(0, ...rows.map((r) => (r.points[g.field] as unknown[]).length)));
  const written = format.groups.map((group) => group.columns.filter((c) => !c.alternative));
  format.groups.forEach((group, g) => {
    for (let n = 1; n <= pointCounts[g]; n += 1) for (const c of written[g]) header.push(groupColumnName(group, n, c));
  });
  const data = rows.map(({ fields, points }) => {
    const cells = format.columns.map((c) => writeCell(c, fields[c.field]));
    format.groups.forEach((group, g) => {
      const list = points[group.field] as Values[];
      for (let n = 0; n < pointCounts[g]; n += 1) for (const c of written[g]) cells.push(writeCell(c, list[n]?.[c.field]));
    });
    return cells;
  });
  return `${Papa.unparse({ fields: header, data })}\r\n`;
}

// Numbers go out in SI base units with JavaScript's shortest exact form, so they read back bit for bit.
function writeCell(spec: ColumnSpec, value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return String(value);
  const text = String(value);
  if (spec.type.kind === "choice") return spec.type.choices.find((c) => c.toLowerCase() === text) ?? text;
  return text;
}
