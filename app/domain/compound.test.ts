import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { hfeAt, vceSatAt, worstCaseGain } from "./gain-curve";
import type { GainPoint, PartSpec, Polarity, SaturationPoint } from "./part";
import { parseRequirementSheet } from "./requirement";
import {
  canPair,
  compoundBeta,
  compoundPolarity,
  compoundVbe,
  compoundVceSat,
  cornerGainModel,
  darlingtonBeta,
  evaluateCompound,
  findCompoundExclusions,
  PAIR_MAX_ITERATIONS,
  solvePairCurrents,
  sziklaiBeta,
  type CompoundTopology,
  worstGainModel,
} from "./compound";

const flat = (hfe: number) => () => hfe;
// Gain falling a little with current, like a device past its peak (common practice: gain rolls off at high current).
const falling = (hfeAt1mA: number) => (icAmps: number) => hfeAt1mA * (1e-3 / icAmps) ** 0.1;

describe("pair beta formulas", () => {
  it("gives β1 β2 + β1 + β2 for a Darlington and β1 (β2 + 1) for a Sziklai", () => {
    expect(darlingtonBeta(100, 50)).toBe(5150);
    expect(sziklaiBeta(100, 50)).toBe(5100);
    expect(compoundBeta("darlington", 100, 50)).toBe(5150);
    expect(compoundBeta("sziklai", 100, 50)).toBe(5100);
  });

  it("adds the VBEs for a Darlington, keeps the driver's for a Sziklai", () => {
    // Common practice: a Darlington's VBE is about two diode drops, about 1.2 V to 1.4 V.
    const vbe = compoundVbe("darlington", 0.65, 0.68);
    expect(vbe).toBeGreaterThan(1.2);
    expect(vbe).toBeLessThan(1.4);
    expect(compoundVbe("sziklai", 0.65, 0.68)).toBe(0.65);
  });

  it("puts the saturation voltage one VBE above the driver's, never below about one VBE", () => {
    // Common practice: a Darlington's VCE(sat) cannot fall below about one VBE.
    expect(compoundVceSat(0.1, 0.7)).toBeCloseTo(0.8, 12);
    expect(compoundVceSat(0, 0.7)).toBeGreaterThanOrEqual(0.7);
  });
});

