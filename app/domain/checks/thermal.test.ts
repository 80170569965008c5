import { describe, expect, it } from "vitest";
import { customDerating, findDerating } from "../derating";
import { checkThermal, DEFAULT_TJ_MAX_C, deratedPtotWatts, dissipationWatts, junctionTempC, type ThermalCheckInput } from "./thermal";

const NONE = customDerating({ voltageFraction: 1, currentFraction: 1, powerFraction: 1 });
const INDUSTRIAL = findDerating("industrial") ?? NONE;

const SMALL: ThermalCheckInput = {
  mode: "linear",
  vceVolts: 5,
  icAmps: 0.05,
  dutyCycle: 1,
  ambientC: 25,
  rthJaCPerW: 200,
  rthJcCPerW: null,
  heatsinkRthCPerW: null,
  tjMaxC: 150,
  ptotWatts: 0.625,
  ptotReference: "ambient",
  derating: NONE,
};

describe("dissipationWatts", () => {
  it("is VCE × IC in linear mode and VCE(sat) × IC × duty when switching", () => {
    expect(dissipationWatts("linear", 5, 0.05, 0.3)).toBeCloseTo(0.25, 12);
    expect(dissipationWatts("switching", 0.3, 2, 0.5)).toBeCloseTo(0.3, 12);
  });
});

describe("junctionTempC", () => {
  it("follows the JEDEC definition Rth(j-a) = (Tj − Ta) / P", () => {
    // JEDEC JESD51-1 (1995), θJA = (TJ − TA) / PH (definition; from memory): 0.5 W through 200 °C/W from 25 °C gives 125 °C.
    expect(junctionTempC(25, 0.5, 200)).toBe(125);
    // JESD51-1 θJC path plus a heatsink in series: 10 W × (1.5 + 3.5) °C/W from 40 °C gives 90 °C (worked example, own numbers).
    expect(junctionTempC(40, 10, 1.5 + 3.5)).toBe(90);
  });
});

describe("deratedPtotWatts", () => {
  it("derates linearly from 25 °C to zero at Tj max", () => {
    expect(deratedPtotWatts(0.625, 150, 25)).toBe(0.625);
    expect(deratedPtotWatts(0.625, 150, 0)).toBe(0.625);
    // Halfway from 25 °C to 150 °C keeps half.
    expect(deratedPtotWatts(0.625, 150, 87.5)).toBeCloseTo(0.3125, 12);
    expect(deratedPtotWatts(0.625, 150, 160)).toBe(0);
  });
});

describe("checkThermal", () => {
  it("computes Tj through Rth(j-a) and passes a cool junction", () => {
    const result = checkThermal(SMALL);
    expect(result).toMatchObject({ check: "thermal", verdict: "fits", flags: [] });
    // 0.25 W × 200 °C/W + 25 °C = 75 °C.
    expect(result.inputs.find((input) => input.symbol === "Tj")?.value).toBeCloseTo(75, 9);
    // Tj budget (150 − 75) / (150 − 25) = 0.6, Ptot budget (0.625 − 0.25) / 0.625 = 0.6.
    expect(result.margin).toBeCloseTo(0.6, 9);
    expect(result.formula).toMatch(/Tj = Ta \+ P × Rth\(j-a\)/);
  });
  it("is marginal inside the derated Tj and fails above Tj max", () => {
    const warm = checkThermal({ ...SMALL, icAmps: 0.11, derating: INDUSTRIAL });
    // 0.55 W × 200 = 110 °C + 25 = 135 °C: above 80% of 150 °C, below 150 °C.
    expect(warm).toMatchObject({ verdict: "marginal", flags: ["hot-junction", "inside-derating"] });
    const hot = checkThermal({ ...SMALL, icAmps: 0.15 });
    expect(hot).toMatchObject({ verdict: "fails", flags: ["hot-junction"] });
    expect(hot.margin).toBeLessThan(0);
  });
  it("derates Ptot with a hot ambient", () => {
    const result = checkThermal({ ...SMALL, ambientC: 87.5, rthJaCPerW: 100, icAmps: 0.07 });
    // Tj = 87.5 + 0.35 × 100 = 122.5 °C is fine, but Ptot at 87.5 °C is 0.3125 W < 0.35 W.
    expect(result.verdict).toBe("fails");
    expect(result.inputs.find((input) => input.symbol === "Ptot(T)")?.value).toBeCloseTo(0.3125, 9);
  });
  it("uses Rth(j-c) plus the heatsink, and derates a case-rated Ptot at the case temperature", () => {
    const power: ThermalCheckInput = {
      ...SMALL,
      mode: "switching",
      vceVolts: 0.5,
      icAmps: 4,
      dutyCycle: 1,
      ambientC: 40,
      rthJaCPerW: 62.5,
      rthJcCPerW: 1.5,
      heatsinkRthCPerW: 3.5,
      ptotWatts: 60,
      ptotReference: "case",
    };
    const result = checkThermal(power);
    // 2 W × (1.5 + 3.5) + 40 = 50 °C; case at 40 + 2 × 3.5 = 47 °C.
    expect(result.inputs.find((input) => input.symbol === "Tj")?.value).toBeCloseTo(50, 9);
    expect(result.inputs.find((input) => input.symbol === "Ptot(T)")?.label).toMatch(/47 °C case/);
    expect(result.verdict).toBe("fits");
  });
  it("ignores a heatsink when no Rth(j-c) can be found, and says so", () => {
    const result = checkThermal({ ...SMALL, heatsinkRthCPerW: 5 });
    expect(result.formula).toMatch(/Rth\(j-a\)/);
    expect(result.summary).toMatch(/heatsink is ignored/);
  });
  it("derives Rth from Ptot when none is quoted, and assumes 150 °C when Tj max is missing", () => {
    const result = checkThermal({ ...SMALL, rthJaCPerW: null, tjMaxC: null });
    expect(DEFAULT_TJ_MAX_C).toBe(150);
    // (150 − 25) / 0.625 W = 200 °C/W (common practice).
    expect(result.inputs.find((input) => input.symbol === "Rth(j-a)")?.value).toBeCloseTo(200, 9);
    expect(result.inputs.find((input) => input.symbol === "Tj(max)")?.label).toMatch(/assumed/);
  });
  it("labels an assumed VCE(sat)", () => {
    const result = checkThermal({ ...SMALL, mode: "switching", vceVolts: 1, vceAssumed: true });
    expect(result.inputs.find((input) => input.symbol === "VCE")?.label).toBe("VCE(sat), assumed (not quoted)");
  });
  it("is marginal without any thermal data", () => {
    const result = checkThermal({ ...SMALL, rthJaCPerW: null, ptotWatts: null, ptotReference: null });
    expect(result).toMatchObject({ verdict: "marginal", margin: null });
    expect(result.summary).toMatch(/junction temperature is unknown/);
  });
});
