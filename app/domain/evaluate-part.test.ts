import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { compareVerdicts } from "./check-result";
import { chooseVbe, DEFAULT_VBE_SMALL_SIGNAL_VOLTS, evaluatePart, findExclusions } from "./evaluate-part";
import type { PartSpec } from "./part";
import { parseRequirementSheet, presets, type RequirementSheetInput } from "./requirement";

// Invented parts; figures shaped like small-signal and power datasheets, no real device.
const SMALL: PartSpec = {
  manufacturer: "Norrhamn Semiconductor",
  partNumber: "NX-GP100",
  polarity: "npn",
  packageName: "TO-92",
  configuration: "single",
  vceoVolts: 45,
  vcboVolts: 60,
  veboVolts: 6,
  icMaxAmps: 0.5,
  ptotWatts: 0.625,
  ptotReference: "ambient",
  tjMaxC: 150,
  rthJaCPerW: 200,
  rthJcCPerW: null,
  gainPoints: [
    { icAmps: 1e-4, vceVolts: 5, hfeMin: 100, hfeTyp: 180, hfeMax: null, tempC: 25 },
    { icAmps: 1e-2, vceVolts: 5, hfeMin: 110, hfeTyp: 220, hfeMax: 450, tempC: 25 },
    { icAmps: 0.1, vceVolts: 5, hfeMin: 60, hfeTyp: 130, hfeMax: null, tempC: 25 },
  ],
  saturationPoints: [
    { icAmps: 0.01, ibAmps: 0.001, vceSatMaxVolts: 0.1, vceSatTypVolts: 0.05, vbeSatVolts: 0.75 },
    { icAmps: 0.1, ibAmps: 0.01, vceSatMaxVolts: 0.25, vceSatTypVolts: 0.12, vbeSatVolts: 0.9 },
    { icAmps: 0.3, ibAmps: 0.03, vceSatMaxVolts: 0.5, vceSatTypVolts: 0.25, vbeSatVolts: 1.1 },
  ],
  vbeOnVolts: 0.66,
  ftHz: 250e6,
  cobFarads: 4e-12,
  earlyVolts: 90,
  lifecycle: "active",
  datasheetUrl: null,
  datasheetRevisionDate: "2020-04-01",
};

const POWER: PartSpec = {
  ...SMALL,
  partNumber: "NX-PW3",
  packageName: "TO-220",
  vceoVolts: 60,
  vcboVolts: 80,
  veboVolts: 5,
  icMaxAmps: 4,
  ptotWatts: 40,
  ptotReference: "case",
  rthJaCPerW: 62.5,
  rthJcCPerW: 3.1,
  gainPoints: [
    { icAmps: 0.1, vceVolts: 4, hfeMin: 40, hfeTyp: 90, hfeMax: null, tempC: 25 },
    { icAmps: 2, vceVolts: 4, hfeMin: 20, hfeTyp: 45, hfeMax: null, tempC: 25 },
  ],
  saturationPoints: [{ icAmps: 2, ibAmps: 0.2, vceSatMaxVolts: 0.8, vceSatTypVolts: 0.4, vbeSatVolts: 1.3 }],
  vbeOnVolts: null,
  ftHz: 3e6,
  earlyVolts: null,
};

const preset = (id: string) => {
  const found = presets.find((p) => p.id === id);
  if (!found) throw new Error(`no preset ${id}`);
  return found.sheet;
};

