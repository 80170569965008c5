import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DIMENSIONS, formatQuantity, lookUpUnit, parseQuantity, unitSymbol, type Dimension } from "./quantity";

// Prefix values: SI Brochure, 9th edition (BIPM 2019), table 7 (from memory).
// RKM letter-for-decimal-point marking (4R7, 3k3, 4u7): IEC 60062 (from memory).
// Everything else is how librarians type datasheet values (common practice).
const accepted: Array<[string, Dimension, number]> = [
  ["100uA", "current", 1e-4],
  ["100 µA", "current", 1e-4], // U+00B5 MICRO SIGN (Unicode 15, Latin-1 Supplement)
  ["100 μA", "current", 1e-4], // U+03BC GREEK SMALL LETTER MU (Unicode 15, Greek block)
  ["100\u00a0µA", "current", 1e-4], // no-break space, as spreadsheets paste it
  ["0.1 mA", "current", 1e-4],
  ["1.5 A", "current", 1.5],
  ["2a", "current", 2],
  ["3.3MΩ", "resistance", 3.3e6],
  ["3.3 MΩ", "resistance", 3.3e6], // U+2126 OHM SIGN
  ["3k3", "resistance", 3300],
  ["4K7", "resistance", 4700],
  ["4R7", "resistance", 4.7],
  ["R47", "resistance", 0.47],
  ["1M5", "resistance", 1.5e6],
  ["2k2Ω", "resistance", 2200],
  ["10k", "resistance", 1e4],
  ["470", "resistance", 470],
  ["470R", "resistance", 470],
  ["10 kohm", "resistance", 1e4],
  ["100m", "resistance", 0.1],
  ["250 mW", "power", 0.25],
  ["0.625W", "power", 0.625],
  ["62.5 °C/W", "thermal-resistance", 62.5],
  ["62.5 K/W", "thermal-resistance", 62.5],
  ["62.5 C/W", "thermal-resistance", 62.5],
  ["62.5 degC/W", "thermal-resistance", 62.5],
  ["1.2e-3", "current", 1.2e-3],
  ["1.2E-3 A", "current", 1.2e-3],
  ["5e2 mA", "current", 0.5],
  ["0,25 V", "voltage", 0.25],
  ["0,250 V", "voltage", 0.25],
  ["1,5 V", "voltage", 1.5],
  ["1.000 V", "voltage", 1],
  ["12 VDC", "voltage", 12],
  ["3V3", "voltage", 3.3],
  ["45 V", "voltage", 45],
  ["1.2kV", "voltage", 1200],
  ["+5 V", "voltage", 5],
  ["-55 °C", "temperature", -55],
  ["150C", "temperature", 150],
  ["150 degC", "temperature", 150],
  ["150 ℃", "temperature", 150],
  ["150 ºC", "temperature", 150], // masculine ordinal, a common mistyping of the degree sign
  ["300 MHz", "frequency", 3e8],
  ["300MHz", "frequency", 3e8],
  ["1.5 GHz", "frequency", 1.5e9],
  ["4 pF", "capacitance", 4e-12],
  ["100n", "capacitance", 1e-7],
  ["4u7", "capacitance", 4.7e-6],
  ["4u7F", "capacitance", 4.7e-6],
  ["35 ns", "time", 3.5e-8],
  ["2 µs", "time", 2e-6],
  ["250", "ratio", 250],
  ["1e5", "ratio", 1e5],
  ["  42  ", "ratio", 42],
  ["5.", "ratio", 5],
  [".5", "ratio", 0.5],
];

const rejected: Array<[string, Dimension, string]> = [
  ["", "voltage", "empty"],
  ["   ", "current", "empty"],
  ["abc", "voltage", 'not a number: "abc"'],
  ["mV", "voltage", 'not a number: "mV"'],
  [".", "voltage", 'not a number: "."'],
  ["e5", "ratio", 'not a number: "e5"'],
  ["NaN", "ratio", 'not a number: "NaN"'],
  ["=A1*2", "voltage", 'not a number: "=A1*2"'],
  ["3 mV/s", "voltage", 'unknown unit "mV/s"'],
  ["10 furlongs", "voltage", 'unknown unit "furlongs"'],
  ["5 constructor", "voltage", 'unknown unit "constructor"'],
  ["5 toString", "temperature", 'unknown unit "toString"'],
  ["5 mA", "voltage", "a current (mA) where a voltage is expected"],
  ["40 V", "current", "a voltage (V) where a current is expected"],
  ["250 mW", "current", "a power (mW) where a current is expected"],
  ["4R7", "voltage", "a resistance (R) where a voltage is expected"],
  ["5 V", "ratio", "a voltage (V) where a plain number is expected"],
  ["150 °C", "thermal-resistance", "a temperature (°C) where a thermal resistance is expected"],
  ["62.5 °C/W", "temperature", "a thermal resistance (°C/W) where a temperature is expected"],
  ["1,000 V", "voltage", 'ambiguous: "1,000 V" is 1000 V if the comma groups digits, or 1 V if it is a decimal comma: write 1000 V or 1 V'],
  ["10,000", "ratio", 'ambiguous: "10,000" is 10000 if the comma groups digits, or 10 if it is a decimal comma: write 10000 or 10'],
  ["1,000,000", "ratio", 'not a number: "1,000,000" (write numbers without thousands separators or spaces)'],
  ["1 000 V", "voltage", 'not a number: "1 000 V" (write numbers without thousands separators or spaces)'],
  ["1.000,5", "ratio", 'not a number: "1.000,5" (write numbers without thousands separators or spaces)'],
  ["10k", "voltage", '"k" is a prefix without its unit; write kV'],
  ["100m", "current", '"m" is a prefix without its unit; write mA'],
  ["10k", "ratio", '"k" is an SI prefix, which a plain number does not take; write the whole number'],
  ["150 K", "temperature", 'kelvin is not accepted for temperatures; give °C (got "K")'],
  ["300 °F", "temperature", '°F is not accepted; give °C (got "°F")'],
  ["10 m°C", "temperature", 'a temperature takes no SI prefix (got "m°C"); give the value in °C'],
  ["12 VAC", "voltage", 'an AC or peak value; give the DC rating in V (got "VAC")'],
  ["5 Vrms", "voltage", 'an AC or peak value; give the DC rating in V (got "Vrms")'],
  ["1e400", "voltage", 'out of range: "1e400"'],
];

