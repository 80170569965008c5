import { describe, expect, it } from "vitest";
import { checkCurrent } from "./current";

describe("checkCurrent", () => {
  it("grades peak IC against the derated IC max", () => {
    const fits = checkCurrent({ peakIcAmps: 0.3, icMaxAmps: 0.5, currentFraction: 0.75 });
    expect(fits).toMatchObject({ check: "current", verdict: "fits", flags: [] });
    // Derated limit 375 mA: (0.375 - 0.3) / 0.375.
    expect(fits.margin).toBeCloseTo(0.2, 12);
    expect(checkCurrent({ peakIcAmps: 0.45, icMaxAmps: 0.5, currentFraction: 0.75 })).toMatchObject({ verdict: "marginal", flags: ["inside-derating"] });
    expect(checkCurrent({ peakIcAmps: 0.6, icMaxAmps: 0.5, currentFraction: 0.75 })).toMatchObject({ verdict: "fails", flags: ["rating-below-supply"] });
  });
  it("explains itself with the numbers used", () => {
    const result = checkCurrent({ peakIcAmps: 0.3, icMaxAmps: 0.5, currentFraction: 0.75 });
    expect(result.summary).toBe("Peak IC 300 mA against IC max 500 mA (derated to 375 mA): within the derated rating.");
    expect(result.formula).toMatch(/k\(I\) = 75%/);
  });
});
