// The part correction form: every field as text with its unit, gain and saturation points as repeatable rows.
import { useRef, useState } from "react";
import { Form } from "react-router";
import type { ColumnSpec } from "#app/domain/intake/columns.ts";
import { unitSymbol } from "#app/domain/quantity.ts";
import { GAIN_FIELDS, PART_FIELDS, SATURATION_FIELDS, type FieldErrors, type PartFormValues } from "./part-form-fields.ts";

const SECTIONS: Array<{ title: string; fields: string[] }> = [
  { title: "Identity", fields: ["manufacturer", "partNumber", "polarity", "packageName", "configuration"] },
  { title: "Ratings", fields: ["vceoVolts", "vcboVolts", "veboVolts", "icMaxAmps", "ptotWatts", "ptotReference"] },
  { title: "Thermal", fields: ["tjMaxC", "rthJaCPerW", "rthJcCPerW"] },
  { title: "Dynamic and small-signal", fields: ["ftHz", "cobFarads", "earlyVolts", "vbeOnVolts"] },
  { title: "Lifecycle and datasheet", fields: ["lifecycle", "datasheetUrl", "datasheetRevisionDate"] },
];

// Temperatures and thermal resistances take no SI prefix (the quantity parser refuses one).
const UNPREFIXED = new Set(["temperature", "thermal-resistance", "ratio"]);

function unitHint(spec: ColumnSpec): string | undefined {
  if (spec.type.kind !== "quantity") return undefined;
  const unit = unitSymbol(spec.type.dimension);
  if (!unit) return undefined;
  return UNPREFIXED.has(spec.type.dimension) ? `in ${unit}, e.g. ${spec.example}` : `in ${unit} or with a prefix, e.g. ${spec.example}`;
}

/** Column labels as form labels: first letter capitalised, trade symbols (hFE, fT) left as written. */
export function labelOf(spec: ColumnSpec): string {
  return /^[a-z][A-Z]/.test(spec.label) ? spec.label : spec.label.charAt(0).toUpperCase() + spec.label.slice(1);
}

function FieldInput({ spec, value, error }: { spec: ColumnSpec; value: string; error?: string }) {
  const id = `field-${spec.field}`;
  const describedBy = error ? `${id}-error` : `${id}-hint`;
  const base = `mt-1 block w-full rounded border bg-white px-2 py-1.5 text-sm ${error ? "border-fault" : "border-rule"}`;
  const hint = unitHint(spec) ?? (spec.type.kind === "date" ? "YYYY-MM-DD" : undefined);
  return (
    <label className="block" htmlFor={id}>
      <span className="block text-xs font-medium">
        {labelOf(spec)}
        {spec.required ? <span className="text-fault"> *</span> : null}
      </span>
      {spec.type.kind === "choice" ? (
        <select id={id} name={spec.field} defaultValue={value} className={base} aria-invalid={error ? true : undefined} aria-describedby={describedBy}>
          {spec.required ? null : <option value="">—</option>}
          {spec.type.choices.map((c) => (
            <option key={c} value={spec.field === "polarity" ? c.toUpperCase() : c}>
              {c}
            </option>
          ))}
        </select>
      ) : (
        <input
          id={id}
          name={spec.field}
          defaultValue={value}
          className={base}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
        />
      )}
      {error ? (
        <span id={`${id}-error`} className="mt-1 block text-xs text-fault">
          {error}
        </span>
      ) : hint ? (
        <span id={`${id}-hint`} className="mt-1 block text-xs text-ink/50">
          {hint}
        </span>
      ) : null}
    </label>
  );
}

interface Row {
  key: number;
  cells: Record<string, string>;
}

