import { describe, expect, it } from "vitest";
import { checkSaturation } from "./saturation";

const SAT = { volts: 0.25, forcedGain: 10, extrapolated: false, source: "max" as const };

describe("checkSaturation", () => {
  it("fits when VCE(sat) at the drive's forced gain clears the allowance", () => {
    const result = checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: SAT, allowedSatDropVolts: 0.4 });
    expect(result).toMatchObject({ check: "saturation", verdict: "fits", flags: [] });
    expect(result.margin).toBeCloseTo(0.375, 12);
  });
  it("fails with sat-too-high above the allowed drop", () => {
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: SAT, allowedSatDropVolts: 0.2 })).toMatchObject({
      verdict: "fails",
      flags: ["sat-too-high"],
    });
  });
  it("fails when the drive forces a gain the device cannot give", () => {
    const result = checkSaturation({ icAmps: 0.15, drivenForcedGain: 90, worstHfe: 80, saturation: SAT, allowedSatDropVolts: 0.4 });
    expect(result).toMatchObject({ verdict: "fails", flags: ["sat-too-high"], margin: null });
    expect(result.summary).toMatch(/does not saturate/);
  });
  it("is marginal when the quoted VCE(sat) assumed more base current, was scaled, or is only typical", () => {
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 20, worstHfe: 80, saturation: SAT, allowedSatDropVolts: 0.4 }).verdict).toBe("marginal");
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: { ...SAT, extrapolated: true }, allowedSatDropVolts: 0.4 }).summary).toMatch(/above the quoted points/);
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: { ...SAT, source: "typ" }, allowedSatDropVolts: 0.4 }).verdict).toBe("marginal");
  });
  it("is marginal without saturation data and reports without an allowance", () => {
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: null, allowedSatDropVolts: 0.4 }).verdict).toBe("marginal");
    expect(checkSaturation({ icAmps: 0.15, drivenForcedGain: 10, worstHfe: 80, saturation: SAT, allowedSatDropVolts: null })).toMatchObject({ verdict: "fits", margin: null });
  });
});
