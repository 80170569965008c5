// Small-signal families in TO-92, SOT-23, SOT-363 and SO-8: general purpose, low-noise in gain groups, high gain,
// high voltage, low saturation, and a few from older datasheets.
import { MAELBROOK, OSTREVIK, TARNWELL } from "#seeds/data/manufacturers.ts";
import { ambientRated, type DeviceFamily, type FamilyPart } from "./family.ts";

/** A sibling of a part (complement, other package, dual) that differs only in `changes`. */
const variant = (base: FamilyPart, changes: Partial<FamilyPart> & { partNumber: string }): FamilyPart => ({ ...base, ...changes });

const osk2710n: FamilyPart = {
  partNumber: "OSK2710N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 36,
  vcboVolts: 55,
  veboVolts: 6,
  icMaxAmps: 0.35,
  thermals: ambientRated(0.56),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2022-04-19",
};
const osk2710p = variant(osk2710n, { partNumber: "OSK2710P", polarity: "pnp", vcboVolts: 48, veboVolts: 5 });
const osk2730 = { packageName: "SOT-23", thermals: ambientRated(0.31), datasheetRevisionDate: "2023-09-12" };
const osk2750 = { packageName: "SOT-89", thermals: ambientRated(1.1), datasheetRevisionDate: "2025-05-06", onlyInMessyIntake: true };

const osk27: DeviceFamily = {
  id: "osk27",
  title: "Ostrevik general-purpose 36 V / 350 mA NPN and PNP",
  manufacturer: OSTREVIK,
  devices: { npn: { kind: "model", name: "OSK27N" }, pnp: { kind: "model", name: "OSK27P" } },
  vbeSweepMaxVolts: 1.3,
  gain: [
    { icAmps: 0.2e-3, vceVolts: 2, quote: "min-typ" },
    { icAmps: 5e-3, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 120e-3, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.55, high: 1.65 },
  saturation: [
    { icAmps: 50e-3, forcedGain: 20, quote: "max-typ-vbe" },
    { icAmps: 250e-3, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 5e-3, vceVolts: 2 },
  ft: { icAmps: 20e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1e-3, vceVolts: 5 },
  parts: [
    osk2710n,
    osk2710p,
    variant(osk2710n, { partNumber: "OSK2730N", ...osk2730 }),
    variant(osk2710p, { partNumber: "OSK2730P", ...osk2730 }),
    variant(osk2710n, { partNumber: "OSK2750N", ...osk2750 }),
    variant(osk2710p, { partNumber: "OSK2750P", ...osk2750 }),
  ],
};

const mlb462t: FamilyPart = {
  partNumber: "MLB462T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 52,
  vcboVolts: 62,
  veboVolts: 6,
  icMaxAmps: 0.12,
  thermals: ambientRated(0.52),
  group: "2",
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2021-02-08",
};
const mlb562t = variant(mlb462t, { partNumber: "MLB562T", polarity: "pnp", veboVolts: 5 });
const mlb46Sot23 = { packageName: "SOT-23", thermals: ambientRated(0.27), datasheetRevisionDate: "2022-07-25" };
// Both dies together: the SOT-363 datasheet quotes the package total.
const mlb46Dual = {
  packageName: "SOT-363",
  configuration: "dual",
  thermals: ambientRated(0.22),
  datasheetRevisionDate: "2023-01-30",
} as const;
const firstPointsOnly = { gainPoints: [1], saturationPoints: [0] };

const mlb46: DeviceFamily = {
  id: "mlb46",
  title: "Maelbrook low-noise audio 52 V / 120 mA NPN and PNP, sold in gain groups 1, 2 and 3",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "model", name: "MLB46N" }, pnp: { kind: "model", name: "MLB46P" } },
  vbeSweepMaxVolts: 1.2,
  gain: [
    { icAmps: 10e-6, vceVolts: 6, quote: "typ" },
    { icAmps: 1e-3, vceVolts: 6, quote: "min-typ-max" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.45, high: 2.3 },
  gainGroups: { "1": [140, 255], "2": [235, 430], "3": [395, 720] },
  saturation: [
    { icAmps: 10e-3, forcedGain: 20, quote: "max-typ-vbe" },
    { icAmps: 60e-3, forcedGain: 10, quote: "max-vbe" },
  ],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 1e-3, vceVolts: 6 },
  ft: { icAmps: 5e-3, vceVolts: 6 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1e-3, vceVolts: 6 },
  parts: [
    variant(mlb462t, { partNumber: "MLB461T", group: "1" }),
    mlb462t,
    variant(mlb462t, { partNumber: "MLB463T", group: "3" }),
    variant(mlb562t, { partNumber: "MLB561T", group: "1" }),
    mlb562t,
    variant(mlb462t, { partNumber: "MLB462S", ...mlb46Sot23 }),
    variant(mlb562t, { partNumber: "MLB562S", ...mlb46Sot23 }),
    variant(mlb462t, { partNumber: "MLB462M", ...mlb46Dual, ...firstPointsOnly }),
    variant(mlb562t, { partNumber: "MLB562M", ...mlb46Dual, ...firstPointsOnly, quotesEarlyVoltage: false }),
    variant(mlb462t, { partNumber: "MLB468T", datasheetRevisionDate: "2024-11-18", onlyInMessyIntake: true }),
    variant(mlb562t, { partNumber: "MLB568T", datasheetRevisionDate: "2024-11-18", onlyInMessyIntake: true }),
  ],
};

