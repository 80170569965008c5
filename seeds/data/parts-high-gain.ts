// Invented high-gain, low-noise small-signal parts and the dual (two-die) packages built from them.
import type { PartSpec } from "#app/domain/part.ts";
import { MAELBROOK, OSTREVIK, TARNWELL } from "./manufacturers.ts";
import { definePart, deriveVariant, quoteGain, rateAtAmbient, quoteSaturation } from "./part-builders.ts";

const TO92 = rateAtAmbient(0.625, 150, 200);
const TO92_HALF_WATT = rateAtAmbient(0.5, 150, 250);
const SOT23 = rateAtAmbient(0.35, 150, 357);
const SOT23_SMALL_PAD = rateAtAmbient(0.25, 150, 500);
// Both dies together; SOT-363 and SO-8 datasheets quote the package total.
const SOT363_DUAL = rateAtAmbient(0.2, 150, 625);
const SO8_DUAL = rateAtAmbient(0.625, 150, 200);

const osk4401n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK4401N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 45,
  vcboVolts: 50,
  veboVolts: 6,
  icMaxAmps: 0.1,
  thermals: TO92_HALF_WATT,
  gainPoints: [
    quoteGain(10e-6, 5, { min: 250, typ: 400 }),
    quoteGain(100e-6, 5, { min: 350, typ: 500 }),
    quoteGain(2e-3, 5, { min: 420, typ: 600, max: 800 }),
  ],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.2, typ: 0.08 }, 0.7),
    quoteSaturation(100e-3, 5e-3, { max: 0.55, typ: 0.2 }, 0.9),
  ],
  vbeOnVolts: 0.62,
  ftHz: 200e6,
  cobFarads: 2.5e-12,
  earlyVolts: 35,
  datasheetRevisionDate: "2022-02-11",
});

const osk4401p = deriveVariant(osk4401n, {
  partNumber: "OSK4401P",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [
    quoteGain(10e-6, 5, { min: 220, typ: 350 }),
    quoteGain(100e-6, 5, { min: 300, typ: 450 }),
    quoteGain(2e-3, 5, { min: 420, typ: 560, max: 800 }),
  ],
  saturationPoints: [
    quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.1 }, 0.72),
    quoteSaturation(100e-3, 5e-3, { max: 0.6, typ: 0.25 }, 0.95),
  ],
  vbeOnVolts: 0.64,
  ftHz: 150e6,
  cobFarads: 4.5e-12,
  earlyVolts: 28,
});

// A very high gain part with a low Early voltage, and typical gain only.
const osk4480n = definePart({
  manufacturer: OSTREVIK,
  partNumber: "OSK4480N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 30,
  vcboVolts: 40,
  veboVolts: 6,
  icMaxAmps: 0.05,
  thermals: TO92_HALF_WATT,
  gainPoints: [quoteGain(10e-6, 5, { typ: 750 }), quoteGain(2e-3, 5, { typ: 1100 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.1 }, 0.72)],
  vbeOnVolts: 0.6,
  ftHz: 150e6,
  cobFarads: 2e-12,
  earlyVolts: 18,
  datasheetRevisionDate: "2020-07-08",
});

const mlb449t = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB449T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 50,
  vcboVolts: 50,
  veboVolts: 5,
  icMaxAmps: 0.1,
  thermals: TO92_HALF_WATT,
  gainPoints: [quoteGain(10e-6, 5, { min: 200, typ: 320 }), quoteGain(2e-3, 5, { min: 420, typ: 520, max: 800 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.09 }, 0.7)],
  vbeOnVolts: 0.64,
  ftHz: 250e6,
  cobFarads: 2.5e-12,
  earlyVolts: 60,
  datasheetRevisionDate: "2019-06-18",
});

const mlb549t = deriveVariant(mlb449t, {
  partNumber: "MLB549T",
  polarity: "pnp",
  gainPoints: [quoteGain(10e-6, 5, { min: 180, typ: 300 }), quoteGain(2e-3, 5, { min: 420, typ: 500, max: 800 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.3, typ: 0.1 }, 0.72)],
  ftHz: 180e6,
  cobFarads: 4e-12,
  earlyVolts: 40,
});

const twK2210 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-K2210",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 60,
  vcboVolts: 60,
  veboVolts: 5,
  icMaxAmps: 0.2,
  thermals: TO92,
  gainPoints: [quoteGain(1e-3, 5, { min: 400, typ: 600, max: 1000 }), quoteGain(50e-3, 5, { min: 250, typ: 450 })],
  saturationPoints: [quoteSaturation(50e-3, 2.5e-3, { max: 0.3, typ: 0.1 }, 0.8)],
  vbeOnVolts: 0.63,
  ftHz: 180e6,
  cobFarads: 3e-12,
  earlyVolts: null,
  datasheetRevisionDate: "2021-09-27",
});

