// Reads and prints physical quantities the way component librarians type them.
// Inside the engine every value is in SI base units (temperatures in °C); units live only here.
import { formatLocale } from "d3-format";

export const DIMENSIONS = [
  "voltage",
  "current",
  "power",
  "temperature",
  "thermal-resistance",
  "frequency",
  "capacitance",
  "resistance",
  "time",
  "ratio",
] as const;
export type Dimension = (typeof DIMENSIONS)[number];

/** `bare` is true when neither the cell nor the header gave a unit (the SI base unit was assumed). */
export type ParseResult = { ok: true; value: number; bare?: boolean } | { ok: false; reason: string };

/**
 * Which decimal mark the text around a number uses. `point`: a dot is decimal, and so is a comma unless it is
 * followed by exactly three digits (which may be digit grouping). `comma`: the mirror image. `either`: both may
 * be grouping, so a dot or a comma before exactly three digits is refused.
 */
export type DecimalMark = "point" | "comma" | "either";

export interface ParseOptions {
  /** Unit given once for a whole column (e.g. from a `[mA]` header); a unit in the cell wins. */
  headerUnit?: string;
  /** The file's decimal mark (see DecimalMark); `point` when not given. */
  decimalMark?: DecimalMark;
}

export interface FormatOptions {
  /** Plain ASCII output (u for micro, ohm, C), for CSV exports. */
  ascii?: boolean;
  /** Significant digits; 3 by default. */
  digits?: number;
}

interface DimensionTable {
  noun: string;
  /** Canonical symbol for display, Unicode and ASCII. */
  symbol: string;
  asciiSymbol: string;
  /** Spellings of the unit itself; each is combined with every prefix when `prefixed`. */
  spellings: readonly string[];
  prefixed: boolean;
  /** Passive-component shorthand (`10k`, `100n`): a prefix alone stands for the unit. */
  barePrefix: boolean;
  /** Spellings we refuse on purpose, with the reason. */
  refused?: Readonly<Record<string, string>>;
}

// Decimal exponents; `K` is kilo as resistors are marked, `u` and both micro signs are micro.
const PREFIXES: Readonly<Record<string, number>> = {
  f: -15,
  p: -12,
  n: -9,
  u: -6,
  "\u00b5": -6,
  "\u03bc": -6,
  m: -3,
  k: 3,
  K: 3,
  M: 6,
  G: 9,
  T: 12,
};

const PREFIX_EXPONENTS = new Map(Object.entries(PREFIXES));

const OHM_SPELLINGS = ["\u03a9", "\u2126", "ohm", "ohms", "Ohm", "Ohms", "OHM", "R"];
const CELSIUS_SPELLINGS = ["\u00b0C", "\u00baC", "\u2103", "C", "degC", "deg C"];
const AC_REFUSAL = "an AC or peak value; give the DC rating in V";
const KELVIN_REFUSAL = "kelvin is not accepted for temperatures; give °C";
const FAHRENHEIT_REFUSAL = "°F is not accepted; give °C";

const TABLES: Readonly<Record<Dimension, DimensionTable>> = {
  voltage: {
    noun: "a voltage",
    symbol: "V",
    asciiSymbol: "V",
    // Transistor ratings are DC values, so "VDC" is just volts.
    spellings: ["V", "v", "VDC", "Vdc"],
    prefixed: true,
    barePrefix: false,
    refused: { VAC: AC_REFUSAL, Vac: AC_REFUSAL, Vrms: AC_REFUSAL, Vpp: AC_REFUSAL, Vpk: AC_REFUSAL },
  },
  current: { noun: "a current", symbol: "A", asciiSymbol: "A", spellings: ["A", "a"], prefixed: true, barePrefix: false },
  power: { noun: "a power", symbol: "W", asciiSymbol: "W", spellings: ["W", "w"], prefixed: true, barePrefix: false },
  temperature: {
    noun: "a temperature",
    symbol: "°C",
    asciiSymbol: "C",
    spellings: CELSIUS_SPELLINGS,
    prefixed: false,
    barePrefix: false,
    refused: { K: KELVIN_REFUSAL, "°K": KELVIN_REFUSAL, "°F": FAHRENHEIT_REFUSAL, F: FAHRENHEIT_REFUSAL, degF: FAHRENHEIT_REFUSAL },
  },
  "thermal-resistance": {
    noun: "a thermal resistance",
    symbol: "°C/W",
    asciiSymbol: "C/W",
    // A temperature difference of 1 K equals 1 °C, so K/W and °C/W are the same unit.
    spellings: [...CELSIUS_SPELLINGS.map((c) => `${c}/W`), "K/W", "k/W"],
    prefixed: false,
    barePrefix: false,
  },
  frequency: { noun: "a frequency", symbol: "Hz", asciiSymbol: "Hz", spellings: ["Hz", "hz", "HZ"], prefixed: true, barePrefix: false },
  capacitance: { noun: "a capacitance", symbol: "F", asciiSymbol: "F", spellings: ["F"], prefixed: true, barePrefix: true },
  resistance: { noun: "a resistance", symbol: "Ω", asciiSymbol: "ohm", spellings: OHM_SPELLINGS, prefixed: true, barePrefix: true },
  time: { noun: "a time", symbol: "s", asciiSymbol: "s", spellings: ["s", "sec"], prefixed: true, barePrefix: false },
  ratio: { noun: "a plain number", symbol: "", asciiSymbol: "", spellings: [""], prefixed: false, barePrefix: false },
};

