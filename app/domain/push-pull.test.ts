import { describe, expect, it } from "vitest";
import type { PartSpec, Polarity } from "./part";
import { gainMismatch, matchPushPull } from "./push-pull";

function makePart(partNumber: string, polarity: Polarity, hfeMin: number): PartSpec {
  return {
    manufacturer: "Quillon Semiconductor",
    partNumber,
    polarity,
    packageName: "TO-220",
    configuration: "single",
    vceoVolts: 60,
    vcboVolts: null,
    veboVolts: null,
    icMaxAmps: 3,
    ptotWatts: null,
    ptotReference: null,
    tjMaxC: 150,
    rthJaCPerW: null,
    rthJcCPerW: null,
    gainPoints: [{ icAmps: 0.5, vceVolts: 2, hfeMin, hfeTyp: null, hfeMax: null, tempC: 25 }],
    saturationPoints: [],
    vbeOnVolts: null,
    ftHz: null,
    cobFarads: null,
    earlyVolts: null,
    lifecycle: "active",
    datasheetUrl: null,
    datasheetRevisionDate: null,
  };
}

describe("gainMismatch", () => {
  it("is the larger gain over the smaller, less one, either way round", () => {
    expect(gainMismatch(100, 120)).toBeCloseTo(0.2, 12);
    expect(gainMismatch(120, 100)).toBeCloseTo(0.2, 12);
    expect(gainMismatch(80, 80)).toBe(0);
  });
});

describe("matchPushPull", () => {
  const parts = [
    makePart("QN-100", "npn", 100),
    makePart("QN-200", "npn", 200),
    makePart("QP-110", "pnp", 110),
    makePart("QP-125", "pnp", 125),
    makePart("QP-300", "pnp", 300),
  ];

  it("pairs only NPN with PNP parts whose gain at the operating current agrees within the tolerance, closest first", () => {
    const matches = matchPushPull(parts, 0.5);
    expect(matches.map((m) => `${m.npn.partNumber}/${m.pnp.partNumber}`)).toEqual(["QN-100/QP-110"]);
    expect(matches[0].mismatch).toBeCloseTo(0.1, 12);
  });

  it("widens with the tolerance and reports each mismatch", () => {
    const matches = matchPushPull(parts, 0.5, { tolerance: 0.65 });
    expect(matches.map((m) => `${m.npn.partNumber}/${m.pnp.partNumber}`)).toEqual([
      "QN-100/QP-110",
      "QN-100/QP-125",
      "QN-200/QP-300",
      "QN-200/QP-125",
    ]);
    expect(matches.every((m) => m.mismatch <= 0.65)).toBe(true);
    expect(matchPushPull(parts, 0.5, { tolerance: 0.65, limit: 1 })).toHaveLength(1);
  });

  it("rejects a negative tolerance", () => {
    expect(() => matchPushPull(parts, 0.5, { tolerance: -0.1 })).toThrow(RangeError);
  });
});
