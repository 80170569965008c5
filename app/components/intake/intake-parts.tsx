// Presentational pieces of the intake pages: state, counts, problems, changes.
import { Link } from "react-router";
import { fieldLabel, formatFieldValue, inFieldOrder, offerSummary } from "#app/components/catalogue/field-display.ts";
import { STATE_LABELS, type IntakeCounts, type IntakeState, type RowChange, type ShownProblem } from "./types.ts";

const STATE_TONES: Record<IntakeState, string> = {
  previewed: "border-signal/40 bg-signal-soft text-signal",
  committed: "border-ink/30 bg-ink text-white",
  discarded: "border-rule bg-paper text-ink/70",
  "rolled-back": "border-caution/40 bg-caution-soft text-caution",
};

export function StateTag({ state }: { state: IntakeState }) {
  return (
    <span className={`inline-block whitespace-nowrap rounded-sm border px-1.5 py-px text-xs font-medium ${STATE_TONES[state]}`} data-state={state}>
      {STATE_LABELS[state]}
    </span>
  );
}

const COUNT_ITEMS: Array<{ key: keyof IntakeCounts; label: string; tone: string }> = [
  { key: "new", label: "new", tone: "text-signal" },
  { key: "changed", label: "changed", tone: "text-ink" },
  { key: "unchanged", label: "unchanged", tone: "text-ink/60" },
  { key: "rejected", label: "rejected", tone: "text-fault" },
  { key: "warnings", label: "warnings", tone: "text-caution" },
];

