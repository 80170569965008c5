import { describe, expect, it } from "vitest";
import { worstCaseGain } from "../gain-curve";
import type { GainPoint } from "../part";
import { checkGain } from "./gain";

const POINTS: GainPoint[] = [
  { icAmps: 1e-3, vceVolts: 5, hfeMin: 100, hfeTyp: 200, hfeMax: null, tempC: 25 },
  { icAmps: 0.1, vceVolts: 5, hfeMin: 50, hfeTyp: 110, hfeMax: null, tempC: 25 },
];
const at = (icAmps: number, points = POINTS) => ({ icAmps, estimate: worstCaseGain(points, icAmps) });

describe("checkGain", () => {
  it("lets the lowest gain over the circuit's currents govern", () => {
    const result = checkGain({ requiredHfe: 60, gains: [at(1e-3), at(0.01), at(0.1)] });
    expect(result.verdict).toBe("fails");
    expect(result.summary).toMatch(/hFE 50 at IC = 100 mA/);
    expect(result.margin).toBeCloseTo((50 - 60) / 50, 12);
  });
  it("fits with margin when the gain clears the need", () => {
    const result = checkGain({ requiredHfe: 40, gains: [at(0.01)] });
    expect(result.verdict).toBe("fits");
    expect(result.margin).toBeCloseTo((Math.sqrt(100 * 50) - 40) / Math.sqrt(100 * 50), 12);
  });
  it("is marginal when met only with gain quoted far from the current", () => {
    const result = checkGain({ requiredHfe: 40, gains: [at(1e-5)] });
    expect(result).toMatchObject({ verdict: "marginal", flags: ["gain-off-point"] });
  });
  it("carries no-min-gain and reports without a requirement", () => {
    const typOnly = POINTS.map((p) => ({ ...p, hfeMin: null }));
    const result = checkGain({ requiredHfe: null, gains: [at(1e-3, typOnly)] });
    expect(result).toMatchObject({ verdict: "fits", margin: null, flags: ["no-min-gain"] });
    expect(result.summary).toMatch(/hFE 100 .*typ × 0.5/);
  });
  it("fails when no gain is quoted, and needs one current at least", () => {
    expect(checkGain({ requiredHfe: 10, gains: [at(1e-3, [])] }).verdict).toBe("fails");
    expect(() => checkGain({ requiredHfe: 10, gains: [] })).toThrow(RangeError);
  });
});
