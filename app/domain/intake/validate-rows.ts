// The row pipeline both formats share: cells -> raw row -> zod -> accepted row or problems with row and column.
import type { z } from "zod";
import type { CellValue } from "./cells";
import { groupColumnName, type ColumnGroupSpec, type IntakeFormat } from "./columns";
import { cellProblem, fileProblem, type IntakeKind, type IntakeParseResult, type IntakeProblem, type IntakeRow } from "./problems";
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

export interface RowRules<V> {
  /** Builds the candidate domain object (with defaults) from the typed cells. */
  assemble: (raw: RawRow) => unknown;
  schema: z.ZodType<V>;
  /** Identity of a row for the duplicate check (null when its naming cells are missing). */
  identify: (raw: RawRow) => string | null;
  duplicateColumn: string;
  duplicateMessage: (firstRow: number) => string;
}

/** Validates every record of a mapped table; a row with any error is left out of `rows`. */
export function validateRows<K extends IntakeKind, V>(table: Table, format: IntakeFormat, rules: RowRules<V>): IntakeParseResult<K, V> {
  const kind = format.kind as K;
  const problems = [...table.problems];
  if (!table.ok) return { kind, rows: [], problems };

  const rows: Array<IntakeRow<V>> = [];
  const firstRowByKey = new Map<string, number>();
  const locator = makeIssueLocator(format);
  let recordCount = 0;

  table.eachRecord((record) => {
    recordCount += 1;
    const rowProblems: IntakeProblem[] = [];
    // Cells of a row with a broken quote or too many cells are shifted; judging them would only add noise.
    if (record.quoteProblem !== null) {
      problems.push(cellProblem(record.row, null, null, record.quoteProblem));
      return;
    }
    if (!checkWidth(record, table, rowProblems)) {
      problems.push(...rowProblems);
      return;
    }
    const raw: RawRow = { fields: {}, points: {} };
    for (const group of format.groups) raw.points[group.field] = [];
    let badColumns: Set<string> | null = null;

    for (const column of table.columns) {
      const cell = record.cells[column.index] ?? "";
      const result = column.read(cell);
      if (!result.ok) {
        badColumns ??= new Set();
        badColumns.add(column.name);
        rowProblems.push(cellProblem(record.row, column.name, cell.trim(), result.message));
      }
      const value = result.ok ? result.value : null;
      // A point exists when any of its cells is filled in (only empty cells read as null), even one that failed.
      if (column.group) {
        if (!result.ok || value !== null) pointFor(raw, column.group, column.pointNumber).values[column.spec.field] = value;
      } else {
        raw.fields[column.spec.field] = value;
      }
    }
    for (const group of format.groups) raw.points[group.field].sort((a, b) => a.pointNumber - b.pointNumber);

    const parsed = rules.schema.safeParse(rules.assemble(raw));
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const place = locator(issue.path, raw);
        if (badColumns?.has(place.column)) continue;
        rowProblems.push(cellProblem(record.row, place.column, cellText(record.cells, table, place.column), place.context + issue.message));
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

    problems.push(...rowProblems);
    if (parsed.success && rowProblems.length === 0) rows.push({ row: record.row, value: parsed.data });
  });
  if (recordCount === 0) return { kind, rows: [], problems: [...problems, fileProblem("The file has a header but no data rows.")] };
  return { kind, rows, problems };
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

// Zod paths name domain fields; problems name the file's columns (and the point, for groups).
function makeIssueLocator(format: IntakeFormat): Locator {
  const columnByField = new Map(format.columns.map((c) => [c.field, c.name]));
  const groupByField = new Map(format.groups.map((g) => [g.field, g]));
  return (path, raw) => {
    const groupAt = path.findIndex((p) => typeof p === "string" && groupByField.has(p));
    if (groupAt >= 0) {
      const group = groupByField.get(path[groupAt] as string)!;
      const index = path[groupAt + 1];
      const first = group.columns[0];
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
