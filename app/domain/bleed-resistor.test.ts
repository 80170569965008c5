import { describe, expect, it } from "vitest";
import { highestGainAt, highestGainModel, suggestBleedForPair, suggestBleedResistor, type PairGainModel } from "./bleed-resistor";
import { E24 } from "./e-series";
import type { GainPoint, PartSpec, Polarity } from "./part";
import { parseRequirementSheet } from "./requirement";

const flat = (driverHfe: number, outputHfe: number): PairGainModel => ({ driverHfeAt: () => driverHfe, outputHfeAt: () => outputHfe });

function isE24(ohms: number): boolean {
  const mantissa = ohms / 10 ** Math.floor(Math.log10(ohms));
  return E24.some((value) => Math.abs(value - mantissa) < 1e-9);
}

describe("suggestBleedResistor", () => {
  it("takes no more than 10% of the driver's current at the lowest IC, on an E24 value rounded up", () => {
    const gains = flat(150, 60);
    const suggestion = suggestBleedResistor({ topology: "darlington", minIcAmps: 0.2, operatingIcAmps: 1, outputVbeVolts: 0.7, highGain: gains, worstGain: gains });
    expect(suggestion.maxShare).toBe(0.1);
    expect(suggestion.shareAtMinIc).toBeLessThanOrEqual(0.1);
    expect(suggestion.ohms).toBeGreaterThanOrEqual(suggestion.exactOhms);
    expect(isE24(suggestion.ohms)).toBe(true);
    // R ≥ VBE2 (1 − s) / (s IB2) with IB2 about 0.2 A / 60 (the driver's own collector current takes a little of the 0.2 A).
    expect(suggestion.exactOhms / ((0.7 * 0.9) / (0.1 * (0.2 / 60)))).toBeGreaterThan(1);
    expect(suggestion.exactOhms / ((0.7 * 0.9) / (0.1 * (0.2 / 60)))).toBeLessThan(1.03);
    expect(suggestion.bleedAmps).toBeCloseTo(0.7 / suggestion.ohms, 12);
  });

  it("shows its cost in gain, larger at the lowest current than at the operating current", () => {
    const gains = flat(100, 40);
    const suggestion = suggestBleedResistor({ topology: "sziklai", minIcAmps: 0.1, operatingIcAmps: 2, outputVbeVolts: 0.7, highGain: gains, worstGain: gains, maxShare: 0.2 });
    expect(suggestion.pairHfeWith).toBeLessThan(suggestion.pairHfeWithout);
    expect(suggestion.gainCost).toBeGreaterThan(0);
    expect(suggestion.gainCostAtMinIc).toBeGreaterThan(suggestion.gainCost);
    expect(suggestion.summary).toContain("bleed resistor");
    expect(suggestion.formula).toContain("VBE2");
  });

  it("sizes from the highest gain, so a device at the top of its spread still stays under the share", () => {
    const spread = suggestBleedResistor({
      topology: "darlington",
      minIcAmps: 0.5,
      operatingIcAmps: 1,
      outputVbeVolts: 0.7,
      highGain: flat(300, 120),
      worstGain: flat(100, 40),
    });
    const worstOnly = suggestBleedResistor({ topology: "darlington", minIcAmps: 0.5, operatingIcAmps: 1, outputVbeVolts: 0.7, highGain: flat(100, 40), worstGain: flat(100, 40) });
    expect(spread.ohms).toBeGreaterThan(worstOnly.ohms);
  });

  it("runs from a few hundred ohms for power outputs to a few kilohms for small-signal ones", () => {
    // Common practice: power output (hFE about 40 at 1 A) a few hundred ohms; small-signal output (hFE about 100 at 100 mA) a few kilohms.
    const power = suggestBleedResistor({ topology: "darlington", minIcAmps: 1, operatingIcAmps: 2, outputVbeVolts: 0.7, highGain: flat(150, 40), worstGain: flat(150, 40) });
    const small = suggestBleedResistor({ topology: "darlington", minIcAmps: 0.1, operatingIcAmps: 0.2, outputVbeVolts: 0.7, highGain: flat(300, 100), worstGain: flat(300, 100) });
    expect(power.ohms).toBeGreaterThanOrEqual(100);
    expect(power.ohms).toBeLessThan(1000);
    expect(small.ohms).toBeGreaterThanOrEqual(1000);
    expect(small.ohms).toBeLessThan(10_000);
  });

  it("rejects a share outside (0, 1)", () => {
    const gains = flat(100, 50);
    const input = { topology: "darlington" as const, minIcAmps: 0.1, operatingIcAmps: 1, outputVbeVolts: 0.7, highGain: gains, worstGain: gains };
    expect(() => suggestBleedResistor({ ...input, maxShare: 0 })).toThrow(RangeError);
    expect(() => suggestBleedResistor({ ...input, maxShare: 1 })).toThrow(RangeError);
  });
});

function makePart(polarity: Polarity, gainPoints: GainPoint[], vbeOnVolts: number | null): PartSpec {
  return {
    manufacturer: "Ardent Devices",
    partNumber: `AD-${polarity}`,
    polarity,
    packageName: "TO-220",
    configuration: "single",
    vceoVolts: 80,
    vcboVolts: null,
    veboVolts: 5,
    icMaxAmps: 5,
    ptotWatts: 60,
    ptotReference: "case",
    tjMaxC: 150,
    rthJaCPerW: 62,
    rthJcCPerW: 2,
    gainPoints,
    saturationPoints: [],
    vbeOnVolts,
    ftHz: 3e6,
    cobFarads: null,
    earlyVolts: 100,
    lifecycle: "active",
    datasheetUrl: null,
    datasheetRevisionDate: "2024-01-15",
  };
}

describe("highestGainAt and suggestBleedForPair", () => {
  const point = (icAmps: number, hfeMin: number | null, hfeTyp: number | null, hfeMax: number | null): GainPoint => ({ icAmps, vceVolts: 2, hfeMin, hfeTyp, hfeMax, tempC: 25 });

  it("takes the max curve, else typ, else the worst case", () => {
    expect(highestGainAt(makePart("npn", [point(1, 40, 80, 160)], 0.7), 1)).toBe(160);
    expect(highestGainAt(makePart("npn", [point(1, 40, 80, null)], 0.7), 1)).toBe(80);
    expect(highestGainAt(makePart("npn", [point(1, 40, null, null)], 0.7), 1)).toBe(40);
    const part = makePart("npn", [point(0.1, 40, 80, null), point(1, 30, 60, null)], 0.7);
    expect(highestGainModel(part)(0.3)).toBeCloseTo(highestGainAt(part, 0.3), 9);
  });

  it("reads the pair's lowest current, gains and output VBE from the parts and the sheet", () => {
    const driver = makePart("npn", [point(0.01, 100, 200, null), point(0.1, 120, 240, null)], 0.65);
    const output = makePart("npn", [point(0.5, 40, 80, null), point(3, 20, 40, null)], 0.8);
    const sheet = parseRequirementSheet({ supplyVolts: 15, operatingIcAmps: 1, minIcAmps: 0.5, mode: "linear", requiredHfe: 1000 });
    const suggestion = suggestBleedForPair("darlington", driver, output, sheet);
    expect(suggestion.shareAtMinIc).toBeLessThanOrEqual(0.1);
    expect(suggestion.bleedAmps).toBeCloseTo(0.8 / suggestion.ohms, 12);
    expect(suggestion.pairHfeWithout).toBeGreaterThan(suggestion.pairHfeWith);
  });
});
