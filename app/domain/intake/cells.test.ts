import { describe, expect, it } from "vitest";
import { checkHeaderUnit, makeCellReader } from "./cells";
import type { DecimalMark } from "../quantity";
import { INTAKE_FORMATS, type ColumnSpec } from "./columns";

const spec = (name: string, group?: string): ColumnSpec => {
  const columns = group ? INTAKE_FORMATS.parts.groups.concat(INTAKE_FORMATS.offers.groups).find((g) => g.prefix === group)!.columns : [...INTAKE_FORMATS.parts.columns, ...INTAKE_FORMATS.offers.columns];
  return columns.find((c) => c.name === name)!;
};
const read = (name: string, cell: string, headerUnit = "", decimalMark: DecimalMark = "point", group?: string) => makeCellReader(spec(name, group), { headerUnit, decimalMark })(cell);

describe("makeCellReader", () => {
  it("reads empty cells as no value", () => {
    expect(read("vceo", "   ")).toEqual({ ok: true, value: null });
    expect(read("manufacturer", "")).toEqual({ ok: true, value: null });
  });

  it("reads quantities in SI units, with the header's unit and the file's decimal comma", () => {
    expect(read("ic_max", "100 mA")).toEqual({ ok: true, value: 0.1 });
    expect(read("ic_max", "100", "mA")).toEqual({ ok: true, value: 0.1 });
    expect(read("ic_max", "1,250", "", "comma")).toEqual({ ok: true, value: 1.25 });
  });

  it("returns the same result for a repeated cell (the column's cache)", () => {
    const reader = makeCellReader(spec("vceo"), { headerUnit: "", decimalMark: "point" });
    const first = reader("45 V");
    expect(reader("45 V")).toBe(first);
    expect(reader("45 mA")).toEqual({ ok: false, message: "a current (mA) where a voltage is expected" });
  });

  it("refuses text that a spreadsheet would run as a formula, but not a negative number", () => {
    const formula = (c: string) => `looks like a spreadsheet formula (starts with "${c}"); formulas are not evaluated: enter the value itself`;
    expect(read("manufacturer", "=1+1")).toEqual({ ok: false, message: formula("=") });
    expect(read("manufacturer", "@A1")).toEqual({ ok: false, message: formula("@") });
    expect(read("part_number", "+X")).toEqual({ ok: false, message: formula("+") });
    expect(read("package", "-5")).toEqual({ ok: true, value: "-5" });
    expect(read("vceo", "=A2")).toEqual({ ok: false, message: formula("=") });
  });

  it("reads choices in any case, with lifecycle aliases", () => {
    expect(read("polarity", "Pnp")).toEqual({ ok: true, value: "pnp" });
    expect(read("lifecycle", "LTB")).toEqual({ ok: true, value: "last-time-buy", reading: "read as last-time-buy" });
    expect(read("polarity", "PNP-NPN")).toEqual({ ok: false, message: "polarity must be NPN or PNP" });
  });

  it("reads ISO 4217 currency codes (ISO 4217:2015, as listed by Intl.supportedValuesOf)", () => {
    expect(read("currency", "eur")).toEqual({ ok: true, value: "EUR" });
    expect(read("currency", "QQQ")).toEqual({ ok: false, message: '"QQQ" is not an ISO 4217 currency code' });
    expect(read("currency", "$")).toEqual({ ok: false, message: "currency must be a three-letter ISO 4217 code such as EUR or USD" });
  });

  it("reads calendar dates (2024 is a leap year, 2023 is not: Gregorian calendar)", () => {
    expect(read("datasheet_date", "2024-02-29")).toEqual({ ok: true, value: "2024-02-29" });
    expect(read("datasheet_date", "2023-02-29")).toEqual({ ok: false, message: "datasheet date 2023-02-29 is not a calendar date" });
    expect(read("datasheet_date", "2024-3-5")).toEqual({ ok: false, message: "datasheet date must be written YYYY-MM-DD, for example 2024-03-15" });
  });

  it("reads only http and https addresses", () => {
    expect(read("datasheet_url", "https://example.com/a.pdf")).toEqual({ ok: true, value: "https://example.com/a.pdf" });
    expect(read("datasheet_url", "javascript:alert(1)")).toEqual({ ok: false, message: "datasheet URL must be an http:// or https:// address" });
  });

  it("refuses cells over 500 characters", () => {
    expect(read("manufacturer", "y".repeat(501))).toEqual({ ok: false, message: "the cell is 501 characters long; at most 500 are accepted" });
    expect(read("manufacturer", "y".repeat(500)).ok).toBe(true);
  });
});

describe("checkHeaderUnit", () => {
  it("accepts a unit of the column's dimension and names the problem otherwise", () => {
    expect(checkHeaderUnit(spec("rth_ja"), "K/W")).toBeNull();
    expect(checkHeaderUnit(spec("ic_max"), "V")).toBe("column unit: a voltage (V) where a current is expected");
    expect(checkHeaderUnit(spec("stock"), "pcs")).toBe('stock takes no unit in the header (got "[pcs]")');
    expect(checkHeaderUnit(spec("ic", "gain"), "µA")).toBeNull();
  });
});

describe("what people type (issue items 11 and 15)", () => {
  it("reads digit grouping in whole-number columns in any file, and says so", () => {
    expect(read("stock", "24.000", "", "comma")).toEqual({ ok: true, value: 24000, reading: "read as 24000 (digit grouping)" });
    expect(read("stock", "12,000")).toEqual({ ok: true, value: 12000, reading: "read as 12000 (digit grouping)" });
    expect(read("stock", "1.000.000", "", "either")).toEqual({ ok: true, value: 1000000, reading: "read as 1000000 (digit grouping)" });
    expect(read("qty", "100+", "", "point", "break")).toEqual({ ok: true, value: 100, reading: "read as 100 (from 100 on)" });
    expect(read("stock", "100+").ok).toBe(false);
  });

  it("reads n/a, - and dashes as an empty cell", () => {
    for (const cell of ["n/a", "N/A", "-", "—", "–"]) expect(read("ft", cell)).toEqual({ ok: true, value: null, reading: "read as an empty cell" });
  });

  it("reads polarity letters and lifecycle words, with the reading", () => {
    expect(read("polarity", "n")).toEqual({ ok: true, value: "npn", reading: "read as NPN" });
    expect(read("lifecycle", "EOL")).toEqual({ ok: true, value: "obsolete", reading: "read as obsolete" });
  });

  it("reads the Unicode minus sign as a minus", () => {
    expect(read("temp", "\u221255 °C", "", "point", "gain")).toEqual({ ok: true, value: -55, reading: "read as -55 °C (minus sign)" });
  });

  it("reads a price with its currency sign", () => {
    expect(read("price", "€0,12", "", "point", "break")).toEqual({ ok: true, value: { kind: "money", amount: 0.12, sign: "€", currencies: ["EUR"] } });
  });

  it("reads back the apostrophe our rejected-rows download puts before formula-like cells", () => {
    expect(read("vceo", "'-45 V")).toEqual({ ok: true, value: -45 });
  });
});