describe("parseQuantity", () => {
  it.each(accepted)("reads %j as %s", (text, dimension, expected) => {
    expect(parseQuantity(text, dimension)).toMatchObject({ ok: true, value: expected });
  });

  it.each(rejected)("rejects %j as %s", (text, dimension, reason) => {
    expect(parseQuantity(text, dimension)).toEqual({ ok: false, reason });
  });

  it("reads bare numbers in the header's unit, but a unit in the cell wins", () => {
    expect(parseQuantity("200", "current", { headerUnit: "mA" })).toEqual({ ok: true, value: 0.2 });
    expect(parseQuantity("200", "current")).toEqual({ ok: true, value: 200, bare: true });
    expect(parseQuantity("1 A", "current", { headerUnit: "mA" })).toEqual({ ok: true, value: 1 });
    expect(parseQuantity("62.5", "thermal-resistance", { headerUnit: "K/W" })).toEqual({ ok: true, value: 62.5 });
    expect(parseQuantity("200", "current", { headerUnit: "mV" })).toEqual({
      ok: false,
      reason: "column unit: a voltage (mV) where a current is expected",
    });
  });

  it("treats every comma as decimal when the file says so (semicolon-separated files)", () => {
    expect(parseQuantity("1,000 V", "voltage", { decimalMark: "comma" })).toEqual({ ok: true, value: 1 });
    expect(parseQuantity("1,250", "power", { decimalMark: "comma" })).toEqual({ ok: true, value: 1.25, bare: true });
  });

  // Issue item 11: in a decimal-comma file "1.000" may be one thousand (digit grouping) or one; never guess.
  it.each([
    ["1.000", 'ambiguous: "1.000" is 1000 if the dot groups digits, or 1 if it is a decimal point: write 1000 or 1'],
    ["10.000", 'ambiguous: "10.000" is 10000 if the dot groups digits, or 10 if it is a decimal point: write 10000 or 10'],
    ["24.000", 'ambiguous: "24.000" is 24000 if the dot groups digits, or 24 if it is a decimal point: write 24000 or 24'],
    ["1.500 mA", 'ambiguous: "1.500 mA" is 1500 mA if the dot groups digits, or 1,5 mA if it is a decimal point: write 1500 mA or 1,5 mA'],
    ["1.005mA", 'ambiguous: "1.005mA" is 1005mA if the dot groups digits, or 1,0050mA if it is a decimal point: write 1005mA or 1,0050mA'],
  ])("refuses %j in a decimal-comma file, saying how to write it", (text, reason) => {
    expect(parseQuantity(text, "current", { decimalMark: "comma" })).toEqual({ ok: false, reason });
  });

  it("reads a dot before other than three digits, or after a zero, as decimal in a decimal-comma file", () => {
    expect(parseQuantity("0.500 V", "voltage", { decimalMark: "comma" })).toEqual({ ok: true, value: 0.5 });
    expect(parseQuantity("1.5 mA", "current", { decimalMark: "comma" })).toEqual({ ok: true, value: 0.0015 });
    expect(parseQuantity("1.0000", "ratio", { decimalMark: "comma" })).toEqual({ ok: true, value: 1, bare: true });
  });

  it("refuses both marks before three digits when the file's locale is unknown (tab files), and reads the rest", () => {
    expect(parseQuantity("1,000", "ratio", { decimalMark: "either" })).toEqual({
      ok: false,
      reason: 'ambiguous: "1,000" is 1000 if the comma groups digits, or 1 if it is a decimal comma: write 1000 or 1',
    });
    expect(parseQuantity("2.500 V", "voltage", { decimalMark: "either" })).toEqual({
      ok: false,
      reason: 'ambiguous: "2.500 V" is 2500 V if the dot groups digits, or 2.5 V if it is a decimal point: write 2500 V or 2.5 V',
    });
    expect(parseQuantity("0,65 V", "voltage", { decimalMark: "either" })).toEqual({ ok: true, value: 0.65 });
    expect(parseQuantity("0.65 V", "voltage", { decimalMark: "either" })).toEqual({ ok: true, value: 0.65 });
  });

  it("reads the Unicode minus sign (U+2212) as a minus", () => {
    expect(parseQuantity("\u221255 °C", "temperature")).toEqual({ ok: true, value: -55 });
  });

  it("reads every plain decimal exactly as Number() does", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true }), (value) => {
        const { bare: _bare, ...result } = parseQuantity(String(value), "voltage") as { ok: true; value: number; bare?: boolean };
        expect(result).toEqual({ ok: true, value: Object.is(value, -0) ? 0 : value });
      }),
    );
  });

  it("folds a prefix into the decimal exponent without rounding error", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), (count) => {
        expect(parseQuantity(`${count} µA`, "current")).toEqual({ ok: true, value: Number(`${count}e-6`) });
        expect(parseQuantity(`${count}mA`, "current")).toEqual({ ok: true, value: Number(`${count}e-3`) });
        expect(parseQuantity(`${count} kΩ`, "resistance")).toEqual({ ok: true, value: Number(`${count}e3`) });
      }),
    );
  });
});

