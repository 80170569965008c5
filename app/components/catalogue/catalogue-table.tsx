// The catalogue list as a TanStack table: the server sorts, filters and pages; the table only lays out.
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import { Link } from "react-router";
import { toSearchParams, type PartColumn, type PartListQuery } from "#app/lib/catalogue-query.ts";
import { formatCount, formatMoney } from "#app/components/ui/format.ts";
import { LIFECYCLE_LABELS, type Lifecycle } from "#app/domain/part.ts";
import { formatQuantity } from "#app/domain/quantity.ts";
import { FlagTags } from "./flags.tsx";

/** One catalogue row as app/data/parts.server.ts lists it. */
export interface CatalogueRow {
  id: string;
  manufacturer: string;
  partNumber: string;
  polarity: "npn" | "pnp";
  packageName: string;
  configuration: string;
  vceoVolts: number;
  icMaxAmps: number;
  ptotWatts: number | null;
  ftHz: number | null;
  lifecycle: Lifecycle;
  hfeAtChosen: number | null;
  hfeSummary: string;
  offerCount: number;
  bestUnitPrice: { amount: number; currency: string } | null;
  stockTotal: number;
  flags: string[];
}

const NUMERIC_COLUMNS = new Set(["vceo", "icMax", "ptot", "ft", "hfe", "offers", "price", "stock"]);

const LIFECYCLE_SHORT: Record<Lifecycle, string> = { active: "active", nrnd: "NRND", "last-time-buy": "last-time buy", obsolete: "obsolete" };

function dash() {
  return <span className="text-ink/30">—</span>;
}

/** The URL of the list with some of the query changed (filters kept, so a view stays shareable). */
export function listHref(query: PartListQuery, change: Partial<PartListQuery>): string {
  const params = toSearchParams({ ...query, ...change });
  const search = params.toString();
  return search ? `/catalogue?${search}` : "/catalogue";
}

function partHref(row: CatalogueRow, query: PartListQuery): string {
  if (query.hfeAt === undefined) return `/catalogue/${row.id}`;
  return `/catalogue/${row.id}?ic=${encodeURIComponent(formatQuantity(query.hfeAt, "current", { ascii: true, digits: 15 }).replace(" ", ""))}`;
}

function cellFor(column: PartColumn, query: PartListQuery, showFlagsInline: boolean): ColumnDef<CatalogueRow>["cell"] {
  switch (column.id) {
    case "manufacturer":
      return ({ row }) => <span className="whitespace-nowrap">{row.original.manufacturer}</span>;
    case "partNumber":
      return ({ row }) => (
        <span className="flex flex-wrap items-baseline gap-x-2 gap-y-0.5">
          <Link to={partHref(row.original, query)} className="font-medium text-signal hover:underline">
            {row.original.partNumber}
          </Link>
          {showFlagsInline ? <FlagTags flags={row.original.flags} /> : null}
        </span>
      );
    case "polarity":
      return ({ row }) => row.original.polarity.toUpperCase();
    case "package":
      return ({ row }) => row.original.packageName;
    case "configuration":
      return ({ row }) => row.original.configuration;
    case "vceo":
      return ({ row }) => formatQuantity(row.original.vceoVolts, "voltage");
    case "icMax":
      return ({ row }) => formatQuantity(row.original.icMaxAmps, "current");
    case "ptot":
      return ({ row }) => (row.original.ptotWatts == null ? dash() : formatQuantity(row.original.ptotWatts, "power"));
    case "ft":
      return ({ row }) => (row.original.ftHz == null ? dash() : formatQuantity(row.original.ftHz, "frequency"));
    case "hfe":
      return ({ row }) =>
        query.hfeAt !== undefined ? (
          row.original.hfeAtChosen == null ? (
            dash()
          ) : (
            <span title={`worst-case hFE at ${formatQuantity(query.hfeAt, "current")}; quoted ${row.original.hfeSummary}`}>
              {Math.round(row.original.hfeAtChosen)}
            </span>
          )
        ) : (
          <span className="whitespace-nowrap text-ink/80">{row.original.hfeSummary || "—"}</span>
        );
    case "lifecycle":
      return ({ row }) => {
        const lifecycle = row.original.lifecycle;
        return lifecycle === "active" ? (
          <span className="text-ink/70">active</span>
        ) : (
          <span
            className={`whitespace-nowrap rounded-sm px-1.5 text-xs font-medium ${lifecycle === "obsolete" ? "bg-fault-soft text-fault" : "bg-caution-soft text-caution"}`}
            title={LIFECYCLE_LABELS[lifecycle]}
          >
            {LIFECYCLE_SHORT[lifecycle]}
          </span>
        );
      };
    case "offers":
      return ({ row }) => (row.original.offerCount === 0 ? dash() : row.original.offerCount);
    case "price":
      return ({ row }) => (row.original.bestUnitPrice ? formatMoney(row.original.bestUnitPrice.amount, row.original.bestUnitPrice.currency) : dash());
    case "stock":
      return ({ row }) => (row.original.offerCount === 0 ? dash() : formatCount(row.original.stockTotal));
    case "flags":
      return ({ row }) => <FlagTags flags={row.original.flags} />;
    default:
      return () => dash();
  }
}