function PointRows({
  group,
  title,
  specs,
  initial,
  errors,
  addLabel,
}: {
  group: "gainPoints" | "saturationPoints";
  title: string;
  specs: readonly ColumnSpec[];
  initial: Array<Record<string, string>>;
  errors: FieldErrors;
  addLabel: string;
}) {
  const nextKey = useRef(initial.length);
  const [rows, setRows] = useState<Row[]>(() => initial.map((cells, key) => ({ key, cells })));
  const add = () => setRows((current) => [...current, { key: nextKey.current++, cells: {} }]);
  const remove = (key: number) => setRows((current) => current.filter((r) => r.key !== key));
  return (
    <fieldset className="rounded border border-rule bg-white" data-group={group}>
      <legend className="sr-only">{title}</legend>
      <div className="flex items-baseline justify-between border-b border-rule px-4 py-2.5">
        <h2 className="text-sm font-semibold uppercase tracking-wide text-ink/80">{title}</h2>
        <button type="button" onClick={add} className="rounded border border-rule px-2.5 py-1 text-sm hover:bg-paper">
          {`+ ${addLabel}`}
        </button>
      </div>
      <div className="overflow-x-auto px-4 py-3">
        {errors[group] ? <p className="mb-2 text-sm text-fault">{errors[group]}</p> : null}
        {rows.length === 0 ? (
          <p className="text-sm text-ink/60">None. Use “{addLabel}” to add one.</p>
        ) : (
          <table className="w-full border-collapse text-sm">
            <thead>
              <tr className="text-left text-xs">
                {specs.map((spec) => (
                  <th key={spec.field} scope="col" className="px-1 pb-1 font-medium">
                    {labelOf(spec)}
                    {spec.required ? <span className="text-fault"> *</span> : null}
                  </th>
                ))}
                <th scope="col" className="w-20" />
              </tr>
            </thead>
            <tbody>
              {rows.map((row, index) => (
                <tr key={row.key} className="align-top" data-row={index}>
                  {specs.map((spec) => {
                    const error = errors[`${group}.${index}.${spec.field}`];
                    return (
                      <td key={spec.field} className="px-1 py-1">
                        <input
                          name={`${group}.${spec.field}`}
                          aria-label={`${title} ${index + 1} ${spec.label}`}
                          defaultValue={row.cells[spec.field] ?? ""}
                          aria-invalid={error ? true : undefined}
                          className={`block w-full min-w-20 rounded border bg-white px-2 py-1 text-sm ${error ? "border-fault" : "border-rule"}`}
                        />
                        {error ? <span className="mt-0.5 block text-xs text-fault">{error}</span> : null}
                      </td>
                    );
                  })}
                  <td className="px-1 py-1 text-right">
                    <button type="button" onClick={() => remove(row.key)} className="rounded px-2 py-1 text-sm text-fault hover:bg-fault-soft">
                      Remove
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <p className="mt-2 text-xs text-ink/50">A row left wholly blank is ignored.</p>
      </div>
    </fieldset>
  );
}

export function PartForm({ values, errors, cancelHref }: { values: PartFormValues; errors: FieldErrors; cancelHref: string }) {
  const byField = new Map(PART_FIELDS.map((spec) => [spec.field, spec]));
  return (
    <Form method="post" className="space-y-5" noValidate>
      {errors.form ? (
        <div role="alert" className="rounded border border-fault/30 bg-fault-soft px-4 py-3 text-sm">
          {errors.form}
        </div>
      ) : Object.keys(errors).length > 0 ? (
        <div role="alert" className="rounded border border-fault/30 bg-fault-soft px-4 py-3 text-sm">
          {`${Object.keys(errors).length === 1 ? "One value needs fixing" : `${Object.keys(errors).length} values need fixing`}; nothing was saved.`}
        </div>
      ) : null}
      {SECTIONS.map((section) => (
        <fieldset key={section.title} className="rounded border border-rule bg-white">
          <legend className="sr-only">{section.title}</legend>
          <h2 className="border-b border-rule px-4 py-2.5 text-sm font-semibold uppercase tracking-wide text-ink/80">{section.title}</h2>
          <div className="grid grid-cols-2 gap-x-4 gap-y-3 px-4 py-3 md:grid-cols-3">
            {section.fields.map((field) => {
              const spec = byField.get(field)!;
              return <FieldInput key={field} spec={spec} value={values.fields[field] ?? ""} error={errors[field]} />;
            })}
          </div>
        </fieldset>
      ))}
      <PointRows group="gainPoints" title="Gain points" specs={GAIN_FIELDS} initial={values.gainPoints} errors={errors} addLabel="Add gain point" />
      <PointRows
        group="saturationPoints"
        title="Saturation points"
        specs={SATURATION_FIELDS}
        initial={values.saturationPoints}
        errors={errors}
        addLabel="Add saturation point"
      />
      <div className="flex items-center gap-4">
        <button type="submit" className="rounded bg-signal px-4 py-2 font-medium text-white hover:bg-signal/90">
          Save correction
        </button>
        <a href={cancelHref} className="text-sm text-signal underline">
          Cancel
        </a>
        <p className="text-sm text-ink/60">Saving records a revision with every changed value.</p>
      </div>
    </Form>
  );
}
