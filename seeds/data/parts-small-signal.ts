// Invented general-purpose small-signal parts in TO-92 and SOT-23.
import type { PartSpec } from "#app/domain/part.ts";
import { MAELBROOK, OSTREVIK, TARNWELL } from "./manufacturers.ts";
import { definePart, deriveVariant, quoteGain, rateAtAmbient, quoteSaturation } from "./part-builders.ts";

const TO92 = rateAtAmbient(0.625, 150, 200);
const TO92_HALF_WATT = rateAtAmbient(0.5, 150, 250);
const SOT23 = rateAtAmbient(0.35, 150, 357);
const SOT23_SMALL_PAD = rateAtAmbient(0.25, 150, 500);

const osk2210n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK2210N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 40,
  vcboVolts: 60,
  veboVolts: 6,
  icMaxAmps: 0.6,
  thermals: TO92,
  gainPoints: [
    quoteGain(1e-3, 1, { min: 70, typ: 150 }),
    quoteGain(10e-3, 1, { min: 100, typ: 200, max: 300 }),
    quoteGain(150e-3, 1, { min: 60, typ: 120 }),
  ],
  saturationPoints: [
    quoteSaturation(150e-3, 15e-3, { max: 0.3, typ: 0.15 }, 0.9),
    quoteSaturation(500e-3, 50e-3, { max: 0.75, typ: 0.35 }, 1.15),
  ],
  vbeOnVolts: 0.68,
  ftHz: 250e6,
  cobFarads: 4e-12,
  earlyVolts: 100,
  datasheetRevisionDate: "2021-03-15",
});

const osk2210p = deriveVariant(osk2210n, {
  partNumber: "OSK2210P",
  polarity: "pnp",
  vcboVolts: 50,
  veboVolts: 5,
  gainPoints: [
    quoteGain(1e-3, 1, { min: 60, typ: 140 }),
    quoteGain(10e-3, 1, { min: 100, typ: 180, max: 300 }),
    quoteGain(150e-3, 1, { min: 50, typ: 100 }),
  ],
  saturationPoints: [
    quoteSaturation(150e-3, 15e-3, { max: 0.4, typ: 0.2 }, 0.95),
    quoteSaturation(500e-3, 50e-3, { max: 0.8, typ: 0.45 }, 1.25),
  ],
  vbeOnVolts: 0.7,
  ftHz: 200e6,
  cobFarads: 6.5e-12,
  earlyVolts: 60,
});

const osk3050n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK3050N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 65,
  vcboVolts: 80,
  veboVolts: 6,
  icMaxAmps: 0.1,
  thermals: TO92_HALF_WATT,
  gainPoints: [
    quoteGain(10e-6, 5, { typ: 90 }),
    quoteGain(2e-3, 5, { min: 110, typ: 200, max: 450 }),
    quoteGain(100e-3, 5, { min: 60, typ: 120 }),
  ],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.09 }, 0.7),
    quoteSaturation(100e-3, 5e-3, { max: 0.6, typ: 0.2 }, 0.9),
  ],
  vbeOnVolts: 0.66,
  ftHz: 300e6,
  cobFarads: 3.5e-12,
  earlyVolts: 90,
  datasheetRevisionDate: "2019-09-10",
});

const osk3050p = deriveVariant(osk3050n, {
  partNumber: "OSK3050P",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [
    quoteGain(10e-6, 5, { typ: 75 }),
    quoteGain(2e-3, 5, { min: 110, typ: 190, max: 450 }),
    quoteGain(100e-3, 5, { min: 50, typ: 100 }),
  ],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.3, typ: 0.1 }, 0.72),
    quoteSaturation(100e-3, 5e-3, { max: 0.65, typ: 0.25 }, 0.95),
  ],
  vbeOnVolts: 0.68,
  ftHz: 150e6,
  cobFarads: 6e-12,
  earlyVolts: 45,
});

