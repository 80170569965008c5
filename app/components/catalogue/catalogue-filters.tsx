// The catalogue's filter form: a GET form, so every filter lands in the URL and a view can be shared.
import { Form, Link } from "react-router";
import { PART_COLUMNS, type PartColumn, type PartListQuery } from "#app/lib/catalogue-query.ts";
import { CONFIGURATIONS, LIFECYCLE_LABELS, LIFECYCLES } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";
import { listHref } from "./catalogue-table.tsx";

/** The URL's search params as typed, one list per name (so a refused value is shown back as it was). */
export type RawQuery = Record<string, string[]>;

export function rawQueryOf(searchParams: URLSearchParams): RawQuery {
  const raw: RawQuery = {};
  for (const [key, value] of searchParams) (raw[key] ??= []).push(value);
  return raw;
}

const PAGE_SIZES = [25, 50, 100, 200];

const inputClass = (error?: string) =>
  `mt-1 block w-full rounded border bg-white px-2 py-1.5 text-sm ${error ? "border-fault" : "border-rule"}`;

function FilterError({ name, error }: { name: string; error?: string }) {
  return error ? (
    <span id={`${name}-error`} className="mt-1 block text-xs text-fault">
      {error}
    </span>
  ) : null;
}

function TextInput({
  name,
  label,
  raw,
  errors,
  placeholder,
  className = "",
}: {
  name: string;
  label: string;
  raw: RawQuery;
  errors: Record<string, string>;
  placeholder?: string;
  className?: string;
}) {
  return (
    <label className={`block ${className}`}>
      <span className="block text-xs font-medium text-ink/80">{label}</span>
      <input
        name={name}
        defaultValue={raw[name]?.at(-1) ?? ""}
        placeholder={placeholder}
        aria-invalid={errors[name] ? true : undefined}
        aria-describedby={errors[name] ? `${name}-error` : undefined}
        className={inputClass(errors[name])}
      />
      <FilterError name={name} error={errors[name]} />
    </label>
  );
}

function Select({
  name,
  label,
  raw,
  errors,
  options,
}: {
  name: string;
  label: string;
  raw: RawQuery;
  errors: Record<string, string>;
  options: Array<{ value: string; label: string }>;
}) {
  return (
    <label className="block">
      <span className="block text-xs font-medium text-ink/80">{label}</span>
      <select
        name={name}
        defaultValue={raw[name]?.at(-1) ?? ""}
        aria-invalid={errors[name] ? true : undefined}
        className={inputClass(errors[name])}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FilterError name={name} error={errors[name]} />
    </label>
  );
}

function RangeInputs({
  label,
  min,
  max,
  raw,
  errors,
  placeholders,
}: {
  label: string;
  min: string;
  max: string;
  raw: RawQuery;
  errors: Record<string, string>;
  placeholders: [string, string];
}) {
  return (
    <fieldset>
      <legend className="text-xs font-medium text-ink/80">{label}</legend>
      <div className="mt-1 flex items-center gap-1.5">
        <input
          name={min}
          aria-label={`${label} from`}
          defaultValue={raw[min]?.at(-1) ?? ""}
          placeholder={placeholders[0]}
          aria-invalid={errors[min] ? true : undefined}
          className={`${inputClass(errors[min])} mt-0`}
        />
        <span className="text-ink/50">to</span>
        <input
          name={max}
          aria-label={`${label} to`}
          defaultValue={raw[max]?.at(-1) ?? ""}
          placeholder={placeholders[1]}
          aria-invalid={errors[max] ? true : undefined}
          className={`${inputClass(errors[max])} mt-0`}
        />
      </div>
      <FilterError name={min} error={errors[min]} />
      <FilterError name={max} error={errors[max]} />
    </fieldset>
  );
}

function CheckboxGroup({
  name,
  legend,
  options,
  raw,
  errors,
}: {
  name: string;
  legend: string;
  options: Array<{ value: string; label: string; title?: string }>;
  raw: RawQuery;
  errors: Record<string, string>;
}) {
  const chosen = new Set(raw[name] ?? []);
  return (
    <fieldset>
      <legend className="text-xs font-medium text-ink/80">{legend}</legend>
      <div className="mt-1 flex flex-wrap gap-1">
        {options.map((o) => (
          <label
            key={o.value}
            title={o.title}
            className="inline-flex cursor-pointer items-center gap-1.5 rounded border border-rule bg-white px-2 py-1 text-xs has-[:checked]:border-signal has-[:checked]:bg-signal-soft"
          >
            <input type="checkbox" name={name} value={o.value} defaultChecked={chosen.has(o.value)} className="accent-[var(--color-signal)]" />
            {o.label}
          </label>
        ))}
      </div>
      <FilterError name={name} error={errors[name]} />
    </fieldset>
  );
}

