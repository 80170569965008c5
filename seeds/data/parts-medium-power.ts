// Invented general-purpose medium-power parts in SOT-89 and TO-126.
import type { PartSpec } from "#app/domain/part.ts";
import { QUARROW, TARNWELL } from "./manufacturers.ts";
import { definePart, deriveVariant, quoteGain, rateAtAmbient, rateAtCase, quoteSaturation } from "./part-builders.ts";

// SOT-89 on a 1 cm² copper pad, as its datasheets quote it.
const SOT89 = rateAtAmbient(1, 150, 125);
const TO126 = rateAtCase(12.5, 150, 10, 100);
const TO126_20W = rateAtCase(20, 150, 6.25, 100);

const twG2205 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-G2205",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 45,
  vcboVolts: 60,
  veboVolts: 5,
  icMaxAmps: 1,
  thermals: SOT89,
  gainPoints: [
    quoteGain(150e-3, 2, { min: 100, typ: 200, max: 250 }),
    quoteGain(500e-3, 2, { min: 60, typ: 120 }),
    quoteGain(1, 2, { min: 25, typ: 60 }),
  ],
  saturationPoints: [
    quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.2 }, 1.0),
    quoteSaturation(1, 100e-3, { max: 0.7, typ: 0.35 }, 1.2),
  ],
  vbeOnVolts: 0.85,
  ftHz: 150e6,
  cobFarads: 12e-12,
  earlyVolts: 100,
  datasheetRevisionDate: "2021-05-04",
});

const twG2205c = deriveVariant(twG2205, {
  partNumber: "TW-G2205C",
  polarity: "pnp",
  gainPoints: [
    quoteGain(150e-3, 2, { min: 100, typ: 180, max: 250 }),
    quoteGain(500e-3, 2, { min: 60, typ: 100 }),
    quoteGain(1, 2, { min: 25, typ: 50 }),
  ],
  saturationPoints: [
    quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.25 }, 1.0),
    quoteSaturation(1, 100e-3, { max: 0.8, typ: 0.45 }, 1.25),
  ],
  ftHz: 120e6,
  cobFarads: 20e-12,
  earlyVolts: 70,
});

const twG2260 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-G2260",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 80,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 1,
  thermals: SOT89,
  gainPoints: [quoteGain(150e-3, 2, { min: 40, typ: 150, max: 250 }), quoteGain(500e-3, 2, { min: 25, typ: 80 })],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.25 }, 1.0)],
  vbeOnVolts: 0.85,
  ftHz: 100e6,
  cobFarads: 15e-12,
  earlyVolts: 120,
  datasheetRevisionDate: "2018-12-12",
});

const twG2260c = deriveVariant(twG2260, {
  partNumber: "TW-G2260C",
  polarity: "pnp",
  gainPoints: [quoteGain(150e-3, 2, { min: 40, typ: 140, max: 250 }), quoteGain(500e-3, 2, { min: 25, typ: 70 })],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.3 }, 1.05)],
  ftHz: 80e6,
  cobFarads: 25e-12,
  earlyVolts: 80,
});

// A low-saturation type: high gain held up to its rated current.
const twG2290 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-G2290",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 20,
  vcboVolts: 30,
  veboVolts: 5,
  icMaxAmps: 3,
  thermals: SOT89,
  gainPoints: [
    quoteGain(0.5, 2, { min: 200, typ: 350 }),
    quoteGain(2, 2, { min: 150, typ: 240 }),
    quoteGain(3, 2, { min: 80, typ: 160 }),
  ],
  saturationPoints: [
    quoteSaturation(1, 20e-3, { max: 0.12, typ: 0.07 }, 0.85),
    quoteSaturation(3, 100e-3, { max: 0.3, typ: 0.18 }, 1.0),
  ],
  vbeOnVolts: 0.8,
  ftHz: 120e6,
  cobFarads: 30e-12,
  earlyVolts: 60,
  datasheetRevisionDate: "2024-06-19",
});

const twG2290c = deriveVariant(twG2290, {
  partNumber: "TW-G2290C",
  polarity: "pnp",
  gainPoints: [
    quoteGain(0.5, 2, { min: 180, typ: 300 }),
    quoteGain(2, 2, { min: 120, typ: 200 }),
    quoteGain(3, 2, { min: 60, typ: 130 }),
  ],
  saturationPoints: [
    quoteSaturation(1, 20e-3, { max: 0.15, typ: 0.09 }, 0.87),
    quoteSaturation(3, 100e-3, { max: 0.38, typ: 0.24 }, 1.05),
  ],
  ftHz: 100e6,
  cobFarads: 45e-12,
  earlyVolts: 40,
});

