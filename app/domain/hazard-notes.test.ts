import { describe, expect, it } from "vitest";
import { estimateDissipationWatts, HAZARDOUS_VOLTS, hazardNotes } from "./hazard-notes";
import { parseRequirementSheet } from "./requirement";

describe("hazardNotes", () => {
  it("is silent for a low-voltage, low-power sheet", () => {
    expect(hazardNotes(parseRequirementSheet({ supplyVolts: 12, operatingIcAmps: 0.1, mode: "switching" }))).toEqual([]);
  });
  it("warns above 50 V, counting the peak VCE", () => {
    // About 50 V as the hazard threshold (design section 9; common practice for extra-low voltage).
    expect(HAZARDOUS_VOLTS).toBe(50);
    const notes = hazardNotes(parseRequirementSheet({ supplyVolts: 48, peakVceVolts: 80, operatingIcAmps: 0.1, mode: "switching" }));
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/hazardous voltage \(above 50 V, here up to 80 V\)/);
    expect(notes[0]).toMatch(/datasheet and safe operating area govern/);
  });
  it("warns of large dissipation in a linear stage", () => {
    const sheet = parseRequirementSheet({ supplyVolts: 30, operatingIcAmps: 1, peakIcAmps: 2, mode: "linear", vceOperatingVolts: 10 });
    expect(estimateDissipationWatts(sheet)).toBe(20);
    expect(hazardNotes(sheet)).toEqual([expect.stringMatching(/large power \(about 20 W/)]);
  });
});