export function CatalogueFilters({
  raw,
  errors,
  packages,
  visible,
}: {
  raw: RawQuery;
  errors: Record<string, string>;
  packages: readonly string[];
  visible: readonly PartColumn[];
}) {
  const chosenPackages = raw.package ?? [];
  const packageOptions = [...new Set([...packages, ...chosenPackages])].map((p) => ({ value: p, label: p }));
  const visibleIds = new Set(visible.map((c) => c.id));
  return (
    <Form method="get" action="/catalogue" className="rounded border border-rule bg-white p-4" aria-label="Filters" data-testid="catalogue-filters">
      {raw.sort?.length ? <input type="hidden" name="sort" value={raw.sort.at(-1)} /> : null}
      {raw.dir?.length ? <input type="hidden" name="dir" value={raw.dir.at(-1)} /> : null}
      {errors.sort || errors.dir || errors.page || errors.form ? (
        <p role="alert" className="mb-3 text-sm text-fault">
          {[errors.sort, errors.dir, errors.page, errors.form].filter(Boolean).join(" · ")}
        </p>
      ) : null}
      <div className="grid grid-cols-2 gap-x-4 gap-y-3 md:grid-cols-6">
        <TextInput name="q" label="Search manufacturer or part number" raw={raw} errors={errors} placeholder="e.g. Larkfield or N100" className="col-span-2" />
        <Select
          name="polarity"
          label="Polarity"
          raw={raw}
          errors={errors}
          options={[
            { value: "", label: "NPN and PNP" },
            { value: "npn", label: "NPN" },
            { value: "pnp", label: "PNP" },
          ]}
        />
        <Select
          name="configuration"
          label="Configuration"
          raw={raw}
          errors={errors}
          options={[{ value: "", label: "any" }, ...CONFIGURATIONS.map((c) => ({ value: c, label: c }))]}
        />
        <Select
          name="hasOffers"
          label="Offers"
          raw={raw}
          errors={errors}
          options={[
            { value: "", label: "with or without" },
            { value: "yes", label: "has offers" },
            { value: "no", label: "no offers" },
          ]}
        />
        <Select
          name="size"
          label="Rows per page"
          raw={raw}
          errors={errors}
          options={[{ value: "", label: "50" }, ...PAGE_SIZES.filter((s) => s !== 50).map((s) => ({ value: String(s), label: String(s) }))]}
        />
        <div className="col-span-2">
          <RangeInputs label="VCEO" min="vceoMin" max="vceoMax" raw={raw} errors={errors} placeholders={["30 V", "100 V"]} />
        </div>
        <div className="col-span-2">
          <RangeInputs label="IC max" min="icMaxMin" max="icMaxMax" raw={raw} errors={errors} placeholders={["100 mA", "5 A"]} />
        </div>
        <fieldset className="col-span-2">
          <legend className="text-xs font-medium text-ink/80">Worst-case hFE at a collector current</legend>
          <div className="mt-1 grid grid-cols-[1.2fr_1fr_1fr] items-center gap-1.5">
            <input
              name="hfeAt"
              aria-label="at IC"
              defaultValue={raw.hfeAt?.at(-1) ?? ""}
              placeholder="at IC, e.g. 20 mA"
              aria-invalid={errors.hfeAt ? true : undefined}
              className={`${inputClass(errors.hfeAt)} mt-0`}
            />
            <input
              name="hfeMin"
              aria-label="hFE from"
              defaultValue={raw.hfeMin?.at(-1) ?? ""}
              placeholder="min"
              aria-invalid={errors.hfeMin ? true : undefined}
              className={`${inputClass(errors.hfeMin)} mt-0`}
            />
            <input
              name="hfeMax"
              aria-label="hFE to"
              defaultValue={raw.hfeMax?.at(-1) ?? ""}
              placeholder="max"
              aria-invalid={errors.hfeMax ? true : undefined}
              className={`${inputClass(errors.hfeMax)} mt-0`}
            />
          </div>
          <FilterError name="hfeAt" error={errors.hfeAt} />
          <FilterError name="hfeMin" error={errors.hfeMin} />
          <FilterError name="hfeMax" error={errors.hfeMax} />
        </fieldset>
        <div className="col-span-2 md:col-span-3">
          <CheckboxGroup
            name="lifecycle"
            legend="Lifecycle"
            raw={raw}
            errors={errors}
            options={LIFECYCLES.map((l) => ({ value: l, label: l === "nrnd" ? "NRND" : LIFECYCLE_LABELS[l], title: LIFECYCLE_LABELS[l] }))}
          />
        </div>
        <div className="col-span-2 md:col-span-3">
          <CheckboxGroup name="package" legend="Package" raw={raw} errors={errors} options={packageOptions} />
        </div>
      </div>
      <div className="mt-4 flex flex-wrap items-center gap-3 border-t border-rule pt-3">
        <button type="submit" className="rounded bg-signal px-4 py-1.5 text-sm font-medium text-white hover:bg-signal/90">
          Apply filters
        </button>
        <Link to="/catalogue" className="text-sm text-signal underline">
          Clear all
        </Link>
        <details className="ml-auto text-sm">
          <summary className="cursor-pointer select-none rounded border border-rule px-3 py-1 hover:bg-paper">{`Columns (${visible.length})`}</summary>
          <div className="mt-2 grid grid-cols-2 gap-x-4 gap-y-1 rounded border border-rule bg-white p-3 sm:grid-cols-3">
            {PART_COLUMNS.map((c) => (
              <label key={c.id} className="flex items-center gap-2">
                <input type="checkbox" name="cols" value={c.id} defaultChecked={visibleIds.has(c.id)} />
                {c.label}
              </label>
            ))}
            <p className="col-span-full mt-1 text-xs text-ink/60">Apply filters to show the chosen columns.</p>
          </div>
        </details>
      </div>
      {errors.cols ? <p className="mt-2 text-xs text-fault">{errors.cols}</p> : null}
    </Form>
  );
}

