// Invented devices for the pair tests: a small-signal and a power transistor of either polarity, with gain and saturation points.
import type { GainPoint, PartSpec, Polarity, SaturationPoint } from "#app/domain/part.ts";

export const gainPoint = (icAmps: number, hfeMin: number): GainPoint => ({ icAmps, vceVolts: 5, hfeMin, hfeTyp: hfeMin * 1.6, hfeMax: null, tempC: 25 });
export const satPoint = (icAmps: number, vceSatMaxVolts: number): SaturationPoint => ({ icAmps, ibAmps: icAmps / 10, vceSatMaxVolts, vceSatTypVolts: null, vbeSatVolts: 0.9 });

export function makeDevice(partNumber: string, polarity: Polarity, size: "small" | "power", overrides: Partial<PartSpec> = {}): PartSpec {
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
