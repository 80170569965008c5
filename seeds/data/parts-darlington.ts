// Invented Darlington pairs in one package, from TO-92 to TO-3.
import type { PartSpec } from "#app/domain/part.ts";
import { MAELBROOK, OSTREVIK, QUARROW, VELLACOTT } from "./manufacturers.ts";
import { definePart, deriveVariant, quoteGain, rateAtAmbient, rateAtCase, quoteSaturation } from "./part-builders.ts";

const darlington = "darlington" as const;

const vpd8120 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD8120",
  polarity: "npn",
  packageName: "TO-220",
  configuration: darlington,
  vceoVolts: 100,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 8,
  thermals: rateAtCase(65, 150, 1.92, 62.5),
  gainPoints: [quoteGain(0.5, 3, { typ: 5000 }), quoteGain(3, 3, { min: 1000, typ: 2500 })],
  saturationPoints: [
    quoteSaturation(1, 4e-3, { max: 1.5, typ: 1.05 }, 1.8),
    quoteSaturation(3, 12e-3, { max: 2.0, typ: 1.3 }, 2.4),
  ],
  vbeOnVolts: 1.3,
  ftHz: 4e6,
  cobFarads: 200e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2018-05-30",
});

const vpd9120 = deriveVariant(vpd8120, {
  partNumber: "VPD9120",
  polarity: "pnp",
  gainPoints: [quoteGain(0.5, 3, { typ: 4500 }), quoteGain(3, 3, { min: 1000, typ: 2200 })],
  saturationPoints: [
    quoteSaturation(1, 4e-3, { max: 1.6, typ: 1.1 }, 1.85),
    quoteSaturation(3, 12e-3, { max: 2.0, typ: 1.4 }, 2.5),
  ],
  vbeOnVolts: 1.35,
  cobFarads: 300e-12,
});

const vpd8160 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD8160",
  polarity: "npn",
  packageName: "TO-3",
  configuration: darlington,
  vceoVolts: 100,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 20,
  thermals: rateAtCase(160, 200, 1.09, 35),
  gainPoints: [quoteGain(5, 3, { typ: 4000 }), quoteGain(10, 3, { min: 1000, max: 18000 })],
  saturationPoints: [
    quoteSaturation(5, 20e-3, { max: 1.5, typ: 1.1 }, 2.3),
    quoteSaturation(10, 40e-3, { max: 2.0, typ: 1.4 }, 2.8),
  ],
  vbeOnVolts: 1.4,
  ftHz: 1e6,
  cobFarads: 400e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2016-03-14",
});

const vpd9160 = deriveVariant(vpd8160, {
  partNumber: "VPD9160",
  polarity: "pnp",
  gainPoints: [quoteGain(5, 3, { typ: 3500 }), quoteGain(10, 3, { min: 1000, max: 18000 })],
  saturationPoints: [
    quoteSaturation(5, 20e-3, { max: 1.6, typ: 1.15 }, 2.35),
    quoteSaturation(10, 40e-3, { max: 2.0, typ: 1.5 }, 2.9),
  ],
  cobFarads: 600e-12,
});

const vpd8240 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD8240",
  polarity: "npn",
  packageName: "TO-247",
  configuration: darlington,
  vceoVolts: 120,
  vcboVolts: 120,
  veboVolts: 5,
  icMaxAmps: 15,
  thermals: rateAtCase(150, 150, 0.833, 40),
  gainPoints: [quoteGain(5, 3, { min: 1000, typ: 3000, max: 20000 })],
  saturationPoints: [
    quoteSaturation(5, 20e-3, { max: 1.6, typ: 1.1 }, 2.2),
    quoteSaturation(10, 50e-3, { max: 2.0, typ: 1.45 }, 2.7),
  ],
  vbeOnVolts: 1.35,
  ftHz: 2e6,
  cobFarads: 300e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2022-12-01",
});

const qx60080 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX60-080",
  polarity: "npn",
  packageName: "TO-126",
  configuration: darlington,
  vceoVolts: 80,
  vcboVolts: 80,
  veboVolts: 5,
  icMaxAmps: 4,
  thermals: rateAtCase(40, 150, 3.125, 100),
  gainPoints: [quoteGain(0.5, 3, { typ: 3500 }), quoteGain(1.5, 3, { min: 1000, typ: 2500 })],
  saturationPoints: [
    quoteSaturation(0.5, 2e-3, { max: 1.4, typ: 1.0 }, 1.6),
    quoteSaturation(1.5, 6e-3, { max: 1.8, typ: 1.2 }, 2.0),
  ],
  vbeOnVolts: 1.3,
  ftHz: 2e6,
  cobFarads: 100e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2019-08-21",
});