describe("evaluatePart", () => {
  it("runs the linear checks for the audio preamp preset", () => {
    const evaluation = evaluatePart(SMALL, preset("audio-preamp"));
    expect(evaluation.checks.map((check) => check.check)).toEqual(["gain", "voltage", "current", "thermal", "voltage-gain", "bandwidth"]);
    expect(evaluation.verdict).toBe("fits");
    // hFE min between 100 at 0.1 mA and 110 at 10 mA, log-log at 1 mA: sqrt(100 × 110).
    expect(evaluation.hfeAtOperatingPoint).toBeCloseTo(Math.sqrt(100 * 110), 9);
    // Linear P = 12 V × 1 mA.
    expect(evaluation.dissipationWatts).toBeCloseTo(0.012, 12);
    expect(evaluation.junctionC).toBeCloseTo(40 + 0.012 * 200, 9);
    expect(evaluation.excludedBy).toEqual([]);
  });
  it("runs the switching checks and finds a 1 kΩ logic drive short for the low-side switch", () => {
    const evaluation = evaluatePart(SMALL, parseRequirementSheet({ ...preset("low-side-switch"), drive: { kind: "source", volts: 3.3, sourceOhms: 1e3 } }));
    expect(evaluation.checks.map((check) => check.check)).toEqual(["gain", "voltage", "current", "drive", "saturation", "thermal"]);
    expect(evaluation.verdict).toBe("fails");
    expect(evaluation.flags).toContain("drive-short");
    // (3.3 − VBE(sat)) / 15 mA with VBE(sat) of the nearest point (0.9 V at 100 mA): 2.4 V / 15 mA = 160 Ω -> 150 Ω E12.
    expect(evaluation.vbeVolts).toBe(0.9);
    expect(evaluation.suggestedBaseOhms).toBe(150);
    // The drive's 2.4 mA forces IC / IB = 62.5, above the worst-case hFE of 60 there: no saturation.
    expect(evaluation.checks.find((check) => check.check === "saturation")).toMatchObject({ verdict: "fails", flags: ["sat-too-high"] });
  });
  it("passes the switch once the base resistor follows the suggestion", () => {
    const sheet = parseRequirementSheet({ ...preset("low-side-switch"), drive: { kind: "source", volts: 3.3, sourceOhms: 150 } });
    const evaluation = evaluatePart(SMALL, sheet);
    expect(evaluation.checks.find((check) => check.check === "drive")?.verdict).toBe("fits");
    // VCE(sat) log-log between 0.25 V at 100 mA and 0.5 V at 300 mA: 0.25 × 2^(ln 1.5 / ln 3) at 150 mA.
    expect(evaluation.vceSatVolts).toBeCloseTo(0.25 * 2 ** (Math.log(1.5) / Math.log(3)), 9);
    expect(evaluation.checks.find((check) => check.check === "saturation")?.verdict).toBe("fits");
    expect(evaluation.verdict).toBe("fits");
  });
  it("uses the heatsink path and flags what a power datasheet leaves out", () => {
    const evaluation = evaluatePart(POWER, preset("motor-switch"));
    expect(evaluation.vceSatVolts).not.toBeNull();
    const thermal = evaluation.checks.find((check) => check.check === "thermal");
    expect(thermal?.formula).toMatch(/Rth\(j-c\) \+ Rth\(heatsink\)/);
    // Peak 3 A against IC max 4 A derated to 3 A: exactly at the limit, still fits.
    expect(evaluation.checks.find((check) => check.check === "current")?.verdict).toBe("fits");
    expect(evaluation.dataQuality.flags).toEqual(["early-unknown"]);
  });
  it("fails a part whose VCEO is below the supply and excludes other polarities and packages", () => {
    const evaluation = evaluatePart({ ...SMALL, vceoVolts: 20 }, preset("audio-preamp"));
    expect(evaluation.verdict).toBe("fails");
    expect(evaluation.flags).toContain("rating-below-supply");
    const sheet = parseRequirementSheet({ ...preset("audio-preamp"), polarity: "pnp", packages: ["SOT-23"] });
    expect(findExclusions(SMALL, sheet)).toEqual(["NPN, the sheet asks for PNP", "package TO-92 is not among SOT-23"]);
  });
  it("adds stale-datasheet when today is given", () => {
    expect(evaluatePart(SMALL, preset("audio-preamp"), { todayIso: "2036-01-01" }).flags).toContain("stale-datasheet");
    expect(evaluatePart(SMALL, preset("audio-preamp")).flags).not.toContain("stale-datasheet");
  });
});