function headerLabel(column: PartColumn, query: PartListQuery): string {
  if (column.id === "hfe" && query.hfeAt !== undefined) return `hFE @ ${formatQuantity(query.hfeAt, "current")}`;
  return column.label;
}

export function CatalogueTable({
  rows,
  columns,
  query,
  total,
}: {
  rows: CatalogueRow[];
  columns: readonly PartColumn[];
  query: PartListQuery;
  total: number;
}) {
  const showFlagsInline = !columns.some((c) => c.id === "flags");
  const defs: ColumnDef<CatalogueRow>[] = columns.map((column) => ({
    id: column.id,
    header: () => headerLabel(column, query),
    cell: cellFor(column, query, showFlagsInline),
    enableSorting: column.sort !== null,
    meta: column,
  }));
  const sortedColumn = columns.find((c) => c.sort === query.sort);
  const table = useReactTable({
    data: rows,
    columns: defs,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => row.id,
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    rowCount: total,
    state: {
      sorting: sortedColumn ? [{ id: sortedColumn.id, desc: query.dir === "desc" }] : [],
      pagination: { pageIndex: query.page - 1, pageSize: query.size },
    },
  });

  return (
    <div className="overflow-x-auto rounded border border-rule bg-white">
      <table className="w-full border-collapse text-sm" data-testid="catalogue-table">
        <thead className="bg-paper/60">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule">
              {group.headers.map((header) => {
                const column = header.column.columnDef.meta as PartColumn;
                const sorted = header.column.getIsSorted();
                const numeric = NUMERIC_COLUMNS.has(column.id);
                const label = flexRender(header.column.columnDef.header, header.getContext());
                const nextDir = sorted === "asc" ? "desc" : "asc";
                return (
                  <th
                    key={header.id}
                    scope="col"
                    className={`whitespace-nowrap px-2 py-2 font-medium first:pl-3 last:pr-3 ${numeric ? "text-right" : "text-left"}`}
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                  >
                    {column.sort ? (
                      <Link
                        to={listHref(query, { sort: column.sort, dir: sorted ? nextDir : "asc", page: 1 })}
                        className={`inline-flex items-baseline gap-1 hover:text-signal ${sorted ? "text-signal" : ""}`}
                        title={`Sort by ${column.label}${sorted ? (nextDir === "asc" ? ", ascending" : ", descending") : ""}`}
                      >
                        {label}
                        <span aria-hidden="true" className={`text-[10px] ${sorted ? "" : "text-ink/25"}`}>
                          {sorted === "desc" ? "▼" : sorted === "asc" ? "▲" : "↕"}
                        </span>
                      </Link>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule/60 last:border-b-0 hover:bg-signal-soft/40">
              {row.getVisibleCells().map((cell) => {
                const column = cell.column.columnDef.meta as PartColumn;
                return (
                  <td
                    key={cell.id}
                    className={`px-2 py-1.5 align-baseline first:pl-3 last:pr-3 ${NUMERIC_COLUMNS.has(column.id) ? "whitespace-nowrap text-right tabular-nums" : ""}`}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function Pager({ query, total }: { query: PartListQuery; total: number }) {
  const pages = Math.max(1, Math.ceil(total / query.size));
  const first = total === 0 ? 0 : (query.page - 1) * query.size + 1;
  const last = Math.min(total, query.page * query.size);
  const linkClass = "rounded border border-rule bg-white px-2.5 py-1 hover:bg-paper";
  const disabledClass = "rounded border border-rule/60 px-2.5 py-1 text-ink/30";
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p className="tabular-nums" data-testid="result-count">
        {total === 0 ? "No parts" : `${first}–${last} of ${formatCount(total)} part${total === 1 ? "" : "s"}`}
        {pages > 1 ? <span className="text-ink/60">{` · page ${query.page} of ${pages}`}</span> : null}
      </p>
      {pages > 1 ? (
        <div className="flex items-center gap-1">
          {query.page > 1 ? (
            <Link to={listHref(query, { page: query.page - 1 })} className={linkClass} rel="prev">
              ← Previous
            </Link>
          ) : (
            <span className={disabledClass}>← Previous</span>
          )}
          {query.page < pages ? (
            <Link to={listHref(query, { page: query.page + 1 })} className={linkClass} rel="next">
              Next →
            </Link>
          ) : (
            <span className={disabledClass}>Next →</span>
          )}
        </div>
      ) : null}
    </nav>
  );
}
