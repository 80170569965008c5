// Reads one cell of an intake file into a typed value, or says what is wrong with it. A cell that is not taken
// literally ("1.000" in a stock column, "n/a", "TO92", "≥ 100") carries the reading, which the preview shows.
import { lookUpUnit, parseQuantity, type DecimalMark, type Dimension, type ParseOptions } from "../quantity";
import { MAX_CELL_LENGTH, type BareNumberHint, type ColumnSpec } from "./columns";
import { readHfe, type HfeValue } from "./hfe-notation";
import { cleanName } from "./identity";
import { splitCurrencySign, type MoneyValue } from "./money";
import { resolvePackageOutline } from "./package-outlines";

export type CellValue = string | number | null | HfeValue | MoneyValue;
export type CellResult = { ok: true; value: CellValue; reading?: string } | { ok: false; message: string };

export type CellReader = (cell: string) => CellResult;

export interface ReaderContext {
  /** Unit from the column's header, e.g. `mA` from `ic_max [mA]`. */
  headerUnit: string;
  /** The file's decimal mark, from its delimiter (see number-style.ts). */
  decimalMark: DecimalMark;
}

const EMPTY: CellResult = { ok: true, value: null };
const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
const CURRENCY_PATTERN = /^[A-Za-z]{3}$/;
const ISO_CURRENCIES = new Set(Intl.supportedValuesOf("currency"));
const COLUMN_CACHE_LIMIT = 4096;
const FORMULA_STARTS = new Set(["=", "+", "-", "@"]);
// What people type for "no value": read as an empty cell, and shown as such.
const EMPTY_MARKERS = new Set(["n/a", "n.a.", "-", "--", "\u2013", "\u2014"]);
// Digit grouping in a whole-number column: "1.000", "12,000", "1.000.000" (one separator, groups of three).
const GROUPED_COUNT = /^(\d{1,3})([.,])(\d{3})(?:\2\d{3})*$/;
const FROM_ON = /^(\d+)\s*\+$/;
// Our own rejected-rows download writes '= '+ '- '@ so spreadsheets do not run them; read them back as typed.
const ESCAPED_FORMULA = /^'[=+\-@]/;

/** Checks a header unit against the column once, before any cell is read. */
export function checkHeaderUnit(spec: ColumnSpec, unit: string): string | null {
  if (spec.type.kind !== "quantity") return `${spec.label} takes no unit in the header (got "[${unit}]")`;
  const result = lookUpUnit(unit, spec.type.dimension);
  return result.ok ? null : `column unit: ${result.reason}`;
}

/** True for cells that people write to mean "no value" ("n/a", "-", "—"). */
export function isEmptyMarker(cell: string): boolean {
  return EMPTY_MARKERS.has(cell.trim().toLowerCase());
}

