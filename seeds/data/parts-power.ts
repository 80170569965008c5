// Invented power parts in TO-220, TO-247 and TO-3.
import type { PartSpec } from "#app/domain/part.ts";
import { QUARROW, VELLACOTT } from "./manufacturers.ts";
import { definePart, deriveVariant, quoteGain, rateAtCase, quoteSaturation } from "./part-builders.ts";

const TO220_FREE_AIR_C_PER_W = 62.5;
const TO247_FREE_AIR_C_PER_W = 40;
const TO3_FREE_AIR_C_PER_W = 35;

const vpd6140 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6140",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 100,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 6,
  thermals: rateAtCase(65, 150, 1.92, TO220_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(0.3, 4, { min: 40, typ: 120 }), quoteGain(3, 4, { min: 15, typ: 50, max: 75 })],
  saturationPoints: [quoteSaturation(3, 0.3, { max: 1.2, typ: 0.5 }, 1.5)],
  vbeOnVolts: 1.3,
  ftHz: 3e6,
  cobFarads: 250e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2016-10-18",
});

const vpd7140 = deriveVariant(vpd6140, {
  partNumber: "VPD7140",
  polarity: "pnp",
  gainPoints: [quoteGain(0.3, 4, { min: 40, typ: 110 }), quoteGain(3, 4, { min: 15, typ: 45, max: 75 })],
  saturationPoints: [quoteSaturation(3, 0.3, { max: 1.4, typ: 0.7 }, 1.6)],
  vbeOnVolts: 1.4,
  cobFarads: 350e-12,
});

// Gain quoted only at 3 A, an inconvenient point for a driver stage run at a few hundred mA.
const vpd6160 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6160",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 60,
  vcboVolts: 70,
  veboVolts: 5,
  icMaxAmps: 10,
  thermals: rateAtCase(75, 150, 1.67, TO220_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(3, 4, { min: 20, typ: 45, max: 70 })],
  saturationPoints: [quoteSaturation(3, 0.3, { max: 1.0, typ: 0.4 }, 1.5)],
  vbeOnVolts: 1.3,
  ftHz: 3e6,
  cobFarads: 300e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2015-09-01",
});

const vpd7160 = deriveVariant(vpd6160, {
  partNumber: "VPD7160",
  polarity: "pnp",
  gainPoints: [quoteGain(3, 4, { min: 20, typ: 40, max: 70 })],
  saturationPoints: [quoteSaturation(3, 0.3, { max: 1.1, typ: 0.5 }, 1.5)],
  cobFarads: 400e-12,
});

const vpd6180 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6180",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 80,
  vcboVolts: 80,
  veboVolts: 5,
  icMaxAmps: 4,
  thermals: rateAtCase(40, 150, 3.125, TO220_FREE_AIR_C_PER_W),
  gainPoints: [
    quoteGain(0.5, 2, { min: 40, typ: 100, max: 250 }),
    quoteGain(1, 2, { min: 25, typ: 75 }),
    quoteGain(4, 2, { typ: 25 }),
  ],
  saturationPoints: [
    quoteSaturation(1, 0.1, { max: 0.5, typ: 0.25 }, 1.1),
    quoteSaturation(4, 0.4, { max: 1.2, typ: 0.6 }, 1.5),
  ],
  vbeOnVolts: 1.1,
  ftHz: 8e6,
  cobFarads: 80e-12,
  earlyVolts: 120,
  datasheetRevisionDate: "2020-04-27",
});

const vpd7180 = deriveVariant(vpd6180, {
  partNumber: "VPD7180",
  polarity: "pnp",
  gainPoints: [
    quoteGain(0.5, 2, { min: 40, typ: 90, max: 250 }),
    quoteGain(1, 2, { min: 25, typ: 65 }),
    quoteGain(4, 2, { typ: 20 }),
  ],
  saturationPoints: [
    quoteSaturation(1, 0.1, { max: 0.6, typ: 0.3 }, 1.15),
    quoteSaturation(4, 0.4, { max: 1.4, typ: 0.8 }, 1.6),
  ],
  cobFarads: 120e-12,
  earlyVolts: 80,
});