describe("lookUpUnit", () => {
  it("gives the decimal exponent of a unit spelling", () => {
    expect(lookUpUnit("mA", "current")).toEqual({ ok: true, value: -3 });
    expect(lookUpUnit("°C/W", "thermal-resistance")).toEqual({ ok: true, value: 0 });
    expect(lookUpUnit("kV", "current")).toEqual({ ok: false, reason: "a voltage (kV) where a current is expected" });
  });
});

describe("unitSymbol", () => {
  it("gives the display symbol, Unicode or ASCII", () => {
    expect(DIMENSIONS.map((d) => unitSymbol(d))).toEqual(["V", "A", "W", "°C", "°C/W", "Hz", "F", "Ω", "s", ""]);
    expect(unitSymbol("resistance", { ascii: true })).toBe("ohm");
    expect(unitSymbol("thermal-resistance", { ascii: true })).toBe("C/W");
  });
});

describe("formatQuantity", () => {
  const shown: Array<[number, Dimension, string, string]> = [
    [250e-6, "current", "250 µA", "250 uA"],
    [3300, "resistance", "3.3 kΩ", "3.3 kohm"],
    [4.7, "resistance", "4.7 Ω", "4.7 ohm"],
    [62.5, "thermal-resistance", "62.5 °C/W", "62.5 C/W"],
    [150, "temperature", "150 °C", "150 C"],
    [-55, "temperature", "-55 °C", "-55 C"],
    [0.25, "power", "250 mW", "250 mW"],
    [45, "voltage", "45 V", "45 V"],
    [-0.001, "current", "-1 mA", "-1 mA"],
    [3e8, "frequency", "300 MHz", "300 MHz"],
    [4e-12, "capacitance", "4 pF", "4 pF"],
    [250, "ratio", "250", "250"],
    [100_000, "ratio", "100000", "100000"],
    [0, "voltage", "0 V", "0 V"],
    [999.5, "voltage", "1 kV", "1 kV"], // d3-format rounds to three significant digits before choosing the prefix
    [Number.NaN, "voltage", "—", "-"],
  ];

  it.each(shown)("prints %d (%s) as %s", (value, dimension, unicode, ascii) => {
    expect(formatQuantity(value, dimension)).toBe(unicode);
    expect(formatQuantity(value, dimension, { ascii: true })).toBe(ascii);
  });

  it("honours the number of significant digits", () => {
    expect(formatQuantity(1234.5678, "resistance", { digits: 5 })).toBe("1.2346 kΩ");
    expect(formatQuantity(62.5, "thermal-resistance", { digits: 2 })).toBe("63 °C/W");
  });

  it("prints what parseQuantity reads back, within the digits shown", () => {
    const dimensions = DIMENSIONS.filter((d) => d !== "ratio");
    fc.assert(
      fc.property(
        fc.constantFrom(...dimensions),
        fc.double({ min: 1e-14, max: 1e11, noNaN: true }),
        fc.boolean(),
        fc.boolean(),
        (dimension, magnitude, negative, ascii) => {
          const value = negative ? -magnitude : magnitude;
          const text = formatQuantity(value, dimension, { ascii, digits: 6 });
          const result = parseQuantity(text, dimension);
          expect(result.ok).toBe(true);
          if (result.ok) expect(Math.abs(result.value - value)).toBeLessThanOrEqual(Math.abs(value) * 5e-6);
        },
      ),
    );
  });

  it("reads back plain numbers (ratios) too", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 1e6, noNaN: true }), (value) => {
        const result = parseQuantity(formatQuantity(value, "ratio", { digits: 6 }), "ratio");
        expect(result.ok && Math.abs(result.value - value) <= value * 5e-6).toBe(true);
      }),
    );
  });
});