// One map per dimension from every accepted spelling (prefix included) to its decimal exponent.
const UNIT_EXPONENTS = new Map<Dimension, Map<string, number>>(
  DIMENSIONS.map((dimension) => [dimension, buildExponents(TABLES[dimension])]),
);

function buildExponents(table: DimensionTable): Map<string, number> {
  const exponents = new Map<string, number>();
  for (const spelling of table.spellings) {
    exponents.set(spelling, 0);
    if (!table.prefixed || spelling === "R") continue;
    for (const [prefix, exponent] of PREFIX_EXPONENTS) {
      if (!exponents.has(prefix + spelling)) exponents.set(prefix + spelling, exponent);
    }
  }
  if (table.barePrefix) {
    for (const [prefix, exponent] of PREFIX_EXPONENTS) {
      if (!exponents.has(prefix)) exponents.set(prefix, exponent);
    }
  }
  return exponents;
}

// sign, integer digits, separator, fraction digits, exponent, rest (the unit).
const NUMBER_PATTERN = /^([+-]?)(\d*)(?:([.,])(\d*))?(?:[eE]([+-]?\d+))?\s*(.*)$/s;
// RKM style (`3k3`, `4R7`, `R47`, `4u7F`, `3V3`): the letter stands for the decimal point.
const LETTER_POINT_PATTERN = /^([^\d\s.,])(\d+)(.*)$/s;
const STARTS_WITH_DIGIT = /^[\d.,]/;
const NON_ZERO_DIGIT = /[1-9]/;
// U+2212 MINUS SIGN, as word processors and PDFs print negative values.
const UNICODE_MINUS = "\u2212";

/** Parses one cell as a quantity of the given dimension into SI base units (temperatures in °C). */
export function parseQuantity(text: string, dimension: Dimension, options?: ParseOptions): ParseResult {
  const headerUnit = options?.headerUnit ?? "";
  const decimalMark = options?.decimalMark ?? "point";
  const typed = text.trim();
  const trimmed = typed.startsWith(UNICODE_MINUS) ? `-${typed.slice(1)}` : typed;
  if (trimmed === "") return fail("empty");
  const match = NUMBER_PATTERN.exec(trimmed);
  if (!match) return fail(`not a number: "${trimmed}"`);
  const [, sign, integer, separator, fractionRaw, exponentRaw, restRaw] = match;
  const fraction = fractionRaw ?? "";
  let rest = restRaw.trim();
  let digits = integer;
  let decimals = fraction;

  if (integer === "" && fraction === "") {
    // No digits before the unit: only the RKM form with a leading letter (`R47`) is a number.
    const letterPoint = separator === undefined && exponentRaw === undefined ? LETTER_POINT_PATTERN.exec(rest) : null;
    if (!letterPoint) return fail(`not a number: "${trimmed}"`);
    digits = "0";
    decimals = letterPoint[2];
    rest = letterPoint[1] + letterPoint[3];
  } else if (separator === undefined && exponentRaw === undefined) {
    const letterPoint = LETTER_POINT_PATTERN.exec(rest);
    if (letterPoint) {
      decimals = letterPoint[2];
      rest = letterPoint[1] + letterPoint[3];
    }
  }

  if (STARTS_WITH_DIGIT.test(rest)) {
    return fail(`not a number: "${trimmed}" (write numbers without thousands separators or spaces)`);
  }
  if (separator !== undefined && fraction.length === 3 && NON_ZERO_DIGIT.test(integer) && mayGroupDigits(separator, decimalMark)) {
    const spaced = restRaw !== "" && /\s/.test(typed.charAt(typed.length - restRaw.length - 1));
    return fail(ambiguousGrouping(typed, sign, integer, separator, fraction, `${spaced ? " " : ""}${restRaw.trim()}`, decimalMark));
  }

  let unitExponent: number;
  const bare = rest === "" && headerUnit === "";
  if (rest === "") {
    if (headerUnit === "") {
      unitExponent = 0;
    } else {
      const header = lookUpUnit(headerUnit.trim(), dimension);
      if (!header.ok) return fail(`column unit: ${header.reason}`);
      unitExponent = header.value;
    }
  } else {
    const unit = lookUpUnit(rest, dimension);
    if (!unit.ok) return unit;
    unitExponent = unit.value;
  }

  const exponent = (exponentRaw === undefined ? 0 : Number(exponentRaw)) + unitExponent;
  // Folding the prefix into the decimal exponent keeps the result correctly rounded (100 µA is exactly 1e-4).
  const value = Number(`${sign}${digits === "" ? "0" : digits}.${decimals === "" ? "0" : decimals}e${exponent}`);
  if (!Number.isFinite(value)) return fail(`out of range: "${trimmed}"`);
  return bare ? { ok: true, value: value === 0 ? 0 : value, bare } : { ok: true, value: value === 0 ? 0 : value };
}