// A low-saturation switching type: fast and with gain held up to several amperes.
const vpd6120 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6120",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 45,
  vcboVolts: 60,
  veboVolts: 6,
  icMaxAmps: 10,
  thermals: rateAtCase(50, 150, 2.5, TO220_FREE_AIR_C_PER_W),
  gainPoints: [
    quoteGain(2, 2, { min: 80, typ: 160 }),
    quoteGain(5, 2, { min: 50, typ: 110 }),
    quoteGain(10, 2, { min: 20, typ: 50 }),
  ],
  saturationPoints: [
    quoteSaturation(2, 40e-3, { max: 0.15, typ: 0.08 }, 0.9),
    quoteSaturation(5, 0.25, { max: 0.35, typ: 0.2 }, 1.0),
    quoteSaturation(10, 1, { max: 0.8, typ: 0.45 }, 1.2),
  ],
  vbeOnVolts: 0.95,
  ftHz: 80e6,
  cobFarads: 150e-12,
  earlyVolts: 70,
  datasheetRevisionDate: "2023-11-02",
});

const vpd7120 = deriveVariant(vpd6120, {
  partNumber: "VPD7120",
  polarity: "pnp",
  gainPoints: [
    quoteGain(2, 2, { min: 70, typ: 140 }),
    quoteGain(5, 2, { min: 40, typ: 95 }),
    quoteGain(10, 2, { min: 15, typ: 40 }),
  ],
  saturationPoints: [
    quoteSaturation(2, 40e-3, { max: 0.2, typ: 0.11 }, 0.92),
    quoteSaturation(5, 0.25, { max: 0.45, typ: 0.27 }, 1.05),
    quoteSaturation(10, 1, { max: 1.0, typ: 0.6 }, 1.25),
  ],
  ftHz: 60e6,
  cobFarads: 250e-12,
  earlyVolts: 45,
});

// Audio output types.
const vpd6250 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6250",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 250,
  vcboVolts: 250,
  veboVolts: 5,
  icMaxAmps: 15,
  thermals: rateAtCase(150, 150, 0.833, TO247_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(1, 5, { min: 60, typ: 110, max: 160 }), quoteGain(8, 5, { min: 20, typ: 45 })],
  saturationPoints: [
    quoteSaturation(5, 0.5, { max: 1.5, typ: 0.7 }, 1.5),
    quoteSaturation(8, 0.8, { max: 2.5, typ: 1.2 }, 1.8),
  ],
  vbeOnVolts: 1.0,
  ftHz: 30e6,
  cobFarads: 200e-12,
  earlyVolts: 150,
  datasheetRevisionDate: "2022-08-09",
});

const vpd7250 = deriveVariant(vpd6250, {
  partNumber: "VPD7250",
  polarity: "pnp",
  gainPoints: [quoteGain(1, 5, { min: 60, typ: 100, max: 160 }), quoteGain(8, 5, { min: 20, typ: 40 })],
  saturationPoints: [
    quoteSaturation(5, 0.5, { max: 1.6, typ: 0.8 }, 1.55),
    quoteSaturation(8, 0.8, { max: 2.6, typ: 1.3 }, 1.85),
  ],
  cobFarads: 300e-12,
  earlyVolts: 100,
});

const vpd6230 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6230",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 230,
  vcboVolts: 230,
  veboVolts: 5,
  icMaxAmps: 15,
  thermals: rateAtCase(150, 150, 0.833, TO247_FREE_AIR_C_PER_W),
  gainPoints: [
    quoteGain(1, 5, { min: 55, typ: 100, max: 160 }),
    quoteGain(3, 5, { min: 50, typ: 90 }),
    quoteGain(7, 5, { min: 35, typ: 65 }),
  ],
  saturationPoints: [
    quoteSaturation(3, 0.3, { max: 0.8, typ: 0.35 }, 1.2),
    quoteSaturation(7, 0.7, { max: 1.5, typ: 0.8 }, 1.6),
  ],
  vbeOnVolts: 1.0,
  ftHz: 25e6,
  cobFarads: 250e-12,
  earlyVolts: 180,
  datasheetRevisionDate: "2021-11-30",
});

