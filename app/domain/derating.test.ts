import { describe, expect, it } from "vitest";
import { customDerating, DEFAULT_DERATING, DERATING_POLICIES, deratedTjMaxC, findDerating } from "./derating";

describe("DERATING_POLICIES", () => {
  it("offers a 50% policy, an industrial policy, a named standard and no derating", () => {
    expect(DERATING_POLICIES.map((policy) => policy.id)).toEqual(["half", "industrial", "eee-inst-002-level-2", "none"]);
    const half = findDerating("half");
    expect(half).toMatchObject({ voltageFraction: 0.5, currentFraction: 0.5, powerFraction: 0.5 });
    // Industrial figures: 80% voltage, 75% current and power (common practice).
    expect(findDerating("industrial")).toMatchObject({ voltageFraction: 0.8, currentFraction: 0.75, powerFraction: 0.75 });
  });
  it("names the standard's source and marks its figures as recalled", () => {
    const standard = findDerating("eee-inst-002-level-2");
    // NASA EEE-INST-002, bipolar transistors, level 2: 75% V, 75% I, 50% P, Tj 125 °C or Tj max − 40 °C (from memory).
    expect(standard).toMatchObject({ voltageFraction: 0.75, currentFraction: 0.75, powerFraction: 0.5, tjMaxC: 125, tjMarginC: 40 });
    expect(standard?.source).toMatch(/EEE-INST-002.*from memory/);
  });
  it("defaults to the industrial policy and returns undefined for an unknown id", () => {
    expect(DEFAULT_DERATING.id).toBe("industrial");
    expect(findDerating("nope")).toBeUndefined();
  });
});

describe("customDerating", () => {
  it("builds a validated policy", () => {
    expect(customDerating({ voltageFraction: 0.7, currentFraction: 0.6, powerFraction: 0.5 })).toMatchObject({ id: "custom", name: "Custom", voltageFraction: 0.7 });
  });
  it("rejects fractions outside (0, 1]", () => {
    expect(() => customDerating({ voltageFraction: 1.2, currentFraction: 0.6, powerFraction: 0.5 })).toThrow();
    expect(() => customDerating({ voltageFraction: 0.7, currentFraction: 0, powerFraction: 0.5 })).toThrow();
  });
});

describe("deratedTjMaxC", () => {
  it("takes the lowest of the policy's limits", () => {
    const standard = findDerating("eee-inst-002-level-2");
    if (!standard) throw new Error("policy missing");
    expect(deratedTjMaxC(standard, 150)).toBe(110);
    expect(deratedTjMaxC(standard, 200)).toBe(125);
    expect(deratedTjMaxC(DEFAULT_DERATING, 150)).toBe(120);
    expect(deratedTjMaxC(customDerating({ voltageFraction: 1, currentFraction: 1, powerFraction: 1 }), 150)).toBe(150);
  });
});
