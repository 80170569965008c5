// The row pipeline both formats share: cells -> raw row -> zod -> accepted row or problems with row and column.
import type { z } from "zod";
import { isEmptyMarker, type CellValue } from "./cells";
import { groupColumnName, type ColumnGroupSpec, type IntakeFormat } from "./columns";
import { ProblemCollector } from "./problem-cap";
import { cellProblem, fileProblem, type IntakeKind, type IntakeParseResult, type IntakeProblem, type IntakeRow } from "./problems";
import { ReadingCollector, type CellReading } from "./readings";
import type { Table, TableRecord } from "./read-table";

/** One numbered point (`gain2_*`) as read from the cells. */
export interface RawPoint {
  pointNumber: number;
  values: Record<string, CellValue>;
}

/** A record's cells read into typed values by field name, before the row rules run. */
export interface RawRow {
  fields: Record<string, CellValue>;
  /** Points with at least one value, by group field (`gainPoints`), in point-number order. */
  points: Record<string, RawPoint[]>;
}

/** What a row rule may report while it assembles a row: a problem, or how it read a cell. */
export interface RowReport {
  problem: (column: string, message: string) => void;
  reading: (column: string, reading: string) => void;
}

export interface RowRules<V> {
  /** Builds the candidate domain object (with defaults) from the typed cells. */
  assemble: (raw: RawRow, report: RowReport) => unknown;
  schema: z.ZodType<V>;
  /** Identity of a row for the duplicate check (null when its naming cells are missing). */
  identify: (raw: RawRow) => string | null;
  duplicateColumn: string;
  duplicateMessage: (firstRow: number) => string;
  /** Warnings about an accepted row (plausibility across fields); they do not reject it. */
  warn?: (value: V, columnOf: ColumnLocator) => Array<{ column: string; message: string }>;
}

/** The file's column for a domain field, or for a field of the n-th point of a group (0-based, as in the value). */
export type ColumnLocator = (field: string, group?: { field: string; index: number }) => string;

/** Validates every record of a mapped table; a row with any error is left out of `rows`. */
export function validateRows<K extends IntakeKind, V>(table: Table, format: IntakeFormat, rules: RowRules<V>): IntakeParseResult<K, V> {
  const kind = format.kind as K;
  const problems = new ProblemCollector(table.problems);
  const presentFields = listPresentFields(table);
  const present = new Set(presentFields);
  const readings = new ReadingCollector();
  const firstRowByKey = new Map<string, number>();
  const result = (rows: Array<IntakeRow<V>>): IntakeParseResult<K, V> => ({
    kind,
    rows,
    problems: problems.list(),
    readings: readings.list(),
    readingsNotListed: readings.overflow,
    presentFields,
    identities: [...firstRowByKey.keys()],
  });
  if (!table.ok) return result([]);
  for (const reading of table.headerReadings) readings.add(1, reading);

  const rows: Array<IntakeRow<V>> = [];
  const locator = makeIssueLocator(format);
  let recordCount = 0;

  table.eachRecord((record) => {
    recordCount += 1;
    const rowProblems: IntakeProblem[] = [];
    // Cells of a row with a broken quote or too many cells are shifted; judging them would only add noise.
    if (record.quoteProblem !== null) {
      problems.add(record.row, [cellProblem(record.row, null, null, record.quoteProblem)]);
      return problems.withinCap();
    }
    if (!checkWidth(record, table, rowProblems)) {
      problems.add(record.row, rowProblems);
      return problems.withinCap();
    }
    const raw: RawRow = { fields: {}, points: {} };
    for (const group of format.groups) raw.points[group.field] = [];
    // Made only when a row needs them: most rows of a large file have no bad cell, reading or empty cell.
    let badColumns: Set<string> | null = null;
    let rowReadings: CellReading[] | null = null;
    let emptyMarkers: Map<string, string> | null = null;
    let emptyFields: string[] | null = null;

    for (const column of table.columns) {
      const cell = record.cells[column.index] ?? "";
      const result = column.read(cell);
      if (!result.ok) {
        (badColumns ??= new Set()).add(column.name);
        rowProblems.push(cellProblem(record.row, column.name, cell.trim(), result.message));
      } else if (result.reading) {
        (rowReadings ??= []).push({ column: column.name, value: cell.trim(), reading: result.reading });
      }
      if (result.ok && result.value === null && isEmptyMarker(cell)) (emptyMarkers ??= new Map()).set(column.name, cell.trim());
      const value = result.ok ? result.value : null;
      // A point exists when any of its cells is filled in (only empty cells read as null), even one that failed.
      if (column.group) {
        if (!result.ok || value !== null) pointFor(raw, column.group, column.pointNumber).values[column.spec.field] = value;
      } else {
        raw.fields[column.spec.field] = value;
        if (result.ok && value === null) (emptyFields ??= []).push(column.spec.field);
      }
    }
    for (const group of format.groups) {
      raw.points[group.field].sort((a, b) => a.pointNumber - b.pointNumber);
      if (present.has(group.field) && raw.points[group.field].length === 0) (emptyFields ??= []).push(group.field);
    }

    const report: RowReport = {
      problem: (column, message) => {
        (badColumns ??= new Set()).add(column);
        rowProblems.push(cellProblem(record.row, column, cellText(record.cells, table, column), message));
      },
      reading: (column, reading) => (rowReadings ??= []).push({ column, value: cellText(record.cells, table, column) ?? "", reading }),
    };
    const parsed = rules.schema.safeParse(rules.assemble(raw, report));
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const place = locator(issue.path, raw);
        if (badColumns?.has(place.column) || (badColumns && badAlternative(format, place.column, badColumns))) continue;
        const marker = emptyMarkers?.get(place.column);
        const note = marker === undefined ? "" : ` ("${marker}" counts as an empty cell)`;
        rowProblems.push(cellProblem(record.row, place.column, cellText(record.cells, table, place.column), place.context + issue.message + note));
      }
    }
    // Identity comes from the cells, so a part repeated after a rejected row is still caught.
    const key = rules.identify(raw);
    const firstRow = key === null ? undefined : firstRowByKey.get(key);
    if (firstRow !== undefined) {
      rowProblems.push(cellProblem(record.row, rules.duplicateColumn, cellText(record.cells, table, rules.duplicateColumn), rules.duplicateMessage(firstRow)));
    } else if (key !== null) {
      firstRowByKey.set(key, record.row);
    }

    if (parsed.success && rowProblems.length === 0) {
      const columnOf: ColumnLocator = (field, group) => columnFor(format, raw, field, group);
      for (const warning of rules.warn?.(parsed.data, columnOf) ?? []) {
        rowProblems.push(cellProblem(record.row, warning.column, cellText(record.cells, table, warning.column), warning.message, "warning"));
      }
      rows.push(emptyFields ? { row: record.row, value: parsed.data, empty: emptyFields } : { row: record.row, value: parsed.data });
      for (const reading of rowReadings ?? []) readings.add(record.row, reading);
    }
    problems.add(record.row, rowProblems);
    return problems.withinCap();
  });
  if (problems.stoppedAt !== null) return result([]);
  if (recordCount === 0) {
    problems.add(null, [fileProblem("The file has a header but no data rows.")]);
    return result([]);
  }
  return result(rows);
}