const vpd7230 = deriveVariant(vpd6230, {
  partNumber: "VPD7230",
  polarity: "pnp",
  gainPoints: [
    quoteGain(1, 5, { min: 55, typ: 95, max: 160 }),
    quoteGain(3, 5, { min: 45, typ: 85 }),
    quoteGain(7, 5, { min: 30, typ: 60 }),
  ],
  saturationPoints: [
    quoteSaturation(3, 0.3, { max: 0.9, typ: 0.45 }, 1.25),
    quoteSaturation(7, 0.7, { max: 1.7, typ: 0.95 }, 1.65),
  ],
  cobFarads: 380e-12,
  earlyVolts: 110,
});

// An old metal-can workhorse, near the end of its life.
const vpd6300 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6300",
  polarity: "npn",
  packageName: "TO-3",
  vceoVolts: 60,
  vcboVolts: 100,
  veboVolts: 7,
  icMaxAmps: 15,
  thermals: rateAtCase(115, 200, 1.52, TO3_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(4, 4, { min: 20, max: 70 }), quoteGain(10, 4, { min: 5, typ: 15 })],
  saturationPoints: [quoteSaturation(4, 0.4, { max: 1.1 }), quoteSaturation(10, 3.3, { max: 3.0 })],
  vbeOnVolts: 1.5,
  ftHz: 2.5e6,
  cobFarads: null,
  earlyVolts: null,
  lifecycle: "last-time-buy",
  datasheetRevisionDate: "2009-03-01",
});

const vpd7300 = deriveVariant(vpd6300, {
  partNumber: "VPD7300",
  polarity: "pnp",
  gainPoints: [quoteGain(4, 4, { min: 20, max: 70 }), quoteGain(10, 4, { min: 5, typ: 12 })],
  lifecycle: "obsolete",
});

const vpd6350 = definePart({
  manufacturer: VELLACOTT,
  partNumber: "VPD6350",
  polarity: "npn",
  packageName: "TO-3",
  vceoVolts: 250,
  vcboVolts: 250,
  veboVolts: 5,
  icMaxAmps: 16,
  thermals: rateAtCase(250, 200, 0.7, TO3_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(1, 5, { min: 25, typ: 80, max: 150 }), quoteGain(8, 5, { min: 20, typ: 40 })],
  saturationPoints: [quoteSaturation(8, 0.8, { max: 1.5, typ: 0.7 }, 1.6)],
  vbeOnVolts: 1.1,
  ftHz: 4e6,
  cobFarads: 350e-12,
  earlyVolts: 100,
  datasheetRevisionDate: "2017-07-07",
});

const vpd7350 = deriveVariant(vpd6350, {
  partNumber: "VPD7350",
  polarity: "pnp",
  gainPoints: [quoteGain(1, 5, { min: 25, typ: 75, max: 150 }), quoteGain(8, 5, { min: 20, typ: 35 })],
  saturationPoints: [quoteSaturation(8, 0.8, { max: 1.6, typ: 0.8 }, 1.65)],
  cobFarads: 500e-12,
  earlyVolts: 70,
});

const qx40100 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX40-100",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 100,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 8,
  thermals: rateAtCase(80, 150, 1.56, TO220_FREE_AIR_C_PER_W),
  gainPoints: [
    quoteGain(1, 4, { min: 30, typ: 90 }),
    quoteGain(4, 4, { min: 20, typ: 55 }),
    quoteGain(8, 4, { min: 8, typ: 20 }),
  ],
  saturationPoints: [
    quoteSaturation(4, 0.4, { max: 0.8, typ: 0.35 }, 1.3),
    quoteSaturation(8, 1.6, { max: 1.5, typ: 0.8 }, 1.8),
  ],
  vbeOnVolts: 1.2,
  ftHz: 4e6,
  cobFarads: 200e-12,
  earlyVolts: 90,
  datasheetRevisionDate: "2019-10-14",
});

