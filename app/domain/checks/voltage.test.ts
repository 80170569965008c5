import { describe, expect, it } from "vitest";
import { checkVoltage } from "./voltage";

describe("checkVoltage", () => {
  it("fits when the peak clears the derated VCEO", () => {
    const result = checkVoltage({ peakVceVolts: 24, vceoVolts: 45, voltageFraction: 0.8 });
    expect(result).toMatchObject({ check: "voltage", subject: "part", verdict: "fits", flags: [] });
    // Derated limit 36 V: (36 - 24) / 36.
    expect(result.margin).toBeCloseTo(1 / 3, 12);
    expect(result.inputs.map((input) => input.symbol)).toEqual(["k(V)", "VCE(peak)", "VCEO"]);
    expect(result.summary).toMatch(/VCE\(peak\) 24 V against VCEO 45 V \(derated to 36 V\)/);
  });
  it("is marginal inside the derating and fails above the rating", () => {
    expect(checkVoltage({ peakVceVolts: 40, vceoVolts: 45, voltageFraction: 0.8 })).toMatchObject({ verdict: "marginal", flags: ["inside-derating"] });
    const fails = checkVoltage({ peakVceVolts: 50, vceoVolts: 45, voltageFraction: 0.8 });
    expect(fails).toMatchObject({ verdict: "fails", flags: ["rating-below-supply"] });
    expect(fails.margin).toBeLessThan(0);
  });
  it("checks a reverse VBE against VEBO and a VCB against VCBO when the circuit applies them", () => {
    const result = checkVoltage({ peakVceVolts: 12, vceoVolts: 45, reverseVbeVolts: 7, veboVolts: 6, peakVcbVolts: 20, vcboVolts: 60, voltageFraction: 0.8 });
    expect(result.verdict).toBe("fails");
    expect(result.flags).toEqual(["rating-below-supply"]);
    expect(result.summary).toMatch(/VEB\(reverse\) 7 V against VEBO 6 V/);
    expect(result.inputs.map((input) => input.symbol)).toContain("VCBO");
  });
  it("is marginal when a rating the circuit needs is not quoted", () => {
    const result = checkVoltage({ peakVceVolts: 12, vceoVolts: 45, reverseVbeVolts: 5, veboVolts: null, voltageFraction: 0.8 });
    expect(result.verdict).toBe("marginal");
    expect(result.summary).toMatch(/VEBO is not quoted/);
  });
  it("names the subject inside a pair", () => {
    expect(checkVoltage({ subject: "driver", peakVceVolts: 12, vceoVolts: 45, voltageFraction: 1 }).subject).toBe("driver");
  });
});
