import { Link } from "react-router";
import type { Route } from "./+types/formats";
import { FormatTable } from "#app/components/intake/format-docs.tsx";
import { formatBytes } from "#app/components/ui/format.ts";
import { INTAKE_FORMATS, listColumnDocs, MAX_CELL_LENGTH, MAX_INTAKE_BYTES } from "#app/domain/intake/columns.ts";
import { NUMBER_STYLES, WHOLE_NUMBER_RULE } from "#app/domain/intake/number-style.ts";
import { MAX_PROBLEMS } from "#app/domain/intake/problem-cap.ts";
import { requireRole } from "#app/lib/auth.server.ts";

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  return {
    formats: (["parts", "offers"] as const).map((kind) => ({ kind, description: INTAKE_FORMATS[kind].description, columns: listColumnDocs(kind) })),
    maxBytes: MAX_INTAKE_BYTES,
    maxCellLength: MAX_CELL_LENGTH,
    maxProblems: MAX_PROBLEMS,
    // The same table the cell readers use, so this page and the code cannot disagree.
    numberStyles: NUMBER_STYLES.map(({ files, rule }) => ({ files, rule })),
    wholeNumberRule: WHOLE_NUMBER_RULE,
  };
}

export const meta: Route.MetaFunction = () => [{ title: "Intake file formats · Betasift" }];

const code = "rounded bg-paper px-1 font-mono text-[0.85em]";

export default function Formats({ loaderData }: Route.ComponentProps) {
  const { formats, maxBytes, maxCellLength, maxProblems, numberStyles, wholeNumberRule } = loaderData;
  return (
    <section className="space-y-8">
      <div>
        <p className="text-sm">
          <Link to="/intakes" className="text-signal underline">Intakes</Link>
        </p>
        <h1 className="mt-2 text-2xl font-semibold">Intake file formats</h1>
        <p className="mt-1 max-w-3xl text-ink/70">
          Two CSV formats of our own: one for datasheet values (parts) and one for stock and prices (offers). Start from a template:{" "}
          <a href="/intakes/templates/parts" className="text-signal underline">parts template</a>,{" "}
          <a href="/intakes/templates/offers" className="text-signal underline">offers template</a>.
        </p>
      </div>

      <div className="grid gap-4 md:grid-cols-2">
        <div className="rounded border border-rule bg-white p-4 text-sm">
          <h2 className="font-semibold">The file</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5">
            <li>One header row, then one row per part (or per part and supplier). Column names are not case-sensitive; spaces and hyphens count as underscores (<code className={code}>Part Number</code> is <code className={code}>part_number</code>).</li>
            <li>Columns may be separated by commas, semicolons, tabs or vertical bars; the header tells which.</li>
            <li>UTF-8, with or without a byte-order mark. Other encodings are refused with a message saying so; save the sheet as “CSV UTF-8”.</li>
            <li>Quote cells that hold the separator or a line break: <code className={code}>"Larkfield, Ltd"</code>.</li>
            <li>Up to {formatBytes(maxBytes)} per file and {maxCellLength} characters per cell. Cells that start like a spreadsheet formula (<code className={code}>=</code>, <code className={code}>@</code>) are refused, never evaluated.</li>
            <li>Columns the format does not know are reported as warnings and ignored; so is the <code className={code}>problems</code> column of a rejected-rows download.</li>
            <li>A file with more than {maxProblems} problems stops there with a summary of the most frequent ones; fix those and upload it again.</li>
            <li>A re-import changes only the columns it has: a column left out keeps the catalogue's values; an empty cell in a column clears the value, and the preview marks each one.</li>
          </ul>
        </div>
        <div className="rounded border border-rule bg-white p-4 text-sm">
          <h2 className="font-semibold">Units and numbers</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5">
            <li>Write values with or without a unit: <code className={code}>100 mA</code>, <code className={code}>100mA</code>, <code className={code}>0.1 A</code>; without a unit the SI base unit (V, A, W, Hz, F) is meant.</li>
            <li>SI prefixes p, n, µ (or u), m, k, M, G: <code className={code}>10 µA</code>, <code className={code}>10uA</code>, <code className={code}>250 MHz</code>, <code className={code}>4 pF</code>.</li>
            <li>A unit given once in the header applies to the whole column: <code className={code}>ic_max [mA]</code> or <code className={code}>ic_max (mA)</code>; a unit in a cell wins.</li>
            <li>Temperatures in °C (<code className={code}>150 °C</code>, <code className={code}>150 C</code>); thermal resistance in °C/W or K/W.</li>
            {numberStyles.map((style) => (
              <li key={style.files}>
                {style.files}: {style.rule}
              </li>
            ))}
            <li>{wholeNumberRule}</li>
            <li>No digit grouping elsewhere; PNP ratings as magnitudes (no minus sign; a typographic minus − reads as one).</li>
            <li>
              Written as datasheets print them: <code className={code}>100-300</code>, <code className={code}>≥ 100</code>, <code className={code}>typ 200</code> in hFE
              columns; <code className={code}>n/a</code>, <code className={code}>-</code> or <code className={code}>—</code> for an empty cell; <code className={code}>N</code> or{" "}
              <code className={code}>P</code> for the polarity; <code className={code}>EOL</code> for obsolete; <code className={code}>€0,12</code> and <code className={code}>100+</code> in
              offers. The preview lists every such reading.
            </li>
          </ul>
        </div>
        <div className="rounded border border-rule bg-white p-4 text-sm md:col-span-2">
          <h2 className="font-semibold">Numbered groups</h2>
          <p className="mt-2">
            A datasheet quotes hFE at one, two or more collector currents. Each point is a numbered group of columns:{" "}
            <code className={code}>gain1_ic</code>, <code className={code}>gain1_hfe_min</code>, … then <code className={code}>gain2_ic</code>,{" "}
            <code className={code}>gain2_hfe_min</code>, … as many as the file needs. Saturation points work the same way (<code className={code}>sat1_ic</code>,{" "}
            <code className={code}>sat1_vce_max</code>, …) and so do the price breaks of an offer (<code className={code}>break1_qty</code>,{" "}
            <code className={code}>break1_price</code>, …). A group left empty in a row is skipped; a group with values needs its IC (or quantity).
          </p>
        </div>
      </div>

      {formats.map((format) => (
        <section key={format.kind} aria-labelledby={`${format.kind}-heading`}>
          <div className="flex flex-wrap items-baseline justify-between gap-3">
            <h2 id={`${format.kind}-heading`} className="text-lg font-semibold">
              {format.kind === "parts" ? "Parts file" : "Offers file"}
            </h2>
            <a href={`/intakes/templates/${format.kind}`} className="text-sm text-signal underline">
              Download the {format.kind} template
            </a>
          </div>
          <p className="mb-3 mt-1 text-sm text-ink/70">{format.description}</p>
          <FormatTable kind={format.kind} columns={format.columns} />
        </section>
      ))}
    </section>
  );
}