// A dot or comma before exactly three digits may be digit grouping, unless the file's decimal mark is that character.
function mayGroupDigits(separator: string, decimalMark: DecimalMark): boolean {
  return decimalMark === "either" || (separator === "," ? decimalMark === "point" : decimalMark === "comma");
}

/** Says both readings of `1.500 mA` and how to write each so that it cannot be misread. */
function ambiguousGrouping(typed: string, sign: string, integer: string, separator: string, fraction: string, unit: string, decimalMark: DecimalMark): string {
  const mark = decimalMark === "comma" ? "," : ".";
  const kept = fraction.replace(/0+$/, "");
  // Three decimals again would be just as ambiguous, so a trailing zero keeps the decimal reading unmistakable.
  const decimals = kept === "" ? "" : `${mark}${kept.length === 3 ? `${kept}0` : kept}`;
  const grouped = `${sign}${integer}${fraction}${unit}`;
  const decimal = `${sign}${integer}${decimals}${unit}`;
  const what = separator === "." ? "dot" : "comma";
  const asDecimal = separator === "." ? "a decimal point" : "a decimal comma";
  return `ambiguous: "${typed}" is ${grouped} if the ${what} groups digits, or ${decimal} if it is ${asDecimal}: write ${grouped} or ${decimal}`;
}

/** Resolves a unit spelling (prefix included) to its decimal exponent for the dimension, or says why not. */
export function lookUpUnit(unit: string, dimension: Dimension): ParseResult {
  const exponent = UNIT_EXPONENTS.get(dimension)!.get(unit);
  if (exponent !== undefined) return { ok: true, value: exponent };
  const table = TABLES[dimension];
  const refusal = table.refused && Object.hasOwn(table.refused, unit) ? table.refused[unit] : undefined;
  if (refusal) return fail(`${refusal} (got "${unit}")`);
  if (PREFIX_EXPONENTS.has(unit)) {
    return table.prefixed
      ? fail(`"${unit}" is a prefix without its unit; write ${unit}${table.symbol}`)
      : fail(`"${unit}" is an SI prefix, which ${table.noun} does not take; write the whole number`);
  }
  for (const other of DIMENSIONS) {
    if (other === dimension || other === "ratio") continue;
    if (UNIT_EXPONENTS.get(other)!.has(unit)) {
      return fail(`${TABLES[other].noun} (${unit}) where ${table.noun} is expected`);
    }
  }
  if (!table.prefixed && table.spellings.some((s) => s !== "" && unit.endsWith(s) && PREFIX_EXPONENTS.has(unit.slice(0, -s.length)))) {
    return fail(`${table.noun} takes no SI prefix (got "${unit}"); give the value in ${table.symbol}`);
  }
  return fail(`unknown unit "${unit}"`);
}

function fail(reason: string): ParseResult {
  return { ok: false, reason };
}

const LOCALE = formatLocale({ decimal: ".", thousands: ",", grouping: [3], currency: ["", ""], minus: "-" });
const formatters = new Map<string, (value: number) => string>();

function formatterFor(specifier: string): (value: number) => string {
  let formatter = formatters.get(specifier);
  if (!formatter) {
    formatter = LOCALE.format(specifier);
    formatters.set(specifier, formatter);
  }
  return formatter;
}

/** Prints an SI value in engineering notation with its unit, e.g. `250 µA`, `3.3 kΩ`, `62.5 °C/W`. */
export function formatQuantity(value: number, dimension: Dimension, options?: FormatOptions): string {
  const table = TABLES[dimension];
  const ascii = options?.ascii === true;
  const symbol = ascii ? table.asciiSymbol : table.symbol;
  if (!Number.isFinite(value)) return ascii ? "-" : "—";
  const digits = options?.digits ?? 3;
  if (!table.prefixed) {
    const number = formatterFor(`.${digits}~r`)(value);
    return symbol === "" ? number : `${number} ${symbol}`;
  }
  const printed = formatterFor(`.${digits}~s`)(value);
  const last = printed.at(-1) ?? "";
  const hasPrefix = /[^\d.]/.test(last);
  const number = hasPrefix ? printed.slice(0, -1) : printed;
  const prefix = hasPrefix ? (ascii && last === "µ" ? "u" : last) : "";
  const unit = ascii && dimension === "resistance" && prefix !== "" ? `${prefix}ohm` : `${prefix}${symbol}`;
  return `${number} ${unit}`;
}

/** The unit symbol shown for a dimension (empty for plain numbers). */
export function unitSymbol(dimension: Dimension, options?: { ascii?: boolean }): string {
  return options?.ascii ? TABLES[dimension].asciiSymbol : TABLES[dimension].symbol;
}