/** Builds the reader for one column once, so the per-cell path does no set-up work. */
export function makeCellReader(spec: ColumnSpec, context: ReaderContext): CellReader {
  const read = spec.type.kind === "text" ? makeTypedReader(spec, context) : withCache(makeTypedReader(spec, context));
  return (cell) => {
    const trimmed = cell.trim();
    if (trimmed === "") return EMPTY;
    if (trimmed.length > MAX_CELL_LENGTH) {
      return { ok: false, message: `the cell is ${trimmed.length} characters long; at most ${MAX_CELL_LENGTH} are accepted` };
    }
    if (EMPTY_MARKERS.has(trimmed.toLowerCase())) return { ok: true, value: null, reading: "read as an empty cell" };
    return read(ESCAPED_FORMULA.test(trimmed) ? trimmed.slice(1) : trimmed);
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
      return makeTextReader(type.clean);
    case "choice": {
      const byLowerCase = new Map<string, string>();
      for (const choice of type.choices) byLowerCase.set(choice.toLowerCase(), choice.toLowerCase());
      const aliases = new Map(Object.entries(type.aliases ?? {}));
      const message = `${spec.label} must be ${listChoices(type.choices)}`;
      const shown = (choice: string) => type.choices.find((c) => c.toLowerCase() === choice) ?? choice;
      return (value) => {
        const lower = value.toLowerCase();
        const choice = byLowerCase.get(lower);
        if (choice !== undefined) return { ok: true, value: choice };
        const alias = aliases.get(lower);
        return alias === undefined ? { ok: false, message } : { ok: true, value: alias, reading: `read as ${shown(alias)}` };
      };
    }
    case "quantity":
      return makeNumberReader(type.dimension, { headerUnit: context.headerUnit, decimalMark: context.decimalMark }, spec.bareHint);
    case "count":
      return makeCountReader(context.decimalMark, type.fromOn === true);
    case "hfe":
      return makeHfeReader(type.role, context.decimalMark);
    case "amount":
      return makeAmountReader(context.decimalMark);
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

function makeTextReader(clean: "name" | "package" | undefined): CellReader {
  return (value) => {
    if (looksLikeFormula(value)) return formulaProblem(value);
    if (clean === undefined) return { ok: true, value };
    const cleaned = cleanName(value);
    if (clean === "package") {
      const outline = resolvePackageOutline(cleaned);
      if (outline !== null && outline !== value) return { ok: true, value: outline, reading: `read as the ${outline} outline` };
    }
    return cleaned === value ? { ok: true, value } : { ok: true, value: cleaned, reading: `read as "${cleaned}" (${describeCleaning(value)})` };
  };
}

function describeCleaning(value: string): string {
  const notes: string[] = [];
  if (/\p{Default_Ignorable_Code_Point}/u.test(value)) notes.push("invisible characters removed");
  if (/\s{2,}|[^\S ]/.test(value)) notes.push("spaces collapsed");
  if (/[\u2010-\u2015\u2212]/.test(value)) notes.push("dashes as -");
  if (value.normalize("NFKC") !== value) notes.push("compatibility characters unified");
  return notes.length > 0 ? notes.join(", ") : "spacing tidied";
}

// Ranges and whole-number rules live in the zod schema, so the edit form shares them.
function makeNumberReader(dimension: Dimension, options: ParseOptions, hint?: BareNumberHint): CellReader {
  return (value) => {
    const parsed = parseQuantity(value, dimension, options);
    if (!parsed.ok) return value[0] === "=" || value[0] === "@" ? formulaProblem(value) : { ok: false, message: parsed.reason };
    if (parsed.bare && hint && ((hint.min !== undefined && parsed.value < hint.min) || (hint.max !== undefined && parsed.value > hint.max))) {
      return { ok: false, message: `probable missing unit: "${value}" without a unit reads as ${value} ${unitOf(dimension)}, which no transistor has; write the unit (${value} ${hint.unit} if that is meant)` };
    }
    const reading = value.startsWith("\u2212") ? `read as ${value.replace("\u2212", "-")} (minus sign)` : undefined;
    return reading ? { ok: true, value: parsed.value, reading } : { ok: true, value: parsed.value };
  };
}

const UNIT_NAMES: Partial<Record<Dimension, string>> = { frequency: "Hz", capacitance: "F", voltage: "V", current: "A", power: "W" };

function unitOf(dimension: Dimension): string {
  return UNIT_NAMES[dimension] ?? "";
}

// A whole-number column cannot hold three decimals, so "1.000" there is digit grouping whatever the file's mark.
function makeCountReader(decimalMark: DecimalMark, fromOn: boolean): CellReader {
  const plain = makeNumberReader("ratio", { decimalMark });
  return (value) => {
    const grouped = GROUPED_COUNT.exec(value);
    if (grouped) {
      const whole = Number(value.replaceAll(grouped[2], ""));
      return { ok: true, value: whole, reading: `read as ${whole} (digit grouping)` };
    }
    const from = fromOn ? FROM_ON.exec(value) : null;
    if (from) return { ok: true, value: Number(from[1]), reading: `read as ${Number(from[1])} (from ${from[1]} on)` };
    return plain(value);
  };
}

function makeHfeReader(role: "hfeMin" | "hfeTyp" | "hfeMax" | null, decimalMark: DecimalMark): CellReader {
  const plain = makeNumberReader("ratio", { decimalMark });
  return (value) => {
    const number = role === null ? null : plain(value);
    if (number?.ok) return number;
    const hfe = readHfe(value, role);
    if (hfe.ok) return { ok: true, value: hfe.value, reading: hfe.reading };
    return hfe.recognised || !number ? { ok: false, message: hfe.message } : number;
  };
}

function makeAmountReader(decimalMark: DecimalMark): CellReader {
  const plain = makeNumberReader("ratio", { decimalMark });
  return (value) => {
    const split = splitCurrencySign(value);
    if (split.sign === null) return plain(value);
    if ("unknown" in split) return { ok: false, message: `unknown currency sign "${split.sign}"; write the price as a number and the code in the currency column` };
    const amount = plain(split.amountText);
    if (!amount.ok) return amount;
    const money: MoneyValue = { kind: "money", amount: amount.value as number, sign: split.sign, currencies: split.currencies };
    return { ok: true, value: money };
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
