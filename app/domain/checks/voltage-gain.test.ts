import { describe, expect, it } from "vitest";
import { thermalVoltage } from "../constants";
import { checkVoltageGain, intrinsicParameters, type VoltageGainCheckInput } from "./voltage-gain";

const STAGE: VoltageGainCheckInput = { icAmps: 1e-3, vceVolts: 10, earlyVolts: 90, loadOhms: 10e3, requiredVoltageGain: 100, tempC: 25, hfe: 150 };

describe("intrinsicParameters", () => {
  it("gives ro = (VA + VCE) / IC and gm = IC / VT", () => {
    const p = intrinsicParameters(1e-3, 10, 90, 25);
    expect(p.roOhms).toBeCloseTo(100e3, 6);
    // VT at 25 °C = 25.693 mV (CODATA 2018 k and e).
    expect(p.gmSiemens).toBeCloseTo(1e-3 / 0.025693, 4);
    expect(p.intrinsicGain).toBeCloseTo(100 / thermalVoltage(25), 9);
  });
});

describe("checkVoltageGain", () => {
  it("computes gm × (RC ∥ ro) against the need", () => {
    const result = checkVoltageGain(STAGE);
    const expected = (1e-3 / thermalVoltage(25)) * ((10e3 * 100e3) / 110e3);
    expect(result.inputs.find((input) => input.symbol === "Av")?.value).toBeCloseTo(expected, 9);
    expect(result).toMatchObject({ check: "voltage-gain", verdict: "fits", flags: [] });
    expect(result.margin).toBeCloseTo((expected - 100) / expected, 12);
  });
  it("fails when the gain falls short", () => {
    expect(checkVoltageGain({ ...STAGE, requiredVoltageGain: 500 }).verdict).toBe("fails");
  });
  it("is marginal with early-unknown and an upper bound gm × RC when VA is missing", () => {
    const result = checkVoltageGain({ ...STAGE, earlyVolts: null });
    expect(result).toMatchObject({ verdict: "marginal", flags: ["early-unknown"] });
    expect(result.inputs.find((input) => input.symbol === "Av")?.value).toBeCloseTo(10 / thermalVoltage(25), 9);
  });
  it("flags low-early-voltage on a high-gain part with a low VA, or when ro loads the stage", () => {
    expect(checkVoltageGain({ ...STAGE, earlyVolts: 30, hfe: 400, requiredVoltageGain: 10 }).flags).toEqual(["low-early-voltage"]);
    // ro = 40 kΩ: more than ten times a 2.2 kΩ load, so an ordinary-gain part is not flagged; a 10 kΩ load is.
    expect(checkVoltageGain({ ...STAGE, earlyVolts: 30, hfe: 100, loadOhms: 2.2e3, requiredVoltageGain: 10 }).flags).toEqual([]);
    expect(checkVoltageGain({ ...STAGE, earlyVolts: 30, hfe: 100, loadOhms: 10e3, requiredVoltageGain: 10 }).flags).toEqual(["low-early-voltage"]);
  });
  it("loses gain as the stage gets hotter (VT rises)", () => {
    const cool = checkVoltageGain(STAGE).inputs.find((input) => input.symbol === "Av")?.value ?? 0;
    const hot = checkVoltageGain({ ...STAGE, tempC: 85 }).inputs.find((input) => input.symbol === "Av")?.value ?? 0;
    expect(hot).toBeLessThan(cool);
  });
});
