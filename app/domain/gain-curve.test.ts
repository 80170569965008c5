import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_TYP_TO_MIN_FACTOR, decadesOutside, hfeAt, vceSatAt, worstCaseGain } from "./gain-curve";
import type { GainPoint, SaturationPoint } from "./part";

function gp(icAmps: number, hfeMin: number | null, hfeTyp: number | null, hfeMax: number | null = null, tempC: number | null = 25): GainPoint {
  return { icAmps, vceVolts: 5, hfeMin, hfeTyp, hfeMax, tempC };
}

// An invented general-purpose datasheet: gain quoted at 0.1 mA, 10 mA and 100 mA.
const POINTS = [gp(1e-4, 60, 120), gp(1e-2, 100, 200, 400), gp(1e-1, 40, 90)];

describe("hfeAt", () => {
  it("returns the quoted values at the quoted currents", () => {
    expect(hfeAt(POINTS, 1e-2, "min")).toBe(100);
    expect(hfeAt(POINTS, 1e-1, "typ")).toBe(90);
    expect(hfeAt(POINTS, 1e-2, "max")).toBe(400);
  });
  it("interpolates linearly in log(IC) and log(hFE)", () => {
    // Halfway in log IC between 0.1 mA and 10 mA (1 mA): the geometric mean of 60 and 100.
    expect(hfeAt(POINTS, 1e-3, "min")).toBeCloseTo(Math.sqrt(60 * 100), 9);
    // A quarter of the way in log IC from 10 mA to 100 mA: 100 × (40/100)^0.25.
    expect(hfeAt(POINTS, 10 ** -1.75, "min")).toBeCloseTo(100 * 0.4 ** 0.25, 9);
  });
  it("holds the end values beyond the quoted range", () => {
    expect(hfeAt(POINTS, 1e-6, "min")).toBe(60);
    expect(hfeAt(POINTS, 5, "typ")).toBe(90);
  });
  it("returns null when no point quotes the corner", () => {
    expect(hfeAt([gp(1e-3, null, 200)], 1e-3, "min")).toBeNull();
    expect(hfeAt([], 1e-3, "typ")).toBeNull();
  });
  it("takes the lower gain at a repeated current and prefers room-temperature points", () => {
    expect(hfeAt([gp(1e-3, 120, null), gp(1e-3, 100, null)], 1e-3, "min")).toBe(100);
    expect(hfeAt([gp(1e-3, 100, null), gp(1e-3, 40, null, null, -40)], 1e-3, "min")).toBe(100);
    expect(hfeAt([gp(1e-3, 40, null, null, -40)], 1e-3, "min")).toBe(40);
  });
  it("stays between its two monotone neighbours (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -6, max: 0, noNaN: true }),
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (logLow, spanDecades, hfeLow, hfeHigh, t) => {
          const icLow = 10 ** logLow;
          const icHigh = 10 ** (logLow + spanDecades);
          const points = [gp(icLow, hfeLow, null), gp(icHigh, hfeHigh, null)];
          const hfe = hfeAt(points, 10 ** (logLow + t * spanDecades), "min") ?? Number.NaN;
          expect(hfe).toBeGreaterThanOrEqual(Math.min(hfeLow, hfeHigh) * (1 - 1e-9));
          expect(hfe).toBeLessThanOrEqual(Math.max(hfeLow, hfeHigh) * (1 + 1e-9));
        },
      ),
    );
  });
});

describe("decadesOutside", () => {
  it("measures decades beyond the quoted range, zero inside", () => {
    expect(decadesOutside([1e-3, 1e-1], 1e-2)).toBe(0);
    expect(decadesOutside([1e-3, 1e-1], 1e-5)).toBeCloseTo(2, 12);
    expect(decadesOutside([1e-3, 1e-1], 1)).toBeCloseTo(1, 12);
    expect(decadesOutside([], 1)).toBe(Number.POSITIVE_INFINITY);
  });
});

describe("worstCaseGain", () => {
  it("uses hFE min when quoted, without flags inside the range", () => {
    expect(worstCaseGain(POINTS, 1e-2)).toMatchObject({ hfe: 100, source: "min", typToMinFactor: null, flags: [], decadesOffPoint: 0 });
  });
  it("derates typ by the stated factor and flags no-min-gain when no minimum is quoted", () => {
    const typOnly = [gp(1e-3, null, 300), gp(1e-2, null, 250)];
    const estimate = worstCaseGain(typOnly, 1e-3);
    // typ × 0.5 for the worst case (common practice).
    expect(DEFAULT_TYP_TO_MIN_FACTOR).toBe(0.5);
    expect(estimate).toMatchObject({ hfe: 150, source: "typ-derated", typToMinFactor: 0.5, flags: ["no-min-gain"] });
    expect(worstCaseGain(typOnly, 1e-3, { typToMinFactor: 0.4 }).hfe).toBeCloseTo(120, 9);
    expect(estimate.note).toMatch(/no minimum quoted/);
  });
  it("falls back to max scaled twice when only a gain group's ceiling is quoted", () => {
    expect(worstCaseGain([gp(1e-3, null, null, 400)], 1e-3)).toMatchObject({ hfe: 100, source: "max-derated", flags: ["no-min-gain"] });
  });
  it("flags gain-off-point only beyond the window around the quoted points", () => {
    // 0.4 decades above 100 mA stays inside the default half decade; 0.6 does not.
    expect(worstCaseGain(POINTS, 0.1 * 10 ** 0.4).flags).toEqual([]);
    const far = worstCaseGain(POINTS, 0.1 * 10 ** 0.6);
    expect(far.flags).toEqual(["gain-off-point"]);
    expect(far.hfe).toBe(40);
    expect(far.decadesOffPoint).toBeCloseTo(0.6, 9);
    expect(worstCaseGain(POINTS, 0.1 * 10 ** 0.6, { windowDecades: 1 }).flags).toEqual([]);
  });
  it("returns zero gain with both flags when nothing is quoted", () => {
    expect(worstCaseGain([], 1e-3)).toMatchObject({ hfe: 0, source: "none", flags: ["no-min-gain", "gain-off-point"] });
  });
});

function sp(icAmps: number, ibAmps: number | null, max: number | null, typ: number | null = null): SaturationPoint {
  return { icAmps, ibAmps, vceSatMaxVolts: max, vceSatTypVolts: typ, vbeSatVolts: null };
}

describe("vceSatAt", () => {
  const SAT = [sp(0.01, 0.001, 0.1), sp(0.1, 0.01, 0.3)];
  it("interpolates log-log between quoted points and reports the nearest point's forced gain", () => {
    expect(vceSatAt(SAT, 0.01)).toEqual({ volts: 0.1, forcedGain: 10, extrapolated: false, source: "max" });
    expect(vceSatAt(SAT, 10 ** -1.5)?.volts).toBeCloseTo(Math.sqrt(0.1 * 0.3), 9);
  });
  it("holds flat below and scales with IC above the quoted range", () => {
    expect(vceSatAt(SAT, 0.001)).toMatchObject({ volts: 0.1, extrapolated: false });
    const above = vceSatAt(SAT, 0.2);
    expect(above?.volts).toBeCloseTo(0.6, 9);
    expect(above?.extrapolated).toBe(true);
  });
  it("uses typ when no max is quoted, and null when nothing is", () => {
    expect(vceSatAt([sp(0.1, null, null, 0.2)], 0.1)).toEqual({ volts: 0.2, forcedGain: null, extrapolated: false, source: "typ" });
    expect(vceSatAt([], 0.1)).toBeNull();
  });
});