// Gain quoted only at 100 µA, far below where the part is usually run.
const osk1102n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK1102N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 30,
  vcboVolts: 40,
  veboVolts: 5,
  icMaxAmps: 0.2,
  thermals: TO92,
  gainPoints: [quoteGain(100e-6, 5, { min: 60, typ: 140, max: 300 }, null)],
  saturationPoints: [quoteSaturation(10e-3, 1e-3, { max: 0.2, typ: 0.07 }, 0.75)],
  vbeOnVolts: 0.64,
  ftHz: 300e6,
  cobFarads: 2.5e-12,
  earlyVolts: null,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2011-05-20",
});

const osk1105p = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK1105P",
  polarity: "pnp",
  packageName: "SOT-23",
  vceoVolts: 30,
  vcboVolts: 40,
  veboVolts: 5,
  icMaxAmps: 0.2,
  thermals: SOT23,
  gainPoints: [quoteGain(100e-6, 5, { typ: 150 }, null)],
  saturationPoints: [],
  vbeOnVolts: 0.66,
  ftHz: 180e6,
  cobFarads: 4.5e-12,
  earlyVolts: null,
  lifecycle: "obsolete",
  datasheetRevisionDate: "2013-02-01",
});

const mlb481t = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB481T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 45,
  vcboVolts: 50,
  veboVolts: 6,
  icMaxAmps: 0.1,
  thermals: TO92_HALF_WATT,
  gainPoints: [quoteGain(10e-6, 5, { typ: 150 }), quoteGain(2e-3, 5, { min: 200, typ: 290, max: 450 })],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.09 }, 0.7),
    quoteSaturation(100e-3, 5e-3, { max: 0.6, typ: 0.2 }, 0.9),
  ],
  vbeOnVolts: 0.65,
  ftHz: 250e6,
  cobFarads: 3e-12,
  earlyVolts: 80,
  datasheetRevisionDate: "2020-01-14",
});

const mlb581t = deriveVariant(mlb481t, {
  partNumber: "MLB581T",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [quoteGain(10e-6, 5, { typ: 140 }), quoteGain(2e-3, 5, { min: 200, typ: 250, max: 450 })],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.3, typ: 0.1 }, 0.72),
    quoteSaturation(100e-3, 5e-3, { max: 0.65, typ: 0.25 }, 0.95),
  ],
  vbeOnVolts: 0.66,
  ftHz: 150e6,
  cobFarads: 4.5e-12,
  earlyVolts: 50,
});

const mlb430s = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB430S",
  polarity: "npn",
  packageName: "SOT-23",
  vceoVolts: 300,
  vcboVolts: 300,
  veboVolts: 6,
  icMaxAmps: 0.5,
  thermals: SOT23,
  gainPoints: [
    quoteGain(1e-3, 10, { min: 25, typ: 60 }),
    quoteGain(10e-3, 10, { min: 40, typ: 90 }),
    quoteGain(30e-3, 10, { min: 40, typ: 85, max: 200 }),
  ],
  saturationPoints: [quoteSaturation(20e-3, 2e-3, { max: 0.5, typ: 0.15 }, 0.9)],
  vbeOnVolts: 0.7,
  ftHz: 50e6,
  cobFarads: 6e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2018-04-02",
});

const mlb530s = deriveVariant(mlb430s, {
  partNumber: "MLB530S",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [
    quoteGain(1e-3, 10, { min: 25, typ: 55 }),
    quoteGain(10e-3, 10, { min: 40, typ: 80 }),
    quoteGain(30e-3, 10, { min: 40, typ: 75, max: 200 }),
  ],
  saturationPoints: [quoteSaturation(20e-3, 2e-3, { max: 0.5, typ: 0.2 }, 0.9)],
  cobFarads: 8e-12,
});

const mlb412t = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB412T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 15,
  vcboVolts: 40,
  veboVolts: 4.5,
  icMaxAmps: 0.2,
  thermals: TO92,
  gainPoints: [quoteGain(10e-3, 1, { min: 40, typ: 90, max: 120 }), quoteGain(100e-3, 1, { min: 20, typ: 50 })],
  saturationPoints: [
    quoteSaturation(10e-3, 1e-3, { max: 0.25, typ: 0.1 }, 0.85),
    quoteSaturation(50e-3, 5e-3, { max: 0.5, typ: 0.2 }, 1.0),
  ],
  vbeOnVolts: 0.72,
  ftHz: 300e6,
  cobFarads: 2.5e-12,
  earlyVolts: null,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2016-11-07",
});