const qx61080 = deriveVariant(qx60080, {
  partNumber: "QX61-080",
  polarity: "pnp",
  gainPoints: [quoteGain(0.5, 3, { typ: 3000 }), quoteGain(1.5, 3, { min: 1000, typ: 2200 })],
  saturationPoints: [
    quoteSaturation(0.5, 2e-3, { max: 1.5, typ: 1.05 }, 1.65),
    quoteSaturation(1.5, 6e-3, { max: 2.0, typ: 1.3 }, 2.1),
  ],
  cobFarads: 150e-12,
});

const qx62060 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX62-060",
  polarity: "npn",
  packageName: "SOT-89",
  configuration: darlington,
  vceoVolts: 60,
  vcboVolts: 80,
  veboVolts: 10,
  icMaxAmps: 1,
  thermals: rateAtAmbient(1, 150, 125),
  gainPoints: [quoteGain(10e-3, 5, { min: 4000, typ: 10000 }), quoteGain(100e-3, 5, { min: 10000, typ: 18000 })],
  saturationPoints: [
    quoteSaturation(100e-3, 0.1e-3, { max: 1.5, typ: 1.0 }, 1.6),
    quoteSaturation(500e-3, 0.5e-3, { max: 2.0, typ: 1.3 }, 1.9),
  ],
  vbeOnVolts: 1.35,
  ftHz: 150e6,
  cobFarads: 8e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2023-02-14",
});

// Typical gain only.
const qx64100 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX64-100",
  polarity: "npn",
  packageName: "TO-220",
  configuration: darlington,
  vceoVolts: 100,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 5,
  thermals: rateAtCase(65, 150, 1.92, 62.5),
  gainPoints: [quoteGain(1, 3, { typ: 4000 }), quoteGain(3, 3, { typ: 2000 })],
  saturationPoints: [quoteSaturation(3, 12e-3, { max: 2.0, typ: 1.25 }, 2.5)],
  vbeOnVolts: 1.3,
  ftHz: 4e6,
  cobFarads: 200e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2021-04-12",
});

const osk6420n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK6420N",
  polarity: "npn",
  packageName: "TO-92",
  configuration: darlington,
  vceoVolts: 30,
  vcboVolts: 40,
  veboVolts: 10,
  icMaxAmps: 0.5,
  thermals: rateAtAmbient(0.625, 150, 200),
  gainPoints: [quoteGain(10e-3, 5, { min: 5000, typ: 9000 }), quoteGain(100e-3, 5, { min: 10000, typ: 15000 })],
  saturationPoints: [quoteSaturation(100e-3, 0.1e-3, { max: 1.5, typ: 1.0 }, 1.5)],
  vbeOnVolts: 1.4,
  ftHz: 125e6,
  cobFarads: 6e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2020-10-05",
});

const osk6420p = deriveVariant(osk6420n, {
  partNumber: "OSK6420P",
  polarity: "pnp",
  gainPoints: [quoteGain(10e-3, 5, { min: 4000, typ: 8000 }), quoteGain(100e-3, 5, { min: 10000, typ: 14000 })],
  saturationPoints: [quoteSaturation(100e-3, 0.1e-3, { max: 1.5, typ: 1.05 }, 1.55)],
  ftHz: 100e6,
  cobFarads: 8e-12,
});

const mlb470s = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB470S",
  polarity: "npn",
  packageName: "SOT-23",
  configuration: darlington,
  vceoVolts: 30,
  vcboVolts: 40,
  veboVolts: 10,
  icMaxAmps: 0.3,
  thermals: rateAtAmbient(0.35, 150, 357),
  gainPoints: [quoteGain(100e-3, 5, { min: 10000 })],
  saturationPoints: [quoteSaturation(100e-3, 0.1e-3, { max: 1.0 })],
  vbeOnVolts: 1.4,
  ftHz: 125e6,
  cobFarads: 5e-12,
  earlyVolts: null,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2014-07-22",
});

export const darlingtonParts: PartSpec[] = [
  vpd8120,
  vpd9120,
  vpd8160,
  vpd9160,
  vpd8240,
  qx60080,
  qx61080,
  qx62060,
  qx64100,
  osk6420n,
  osk6420p,
  mlb470s,
];