describe("solvePairCurrents", () => {
  const topologies: CompoundTopology[] = ["darlington", "sziklai"];

  it.each(topologies)("reproduces the formula beta with constant gains and no bleed (%s)", (topology) => {
    const solved = solvePairCurrents({
      topology,
      pairIcAmps: 1,
      bleedOhms: null,
      outputVbeVolts: 0.7,
      driverHfeAt: flat(200),
      outputHfeAt: flat(40),
    });
    expect(solved.converged).toBe(true);
    expect(solved.pairHfe).toBeCloseTo(compoundBeta(topology, 200, 40), 4);
    expect(solved.bleedShare).toBe(0);
  });

  it("runs each device at its own current, and the Darlington's currents add up to the pair's", () => {
    const solved = solvePairCurrents({
      topology: "darlington",
      pairIcAmps: 2,
      bleedOhms: 330,
      outputVbeVolts: 0.7,
      driverHfeAt: falling(150),
      outputHfeAt: falling(60),
    });
    expect(solved.driverHfe).toBeCloseTo(falling(150)(solved.driverIcAmps), 6);
    expect(solved.outputHfe).toBeCloseTo(falling(60)(solved.outputIcAmps), 6);
    expect(solved.driverIcAmps + solved.outputIcAmps).toBeCloseTo(2, 8);
    expect(solved.bleedAmps).toBeCloseTo(0.7 / 330, 12);
    // The driver's emitter feeds the output's base and the bleed resistor.
    const driverIe = solved.pairIbAmps * (solved.driverHfe + 1);
    expect(driverIe).toBeCloseTo(solved.outputIbAmps + solved.bleedAmps, 10);
    expect(solved.bleedShare).toBeCloseTo(solved.bleedAmps / driverIe, 10);
    expect(solved.iterations).toBeLessThan(PAIR_MAX_ITERATIONS);
  });

  it("balances the Sziklai's inner node: the driver's collector feeds the output's base and the bleed", () => {
    const solved = solvePairCurrents({
      topology: "sziklai",
      pairIcAmps: 0.5,
      bleedOhms: 1000,
      outputVbeVolts: 0.68,
      driverHfeAt: falling(300),
      outputHfeAt: falling(80),
    });
    expect(solved.driverIcAmps).toBeCloseTo(solved.outputIbAmps + solved.bleedAmps, 9);
    expect(solved.outputIcAmps + solved.outputIbAmps + solved.bleedAmps).toBeCloseTo(0.5, 8);
    expect(solved.pairIbAmps).toBeCloseTo(solved.driverIcAmps / solved.driverHfe, 12);
  });

  it("loses gain to a bleed resistor, more the smaller it is (property)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...topologies),
        fc.double({ min: 20, max: 800, noNaN: true }),
        fc.double({ min: 10, max: 300, noNaN: true }),
        fc.double({ min: 1e-3, max: 3, noNaN: true }),
        fc.double({ min: 100, max: 1e5, noNaN: true }),
        (topology, b1, b2, icAmps, ohms) => {
          const base = { topology, pairIcAmps: icAmps, outputVbeVolts: 0.7, driverHfeAt: falling(b1), outputHfeAt: falling(b2) };
          const without = solvePairCurrents({ ...base, bleedOhms: null });
          const withLarge = solvePairCurrents({ ...base, bleedOhms: ohms * 2 });
          const withSmall = solvePairCurrents({ ...base, bleedOhms: ohms });
          if (!withSmall.feasible) return;
          expect(withLarge.pairHfe).toBeLessThanOrEqual(without.pairHfe * (1 + 1e-9));
          expect(withSmall.pairHfe).toBeLessThanOrEqual(withLarge.pairHfe * (1 + 1e-9));
          expect(withSmall.bleedShare).toBeGreaterThanOrEqual(withLarge.bleedShare);
        },
      ),
    );
  });

  it("reports an infeasible pair when a device has no gain or the bleed alone exceeds the pair's current", () => {
    const noGain = solvePairCurrents({
      topology: "darlington",
      pairIcAmps: 1,
      bleedOhms: null,
      outputVbeVolts: 0.7,
      driverHfeAt: flat(0),
      outputHfeAt: flat(50),
    });
    expect(noGain.feasible).toBe(false);
    const swamped = solvePairCurrents({
      topology: "sziklai",
      pairIcAmps: 1e-3,
      bleedOhms: 100,
      outputVbeVolts: 0.7,
      driverHfeAt: flat(100),
      outputHfeAt: flat(50),
    });
    expect(swamped.feasible).toBe(false);
    expect(swamped.pairHfe).toBe(0);
  });
});

const gainPoint = (icAmps: number, hfeMin: number): GainPoint => ({ icAmps, vceVolts: 5, hfeMin, hfeTyp: hfeMin * 1.6, hfeMax: null, tempC: 25 });
const satPoint = (icAmps: number, vceSatMaxVolts: number): SaturationPoint => ({ icAmps, ibAmps: icAmps / 10, vceSatMaxVolts, vceSatTypVolts: null, vbeSatVolts: 0.9 });

function makeDevice(partNumber: string, polarity: Polarity, size: "small" | "power", overrides: Partial<PartSpec> = {}): PartSpec {
  const small = size === "small";
  return {
    manufacturer: "Meridel Micro",
    partNumber,
    polarity,
    packageName: small ? "TO-92" : "TO-220",
    configuration: "single",
    vceoVolts: small ? 60 : 100,
    vcboVolts: null,
    veboVolts: 5,
    icMaxAmps: small ? 0.5 : 8,
    ptotWatts: small ? 0.625 : 80,
    ptotReference: small ? "ambient" : "case",
    tjMaxC: 150,
    rthJaCPerW: small ? 200 : 62.5,
    rthJcCPerW: small ? null : 1.56,
    gainPoints: small ? [gainPoint(1e-3, 120), gainPoint(1e-2, 150), gainPoint(0.1, 100)] : [gainPoint(0.1, 60), gainPoint(1, 50), gainPoint(4, 20)],
    saturationPoints: small ? [satPoint(0.01, 0.1), satPoint(0.1, 0.25)] : [satPoint(1, 0.4), satPoint(4, 1)],
    vbeOnVolts: small ? 0.65 : 0.75,
    ftHz: small ? 2e8 : 3e6,
    cobFarads: null,
    earlyVolts: 100,
    lifecycle: "active",
    datasheetUrl: null,
    datasheetRevisionDate: "2024-06-01",
    ...overrides,
  };
}