/** Domain fields the file has a column for (`gainPoints.tempC` for a point's field); absent ones stay unchanged. */
function listPresentFields(table: Table): string[] {
  const present = new Set<string>();
  for (const column of table.columns) {
    if (column.group) {
      present.add(column.group.field);
      present.add(`${column.group.field}.${column.spec.field}`);
    } else {
      present.add(column.spec.field);
    }
  }
  return [...present];
}

// A point's values may come from an alternative column (`gainN_hfe`): when that one failed, the point's other
// columns are not judged again ("give at least one of hFE min, typ or max" would only repeat the problem).
function badAlternative(format: IntakeFormat, column: string, badColumns: ReadonlySet<string>): boolean {
  for (const group of format.groups) {
    const match = new RegExp(`^${group.prefix}(\\d+)_`).exec(column);
    if (!match) continue;
    return group.columns.some((c) => c.alternative && badColumns.has(`${group.prefix}${match[1]}_${c.name}`));
  }
  return false;
}

function pointFor(raw: RawRow, group: ColumnGroupSpec, pointNumber: number): RawPoint {
  const points = raw.points[group.field];
  for (const point of points) if (point.pointNumber === pointNumber) return point;
  const values: Record<string, CellValue> = {};
  for (const column of group.columns) values[column.field] = null;
  const point = { pointNumber, values };
  points.push(point);
  return point;
}

function checkWidth(record: TableRecord, table: Table, problems: IntakeProblem[]): boolean {
  let width = record.cells.length;
  while (width > table.headerWidth && record.cells[width - 1].trim() === "") width -= 1;
  if (width <= table.headerWidth) return true;
  const hint = table.delimiter === "," ? "; a decimal comma in a comma-separated file must be inside double quotes" : "";
  problems.push(cellProblem(record.row, null, null, `the row has ${width} cells but the header has ${table.headerWidth} columns${hint}`));
  return false;
}

function cellText(cells: string[], table: Table, columnName: string): string | null {
  const column = table.columns.find((c) => c.name === columnName);
  const text = column ? (cells[column.index] ?? "").trim() : "";
  return text === "" ? null : text;
}

type Locator = (path: readonly PropertyKey[], raw: RawRow) => { column: string; context: string };

// The accepted value's points keep the raw row's order, so the n-th point is raw point n (with its own number).
function columnFor(format: IntakeFormat, raw: RawRow, field: string, group?: { field: string; index: number }): string {
  if (!group) return format.columns.find((c) => c.field === field)?.name ?? field;
  const spec = format.groups.find((g) => g.field === group.field)!;
  const column = spec.columns.find((c) => c.field === field) ?? spec.columns[0];
  return groupColumnName(spec, raw.points[group.field][group.index]?.pointNumber ?? group.index + 1, column);
}

// Zod paths name domain fields; problems name the file's columns (and the point, for groups).
function makeIssueLocator(format: IntakeFormat): Locator {
  const columnByField = new Map(format.columns.map((c) => [c.field, c.name]));
  const groupByField = new Map(format.groups.map((g) => [g.field, g]));
  return (path, raw) => {
    const groupAt = path.findIndex((p) => typeof p === "string" && groupByField.has(p));
    if (groupAt >= 0) {
      const group = groupByField.get(path[groupAt] as string)!;
      const index = path[groupAt + 1];
      const first = group.columns.find((c) => !c.alternative)!;
      if (typeof index !== "number") return { column: groupColumnName(group, 1, first), context: "" };
      const pointNumber = raw.points[group.field][index]?.pointNumber ?? index + 1;
      const field = path[groupAt + 2];
      const spec = group.columns.find((c) => c.field === field) ?? first;
      return { column: groupColumnName(group, pointNumber, spec), context: `${group.label} ${pointNumber}: ` };
    }
    const field = [...path].reverse().find((p): p is string => typeof p === "string");
    return { column: (field && columnByField.get(field)) ?? format.columns[0].name, context: "" };
  };
}