export function IntakeCountsBar({ counts }: { counts: IntakeCounts }) {
  return (
    <dl className="grid grid-cols-5 divide-x divide-rule rounded border border-rule bg-white" aria-label="Counts">
      {COUNT_ITEMS.map((item) => (
        <div key={item.key} className="px-4 py-3" data-count={item.key}>
          <dt className="text-xs uppercase tracking-wide text-ink/60">{item.label}</dt>
          <dd className={`mt-0.5 text-2xl font-semibold tabular-nums ${counts[item.key] > 0 ? item.tone : "text-ink/40"}`}>{counts[item.key]}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Compact counts for the intake list, zeros left out: `87 new · 4 rejected`. */
export function CountsInline({ counts }: { counts: IntakeCounts }) {
  const shown = COUNT_ITEMS.filter((item) => counts[item.key] > 0);
  if (shown.length === 0) return <span className="text-ink/50">no rows</span>;
  return (
    <span className="tabular-nums">
      {shown.map((item, i) => (
        <span key={item.key} className={`whitespace-nowrap ${item.tone}`}>
          {i > 0 ? " · " : ""}
          {`${counts[item.key]} ${item.label}`}
        </span>
      ))}
    </span>
  );
}

export type ProblemFilter = "all" | "error" | "warning";
export type ProblemSort = "row" | "severity" | "column";

const SEVERITY_ORDER = { error: 0, warning: 1 } as const;

/** Problems in the order asked for; ties keep file order (row, then column). */
export function arrangeProblems(problems: readonly ShownProblem[], filter: ProblemFilter, sort: ProblemSort): ShownProblem[] {
  const kept = filter === "all" ? [...problems] : problems.filter((p) => p.severity === filter);
  const byRow = (a: ShownProblem, b: ShownProblem) => (a.row ?? 0) - (b.row ?? 0);
  const byColumn = (a: ShownProblem, b: ShownProblem) => (a.column ?? "").localeCompare(b.column ?? "");
  const bySeverity = (a: ShownProblem, b: ShownProblem) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity];
  const order = { row: [byRow, bySeverity], severity: [bySeverity, byRow], column: [byColumn, byRow] }[sort];
  return kept
    .map((problem, index) => ({ problem, index }))
    .sort((a, b) => {
      for (const compare of order) {
        const c = compare(a.problem, b.problem);
        if (c !== 0) return c;
      }
      return a.index - b.index;
    })
    .map((entry) => entry.problem);
}

function problemsHref(filter: ProblemFilter, sort: ProblemSort): string {
  const params = new URLSearchParams();
  if (filter !== "all") params.set("severity", filter);
  if (sort !== "row") params.set("sort", sort);
  const query = params.toString();
  return `${query ? `?${query}` : "?"}#problems`;
}

export function ProblemsTable({
  problems,
  filter = "all",
  sort = "row",
}: {
  problems: readonly ShownProblem[];
  filter?: ProblemFilter;
  sort?: ProblemSort;
}) {
  const errors = problems.filter((p) => p.severity === "error").length;
  const warnings = problems.length - errors;
  if (problems.length === 0) {
    return <p className="rounded border border-rule bg-white px-4 py-3 text-sm">No problems: every row and cell was read as it stands.</p>;
  }
  const shown = arrangeProblems(problems, filter, sort);
  const filters: Array<{ value: ProblemFilter; label: string }> = [
    { value: "all", label: `All ${problems.length}` },
    { value: "error", label: `Errors ${errors}` },
    { value: "warning", label: `Warnings ${warnings}` },
  ];
  const sortHeader = (key: ProblemSort, label: string, className = "") => (
    <th scope="col" className={`whitespace-nowrap px-3 py-2 font-medium ${className}`} aria-sort={sort === key ? "ascending" : undefined}>
      <Link to={problemsHref(filter, key)} preventScrollReset className="hover:text-signal">
        {label}
        {sort === key ? " ▲" : ""}
      </Link>
    </th>
  );
  return (
    <div>
      <nav aria-label="Show problems" className="mb-2 flex gap-1 text-sm">
        {filters.map((f) => (
          <Link
            key={f.value}
            to={problemsHref(f.value, sort)}
            preventScrollReset
            aria-current={filter === f.value ? "true" : undefined}
            className={`rounded border px-2.5 py-1 ${filter === f.value ? "border-signal bg-signal-soft font-medium text-signal" : "border-rule bg-white hover:bg-paper"}`}
          >
            {f.label}
          </Link>
        ))}
      </nav>
      <div className="overflow-x-auto rounded border border-rule bg-white">
        <table className="w-full border-collapse text-sm" data-testid="problems-table">
          <thead className="bg-paper/60">
            <tr className="border-b border-rule text-left">
              {sortHeader("row", "Row", "w-16 text-right")}
              {sortHeader("column", "Column")}
              <th scope="col" className="px-3 py-2 font-medium">
                Value
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Message
              </th>
              {sortHeader("severity", "Severity")}
            </tr>
          </thead>
          <tbody>
            {shown.map((p, i) => (
              <tr key={i} className="border-b border-rule/60 align-top last:border-b-0" data-severity={p.severity}>
                <td className="px-3 py-1.5 text-right tabular-nums">{p.row ?? "file"}</td>
                <td className="px-3 py-1.5 font-mono text-xs leading-5">{p.column ?? "—"}</td>
                <td className="max-w-48 truncate px-3 py-1.5 font-mono text-xs leading-5" title={p.value ?? undefined}>
                  {p.value === null ? <span className="text-ink/40">empty</span> : p.value}
                </td>
                <td className="px-3 py-1.5">{p.message}</td>
                <td className="px-3 py-1.5">
                  <span
                    className={`inline-block rounded-sm px-1.5 text-xs font-medium ${p.severity === "error" ? "bg-fault-soft text-fault" : "bg-caution-soft text-caution"}`}
                  >
                    {p.severity}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {shown.length === 0 ? <p className="px-3 py-2 text-sm text-ink/70">No {filter}s in this intake.</p> : null}
      </div>
    </div>
  );
}

/** Each changed part with its fields before → after, then the new parts. */
export function ChangeList({ changes, kind }: { changes: readonly RowChange[]; kind: "parts" | "offers" }) {
  const changed = changes.filter((c) => c.status === "changed");
  const added = changes.filter((c) => c.status === "new");
  const unchanged = changes.filter((c) => c.status === "unchanged").length;
  const noun = kind === "parts" ? "part" : "offer";
  return (
    <div className="space-y-6">
      <section aria-labelledby="changed-heading">
        <h3 id="changed-heading" className="text-base font-semibold">
          Changed {noun}s <span className="font-normal text-ink/60">({changed.length})</span>
        </h3>
        {changed.length === 0 ? (
          <p className="mt-1 text-sm text-ink/70">No {noun} already in the catalogue changes.</p>
        ) : (
          <div className="mt-2 space-y-3">
            {changed.map((c) => (
              <div key={`${c.row}-${c.partNumber}`} className="rounded border border-rule bg-white" data-change-row={c.row}>
                <div className="flex items-baseline gap-3 border-b border-rule px-3 py-2 text-sm">
                  <span className="font-medium">
                    {c.manufacturer} {c.partNumber}
                  </span>
                  <span className="text-ink/60">row {c.row}</span>
                </div>
                <BeforeAfter fields={c.fields} />
              </div>
            ))}
          </div>
        )}
      </section>
      <section aria-labelledby="new-heading">
        <h3 id="new-heading" className="text-base font-semibold">
          New {noun}s <span className="font-normal text-ink/60">({added.length})</span>
        </h3>
        {added.length === 0 ? (
          <p className="mt-1 text-sm text-ink/70">Nothing new.</p>
        ) : (
          <table className="mt-2 w-full border-collapse rounded border border-rule bg-white text-sm">
            <thead className="bg-paper/60">
              <tr className="border-b border-rule text-left">
                <th scope="col" className="w-16 px-3 py-2 text-right font-medium">
                  Row
                </th>
                <th scope="col" className="px-3 py-2 font-medium">
                  Manufacturer
                </th>
                <th scope="col" className="px-3 py-2 font-medium">
                  Part number
                </th>
                {kind === "offers" ? (
                  <th scope="col" className="px-3 py-2 font-medium">
                    Offer
                  </th>
                ) : null}
              </tr>
            </thead>
            <tbody>
              {added.map((c) => (
                <tr key={`${c.row}-${c.partNumber}`} className="border-b border-rule/60 last:border-b-0">
                  <td className="px-3 py-1.5 text-right tabular-nums">{c.row}</td>
                  <td className="px-3 py-1.5">{c.manufacturer}</td>
                  <td className="px-3 py-1.5 font-medium">{c.partNumber}</td>
                  {kind === "offers" ? (
                    <td className="px-3 py-1.5 text-ink/80">{offerSummary(c.fields)}</td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      {unchanged > 0 ? (
        <p className="text-sm text-ink/70">
          {unchanged === 1
            ? `1 ${noun} in the file matches the catalogue exactly and stays as it is.`
            : `${unchanged} ${noun}s in the file match the catalogue exactly and stay as they are.`}
        </p>
      ) : null}
    </div>
  );
}

export function BeforeAfter({ fields }: { fields: ReadonlyArray<{ field: string; before: unknown; after: unknown; cleared?: boolean }> }) {
  if (fields.length === 0) return <p className="px-3 py-2 text-sm text-ink/70">No field differs.</p>;
  return (
    <table className="w-full border-collapse text-sm">
      <thead>
        <tr className="text-left text-xs uppercase tracking-wide text-ink/60">
          <th scope="col" className="w-1/4 px-3 py-1.5 font-medium">
            Field
          </th>
          <th scope="col" className="w-[35%] px-3 py-1.5 font-medium">
            Before
          </th>
          <th scope="col" className="w-6 px-1 py-1.5" aria-hidden="true" />
          <th scope="col" className="px-3 py-1.5 font-medium">
            After
          </th>
        </tr>
      </thead>
      <tbody>
        {inFieldOrder(fields).map((f) => (
          <tr key={f.field} className="border-t border-rule/60 align-top">
            <td className="px-3 py-1.5 font-medium">{fieldLabel(f.field)}</td>
            <td className="px-3 py-1.5 text-ink/70">{formatFieldValue(f.field, f.before)}</td>
            <td className="px-1 py-1.5 text-ink/50" aria-label="becomes">
              →
            </td>
            <td className="px-3 py-1.5" data-cleared={f.cleared ? "true" : undefined}>
              {formatFieldValue(f.field, f.after)}
              {f.cleared ? <span className="ml-2 rounded-sm bg-caution-soft px-1.5 text-xs font-medium text-caution">cleared by an empty cell</span> : null}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