const twK2210c = deriveVariant(twK2210, {
  partNumber: "TW-K2210C",
  polarity: "pnp",
  gainPoints: [quoteGain(1e-3, 5, { min: 400, typ: 550, max: 1000 }), quoteGain(50e-3, 5, { min: 200, typ: 380 })],
  saturationPoints: [quoteSaturation(50e-3, 2.5e-3, { max: 0.35, typ: 0.14 }, 0.82)],
  ftHz: 150e6,
  cobFarads: 5.5e-12,
  earlyVolts: 40,
});

const twK2260 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-K2260",
  polarity: "npn",
  packageName: "SOT-23",
  vceoVolts: 45,
  vcboVolts: 50,
  veboVolts: 5,
  icMaxAmps: 0.1,
  thermals: SOT23_SMALL_PAD,
  gainPoints: [quoteGain(1e-3, 5, { min: 250, typ: 380, max: 600 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.08 }, 0.7)],
  vbeOnVolts: 0.63,
  ftHz: 220e6,
  cobFarads: 2e-12,
  earlyVolts: 70,
  datasheetRevisionDate: "2024-03-05",
});

const twK2280 = definePart({
  manufacturer: TARNWELL,
  partNumber: "TW-K2280",
  polarity: "npn",
  packageName: "SOT-23",
  vceoVolts: 20,
  vcboVolts: 30,
  veboVolts: 4,
  icMaxAmps: 0.05,
  thermals: SOT23_SMALL_PAD,
  gainPoints: [quoteGain(1e-3, 5, { min: 300, typ: 450 }), quoteGain(10e-3, 5, { min: 250, typ: 400 })],
  saturationPoints: [],
  vbeOnVolts: 0.7,
  ftHz: 300e6,
  cobFarads: 1.2e-12,
  earlyVolts: 30,
  datasheetRevisionDate: "2025-01-20",
});

const mlb481m = definePart({
  manufacturer: MAELBROOK,
  partNumber: "MLB481M",
  polarity: "npn",
  packageName: "SOT-363",
  configuration: "dual",
  vceoVolts: 45,
  vcboVolts: 50,
  veboVolts: 6,
  icMaxAmps: 0.1,
  thermals: SOT363_DUAL,
  gainPoints: [quoteGain(2e-3, 5, { min: 200, typ: 290, max: 450 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.25, typ: 0.09 }, 0.7)],
  vbeOnVolts: 0.65,
  ftHz: 250e6,
  cobFarads: 3e-12,
  earlyVolts: 80,
  datasheetRevisionDate: "2022-10-10",
});

const mlb581m = deriveVariant(mlb481m, {
  partNumber: "MLB581M",
  polarity: "pnp",
  veboVolts: 5,
  gainPoints: [quoteGain(2e-3, 5, { min: 200, typ: 250, max: 450 })],
  saturationPoints: [quoteSaturation(10e-3, 0.5e-3, { max: 0.3, typ: 0.1 }, 0.72)],
  ftHz: 150e6,
  cobFarads: 4.5e-12,
  earlyVolts: 50,
});

const dualPackage = { configuration: "dual", datasheetRevisionDate: "2023-08-14" } as const;

export const highGainParts: PartSpec[] = [
  osk4401n,
  osk4401p,
  deriveVariant(osk4401n, { partNumber: "OSK4431N", packageName: "SOT-23", ...SOT23 }),
  deriveVariant(osk4401p, { partNumber: "OSK4431P", packageName: "SOT-23", ...SOT23 }),
  osk4480n,
  mlb449t,
  mlb549t,
  deriveVariant(mlb449t, { partNumber: "MLB449S", packageName: "SOT-23", ...SOT23_SMALL_PAD }),
  deriveVariant(mlb549t, { partNumber: "MLB549S", packageName: "SOT-23", ...SOT23_SMALL_PAD }),
  twK2210,
  twK2210c,
  twK2260,
  twK2280,
];

export const dualParts: PartSpec[] = [
  mlb481m,
  mlb581m,
  deriveVariant(mlb449t, { partNumber: "MLB449M", packageName: "SOT-363", ...SOT363_DUAL, ...dualPackage }),
  deriveVariant(osk4401n, { partNumber: "OSK4491N", packageName: "SO-8", ...SO8_DUAL, ...dualPackage }),
  deriveVariant(osk4401p, { partNumber: "OSK4491P", packageName: "SO-8", ...SO8_DUAL, ...dualPackage }),
];