interface ActiveFilter {
  label: string;
  href: string;
}

/** The filters in force, each with a link that drops it. */
export function activeFilters(query: PartListQuery): ActiveFilter[] {
  const out: ActiveFilter[] = [];
  const without = (change: Partial<PartListQuery>) => listHref(query, { ...change, page: 1 });
  const range = (low: number | undefined, high: number | undefined, show: (v: number) => string) =>
    low !== undefined && high !== undefined ? `${show(low)} to ${show(high)}` : low !== undefined ? `≥ ${show(low)}` : `≤ ${show(high!)}`;
  if (query.q) out.push({ label: `“${query.q}”`, href: without({ q: undefined }) });
  if (query.polarity) out.push({ label: query.polarity.toUpperCase(), href: without({ polarity: undefined }) });
  for (const p of query.package) out.push({ label: p, href: without({ package: query.package.filter((x) => x !== p) }) });
  if (query.configuration) out.push({ label: query.configuration, href: without({ configuration: undefined }) });
  if (query.vceoMin !== undefined || query.vceoMax !== undefined) {
    out.push({
      label: `VCEO ${range(query.vceoMin, query.vceoMax, (v) => formatQuantity(v, "voltage"))}`,
      href: without({ vceoMin: undefined, vceoMax: undefined }),
    });
  }
  if (query.icMaxMin !== undefined || query.icMaxMax !== undefined) {
    out.push({
      label: `IC max ${range(query.icMaxMin, query.icMaxMax, (v) => formatQuantity(v, "current"))}`,
      href: without({ icMaxMin: undefined, icMaxMax: undefined }),
    });
  }
  if (query.hfeAt !== undefined && (query.hfeMin !== undefined || query.hfeMax !== undefined)) {
    out.push({
      label: `hFE ${range(query.hfeMin, query.hfeMax, String)} at ${formatQuantity(query.hfeAt, "current")}`,
      href: without({ hfeMin: undefined, hfeMax: undefined }),
    });
  }
  for (const l of query.lifecycle) out.push({ label: LIFECYCLE_LABELS[l], href: without({ lifecycle: query.lifecycle.filter((x) => x !== l) }) });
  if (query.hasOffers) out.push({ label: query.hasOffers === "yes" ? "has offers" : "no offers", href: without({ hasOffers: undefined }) });
  return out;
}

export function ActiveFilters({ filters }: { filters: ActiveFilter[] }) {
  if (filters.length === 0) return null;
  return (
    <ul className="flex flex-wrap items-center gap-1.5 text-xs" aria-label="Filters in force">
      {filters.map((f) => (
        <li key={f.label}>
          <Link
            to={f.href}
            className="inline-flex items-center gap-1 rounded-full border border-signal/40 bg-signal-soft px-2.5 py-0.5 text-signal hover:border-signal"
            title="Remove this filter"
          >
            {f.label}
            <span aria-hidden="true">×</span>
            <span className="sr-only">remove</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

/** What to say when nothing matches: the filters to loosen, each removable. */
export function EmptyResult({ filters }: { filters: ActiveFilter[] }) {
  return (
    <div className="rounded border border-rule bg-white px-4 py-6 text-sm" data-testid="empty-result">
      <p className="font-medium">No part in the catalogue matches all of these filters.</p>
      {filters.length > 0 ? (
        <>
          <p className="mt-1 text-ink/70">Remove one of them, widen a range, or check the spelling of the search:</p>
          <div className="mt-3">
            <ActiveFilters filters={filters} />
          </div>
          <p className="mt-3">
            <Link to="/catalogue" className="text-signal underline">
              Show the whole catalogue
            </Link>
          </p>
        </>
      ) : (
        <p className="mt-1 text-ink/70">The catalogue is empty. A librarian adds parts with a parts intake.</p>
      )}
    </div>
  );
}
