import { describe, expect, it } from "vitest";
import { checkBandwidth, DEFAULT_BANDWIDTH_FACTOR } from "./bandwidth";

describe("checkBandwidth", () => {
  it("fits with fT well above bandwidth × gain", () => {
    const result = checkBandwidth({ ftHz: 250e6, bandwidthHz: 20e3, gainNeeded: 100 });
    expect(result).toMatchObject({ check: "bandwidth", verdict: "fits" });
    expect(result.margin).toBeCloseTo((250e6 - 2e6) / 250e6, 12);
    expect(result.summary).toMatch(/fT 250 MHz against 2 MHz/);
  });
  it("is marginal inside the headroom factor and fails below the demand", () => {
    // Headroom factor 2 (common practice).
    expect(DEFAULT_BANDWIDTH_FACTOR).toBe(2);
    expect(checkBandwidth({ ftHz: 3e6, bandwidthHz: 20e3, gainNeeded: 100 }).verdict).toBe("marginal");
    const fails = checkBandwidth({ ftHz: 1e6, bandwidthHz: 20e3, gainNeeded: 100 });
    expect(fails.verdict).toBe("fails");
    expect(fails.margin).toBeCloseTo(-1, 12);
    expect(checkBandwidth({ ftHz: 3e6, bandwidthHz: 20e3, gainNeeded: 100, factor: 1.2 }).verdict).toBe("fits");
  });
  it("is marginal when fT is not quoted", () => {
    expect(checkBandwidth({ ftHz: null, bandwidthHz: 20e3, gainNeeded: 100 })).toMatchObject({ verdict: "marginal", margin: null });
  });
});
