import { describe, expect, it } from "vitest";
import { checkDrive, type DriveCheckInput } from "./drive";

const SWITCH: DriveCheckInput = {
  mode: "switching",
  icAmps: 0.15,
  worstHfe: 80,
  forcedGain: 10,
  vbeVolts: 0.7,
  vbeAssumed: true,
  drive: { kind: "source", volts: 3.3, sourceOhms: 1000 },
};

describe("checkDrive", () => {
  it("fails with drive-short when the source cannot give IC / forced gain", () => {
    const result = checkDrive(SWITCH);
    // Need 150 mA / 10 = 15 mA; the source gives (3.3 − 0.7) / 1 kΩ = 2.6 mA.
    expect(result.ibNeededAmps).toBeCloseTo(0.015, 12);
    expect(result.ibAvailableAmps).toBeCloseTo(0.0026, 12);
    expect(result).toMatchObject({ check: "drive", verdict: "fails", flags: ["drive-short"] });
    expect(result.inputs.find((input) => input.symbol === "VBE")?.label).toMatch(/assumed/);
  });
  it("suggests a base resistor rounded DOWN onto E12 so the drive stays enough", () => {
    const result = checkDrive(SWITCH);
    // 2.6 V / 15 mA = 173 Ω, rounded down to E12 (IEC 60063): 150 Ω, giving 17.3 mA.
    expect(result.suggestedBaseOhms).toBe(150);
    expect(result.summary).toMatch(/150 Ω \(E12, rounded down/);
    expect(checkDrive({ ...SWITCH, series: "E24" }).suggestedBaseOhms).toBe(160);
  });
  it("says when the rounded resistor over-drives beyond the limit", () => {
    expect(checkDrive(SWITCH).summary).not.toMatch(/lengthens the turn-off/);
    expect(checkDrive({ ...SWITCH, overdriveLimit: 1.1 }).summary).toMatch(/times the need, which lengthens the turn-off/);
  });
  it("uses the worst-case hFE in linear mode", () => {
    const result = checkDrive({ ...SWITCH, mode: "linear", icAmps: 0.1, drive: { kind: "source", volts: 5, sourceOhms: 2200 } });
    // Need 100 mA / 80 = 1.25 mA; gives 4.3 V / 2.2 kΩ = 1.95 mA.
    expect(result.verdict).toBe("fits");
    expect(result.margin).toBeCloseTo((4.3 / 2200 - 0.00125) / (4.3 / 2200), 12);
  });
  it("compares a current drive directly and suggests no resistor", () => {
    const result = checkDrive({ ...SWITCH, drive: { kind: "current", ibAmps: 0.02 } });
    expect(result).toMatchObject({ verdict: "fits", suggestedBaseOhms: null, ibAvailableAmps: 0.02 });
  });
  it("fails when the drive voltage does not reach VBE", () => {
    const result = checkDrive({ ...SWITCH, drive: { kind: "source", volts: 0.5, sourceOhms: 100 } });
    expect(result).toMatchObject({ verdict: "fails", ibAvailableAmps: 0, suggestedBaseOhms: null, margin: -1 });
  });
});
