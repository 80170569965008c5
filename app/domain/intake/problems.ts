// What an intake reports about a file: one entry per bad cell, row, column or file.
import type { IntakeReading } from "./readings";

export type IntakeKind = "parts" | "offers";

export type ProblemSeverity = "error" | "warning";

export interface IntakeProblem {
  /** Row as a spreadsheet shows it (header = 1); null for file-level problems. */
  row: number | null;
  column: string | null;
  value: string | null;
  message: string;
  severity: ProblemSeverity;
}

export interface IntakeRow<V> {
  row: number;
  value: V;
  /** Fields whose column is in the file but whose cell was empty: a re-import clears them (absent columns do not). */
  empty?: string[];
}

export interface IntakeParseResult<K extends IntakeKind, V> {
  kind: K;
  rows: Array<IntakeRow<V>>;
  problems: IntakeProblem[];
  /** How cells of accepted rows were read when not taken literally. */
  readings: IntakeReading[];
  /** Cells read in ways past the listed readings' cap. */
  readingsNotListed: number;
  /** Fields the file has a column for; the others stay as the catalogue has them (`gainPoints.tempC` for a point's field). */
  presentFields: string[];
  /** Identity keys of every row that named its part (or offer), accepted or not. */
  identities: string[];
}

const SHOWN_VALUE_LENGTH = 80;

/** A file-level error (encoding, missing columns, no rows): the whole file is refused. */
export function fileProblem(message: string): IntakeProblem {
  return { row: null, column: null, value: null, message, severity: "error" };
}

export function cellProblem(
  row: number,
  column: string | null,
  value: string | null,
  message: string,
  severity: ProblemSeverity = "error",
): IntakeProblem {
  return { row, column, value: shortenValue(value), message, severity };
}

// Problems are stored and shown; a 500-character cell need not be repeated whole.
function shortenValue(value: string | null): string | null {
  if (value === null || value.length <= SHOWN_VALUE_LENGTH) return value;
  return `${value.slice(0, SHOWN_VALUE_LENGTH)}…`;
}

/** Rows rejected by at least one error (file-level errors reject no particular row). */
export function countRejectedRows(problems: readonly IntakeProblem[]): number {
  const rows = new Set<number>();
  for (const problem of problems) {
    if (problem.severity === "error" && problem.row !== null && problem.row > 1) rows.add(problem.row);
  }
  return rows.size;
}

/** True when the file itself was refused, so no row can be committed. */
export function hasFileError(problems: readonly IntakeProblem[]): boolean {
  return problems.some((p) => p.severity === "error" && (p.row === null || p.row === 1));
}
