import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { gainPoint, makeDevice } from "#tests/setup/pair-devices.ts";
import {
  compoundBeta,
  compoundVbe,
  compoundVceSat,
  cornerGainModel,
  darlingtonBeta,
  PAIR_MAX_ITERATIONS,
  solvePairCurrents,
  sziklaiBeta,
  type CompoundTopology,
  worstGainModel,
} from "./compound-currents";
import { hfeAt, worstCaseGain } from "./gain-curve";

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
