// zod field schemas built from the column specs, so ranges and messages have one source.
import { z } from "zod";
import { describeRange, showValue, type ColumnSpec, type IntakeFormat } from "./columns";

/** Looks a column up by name in a format (fixed columns first, then every group's). */
export function columnNamed(format: IntakeFormat, name: string, groupPrefix?: string): ColumnSpec {
  const columns = groupPrefix ? format.groups.find((g) => g.prefix === groupPrefix)?.columns : format.columns;
  const spec = columns?.find((c) => c.name === name);
  if (!spec) throw new Error(`no column ${groupPrefix ?? ""}${name} in the ${format.kind} format`);
  return spec;
}

// Datasheets print PNP ratings negative; the catalogue stores every rating as a magnitude.
function isRating(spec: ColumnSpec): boolean {
  return spec.type.kind === "quantity" && (spec.type.dimension === "voltage" || spec.type.dimension === "current");
}

function checkNumber(spec: ColumnSpec, value: number, ctx: z.RefinementCtx): void {
  if (spec.type.kind === "count" && !Number.isInteger(value)) {
    ctx.addIssue({ code: "custom", message: `${spec.label} must be a whole number` });
    return;
  }
  const range = spec.range;
  if (!range) return;
  if (range.minExclusive && value <= range.min) {
    const magnitudeHint = value < 0 && isRating(spec) ? " (write PNP ratings as magnitudes, without the minus sign)" : "";
    ctx.addIssue({ code: "custom", message: `${spec.label} must be above zero${magnitudeHint}` });
  } else if (!range.minExclusive && value < range.min && spec.type.kind !== "quantity") {
    const message = range.min === 0 ? `${spec.label} must be zero or more` : `${spec.label} must be at least ${showValue(spec, range.min)}`;
    ctx.addIssue({ code: "custom", message });
  } else if (value > range.max || value < range.min) {
    ctx.addIssue({
      code: "custom",
      message: `implausible ${spec.label}: ${showValue(spec, value)} is outside the plausible range (${describeRange(spec)})`,
    });
  }
}

export function requiredNumber(spec: ColumnSpec, missingMessage = `${spec.label} is required`) {
  return z.number({ error: missingMessage }).superRefine((value, ctx) => checkNumber(spec, value, ctx));
}

export function optionalNumber(spec: ColumnSpec) {
  return z
    .number()
    .superRefine((value, ctx) => checkNumber(spec, value, ctx))
    .nullable();
}

export function requiredText(spec: ColumnSpec) {
  return z.string({ error: `${spec.label} is required` }).trim().min(1, { error: `${spec.label} is required` });
}

export function optionalText() {
  return z.string().nullable();
}

export function requiredChoice<const T extends readonly [string, ...string[]]>(spec: ColumnSpec, values: T) {
  return z.enum(values, { error: `${spec.label} is required` });
}
