// What the preview understood (readings of cells not taken literally) and what a re-import leaves out.
import { Link } from "react-router";
import type { MissingPartView, ReadingView } from "./types.ts";

export function ReadingsTable({ readings, notListed }: { readings: readonly ReadingView[]; notListed: number }) {
  if (readings.length === 0) {
    return <p className="rounded border border-rule bg-white px-4 py-3 text-sm">Every accepted cell was read as it stands.</p>;
  }
  return (
    <div className="overflow-x-auto rounded border border-rule bg-white">
      <table className="w-full border-collapse text-sm" data-testid="readings-table">
        <thead className="bg-paper/60">
          <tr className="border-b border-rule text-left">
            <th scope="col" className="px-3 py-2 font-medium">Column</th>
            <th scope="col" className="px-3 py-2 font-medium">Typed</th>
            <th scope="col" className="px-3 py-2 font-medium">Read as</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Cells</th>
            <th scope="col" className="px-3 py-2 font-medium">Rows</th>
          </tr>
        </thead>
        <tbody>
          {readings.map((r) => (
            <tr key={`${r.column}-${r.value}-${r.reading}`} className="border-b border-rule/60 align-top last:border-b-0" data-reading-column={r.column}>
              <td className="px-3 py-1.5 font-mono text-xs leading-5">{r.column}</td>
              <td className="max-w-48 truncate px-3 py-1.5 font-mono text-xs leading-5" title={r.value}>
                {r.value === "" ? <span className="text-ink/40">empty</span> : r.value}
              </td>
              <td className="min-w-40 px-3 py-1.5">{r.reading}</td>
              <td className="px-3 py-1.5 text-right tabular-nums">{r.count}</td>
              <td className="px-3 py-1.5 tabular-nums text-ink/70">
                {r.rows.join(", ")}
                {r.count > r.rows.length ? ", …" : ""}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {notListed > 0 ? <p className="px-3 py-2 text-sm text-ink/70">{`${notListed} more cells were read in ways not listed here.`}</p> : null}
    </div>
  );
}

export function MissingPartsList({ parts, total }: { parts: readonly MissingPartView[]; total: number }) {
  if (total === 0) return null;
  return (
    <div className="rounded border border-caution/40 bg-caution-soft/40 px-4 py-3 text-sm" data-testid="missing-parts">
      <p>
        {total === 1
          ? "1 catalogue part of a manufacturer this file re-imports is not in the file. It stays in the catalogue as it is; nothing is deleted."
          : `${total} catalogue parts of manufacturers this file re-imports are not in the file. They stay in the catalogue as they are; nothing is deleted.`}
      </p>
      <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1">
        {parts.map((p) => (
          <li key={p.id}>
            <Link to={`/catalogue/${p.id}`} className="text-signal underline">
              {`${p.partNumber}`}
            </Link>{" "}
            <span className="text-ink/60">{p.manufacturer}</span>
          </li>
        ))}
      </ul>
      {total > parts.length ? <p className="mt-2 text-ink/70">{`Showing ${parts.length} of ${total}.`}</p> : null}
    </div>
  );
}
