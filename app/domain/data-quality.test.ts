import { describe, expect, it } from "vitest";
import { assessDataQuality, isStale } from "./data-quality";
import type { PartSpec } from "./part";

const COMPLETE: PartSpec = {
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
    { icAmps: 1e-3, vceVolts: 5, hfeMin: 100, hfeTyp: 200, hfeMax: null, tempC: 25 },
    { icAmps: 0.1, vceVolts: 5, hfeMin: 60, hfeTyp: 120, hfeMax: null, tempC: 25 },
  ],
  saturationPoints: [],
  vbeOnVolts: 0.65,
  ftHz: 250e6,
  cobFarads: 4e-12,
  earlyVolts: 80,
  lifecycle: "active",
  datasheetUrl: null,
  datasheetRevisionDate: "2021-06-01",
};

describe("assessDataQuality", () => {
  it("finds nothing wrong with a complete, recent record", () => {
    expect(assessDataQuality(COMPLETE, { todayIso: "2026-12-02" })).toEqual({ flags: [], score: 1 });
  });
  it("flags a missing minimum, a missing Early voltage and a single gain current", () => {
    const sparse: PartSpec = { ...COMPLETE, earlyVolts: null, gainPoints: [{ ...COMPLETE.gainPoints[0], hfeMin: null }] };
    expect(assessDataQuality(sparse)).toEqual({ flags: ["no-min-gain", "early-unknown", "single-gain-point"], score: 0.25 });
  });
  it("flags a stale datasheet only when today is given", () => {
    const old = { ...COMPLETE, datasheetRevisionDate: "2009-03-15" };
    expect(assessDataQuality(old).flags).toEqual([]);
    expect(assessDataQuality(old, { todayIso: "2026-12-02" }).flags).toEqual(["stale-datasheet"]);
    expect(assessDataQuality(old, { todayIso: "2026-12-02", staleAfterYears: 20 }).flags).toEqual([]);
  });
});

describe("isStale", () => {
  it("compares whole years from today and counts an unknown revision as stale", () => {
    expect(isStale("2016-12-03", { todayIso: "2026-12-02" })).toBe(false);
    expect(isStale("2016-12-01", { todayIso: "2026-12-02" })).toBe(true);
    expect(isStale(null, { todayIso: "2026-12-02" })).toBe(true);
    expect(isStale("not a date", { todayIso: "2026-12-02" })).toBe(true);
    expect(isStale(null, {})).toBe(false);
  });
});
