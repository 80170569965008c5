// The part correction form's fields: the intake format's own columns, read by the intake's own cell readers
// and checked by the same zod schema, so a corrected value obeys exactly the rules an uploaded one does.
import { INTAKE_FORMATS, type ColumnSpec } from "#app/domain/intake/columns.ts";
import { makeCellReader } from "#app/domain/intake/cells.ts";
import { PartSpecSchema } from "#app/domain/intake/part-schema.ts";
import type { CataloguePart, GainPoint, PartSpec, SaturationPoint } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";

export type FieldErrors = Record<string, string>;

export interface PartFormValues {
  fields: Record<string, string>;
  gainPoints: Array<Record<string, string>>;
  saturationPoints: Array<Record<string, string>>;
}

const PARTS = INTAKE_FORMATS.parts;
const GAIN = PARTS.groups.find((g) => g.prefix === "gain")!;
const SAT = PARTS.groups.find((g) => g.prefix === "sat")!;

/** Fixed fields of the form, by domain field name, in the order the intake format lists them. */
export const PART_FIELDS: readonly ColumnSpec[] = PARTS.columns;
export const GAIN_FIELDS: readonly ColumnSpec[] = GAIN.columns.filter((c) => !c.alternative);
export const SATURATION_FIELDS: readonly ColumnSpec[] = SAT.columns;

// A form is typed by hand, never in a semicolon locale: a comma is read like an intake's comma cell.
const CONTEXT = { headerUnit: "", decimalMark: "point" } as const;

function showCell(spec: ColumnSpec, value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number" && spec.type.kind === "quantity") {
    return formatQuantity(value, spec.type.dimension, { digits: 12 });
  }
  if (spec.type.kind === "choice" && typeof value === "string" && spec.field === "polarity") return value.toUpperCase();
  return String(value);
}

/** A catalogue part as the form's initial text, every value with its unit. */
export function partToFormValues(part: CataloguePart | PartSpec): PartFormValues {
  const record = part as unknown as Record<string, unknown>;
  const fields: Record<string, string> = {};
  for (const spec of PART_FIELDS) fields[spec.field] = showCell(spec, record[spec.field]);
  const rows = (points: ReadonlyArray<GainPoint | SaturationPoint>, specs: readonly ColumnSpec[]) =>
    points.map((point) => {
      const row: Record<string, string> = {};
      for (const spec of specs) row[spec.field] = showCell(spec, (point as unknown as Record<string, unknown>)[spec.field]);
      return row;
    });
  return { fields, gainPoints: rows(part.gainPoints, GAIN_FIELDS), saturationPoints: rows(part.saturationPoints, SATURATION_FIELDS) };
}

function text(formData: FormData, name: string): string {
  const value = formData.get(name);
  return typeof value === "string" ? value : "";
}

function texts(formData: FormData, name: string): string[] {
  return formData.getAll(name).map((v) => (typeof v === "string" ? v : ""));
}

/** Repeated row inputs (`gainPoints.icAmps` once per row) back into rows; wholly blank rows are dropped. */
function readRows(formData: FormData, group: string, specs: readonly ColumnSpec[]): Array<Record<string, string>> {
  const columns = specs.map((spec) => texts(formData, `${group}.${spec.field}`));
  const count = Math.max(0, ...columns.map((c) => c.length));
  const rows: Array<Record<string, string>> = [];
  for (let i = 0; i < count; i += 1) {
    const row: Record<string, string> = {};
    specs.forEach((spec, j) => (row[spec.field] = columns[j][i] ?? ""));
    if (Object.values(row).some((v) => v.trim() !== "")) rows.push(row);
  }
  return rows;
}

export type PartFormResult = { ok: true; spec: PartSpec; values: PartFormValues } | { ok: false; fieldErrors: FieldErrors; values: PartFormValues };

/** Reads and checks the correction form; every field error is keyed by its input (`vceoVolts`, `gainPoints.1.hfeMin`). */
export function readPartForm(formData: FormData): PartFormResult {
  const values: PartFormValues = {
    fields: Object.fromEntries(PART_FIELDS.map((spec) => [spec.field, text(formData, spec.field)])),
    gainPoints: readRows(formData, "gainPoints", GAIN_FIELDS),
    saturationPoints: readRows(formData, "saturationPoints", SATURATION_FIELDS),
  };
  const fieldErrors: FieldErrors = {};
  const readAll = (specs: readonly ColumnSpec[], cells: Record<string, string>, prefix: string) => {
    const out: Record<string, unknown> = {};
    for (const spec of specs) {
      const result = makeCellReader(spec, CONTEXT)(cells[spec.field] ?? "");
      if (result.ok && result.value !== null && typeof result.value === "object") {
        // "100-300" or "typ 200" typed into one field: the form has a field for each, so say where it goes.
        fieldErrors[`${prefix}${spec.field}`] = `${result.reading ?? "not one value"}: put each value in its own field`;
        out[spec.field] = null;
      } else if (result.ok) out[spec.field] = result.value;
      else {
        fieldErrors[`${prefix}${spec.field}`] = result.message;
        out[spec.field] = null;
      }
    }
    return out;
  };
  const input = readAll(PART_FIELDS, values.fields, "");
  // Empty choices take the intake's defaults, as an empty cell would.
  input.configuration ??= "single";
  input.lifecycle ??= "active";
  input.gainPoints = values.gainPoints.map((row, i) => readAll(GAIN_FIELDS, row, `gainPoints.${i}.`));
  input.saturationPoints = values.saturationPoints.map((row, i) => readAll(SATURATION_FIELDS, row, `saturationPoints.${i}.`));
  const parsed = PartSpecSchema.safeParse(input);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = issue.path.join(".") || "form";
      fieldErrors[key] ??= issue.message;
    }
  }
  if (Object.keys(fieldErrors).length > 0 || !parsed.success) return { ok: false, fieldErrors, values };
  return { ok: true, spec: parsed.data, values };
}
