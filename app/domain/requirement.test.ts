import { describe, expect, it } from "vitest";
import { DEFAULT_DERATING } from "./derating";
import { DEFAULT_FORCED_GAIN, minIcOf, operatingVceOf, parseRequirementSheet, peakIcOf, peakVceOf, presets, RequirementSheetSchema } from "./requirement";

const MINIMAL = { supplyVolts: 12, operatingIcAmps: 0.1, mode: "switching" as const };

describe("RequirementSheetSchema", () => {
  it("fills the defaults of a minimal sheet", () => {
    const sheet = parseRequirementSheet(MINIMAL);
    expect(sheet).toMatchObject({
      peakVceVolts: null,
      peakIcAmps: null,
      dutyCycle: 1,
      ambientC: 25,
      heatsinkRthCPerW: null,
      drive: null,
      polarity: "any",
      packages: [],
      compounds: false,
      orderQuantity: 1,
    });
    // Forced gain 10 for hard saturation (common practice).
    expect(sheet.forcedGain).toBe(DEFAULT_FORCED_GAIN);
    expect(DEFAULT_FORCED_GAIN).toBe(10);
    expect(sheet.derating).toEqual(DEFAULT_DERATING);
  });
  it("rejects inconsistent or non-physical fields with their path", () => {
    const cases: [object, string][] = [
      [{ ...MINIMAL, supplyVolts: -1 }, "supplyVolts"],
      [{ ...MINIMAL, peakVceVolts: 5 }, "peakVceVolts"],
      [{ ...MINIMAL, peakIcAmps: 0.05 }, "peakIcAmps"],
      [{ ...MINIMAL, minIcAmps: 0.2 }, "minIcAmps"],
      [{ ...MINIMAL, vceOperatingVolts: 20 }, "vceOperatingVolts"],
      [{ ...MINIMAL, dutyCycle: 1.5 }, "dutyCycle"],
      [{ ...MINIMAL, drive: { kind: "source", volts: 3.3 } }, "drive"],
      [{ ...MINIMAL, mode: "pulsed" }, "mode"],
    ];
    for (const [input, path] of cases) {
      const parsed = RequirementSheetSchema.safeParse(input);
      expect(parsed.success).toBe(false);
      expect(parsed.error?.issues.map((issue) => issue.path[0])).toContain(path);
    }
  });
  it("accepts both drive kinds", () => {
    expect(parseRequirementSheet({ ...MINIMAL, drive: { kind: "current", ibAmps: 0.01 } }).drive).toEqual({ kind: "current", ibAmps: 0.01 });
    expect(parseRequirementSheet({ ...MINIMAL, drive: { kind: "source", volts: 5, sourceOhms: 470 } }).drive?.kind).toBe("source");
  });
});

describe("derived operating values", () => {
  it("fall back to the supply, the operating current and half the supply", () => {
    const sheet = parseRequirementSheet({ ...MINIMAL, mode: "linear" });
    expect(peakVceOf(sheet)).toBe(12);
    expect(peakIcOf(sheet)).toBe(0.1);
    expect(minIcOf(sheet)).toBe(0.1);
    expect(operatingVceOf(sheet)).toBe(6);
  });
  it("use the stated values when given", () => {
    const sheet = parseRequirementSheet({ ...MINIMAL, peakVceVolts: 15, peakIcAmps: 0.3, minIcAmps: 0.01, vceOperatingVolts: 4 });
    expect([peakVceOf(sheet), peakIcOf(sheet), minIcOf(sheet), operatingVceOf(sheet)]).toEqual([15, 0.3, 0.01, 4]);
  });
});

describe("presets", () => {
  it("cover the common circuits, each a valid sheet", () => {
    expect(presets.map((preset) => preset.id)).toEqual(["audio-preamp", "low-side-switch", "motor-switch", "linear-pass"]);
    for (const preset of presets) expect(RequirementSheetSchema.safeParse(preset.sheet).success).toBe(true);
  });
  it("match the mode each circuit runs in", () => {
    const modes = Object.fromEntries(presets.map((preset) => [preset.id, preset.sheet.mode]));
    expect(modes).toEqual({ "audio-preamp": "linear", "low-side-switch": "switching", "motor-switch": "switching", "linear-pass": "linear" });
  });
});