describe("chooseVbe", () => {
  it("prefers VBE(sat) when switching, then VBE(on), then a default flagged as assumed", () => {
    expect(chooseVbe(SMALL, 0.01, "switching")).toEqual({ volts: 0.75, assumed: false });
    expect(chooseVbe(SMALL, 0.01, "linear")).toEqual({ volts: 0.66, assumed: false });
    // 0.7 V at small signal (common practice).
    expect(chooseVbe({ ...SMALL, vbeOnVolts: null }, 0.01, "linear")).toEqual({ volts: DEFAULT_VBE_SMALL_SIGNAL_VOLTS, assumed: true });
    expect(chooseVbe(POWER, 2, "linear")).toEqual({ volts: 1.0, assumed: true });
    expect(chooseVbe({ ...POWER, configuration: "darlington" }, 2, "linear")).toEqual({ volts: 1.4, assumed: true });
  });
});

describe("verdict monotonicity (property)", () => {
  const sheetArbitrary = fc.record({
    supplyVolts: fc.double({ min: 3, max: 80, noNaN: true }),
    icAmps: fc.double({ min: 1e-4, max: 3, noNaN: true }),
    mode: fc.constantFrom("linear" as const, "switching" as const),
    vceFraction: fc.double({ min: 0.1, max: 1, noNaN: true }),
    dutyCycle: fc.double({ min: 0.05, max: 1, noNaN: true }),
    ambientC: fc.double({ min: -20, max: 120, noNaN: true }),
    heatsink: fc.option(fc.double({ min: 0.5, max: 20, noNaN: true }), { nil: null }),
    requiredHfe: fc.option(fc.double({ min: 5, max: 300, noNaN: true }), { nil: null }),
    requiredVoltageGain: fc.option(fc.double({ min: 2, max: 300, noNaN: true }), { nil: null }),
    bandwidthHz: fc.option(fc.double({ min: 100, max: 1e6, noNaN: true }), { nil: null }),
    driveVolts: fc.double({ min: 1, max: 12, noNaN: true }),
    rise: fc.double({ min: 0, max: 50, noNaN: true }),
  });
  type Drawn = typeof sheetArbitrary extends fc.Arbitrary<infer T> ? T : never;
  const build = (v: Drawn, supplyVolts: number, ambientC: number) => {
    const input: RequirementSheetInput = {
      supplyVolts,
      operatingIcAmps: v.icAmps,
      mode: v.mode,
      // The operating point is held while the supply rises: VCE does not follow the supply.
      vceOperatingVolts: v.supplyVolts * v.vceFraction,
      dutyCycle: v.dutyCycle,
      ambientC,
      heatsinkRthCPerW: v.heatsink,
      requiredHfe: v.requiredHfe,
      requiredVoltageGain: v.requiredVoltageGain,
      loadOhms: 4.7e3,
      bandwidthHz: v.bandwidthHz,
      drive: { kind: "source", volts: v.driveVolts, sourceOhms: 220 },
    };
    return parseRequirementSheet(input);
  };
  it("never improves when the supply rises or the ambient gets hotter", () => {
    fc.assert(
      fc.property(sheetArbitrary, fc.constantFrom(SMALL, POWER), (v, part) => {
        const base = evaluatePart(part, build(v, v.supplyVolts, v.ambientC));
        const higherSupply = evaluatePart(part, build(v, v.supplyVolts + v.rise, v.ambientC));
        const hotter = evaluatePart(part, build(v, v.supplyVolts, Math.min(200, v.ambientC + v.rise)));
        for (const changed of [higherSupply, hotter]) {
          expect(compareVerdicts(changed.verdict, base.verdict)).toBeGreaterThanOrEqual(0);
          changed.checks.forEach((check, index) => {
            expect(check.check).toBe(base.checks[index].check);
            expect(compareVerdicts(check.verdict, base.checks[index].verdict)).toBeGreaterThanOrEqual(0);
          });
        }
      }),
      { numRuns: 300 },
    );
  });
});