const twG3140 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-G3140",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 45,
  vcboVolts: 45,
  veboVolts: 5,
  icMaxAmps: 1.5,
  thermals: TO126,
  gainPoints: [
    quoteGain(5e-3, 2, { min: 25, typ: 80 }),
    quoteGain(150e-3, 2, { min: 40, typ: 150, max: 250 }),
    quoteGain(500e-3, 2, { min: 25, typ: 90 }),
  ],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.2 }, 1.0)],
  vbeOnVolts: 0.9,
  ftHz: 50e6,
  cobFarads: 20e-12,
  earlyVolts: 80,
  datasheetRevisionDate: "2017-03-21",
});

const twG3140c = deriveVariant(twG3140, {
  partNumber: "TW-G3140C",
  polarity: "pnp",
  gainPoints: [
    quoteGain(5e-3, 2, { min: 25, typ: 70 }),
    quoteGain(150e-3, 2, { min: 40, typ: 140, max: 250 }),
    quoteGain(500e-3, 2, { min: 25, typ: 80 }),
  ],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.25 }, 1.0)],
  cobFarads: 35e-12,
  earlyVolts: 55,
});

const twG3180 = deriveVariant(twG3140, {
  partNumber: "TW-G3180",
  vceoVolts: 80,
  vcboVolts: 100,
  gainPoints: [quoteGain(150e-3, 2, { min: 40, typ: 120, max: 250 }), quoteGain(500e-3, 2, { min: 25, typ: 70 })],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.25 }, 1.0)],
  earlyVolts: null,
});

const twG3180c = deriveVariant(twG3180, {
  partNumber: "TW-G3180C",
  polarity: "pnp",
  gainPoints: [quoteGain(150e-3, 2, { min: 40, typ: 110, max: 250 }), quoteGain(500e-3, 2, { min: 25, typ: 60 })],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.5, typ: 0.3 }, 1.05)],
  cobFarads: 35e-12,
});

const qx12060 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX12-060",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 60,
  vcboVolts: 70,
  veboVolts: 5,
  icMaxAmps: 3,
  thermals: TO126_20W,
  gainPoints: [quoteGain(0.5, 2, { min: 40, typ: 100 }), quoteGain(2, 2, { min: 20, typ: 45 })],
  saturationPoints: [
    quoteSaturation(1, 0.1, { max: 0.5, typ: 0.25 }, 1.1),
    quoteSaturation(3, 0.3, { max: 1.0, typ: 0.6 }, 1.4),
  ],
  vbeOnVolts: 1.0,
  ftHz: 30e6,
  cobFarads: 60e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2019-02-26",
});

const qx13060 = deriveVariant(qx12060, {
  partNumber: "QX13-060",
  polarity: "pnp",
  gainPoints: [quoteGain(0.5, 2, { min: 40, typ: 90 }), quoteGain(2, 2, { min: 20, typ: 40 })],
  saturationPoints: [
    quoteSaturation(1, 0.1, { max: 0.6, typ: 0.3 }, 1.15),
    quoteSaturation(3, 0.3, { max: 1.2, typ: 0.75 }, 1.45),
  ],
  ftHz: 25e6,
  cobFarads: 90e-12,
});

// Typical gain only, at both currents.
const qx12100 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX12-100",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 100,
  vcboVolts: 120,
  veboVolts: 5,
  icMaxAmps: 1,
  thermals: TO126,
  gainPoints: [quoteGain(150e-3, 2, { typ: 110 }), quoteGain(500e-3, 2, { typ: 70 })],
  saturationPoints: [quoteSaturation(500e-3, 50e-3, { max: 0.6, typ: 0.3 }, 1.05)],
  vbeOnVolts: 0.9,
  ftHz: 40e6,
  cobFarads: 25e-12,
  earlyVolts: 100,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2015-06-09",
});

const qx16250 = definePart({
  manufacturer: QUARROW,
  partNumber: "QX16-250",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 250,
  vcboVolts: 300,
  veboVolts: 5,
  icMaxAmps: 0.5,
  thermals: TO126,
  gainPoints: [quoteGain(30e-3, 10, { typ: 90 }), quoteGain(100e-3, 10, { typ: 60 })],
  saturationPoints: [quoteSaturation(100e-3, 10e-3, { max: 1.0, typ: 0.4 }, 0.9)],
  vbeOnVolts: 0.75,
  ftHz: 40e6,
  cobFarads: 8e-12,
  earlyVolts: null,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2016-02-15",
});

export const mediumPowerParts: PartSpec[] = [
  twG2205,
  twG2205c,
  twG2260,
  twG2260c,
  twG2290,
  twG2290c,
  twG3140,
  twG3140c,
  twG3180,
  twG3180c,
  qx12060,
  qx13060,
  qx12100,
  qx16250,
];
