// Reads one cell of an intake file into a typed value, or says what is wrong with it.
import { lookUpUnit, parseQuantity, type Dimension, type ParseOptions } from "../quantity";
import { MAX_CELL_LENGTH, type ColumnSpec } from "./columns";

export type CellValue = string | number | null;
export type CellResult = { ok: true; value: CellValue } | { ok: false; message: string };

export type CellReader = (cell: string) => CellResult;

export interface ReaderContext {
  /** Unit from the column's header, e.g. `mA` from `ic_max [mA]`. */
  headerUnit: string;
  /** Semicolon files come from locales that write decimal commas, so a comma there is always decimal. */
  decimalComma: boolean;
}

const EMPTY: CellResult = { ok: true, value: null };
const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
const CURRENCY_PATTERN = /^[A-Za-z]{3}$/;
const ISO_CURRENCIES = new Set(Intl.supportedValuesOf("currency"));
const COLUMN_CACHE_LIMIT = 4096;
const FORMULA_STARTS = new Set(["=", "+", "-", "@"]);

/** Checks a header unit against the column once, before any cell is read. */
export function checkHeaderUnit(spec: ColumnSpec, unit: string): string | null {
  if (spec.type.kind !== "quantity") return `${spec.label} takes no unit in the header (got "[${unit}]")`;
  const result = lookUpUnit(unit, spec.type.dimension);
  return result.ok ? null : `column unit: ${result.reason}`;
}

/** Builds the reader for one column once, so the per-cell path does no set-up work. */
export function makeCellReader(spec: ColumnSpec, context: ReaderContext): CellReader {
  const read = spec.type.kind === "text" ? makeTypedReader(spec, context) : withCache(makeTypedReader(spec, context));
  return (cell) => {
    const value = cell.trim();
    if (value === "") return EMPTY;
    if (value.length > MAX_CELL_LENGTH) {
      return { ok: false, message: `the cell is ${value.length} characters long; at most ${MAX_CELL_LENGTH} are accepted` };
    }
    return read(value);
  };
}

// A column repeats its values ("5 V", "25 °C", a date), so each reader keeps its first few thousand results.
function withCache(read: CellReader): CellReader {
  const cache = new Map<string, CellResult>();
  return (value) => {
    const cached = cache.get(value);
    if (cached) return cached;
    const result = read(value);
    if (cache.size < COLUMN_CACHE_LIMIT) cache.set(value, result);
    return result;
  };
}

function makeTypedReader(spec: ColumnSpec, context: ReaderContext): CellReader {
  const type = spec.type;
  switch (type.kind) {
    case "text":
      return (value) => (looksLikeFormula(value) ? formulaProblem(value) : { ok: true, value });
    case "choice": {
      const byLowerCase = new Map<string, string>();
      for (const choice of type.choices) byLowerCase.set(choice.toLowerCase(), choice.toLowerCase());
      for (const [alias, choice] of Object.entries(type.aliases ?? {})) byLowerCase.set(alias, choice);
      const message = `${spec.label} must be ${listChoices(type.choices)}`;
      return (value) => {
        const choice = byLowerCase.get(value.toLowerCase());
        return choice === undefined ? { ok: false, message } : { ok: true, value: choice };
      };
    }
    case "quantity":
      return makeNumberReader(type.dimension, { headerUnit: context.headerUnit, decimalComma: context.decimalComma });
    case "count":
    case "amount":
      return makeNumberReader("ratio", { decimalComma: context.decimalComma });
    case "currency":
      return (value) => {
        if (!CURRENCY_PATTERN.test(value)) return { ok: false, message: `${spec.label} must be a three-letter ISO 4217 code such as EUR or USD` };
        const code = value.toUpperCase();
        return ISO_CURRENCIES.has(code) ? { ok: true, value: code } : { ok: false, message: `"${code}" is not an ISO 4217 currency code` };
      };
    case "url":
      return (value) => (isWebAddress(value) ? { ok: true, value } : { ok: false, message: `${spec.label} must be an http:// or https:// address` });
    case "date":
      return (value) => readDate(spec, value);
  }
}

// Ranges and whole-number rules live in the zod schema, so the edit form shares them.
function makeNumberReader(dimension: Dimension, options: ParseOptions): CellReader {
  return (value) => {
    const parsed = parseQuantity(value, dimension, options);
    if (parsed.ok) return { ok: true, value: parsed.value };
    return value[0] === "=" || value[0] === "@" ? formulaProblem(value) : { ok: false, message: parsed.reason };
  };
}

// Spreadsheets run cells starting with these as formulas; we never evaluate, and refuse to store them.
function looksLikeFormula(value: string): boolean {
  return FORMULA_STARTS.has(value[0]) && Number.isNaN(Number(value));
}

function formulaProblem(value: string): CellResult {
  return {
    ok: false,
    message: `looks like a spreadsheet formula (starts with "${value[0]}"); formulas are not evaluated: enter the value itself`,
  };
}

function listChoices(choices: readonly string[]): string {
  return choices.length === 2 ? `${choices[0]} or ${choices[1]}` : `one of ${choices.join(", ")}`;
}

function isWebAddress(value: string): boolean {
  try {
    const url = new URL(value);
    return (url.protocol === "http:" || url.protocol === "https:") && url.hostname !== "";
  } catch {
    return false;
  }
}

function readDate(spec: ColumnSpec, value: string): CellResult {
  const match = DATE_PATTERN.exec(value);
  if (!match) return { ok: false, message: `${spec.label} must be written YYYY-MM-DD, for example 2024-03-15` };
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) {
    return { ok: false, message: `${spec.label} ${value} is not a calendar date` };
  }
  return { ok: true, value };
}
