import { describe, expect, it } from "vitest";
import { BOLTZMANN_J_PER_K, ELEMENTARY_CHARGE_C, thermalVoltage, ZERO_CELSIUS_K } from "./constants";

describe("physical constants", () => {
  it("are the CODATA 2018 exact values", () => {
    // CODATA 2018 recommended values (NIST SP 961, 2019): k = 1.380 649e-23 J/K, e = 1.602 176 634e-19 C, both exact.
    expect(BOLTZMANN_J_PER_K).toBe(1.380649e-23);
    expect(ELEMENTARY_CHARGE_C).toBe(1.602176634e-19);
    // SI brochure, 9th edition: T/K = t/°C + 273.15.
    expect(ZERO_CELSIUS_K).toBe(273.15);
  });
});

describe("thermalVoltage", () => {
  it("gives kT/q at 300 K and 25 °C", () => {
    // k/e = 8.617 333 262e-5 V/K (CODATA 2018 derived value); × 300 K = 25.852 mV.
    expect(thermalVoltage(300 - 273.15)).toBeCloseTo(0.025852, 6);
    // × 298.15 K = 25.693 mV.
    expect(thermalVoltage(25)).toBeCloseTo(0.025693, 6);
  });
  it("grows in proportion to absolute temperature", () => {
    expect(thermalVoltage(100) / thermalVoltage(0)).toBeCloseTo(373.15 / 273.15, 12);
  });
});