describe("evaluateCompound", () => {
  const driver = makeDevice("MR-S1N", "npn", "small");
  const output = makeDevice("MR-P1N", "npn", "power");
  const pnpOutput = makeDevice("MR-P1P", "pnp", "power");
  const linear = parseRequirementSheet({
    supplyVolts: 15,
    operatingIcAmps: 1,
    peakIcAmps: 1.5,
    minIcAmps: 0.1,
    mode: "linear",
    vceOperatingVolts: 5,
    ambientC: 40,
    heatsinkRthCPerW: 3,
    requiredHfe: 1000,
    polarity: "npn",
  });

  it("pairs one polarity as a Darlington and opposite polarities as a Sziklai, acting as the driver's polarity", () => {
    expect(canPair("darlington", driver, output)).toBe(true);
    expect(canPair("darlington", driver, pnpOutput)).toBe(false);
    expect(canPair("sziklai", driver, pnpOutput)).toBe(true);
    expect(compoundPolarity(driver)).toBe("npn");
    expect(() => evaluateCompound("sziklai", driver, output, linear)).toThrow(RangeError);
  });

  it("runs each device at its own current and reports the pair's derived figures with formulas", () => {
    const pair = evaluateCompound("darlington", driver, output, linear);
    const { driver: d, output: o } = pair.devices;
    expect(o.icAmps + d.icAmps).toBeCloseTo(1, 8);
    expect(d.icAmps).toBeCloseTo(1 / (o.gain.hfe + 1), 3);
    expect(pair.hfeAtOperatingPoint).toBeCloseTo(darlingtonBeta(d.gain.hfe, o.gain.hfe), -1);
    expect(pair.vbeVolts).toBeCloseTo(0.65 + 0.75, 12);
    expect(pair.vceoVolts).toBe(60);
    expect(pair.icMaxAmps).toBe(8);
    expect(pair.figures.find((f) => f.symbol === "β")?.formula).toContain("β1 β2 + β1 + β2");
    expect(pair.verdict).not.toBe("fails");
  });

  it("splits the dissipation: the driver at VCE − VBE2, the output at VCE", () => {
    const pair = evaluateCompound("darlington", driver, output, linear);
    expect(pair.devices.driver.vceVolts).toBeCloseTo(5 - 0.75, 12);
    expect(pair.devices.output.vceVolts).toBe(5);
    expect(pair.devices.output.dissipationWatts).toBeCloseTo(5 * pair.devices.output.icAmps, 9);
    expect(pair.devices.driver.dissipationWatts).toBeCloseTo(4.25 * pair.devices.driver.icAmps, 9);
  });

  it("checks each device on its own ratings: a driver whose IC max is below its own current fails", () => {
    const weakDriver = makeDevice("MR-S2N", "npn", "small", { icMaxAmps: 0.01 });
    const pair = evaluateCompound("darlington", weakDriver, output, linear);
    const failing = pair.checks.filter((c) => c.verdict === "fails").map((c) => `${c.subject}/${c.check}`);
    expect(failing).toEqual(["driver/current"]);
  });

  it("loses gain to a bleed resistor and reports its share of the driver's current", () => {
    const without = evaluateCompound("sziklai", driver, pnpOutput, linear);
    const withBleed = evaluateCompound("sziklai", driver, pnpOutput, linear, { bleedOhms: 220 });
    expect(withBleed.hfeAtOperatingPoint).toBeLessThan(without.hfeAtOperatingPoint);
    expect(withBleed.hfeWithoutBleed).toBeCloseTo(without.hfeAtOperatingPoint, 9);
    expect(withBleed.bleedAmps).toBeCloseTo(0.75 / 220, 12);
    expect(withBleed.bleedShare).toBeGreaterThan(0);
    expect(withBleed.figures.map((f) => f.symbol)).toContain("Rbleed");
    expect(without.vbeVolts).toBe(0.65);
  });

  it("fails a pair whose gain falls short of the sheet", () => {
    const pair = evaluateCompound("darlington", driver, output, { ...linear, requiredHfe: 1e6 });
    expect(pair.verdict).toBe("fails");
    expect(pair.checks.find((c) => c.check === "gain")?.subject).toBe("pair");
  });

  it("saturates the driver when switching: VCE(sat) = VCE(sat)1 + VBE2, and the drive need follows the driver's current", () => {
    const switching = parseRequirementSheet({
      supplyVolts: 24,
      operatingIcAmps: 2,
      mode: "switching",
      dutyCycle: 0.5,
      heatsinkRthCPerW: 5,
      drive: { kind: "current", ibAmps: 0.01 },
      allowedSatDropVolts: 1.5,
      polarity: "npn",
    });
    const pair = evaluateCompound("darlington", driver, output, switching);
    const driverSat = vceSatAt(driver.saturationPoints, pair.devices.driver.icAmps)?.volts ?? Number.NaN;
    expect(pair.vceSatVolts).toBeCloseTo(driverSat + 0.75, 12);
    // Common practice: a Darlington's VCE(sat) cannot fall below about one VBE.
    expect(pair.vceSatVolts).toBeGreaterThan(0.75);
    const drive = pair.checks.find((c) => c.check === "drive");
    expect(drive?.inputs.find((i) => i.symbol === "IB(need)")?.value).toBeCloseTo(pair.devices.driver.icAmps / 10, 9);
    expect(pair.checks.find((c) => c.check === "saturation")?.verdict).not.toBe("fails");
  });

  it("lists what puts a pair outside the sheet's polarity and packages", () => {
    expect(findCompoundExclusions(driver, output, { ...linear, polarity: "pnp" })[0]).toContain("acts as NPN");
    expect(findCompoundExclusions(driver, output, { ...linear, packages: ["TO-220"] })).toEqual(["driver: package TO-92 is not among TO-220"]);
    expect(findCompoundExclusions(driver, output, linear)).toEqual([]);
  });
});

