import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { E12, E24, roundToSeries } from "./e-series";

describe("E12 and E24", () => {
  it("hold the IEC 60063 values", () => {
    // IEC 60063:2015, table 1, E12 and E24 columns.
    expect(E12).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
    expect(E24).toEqual([1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1]);
  });
  it("E12 is every other E24 value (IEC 60063 series nest)", () => {
    expect(E24.filter((_, index) => index % 2 === 0)).toEqual(E12);
  });
});

describe("roundToSeries", () => {
  it("rounds down, up and to the nearest value across decades", () => {
    expect(roundToSeries(4300, "E12", "down")).toBe(3900);
    expect(roundToSeries(4300, "E12", "up")).toBe(4700);
    expect(roundToSeries(4300, "E24", "nearest")).toBe(4300);
    expect(roundToSeries(9500, "E12", "up")).toBe(10000);
    expect(roundToSeries(9.5, "E24", "down")).toBe(9.1);
    expect(roundToSeries(0.105, "E12", "down")).toBe(0.1);
    expect(roundToSeries(2.6e6, "E12", "nearest")).toBe(2.7e6);
  });
  it("keeps a value already in the series", () => {
    expect(roundToSeries(4700, "E12", "down")).toBe(4700);
    expect(roundToSeries(4700, "E12", "up")).toBe(4700);
    expect(roundToSeries(0.33, "E12", "nearest")).toBe(0.33);
  });
  it("chooses nearest in ratio terms, as the series is geometric", () => {
    // 1.09 is 9% above 1.0 and 10% below 1.2: nearer 1.0 by ratio.
    expect(roundToSeries(1.09, "E12", "nearest")).toBe(1.0);
  });
  it("rejects zero, negative and infinite resistances", () => {
    expect(() => roundToSeries(0, "E12", "down")).toThrow(RangeError);
    expect(() => roundToSeries(-5, "E12", "down")).toThrow(RangeError);
    expect(() => roundToSeries(Number.POSITIVE_INFINITY, "E12", "up")).toThrow(RangeError);
  });
  it("down never exceeds the value and up never falls below it, within one series step", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1e8, noNaN: true }), fc.constantFrom("E12" as const, "E24" as const), (ohms, series) => {
        const down = roundToSeries(ohms, series, "down");
        const up = roundToSeries(ohms, series, "up");
        expect(down).toBeLessThanOrEqual(ohms * (1 + 1e-9));
        expect(up).toBeGreaterThanOrEqual(ohms * (1 - 1e-9));
        // The widest step of the IEC 60063 E12 values is 1.2 -> 1.5 (25%); of E24, 1.3 -> 1.5 (15.4%).
        expect(up / down).toBeLessThanOrEqual(series === "E12" ? 1.25 + 1e-9 : 1.5 / 1.3 + 1e-9);
      }),
    );
  });
});