const osk4510n: FamilyPart = {
  partNumber: "OSK4510N",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 28,
  vcboVolts: 36,
  veboVolts: 5,
  icMaxAmps: 0.06,
  thermals: ambientRated(0.52),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2022-10-03",
};
const osk4510p = variant(osk4510n, { partNumber: "OSK4510P", polarity: "pnp", veboVolts: 4.5 });
const osk4530 = { packageName: "SOT-23", thermals: ambientRated(0.27) };
// Both dies together: the SO-8 datasheet quotes the package total.
const osk4590 = { packageName: "SO-8", configuration: "dual", thermals: ambientRated(0.6), datasheetRevisionDate: "2023-06-21" } as const;

const osk45: DeviceFamily = {
  id: "osk45",
  title: "Ostrevik high-gain low-noise 28 V / 60 mA NPN and PNP, with a selected super-gain grade",
  manufacturer: OSTREVIK,
  devices: { npn: { kind: "model", name: "OSK45N" }, pnp: { kind: "model", name: "OSK45P" } },
  vbeSweepMaxVolts: 1.1,
  gain: [
    { icAmps: 10e-6, vceVolts: 5, quote: "min-typ" },
    { icAmps: 0.5e-3, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 5e-3, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.6, high: 1.6 },
  // The super-gain grade: devices selected from the top of the spread, quoted with typical gain only.
  gainGroups: { S: [820, 1250] },
  saturation: [
    { icAmps: 10e-3, forcedGain: 20, quote: "max-typ-vbe" },
    { icAmps: 30e-3, forcedGain: 10, quote: "max-vbe" },
  ],
  vceSatMaxFactor: 2.4,
  vbeOn: { icAmps: 0.5e-3, vceVolts: 5 },
  ft: { icAmps: 2e-3, vceVolts: 5 },
  cob: { vcbVolts: 5 },
  early: { icAmps: 0.5e-3, vceVolts: 5 },
  parts: [
    osk4510n,
    osk4510p,
    variant(osk4510n, { partNumber: "OSK4530N", ...osk4530 }),
    variant(osk4510p, { partNumber: "OSK4530P", ...osk4530 }),
    variant(osk4510n, { partNumber: "OSK4590N", ...osk4590 }),
    variant(osk4510p, { partNumber: "OSK4590P", ...osk4590 }),
    variant(osk4510n, {
      partNumber: "OSK4580N",
      vceoVolts: 22,
      vcboVolts: 30,
      icMaxAmps: 0.04,
      group: "S",
      gainPoints: [0, 1],
      gainQuote: "typ",
      saturationPoints: [0],
      datasheetRevisionDate: "2020-08-17",
    }),
    variant(osk4510n, {
      partNumber: "OSK4560N",
      ...osk4530,
      gainPoints: [0, 1],
      saturationPoints: [0],
      datasheetRevisionDate: null,
      onlyInMessyIntake: true,
    }),
  ],
};

const twK1340: FamilyPart = {
  partNumber: "TW-K1340",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 64,
  vcboVolts: 80,
  veboVolts: 5,
  icMaxAmps: 0.18,
  thermals: ambientRated(0.6),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2018-03-12",
};

const twk13: DeviceFamily = {
  id: "twk13",
  title: "Tarnwell 64 V / 180 mA general-purpose NPN and PNP, gain quoted at one current as a range",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWK13N" }, pnp: { kind: "model", name: "TWK13P" } },
  vbeSweepMaxVolts: 1.2,
  gain: [{ icAmps: 3e-3, vceVolts: 6, quote: "min-max" }],
  mainGain: 0,
  hfeSpread: { low: 0.55, high: 1.8 },
  saturation: [{ icAmps: 80e-3, forcedGain: 10, quote: "max-vbe" }],
  vceSatMaxFactor: 2.4,
  vbeOn: { icAmps: 3e-3, vceVolts: 6 },
  ft: { icAmps: 10e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 3e-3, vceVolts: 6 },
  parts: [
    twK1340,
    variant(twK1340, { partNumber: "TW-K1340C", polarity: "pnp" }),
    variant(twK1340, { partNumber: "TW-K1360", packageName: "SOT-23", thermals: ambientRated(0.3), quotesEarlyVoltage: false, datasheetRevisionDate: "2019-07-01" }),
    variant(twK1340, { partNumber: "TW-K1350", vceoVolts: 48, vcboVolts: 60, datasheetRevisionDate: "2025-06-16", onlyInMessyIntake: true }),
  ],
};

const twK2450: FamilyPart = {
  partNumber: "TW-K2450",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 48,
  vcboVolts: 58,
  veboVolts: 5,
  icMaxAmps: 0.14,
  thermals: ambientRated(0.6),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2021-11-29",
};
const twK2470 = { packageName: "SOT-23", thermals: ambientRated(0.25), gainPoints: [0], datasheetRevisionDate: "2024-04-08" };

const twk24: DeviceFamily = {
  id: "twk24",
  title: "Tarnwell high-gain 48 V / 140 mA NPN and PNP",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWK24N" }, pnp: { kind: "model", name: "TWK24P" } },
  vbeSweepMaxVolts: 1.2,
  gain: [
    { icAmps: 0.8e-3, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 40e-3, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.62, high: 1.55 },
  saturation: [{ icAmps: 40e-3, forcedGain: 20, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 0.8e-3, vceVolts: 5 },
  ft: { icAmps: 8e-3, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.8e-3, vceVolts: 5 },
  parts: [
    twK2450,
    variant(twK2450, { partNumber: "TW-K2450C", polarity: "pnp" }),
    variant(twK2450, { partNumber: "TW-K2470", ...twK2470 }),
    variant(twK2450, { partNumber: "TW-K2470C", polarity: "pnp", ...twK2470, quotesEarlyVoltage: false }),
  ],
};

const mlb436t: FamilyPart = {
  partNumber: "MLB436T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 270,
  vcboVolts: 290,
  veboVolts: 6,
  icMaxAmps: 0.15,
  thermals: ambientRated(0.64),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2019-05-27",
};
const mlb536t = variant(mlb436t, { partNumber: "MLB536T", polarity: "pnp", veboVolts: 5 });
const mlb43Sot23 = { packageName: "SOT-23", thermals: ambientRated(0.33), datasheetRevisionDate: "2020-12-14" };

const mlb43: DeviceFamily = {
  id: "mlb43",
  title: "Maelbrook high-voltage 270 V / 150 mA NPN and PNP",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "model", name: "MLB43N" }, pnp: { kind: "model", name: "MLB43P" } },
  vbeSweepMaxVolts: 1.4,
  gain: [
    { icAmps: 1e-3, vceVolts: 10, quote: "min-typ" },
    { icAmps: 10e-3, vceVolts: 10, quote: "min-typ-max" },
    { icAmps: 40e-3, vceVolts: 10, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.5, high: 2.0 },
  saturation: [{ icAmps: 25e-3, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 10e-3, vceVolts: 10 },
  ft: { icAmps: 10e-3, vceVolts: 20 },
  cob: { vcbVolts: 20 },
  early: { icAmps: 10e-3, vceVolts: 10 },
  parts: [
    mlb436t,
    mlb536t,
    variant(mlb436t, { partNumber: "MLB436S", ...mlb43Sot23 }),
    variant(mlb536t, { partNumber: "MLB536S", ...mlb43Sot23 }),
  ],
};

const osk11: DeviceFamily = {
  id: "osk11",
  title: "Ostrevik low-current 32 V / 180 mA NPN and PNP from older datasheets, gain quoted only far below 1 mA",
  manufacturer: OSTREVIK,
  devices: { npn: { kind: "model", name: "OSK11N" }, pnp: { kind: "model", name: "OSK11P" } },
  vbeSweepMaxVolts: 1.2,
  gain: [
    { icAmps: 50e-6, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 100e-6, vceVolts: 5, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 2.1 },
  saturation: [{ icAmps: 10e-3, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.6,
  vbeOn: { icAmps: 1e-3, vceVolts: 5 },
  ft: { icAmps: 5e-3, vceVolts: 5 },
  cob: { vcbVolts: 5 },
  early: { icAmps: 1e-3, vceVolts: 5 },
  parts: [
    {
      partNumber: "OSK1190N",
      polarity: "npn",
      packageName: "TO-92",
      vceoVolts: 32,
      vcboVolts: 42,
      veboVolts: 5,
      icMaxAmps: 0.18,
      thermals: ambientRated(0.5),
      gainPoints: [0],
      gainTemperatureUnstated: true,
      quotesEarlyVoltage: false,
      lifecycle: "nrnd",
      datasheetRevisionDate: "2011-06-14",
    },
    {
      partNumber: "OSK1195P",
      polarity: "pnp",
      packageName: "SOT-23",
      vceoVolts: 32,
      vcboVolts: 40,
      veboVolts: 5,
      icMaxAmps: 0.18,
      thermals: ambientRated(0.28),
      gainPoints: [1],
      gainTemperatureUnstated: true,
      saturationPoints: [],
      quotesEarlyVoltage: false,
      lifecycle: "obsolete",
      datasheetRevisionDate: "2013-03-04",
    },
  ],
};

const mlb419s: FamilyPart = {
  partNumber: "MLB419S",
  polarity: "npn",
  packageName: "SOT-23",
  vceoVolts: 24,
  vcboVolts: 36,
  veboVolts: 6,
  icMaxAmps: 1.4,
  thermals: ambientRated(0.45),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2023-05-22",
};

const mlb41: DeviceFamily = {
  id: "mlb41",
  title: "Maelbrook low-saturation 24 V / 1.4 A NPN and PNP in SOT-23",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "model", name: "MLB41N" }, pnp: { kind: "model", name: "MLB41P" } },
  vbeSweepMaxVolts: 1.5,
  gain: [
    { icAmps: 10e-3, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 0.4, vceVolts: 2, quote: "min-typ" },
    { icAmps: 1.2, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.6, high: 1.7 },
  saturation: [
    { icAmps: 0.1, forcedGain: 50, quote: "max-typ-vbe" },
    { icAmps: 0.5, forcedGain: 50, quote: "max-typ-vbe" },
    { icAmps: 1.2, forcedGain: 20, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.8,
  vbeOn: { icAmps: 0.5, vceVolts: 2 },
  ft: { icAmps: 50e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 10e-3, vceVolts: 2 },
  parts: [mlb419s, variant(mlb419s, { partNumber: "MLB519S", polarity: "pnp", veboVolts: 5 })],
};

const mlb414: DeviceFamily = {
  id: "mlb414",
  title: "Maelbrook fast-switching 18 V / 250 mA NPN",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "model", name: "MLB414N" } },
  vbeSweepMaxVolts: 1.3,
  gain: [
    { icAmps: 10e-3, vceVolts: 1, quote: "min-typ-max" },
    { icAmps: 100e-3, vceVolts: 1, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.5, high: 1.4 },
  saturation: [
    { icAmps: 10e-3, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 50e-3, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 10e-3, vceVolts: 1 },
  ft: { icAmps: 10e-3, vceVolts: 10 },
  cob: { vcbVolts: 5 },
  early: { icAmps: 10e-3, vceVolts: 1 },
  parts: [
    {
      partNumber: "MLB414T",
      polarity: "npn",
      packageName: "TO-92",
      vceoVolts: 18,
      vcboVolts: 42,
      veboVolts: 4.5,
      icMaxAmps: 0.25,
      thermals: ambientRated(0.6),
      quotesEarlyVoltage: false,
      lifecycle: "nrnd",
      datasheetRevisionDate: "2016-10-05",
    },
  ],
};

const mlb467t: FamilyPart = {
  partNumber: "MLB467T",
  polarity: "npn",
  packageName: "TO-92",
  vceoVolts: 68,
  vcboVolts: 85,
  veboVolts: 6,
  icMaxAmps: 0.45,
  thermals: ambientRated(0.6),
  quotesEarlyVoltage: true,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2016-09-22",
};

const mlb467: DeviceFamily = {
  id: "mlb467",
  title: "Maelbrook 68 V / 450 mA NPN and PNP whose datasheet gives typical gain only",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "model", name: "MLB467N" }, pnp: { kind: "model", name: "MLB467P" } },
  vbeSweepMaxVolts: 1.3,
  gain: [
    { icAmps: 10e-3, vceVolts: 5, quote: "typ" },
    { icAmps: 150e-3, vceVolts: 5, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.5, high: 2 },
  saturation: [{ icAmps: 150e-3, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.4,
  vbeOn: { icAmps: 10e-3, vceVolts: 5 },
  ft: { icAmps: 20e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 10e-3, vceVolts: 5 },
  parts: [mlb467t, variant(mlb467t, { partNumber: "MLB567T", polarity: "pnp", veboVolts: 5 })],
};

export const smallSignalFamilies: DeviceFamily[] = [osk27, mlb46, osk45, twk13, twk24, mlb43, osk11, mlb41, mlb414, mlb467];