describe("gain models", () => {
  const pointArb = fc.record({
    icAmps: fc.double({ min: 1e-5, max: 5, noNaN: true }),
    vceVolts: fc.constant(5),
    hfeMin: fc.option(fc.double({ min: 5, max: 800, noNaN: true }), { nil: null }),
    hfeTyp: fc.option(fc.double({ min: 5, max: 800, noNaN: true }), { nil: null }),
    hfeMax: fc.option(fc.double({ min: 5, max: 800, noNaN: true }), { nil: null }),
    tempC: fc.constantFrom(25, null, 100),
  });

  it("gives worstCaseGain's hFE at any current, with the curve built once (property)", () => {
    fc.assert(
      fc.property(fc.array(pointArb, { minLength: 1, maxLength: 5 }), fc.double({ min: 1e-7, max: 50, noNaN: true }), (points, icAmps) => {
        const part = makeDevice("MR-G", "npn", "small", { gainPoints: points });
        const expected = worstCaseGain(points, icAmps).hfe;
        expect(worstGainModel(part)(icAmps)).toBeCloseTo(expected, 9);
      }),
    );
  });

  it("draws one corner log-log between quoted currents and flat beyond, scaled", () => {
    const points = [gainPoint(1e-3, 100), gainPoint(1e-1, 50)];
    const model = cornerGainModel(points, "typ", 0.5);
    expect(model(1e-2)).toBeCloseTo((hfeAt(points, 1e-2, "typ") ?? 0) * 0.5, 9);
    expect(model(1e-6)).toBeCloseTo(80, 9);
    expect(model(10)).toBeCloseTo(40, 9);
    expect(cornerGainModel(points, "max")(1e-2)).toBe(0);
  });
});
