import { describe, expect, it } from "vitest";
import type { PartSpec } from "../part";
import { PartSpecSchema } from "./part-schema";

// Invented part; the schema is shared by intake rows and the single-part edit form.
const part: PartSpec = {
  manufacturer: "Quillon Devices",
  partNumber: "QD-N60",
  polarity: "npn",
  packageName: "TO-92",
  configuration: "single",
  vceoVolts: 60,
  vcboVolts: null,
  veboVolts: null,
  icMaxAmps: 0.6,
  ptotWatts: null,
  ptotReference: null,
  tjMaxC: 150,
  rthJaCPerW: null,
  rthJcCPerW: null,
  gainPoints: [{ icAmps: 0.01, vceVolts: 1, hfeMin: 100, hfeTyp: null, hfeMax: 300, tempC: 25 }],
  saturationPoints: [],
  vbeOnVolts: null,
  ftHz: null,
  cobFarads: null,
  earlyVolts: null,
  lifecycle: "active",
  datasheetUrl: null,
  datasheetRevisionDate: null,
};
const messages = (value: unknown) => {
  const result = PartSpecSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => [i.path.join("."), i.message]);
};

describe("PartSpecSchema", () => {
  it("accepts a valid part unchanged", () => {
    expect(PartSpecSchema.parse(part)).toEqual(part);
  });

  it("reports every rule a part breaks, with its path", () => {
    expect(
      messages({
        ...part,
        vceoVolts: 12_000,
        icMaxAmps: -1,
        ptotWatts: 0.5,
        gainPoints: [{ ...part.gainPoints[0], hfeMin: 400, hfeTyp: 50 }],
        saturationPoints: [{ icAmps: 0.1, ibAmps: 0.01, vceSatMaxVolts: 0.2, vceSatTypVolts: 0.3, vbeSatVolts: null }],
      }),
    ).toEqual([
      ["vceoVolts", "implausible VCEO: 12 kV is outside the plausible range (above 0 V up to 3 kV)"],
      ["icMaxAmps", "IC max must be above zero (write PNP ratings as magnitudes, without the minus sign)"],
      ["gainPoints.0.hfeMin", "hFE min (400) is above hFE max (300)"],
      ["gainPoints.0.hfeTyp", "hFE typ (50) is below hFE min (400)"],
      ["saturationPoints.0.vceSatTypVolts", "VCE(sat) typ (300 mV) is above VCE(sat) max (200 mV)"],
      ["ptotReference", "Ptot reference (ambient or case) is required when Ptot is given"],
    ]);
  });

  it("still checks the cross-field rules when a required value is missing", () => {
    expect(messages({ ...part, vceoVolts: undefined, ptotWatts: 1 })).toEqual([
      ["vceoVolts", "VCEO is required"],
      ["ptotReference", "Ptot reference (ambient or case) is required when Ptot is given"],
    ]);
  });
});
