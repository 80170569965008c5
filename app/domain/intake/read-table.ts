// From uploaded bytes to records and a header mapped onto a format's columns, with file-level problems.
import Papa from "papaparse";
import type { DecimalMark } from "../quantity";
import { checkHeaderUnit, makeCellReader, type CellReader } from "./cells";
import { groupColumnName, type ColumnGroupSpec, type ColumnSpec, type IntakeFormat } from "./columns";
import { decodeIntakeBytes } from "./decode";
import { DELIMITERS, numberStyleOf, type Delimiter } from "./number-style";
import { cellProblem, fileProblem, type IntakeKind, type IntakeProblem } from "./problems";
import type { CellReading } from "./readings";

export { DELIMITERS, type Delimiter } from "./number-style";

export interface MappedColumn {
  /** Position in each record. */
  index: number;
  /** Normalised name, e.g. `ic_max` or `gain2_hfe_min`. */
  name: string;
  spec: ColumnSpec;
  group: ColumnGroupSpec | null;
  /** N of `gainN_*`; 0 for ordinary columns. */
  pointNumber: number;
  read: CellReader;
}

export interface TableRecord {
  /** Row number as a spreadsheet shows it (header = 1), counted in records, not lines. */
  row: number;
  cells: string[];
  /** Quoting broke in this record, so its cells cannot be trusted. */
  quoteProblem: string | null;
}

export interface Table {
  /** False when a file-level or header error refuses the whole file. */
  ok: boolean;
  delimiter: Delimiter;
  headerWidth: number;
  columns: MappedColumn[];
  problems: IntakeProblem[];
  /** How header cells were read when not literally (`vceo (V)` as the unit V). */
  headerReadings: CellReading[];
  /** Visits every non-blank record after the header, in order, without holding them all in memory; `false` stops. */
  eachRecord: (visit: (record: TableRecord) => boolean | void) => void;
}

const GROUP_NAME_PATTERN = /^([a-z]+)(\d+)_(.+)$/;
const HEADER_UNIT_PATTERN = /^(.*?)\s*\[([^\]]*)\]$/;
// "vceo (V)" as people write units in headers; tried only when the name before it is a known column.
const HEADER_PAREN_UNIT_PATTERN = /^(.*?)\s*\(([^)]*)\)$/;
// The column our rejected-rows download adds: ignored on the way back in.
const PROBLEMS_COLUMN = "problems";
const QUOTE_MESSAGES: Readonly<Record<string, string>> = {
  MissingQuotes: "a quoted cell starting on this row is never closed, so the rest of the file ran into it: a closing double quote is missing",
  InvalidQuotes: "a double quote inside a quoted cell must be doubled (\"\")",
};

/** Decodes a file and maps its header onto a format; the records are streamed by `eachRecord`. */
export function readTable(bytes: Uint8Array, format: IntakeFormat): Table {
  const refused = (problems: IntakeProblem[]): Table => ({ ok: false, delimiter: ",", headerWidth: 0, columns: [], problems, headerReadings: [], eachRecord: () => {} });
  const decoded = decodeIntakeBytes(bytes);
  if (!decoded.ok) return refused([decoded.problem]);
  const text = decoded.text;

  const delimiter = sniffDelimiter(text);
  const options = { delimiter, header: false, skipEmptyLines: false, quoteChar: '"' } as const;
  const headerCells = Papa.parse<string[]>(text, { ...options, preview: 1 }).data[0] ?? [];
  const problems: IntakeProblem[] = [];
  const header = mapHeader(headerCells, format, numberStyleOf(delimiter).decimalMark, problems);
  if (header.fatal) return refused(problems);

  const eachRecord = (visit: (record: TableRecord) => boolean | void) => {
    let index = 0;
    Papa.parse<string[]>(text, {
      ...options,
      step: (result, parser) => {
        index += 1;
        const cells = result.data;
        if (index === 1 || cells.every((cell) => cell.trim() === "")) return;
        const quoteError = result.errors.find((e) => QUOTE_MESSAGES[e.code] !== undefined);
        if (visit({ row: index, cells, quoteProblem: quoteError ? QUOTE_MESSAGES[quoteError.code] : null }) === false) parser.abort();
      },
    });
  };
  return { ok: true, delimiter, headerWidth: headerCells.length, columns: header.columns, problems, headerReadings: header.readings, eachRecord };
}

// Column names never contain a delimiter, so the header line alone tells which one the file uses.
export function sniffDelimiter(text: string): Delimiter {
  const end = text.indexOf("\n");
  const firstLine = end === -1 ? text : text.slice(0, end);
  const counts = new Map<Delimiter, number>(DELIMITERS.map((d) => [d, 0]));
  let quoted = false;
  for (const character of firstLine) {
    if (character === '"') quoted = !quoted;
    else if (!quoted && counts.has(character as Delimiter)) counts.set(character as Delimiter, counts.get(character as Delimiter)! + 1);
  }
  let best: Delimiter = ",";
  for (const delimiter of DELIMITERS) if (counts.get(delimiter)! > counts.get(best)!) best = delimiter;
  return best;
}

const columnName = (text: string) => text.trim().toLowerCase().replace(/[\s-]+/g, "_");

/** Trims, lower-cases, turns spaces and hyphens into `_`, and splits off a `[unit]`. */
export function normaliseHeaderCell(cell: string): { name: string; unit: string | null } {
  const trimmed = cell.trim();
  const match = HEADER_UNIT_PATTERN.exec(trimmed);
  const rawName = match ? match[1] : trimmed;
  const unit = match && match[2].trim() !== "" ? match[2].trim() : null;
  return { name: columnName(rawName), unit };
}