const qx41100 = deriveVariant(qx40100, {
  partNumber: "QX41-100",
  polarity: "pnp",
  gainPoints: [
    quoteGain(1, 4, { min: 30, typ: 80 }),
    quoteGain(4, 4, { min: 20, typ: 50 }),
    quoteGain(8, 4, { min: 8, typ: 18 }),
  ],
  saturationPoints: [
    quoteSaturation(4, 0.4, { max: 0.9, typ: 0.45 }, 1.35),
    quoteSaturation(8, 1.6, { max: 1.7, typ: 0.95 }, 1.85),
  ],
  cobFarads: 300e-12,
  earlyVolts: 60,
});

// Typical gain only, from an old datasheet.
const qx40060 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX40-060",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 60,
  vcboVolts: 60,
  veboVolts: 5,
  icMaxAmps: 3,
  thermals: rateAtCase(40, 150, 3.125, TO220_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(0.5, 4, { typ: 120 }), quoteGain(3, 4, { typ: 35 })],
  saturationPoints: [quoteSaturation(3, 0.3, { max: 1.2 })],
  vbeOnVolts: 1.3,
  ftHz: 3e6,
  cobFarads: null,
  earlyVolts: null,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2012-04-16",
});

// A high-voltage switching type: low gain, fast.
const qx44400 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX44-400",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 400,
  vcboVolts: 700,
  veboVolts: 9,
  icMaxAmps: 4,
  thermals: rateAtCase(75, 150, 1.67, TO220_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(1, 5, { min: 10, typ: 25, max: 40 }), quoteGain(2, 5, { min: 8, typ: 20 })],
  saturationPoints: [
    quoteSaturation(1, 0.2, { max: 0.5, typ: 0.2 }, 1.0),
    quoteSaturation(2, 0.5, { max: 1.0, typ: 0.4 }, 1.2),
  ],
  vbeOnVolts: 1.0,
  ftHz: 4e6,
  cobFarads: 60e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2018-01-25",
});

const qx46140 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX46-140",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 140,
  vcboVolts: 160,
  veboVolts: 5,
  icMaxAmps: 12,
  thermals: rateAtCase(130, 150, 0.96, TO247_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(1, 4, { min: 35, typ: 90, max: 160 }), quoteGain(5, 4, { min: 25, typ: 60 })],
  saturationPoints: [quoteSaturation(5, 0.5, { max: 1.0, typ: 0.45 }, 1.4)],
  vbeOnVolts: 1.1,
  ftHz: 20e6,
  cobFarads: 180e-12,
  earlyVolts: 150,
  datasheetRevisionDate: "2024-09-09",
});

const qx47140 = deriveVariant(qx46140, {
  partNumber: "QX47-140",
  polarity: "pnp",
  gainPoints: [quoteGain(1, 4, { min: 35, typ: 85, max: 160 }), quoteGain(5, 4, { min: 25, typ: 55 })],
  saturationPoints: [quoteSaturation(5, 0.5, { max: 1.1, typ: 0.55 }, 1.45)],
  cobFarads: 280e-12,
  earlyVolts: 90,
});

// Gain quoted only at 8 A.
const qx52160 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX52-160",
  polarity: "npn",
  packageName: "TO-3",
  vceoVolts: 160,
  vcboVolts: 180,
  veboVolts: 5,
  icMaxAmps: 16,
  thermals: rateAtCase(200, 200, 0.875, TO3_FREE_AIR_C_PER_W),
  gainPoints: [quoteGain(8, 4, { min: 15, typ: 35 })],
  saturationPoints: [quoteSaturation(8, 0.8, { max: 1.4 })],
  vbeOnVolts: 1.5,
  ftHz: 2e6,
  cobFarads: 400e-12,
  earlyVolts: null,
  lifecycle: "last-time-buy",
  datasheetRevisionDate: "2008-11-03",
});

export const powerParts: PartSpec[] = [
  vpd6140,
  vpd7140,
  vpd6160,
  vpd7160,
  vpd6180,
  vpd7180,
  vpd6120,
  vpd7120,
  vpd6250,
  vpd7250,
  vpd6230,
  vpd7230,
  vpd6300,
  vpd7300,
  vpd6350,
  vpd7350,
  qx40100,
  qx41100,
  qx40060,
  qx44400,
  qx46140,
  qx47140,
  qx52160,
];
