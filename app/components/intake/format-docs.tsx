// The documentation of one intake file format: every column, its unit, whether it is required, an example.

import type { ColumnDoc } from "#app/domain/intake/columns.ts";

export type ColumnDocRow = ColumnDoc;

export function FormatTable({ kind, columns }: { kind: "parts" | "offers"; columns: readonly ColumnDocRow[] }) {
  return (
    <div className="overflow-x-auto rounded border border-rule bg-white">
      <table className="w-full border-collapse text-sm" data-format={kind}>
        <thead className="bg-paper/60">
          <tr className="border-b border-rule text-left">
            <th scope="col" className="px-3 py-2 font-medium">
              Column
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Meaning
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Type
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Unit
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Required
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Example
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Plausible
            </th>
          </tr>
        </thead>
        <tbody>
          {columns.map((c) => (
            <tr key={c.name} className="border-b border-rule/60 align-top last:border-b-0">
              <td className="whitespace-nowrap px-3 py-1.5 font-mono text-xs leading-5">{c.name}</td>
              <td className="min-w-64 px-3 py-1.5">
                <span className="font-medium">{c.label}</span>
                <span className="block text-ink/70">{c.description}</span>
              </td>
              <td className="min-w-28 px-3 py-1.5 text-ink/80">{c.type}</td>
              <td className="whitespace-nowrap px-3 py-1.5">{c.unit || <span className="text-ink/40">—</span>}</td>
              <td className="min-w-28 px-3 py-1.5">{c.required === "yes" ? <span className="font-medium">yes</span> : c.required}</td>
              <td className="max-w-48 break-all px-3 py-1.5 font-mono text-xs leading-5">{c.example}</td>
              <td className="min-w-36 px-3 py-1.5 text-ink/70">{c.plausible || "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