/** A `(unit)` after a name, as in "vceo (V)": the name and unit, or null when the cell has none. */
export function splitParenthesisedUnit(cell: string): { name: string; unit: string } | null {
  const match = HEADER_PAREN_UNIT_PATTERN.exec(cell.trim());
  return match && match[2].trim() !== "" ? { name: columnName(match[1]), unit: match[2].trim() } : null;
}

function mapHeader(
  cells: string[],
  format: IntakeFormat,
  decimalMark: DecimalMark,
  problems: IntakeProblem[],
): { fatal: boolean; columns: MappedColumn[]; readings: CellReading[] } {
  const fixed = new Map(format.columns.map((c) => [c.name, c]));
  const readings: CellReading[] = [];
  const groups = new Map(format.groups.map((g) => [g.prefix, g]));
  const seen = new Map<string, number>();
  const columns: MappedColumn[] = [];
  const unknown: string[] = [];
  let fatal = false;

  cells.forEach((cell, index) => {
    let { name: rawName, unit } = normaliseHeaderCell(cell);
    if (rawName === "" || rawName === PROBLEMS_COLUMN) return;
    let located = locateColumn(rawName, fixed, groups);
    const parenthesised = located || unit !== null ? null : splitParenthesisedUnit(cell);
    const inParentheses = parenthesised ? locateColumn(parenthesised.name, fixed, groups) : null;
    if (parenthesised && inParentheses) {
      ({ name: rawName, unit } = parenthesised);
      located = inParentheses;
      readings.push({ column: rawName, value: cell.trim(), reading: `read as "${rawName} [${unit}]": the column's unit is ${unit}` });
    }
    if (!located) {
      unknown.push(rawName);
      problems.push(cellProblem(1, rawName, cell.trim(), `unknown column "${rawName}" is ignored`, "warning"));
      return;
    }
    const { spec, group, pointNumber } = located;
    const name = group ? groupColumnName(group, pointNumber, spec) : spec.name;
    const earlier = seen.get(name);
    if (earlier !== undefined) {
      problems.push(cellProblem(1, name, cell.trim(), `column "${name}" appears twice (columns ${earlier + 1} and ${index + 1})`));
      fatal = true;
      return;
    }
    seen.set(name, index);
    if (unit !== null) {
      const unitProblem = checkHeaderUnit(spec, unit);
      if (unitProblem) {
        problems.push(cellProblem(1, name, cell.trim(), unitProblem));
        fatal = true;
        return;
      }
    }
    columns.push({ index, name, spec, group, pointNumber, read: makeCellReader(spec, { headerUnit: unit ?? "", decimalMark }) });
  });

  const missing = listMissingColumns(format, seen);
  if (missing.length > 0) {
    fatal = true;
    const otherKind = guessOtherKind(format.kind, seen, unknown);
    if (cells.length === 1) {
      problems.length = 0;
      problems.push(fileProblem("Could not tell the columns apart: the header row has a single column. Separate the columns with commas, semicolons, tabs or vertical bars (|)."));
    } else if (otherKind) {
      problems.splice(0, problems.length, ...problems.filter((p) => p.severity === "error"));
      problems.push(fileProblem(`This looks like ${otherKind === "offers" ? "an offers" : "a parts"} file, not ${format.kind === "offers" ? "an offers" : "a parts"} file: upload it as ${otherKind}.`));
    } else {
      problems.push(fileProblem(`Missing required columns: ${missing.join(", ")}.`));
    }
  }
  return { fatal, columns, readings };
}

function locateColumn(
  name: string,
  fixed: Map<string, ColumnSpec>,
  groups: Map<string, ColumnGroupSpec>,
): { spec: ColumnSpec; group: ColumnGroupSpec | null; pointNumber: number } | null {
  const spec = fixed.get(name);
  if (spec) return { spec, group: null, pointNumber: 0 };
  const match = GROUP_NAME_PATTERN.exec(name);
  if (!match) return null;
  const group = groups.get(match[1]);
  const pointNumber = Number(match[2]);
  const member = group?.columns.find((c) => c.name === match[3]);
  return group && member && pointNumber >= 1 ? { spec: member, group, pointNumber } : null;
}

// A required group needs its required columns for at least one point number.
function listMissingColumns(format: IntakeFormat, seen: Map<string, number>): string[] {
  const missing = format.columns.filter((c) => c.required && !seen.has(c.name)).map((c) => c.name);
  for (const group of format.groups.filter((g) => g.required)) {
    for (const column of group.columns.filter((c) => c.required)) {
      const suffix = `_${column.name}`;
      const present = [...seen.keys()].some((name) => name.startsWith(group.prefix) && name.endsWith(suffix) && GROUP_NAME_PATTERN.test(name));
      if (!present) missing.push(groupColumnName(group, 1, column));
    }
  }
  return missing;
}

function guessOtherKind(kind: IntakeKind, seen: Map<string, number>, unknown: string[]): IntakeKind | null {
  const other: IntakeKind = kind === "parts" ? "offers" : "parts";
  const names = new Set([...seen.keys(), ...unknown]);
  const distinctive = other === "offers" ? ["supplier", "stock", "currency"] : ["polarity", "vceo", "ic_max"];
  return distinctive.every((name) => names.has(name)) ? other : null;
}
