// The rejected rows of an intake as a CSV to correct and upload again: the file's own header and cells, in its own
// delimiter (so its decimal mark still holds), with a problems column first. Cells a spreadsheet would run as a
// formula are written with a leading apostrophe (papaparse's escapeFormulae); the intake reads them back as typed.
import Papa from "papaparse";
import type { IntakeFormat } from "./columns";
import type { IntakeProblem } from "./problems";
import { readTable } from "./read-table";

/** The rows with errors, each with its problems in words, or null when the file itself could not be read. */
export function writeRejectedRows(bytes: Uint8Array, format: IntakeFormat, problems: readonly IntakeProblem[]): string | null {
  const byRow = new Map<number, string[]>();
  for (const problem of problems) {
    if (problem.severity !== "error" || problem.row === null || problem.row < 2) continue;
    const said = byRow.get(problem.row) ?? [];
    said.push(problem.column ? `${problem.column}: ${problem.message}` : problem.message);
    byRow.set(problem.row, said);
  }
  const table = readTable(bytes, format);
  if (!table.ok) return null;
  let header: string[] = [];
  const data: string[][] = [];
  table.eachRecord((record) => {
    const said = byRow.get(record.row);
    if (said) data.push([`row ${record.row}: ${said.join("; ")}`, ...padded(record.cells, table.headerWidth)]);
  });
  Papa.parse<string[]>(new TextDecoder().decode(bytes).replace(/^\uFEFF/, ""), {
    delimiter: table.delimiter,
    preview: 1,
    step: (result) => {
      header = result.data;
    },
  });
  // A byte-order mark, so spreadsheets open the UTF-8 file with its accents and micro signs intact.
  return `\uFEFF${Papa.unparse({ fields: ["problems", ...header], data }, { delimiter: table.delimiter, escapeFormulae: true, newline: "\r\n" })}\r\n`;
}

function padded(cells: readonly string[], width: number): string[] {
  return cells.length >= width ? [...cells] : [...cells, ...Array<string>(width - cells.length).fill("")];
}