const mlb418s = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB418S",
  polarity: "npn",
  packageName: "SOT-23",
  vceoVolts: 20,
  vcboVolts: 30,
  veboVolts: 5,
  icMaxAmps: 1,
  thermals: SOT23,
  gainPoints: [
    quoteGain(10e-3, 2, { min: 200, typ: 350 }),
    quoteGain(500e-3, 2, { min: 150, typ: 280 }),
    quoteGain(1, 2, { min: 100, typ: 200 }),
  ],
  saturationPoints: [
    quoteSaturation(100e-3, 1e-3, { max: 0.06, typ: 0.03 }, 0.75),
    quoteSaturation(500e-3, 10e-3, { max: 0.15, typ: 0.08 }, 0.85),
    quoteSaturation(1, 50e-3, { max: 0.25, typ: 0.15 }, 0.95),
  ],
  vbeOnVolts: 0.75,
  ftHz: 150e6,
  cobFarads: 12e-12,
  earlyVolts: 60,
  datasheetRevisionDate: "2023-05-22",
});

// Typical gain only: the datasheet quotes no minimum.
const mlb460t = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB460T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 60,
  vcboVolts: 80,
  veboVolts: 6,
  icMaxAmps: 0.5,
  thermals: TO92,
  gainPoints: [quoteGain(10e-3, 5, { typ: 180 }), quoteGain(150e-3, 5, { typ: 140 })],
  saturationPoints: [quoteSaturation(150e-3, 15e-3, { max: 0.3, typ: 0.12 }, 0.9)],
  vbeOnVolts: 0.7,
  ftHz: 200e6,
  cobFarads: 5e-12,
  earlyVolts: 110,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2016-08-30",
});

const mlb560t = deriveVariant(mlb460t, {
  partNumber: "MLB560T",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [quoteGain(10e-3, 5, { typ: 170 }), quoteGain(150e-3, 5, { typ: 120 })],
  saturationPoints: [quoteSaturation(150e-3, 15e-3, { max: 0.4, typ: 0.18 }, 0.95)],
  ftHz: 150e6,
  cobFarads: 8e-12,
  earlyVolts: 70,
});

const twK1120 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-K1120",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 50,
  vcboVolts: 60,
  veboVolts: 5,
  icMaxAmps: 0.15,
  thermals: TO92,
  gainPoints: [quoteGain(2e-3, 6, { min: 120, max: 400 })],
  saturationPoints: [quoteSaturation(100e-3, 10e-3, { max: 0.25 }, 0.95)],
  vbeOnVolts: 0.64,
  ftHz: 180e6,
  cobFarads: 3.5e-12,
  earlyVolts: 95,
  datasheetRevisionDate: "2017-10-03",
});

const twK1120c = deriveVariant(twK1120, {
  partNumber: "TW-K1120C",
  polarity: "pnp",
  saturationPoints: [quoteSaturation(100e-3, 10e-3, { max: 0.3 }, 1.0)],
  ftHz: 150e6,
  cobFarads: 5e-12,
  earlyVolts: 55,
});

export const smallSignalParts: PartSpec[] = [
  osk2210n,
  osk2210p,
  deriveVariant(osk2210n, { partNumber: "OSK2230N", packageName: "SOT-23", ...SOT23, datasheetRevisionDate: "2022-06-01" }),
  deriveVariant(osk2210p, { partNumber: "OSK2230P", packageName: "SOT-23", ...SOT23, datasheetRevisionDate: "2022-06-01" }),
  osk3050n,
  osk3050p,
  osk1102n,
  osk1105p,
  mlb481t,
  mlb581t,
  deriveVariant(mlb481t, { partNumber: "MLB481S", packageName: "SOT-23", ...SOT23_SMALL_PAD }),
  deriveVariant(mlb581t, { partNumber: "MLB581S", packageName: "SOT-23", ...SOT23_SMALL_PAD }),
  mlb430s,
  mlb530s,
  mlb412t,
  mlb418s,
  mlb460t,
  mlb560t,
  twK1120,
  twK1120c,
];
