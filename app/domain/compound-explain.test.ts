import { describe, expect, it } from "vitest";
import { makeDevice } from "#tests/setup/pair-devices.ts";
import { canPair, compoundPolarity, darlingtonBeta } from "./compound-currents";
import { evaluateCompound } from "./compound-explain";
import { findCompoundExclusions } from "./compound-screen";
import { vceSatAt } from "./gain-curve";
import { parseRequirementSheet } from "./requirement";

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
