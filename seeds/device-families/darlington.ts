// Darlington pairs in one package, from SOT-23 to TO-3; each family's library holds the pair as a subcircuit.
import { MAELBROOK, OSTREVIK, QUARROW, VELLACOTT } from "#seeds/data/manufacturers.ts";
import { ambientRated, caseRated, type DeviceFamily, type FamilyPart } from "./family.ts";

const variant = (base: FamilyPart, changes: Partial<FamilyPart> & { partNumber: string }): FamilyPart => ({ ...base, ...changes });
const darlington = "darlington" as const;

const vpd8125: FamilyPart = {
  partNumber: "VPD8125",
  polarity: "npn",
  packageName: "TO-220",
  configuration: darlington,
  vceoVolts: 115,
  vcboVolts: 115,
  veboVolts: 5,
  icMaxAmps: 6,
  thermals: caseRated(68, 62),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2019-06-25",
};

const vpd812: DeviceFamily = {
  id: "vpd812",
  title: "Vellacott 115 V / 6 A Darlington NPN and PNP in TO-220",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "subckt", name: "VPD812N" }, pnp: { kind: "subckt", name: "VPD812P" } },
  vbeSweepMaxVolts: 3.5,
  gain: [
    { icAmps: 0.5, vceVolts: 3, quote: "typ" },
    { icAmps: 3, vceVolts: 3, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.45, high: 2.5 },
  saturation: [
    { icAmps: 2, forcedGain: 250, quote: "max-typ-vbe" },
    { icAmps: 3, forcedGain: 250, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.3,
  vbeOn: { icAmps: 0.5, vceVolts: 3 },
  ft: { icAmps: 1, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 3 },
  parts: [vpd8125, variant(vpd8125, { partNumber: "VPD9125", polarity: "pnp" })],
};

const vpd8165: FamilyPart = {
  partNumber: "VPD8165",
  polarity: "npn",
  packageName: "TO-3",
  configuration: darlington,
  vceoVolts: 125,
  vcboVolts: 125,
  veboVolts: 5,
  icMaxAmps: 18,
  thermals: caseRated(175, 35, 200),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2016-04-12",
};

const vpd816: DeviceFamily = {
  id: "vpd816",
  title: "Vellacott 125 V / 18 A Darlington NPN and PNP in TO-3",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "subckt", name: "VPD816N" }, pnp: { kind: "subckt", name: "VPD816P" } },
  vbeSweepMaxVolts: 3.5,
  gain: [
    { icAmps: 4, vceVolts: 3, quote: "typ" },
    { icAmps: 9, vceVolts: 3, quote: "min-typ-max" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.48, high: 3.2 },
  saturation: [
    { icAmps: 6, forcedGain: 250, quote: "max-typ-vbe" },
    { icAmps: 9, forcedGain: 200, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.25,
  vbeOn: { icAmps: 2, vceVolts: 3 },
  ft: { icAmps: 3, vceVolts: 3 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 3, vceVolts: 3 },
  parts: [vpd8165, variant(vpd8165, { partNumber: "VPD9165", polarity: "pnp" })],
};

const vpd8245: FamilyPart = {
  partNumber: "VPD8245",
  polarity: "npn",
  packageName: "TO-247",
  configuration: darlington,
  vceoVolts: 140,
  vcboVolts: 140,
  veboVolts: 5,
  icMaxAmps: 13,
  thermals: caseRated(140, 40),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2022-11-08",
};

const vpd824: DeviceFamily = {
  id: "vpd824",
  title: "Vellacott 140 V / 13 A Darlington NPN in TO-247, gain quoted only at 5 A, and a 100 V grade",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "subckt", name: "VPD824N" } },
  vbeSweepMaxVolts: 3.5,
  gain: [{ icAmps: 5, vceVolts: 3, quote: "min-typ-max" }],
  mainGain: 0,
  hfeSpread: { low: 0.35, high: 3 },
  saturation: [
    { icAmps: 5, forcedGain: 250, quote: "max-typ-vbe" },
    { icAmps: 7, forcedGain: 250, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.3,
  vbeOn: { icAmps: 1, vceVolts: 3 },
  ft: { icAmps: 2, vceVolts: 3 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 2, vceVolts: 3 },
  parts: [
    vpd8245,
    variant(vpd8245, { partNumber: "VPD8235", vceoVolts: 100, vcboVolts: 100, datasheetRevisionDate: "2021-06-30", onlyInMessyIntake: true }),
  ],
};

const qx60085: FamilyPart = {
  partNumber: "QX60-085",
  polarity: "npn",
  packageName: "TO-126",
  configuration: darlington,
  vceoVolts: 85,
  vcboVolts: 85,
  veboVolts: 5,
  icMaxAmps: 3,
  thermals: caseRated(32, 95),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2020-02-18",
};

const qx60: DeviceFamily = {
  id: "qx60",
  title: "Quarrow 85 V / 3 A Darlington NPN and PNP in TO-126",
  manufacturer: QUARROW,
  devices: { npn: { kind: "subckt", name: "QX60N" }, pnp: { kind: "subckt", name: "QX60P" } },
  vbeSweepMaxVolts: 3.5,
  gain: [
    { icAmps: 0.5, vceVolts: 3, quote: "typ" },
    { icAmps: 1.5, vceVolts: 3, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.4, high: 2.5 },
  saturation: [
    { icAmps: 1.5, forcedGain: 250, quote: "max-typ-vbe" },
    { icAmps: 2, forcedGain: 250, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.3,
  vbeOn: { icAmps: 0.5, vceVolts: 3 },
  ft: { icAmps: 0.5, vceVolts: 3 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.5, vceVolts: 3 },
  parts: [qx60085, variant(qx60085, { partNumber: "QX61-085", polarity: "pnp" })],
};

const qx62: DeviceFamily = {
  id: "qx62",
  title: "Quarrow 55 V / 800 mA Darlington NPN in SOT-89",
  manufacturer: QUARROW,
  devices: { npn: { kind: "subckt", name: "QX62N" } },
  vbeSweepMaxVolts: 3,
  gain: [
    { icAmps: 10e-3, vceVolts: 5, quote: "min-typ" },
    { icAmps: 100e-3, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.45, high: 2.5 },
  saturation: [
    { icAmps: 100e-3, forcedGain: 1000, quote: "max-vbe" },
    { icAmps: 500e-3, forcedGain: 1000, quote: "max-vbe" },
  ],
  vceSatMaxFactor: 1.4,
  vbeOn: { icAmps: 10e-3, vceVolts: 5 },
  ft: { icAmps: 10e-3, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 10e-3, vceVolts: 5 },
  parts: [
    {
      partNumber: "QX62-055",
      polarity: "npn",
      packageName: "SOT-89",
      configuration: darlington,
      vceoVolts: 55,
      vcboVolts: 70,
      veboVolts: 10,
      icMaxAmps: 0.8,
      thermals: ambientRated(1.05),
      quotesEarlyVoltage: false,
      datasheetRevisionDate: "2023-03-07",
    },
  ],
};

const qx64: DeviceFamily = {
  id: "qx64",
  title: "Quarrow 110 V / 4.5 A Darlington NPN in TO-220 whose datasheet gives typical gain only",
  manufacturer: QUARROW,
  devices: { npn: { kind: "subckt", name: "QX64N" } },
  vbeSweepMaxVolts: 3.5,
  gain: [
    { icAmps: 1, vceVolts: 3, quote: "typ" },
    { icAmps: 3, vceVolts: 3, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.4, high: 2.5 },
  saturation: [{ icAmps: 3, forcedGain: 250, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 1.35,
  vbeOn: { icAmps: 0.5, vceVolts: 3 },
  ft: { icAmps: 1, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 3 },
  parts: [
    {
      partNumber: "QX64-110",
      polarity: "npn",
      packageName: "TO-220",
      configuration: darlington,
      vceoVolts: 110,
      vcboVolts: 110,
      veboVolts: 5,
      icMaxAmps: 4.5,
      thermals: caseRated(62, 62),
      quotesEarlyVoltage: false,
      datasheetRevisionDate: "2021-05-17",
    },
  ],
};

const osk6430n: FamilyPart = {
  partNumber: "OSK6430N",
  polarity: "npn",
  packageName: "TO-92",
  configuration: darlington,
  vceoVolts: 36,
  vcboVolts: 45,
  veboVolts: 10,
  icMaxAmps: 0.4,
  thermals: ambientRated(0.62),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2020-11-16",
};

const osk64: DeviceFamily = {
  id: "osk64",
  title: "Ostrevik 36 V / 400 mA Darlington NPN and PNP in TO-92",
  manufacturer: OSTREVIK,
  devices: { npn: { kind: "subckt", name: "OSK64N" }, pnp: { kind: "subckt", name: "OSK64P" } },
  vbeSweepMaxVolts: 3,
  gain: [
    { icAmps: 10e-3, vceVolts: 5, quote: "min-typ" },
    { icAmps: 100e-3, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.45, high: 2.5 },
  saturation: [{ icAmps: 100e-3, forcedGain: 1000, quote: "max-vbe" }],
  vceSatMaxFactor: 1.4,
  vbeOn: { icAmps: 10e-3, vceVolts: 5 },
  ft: { icAmps: 10e-3, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 10e-3, vceVolts: 5 },
  parts: [osk6430n, variant(osk6430n, { partNumber: "OSK6430P", polarity: "pnp" })],
};

const mlb472s: FamilyPart = {
  partNumber: "MLB472S",
  polarity: "npn",
  packageName: "SOT-23",
  configuration: darlington,
  vceoVolts: 32,
  vcboVolts: 40,
  veboVolts: 10,
  icMaxAmps: 0.25,
  thermals: ambientRated(0.3),
  gainPoints: [1],
  quotesEarlyVoltage: false,
  lifecycle: "nrnd",
  datasheetRevisionDate: "2014-08-19",
};

const mlb47: DeviceFamily = {
  id: "mlb47",
  title: "Maelbrook 32 V / 250 mA Darlington NPN in SOT-23, minimum gain only",
  manufacturer: MAELBROOK,
  devices: { npn: { kind: "subckt", name: "MLB47N" } },
  vbeSweepMaxVolts: 3,
  gain: [
    { icAmps: 10e-3, vceVolts: 5, quote: "min" },
    { icAmps: 100e-3, vceVolts: 5, quote: "min" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.45, high: 2.5 },
  saturation: [{ icAmps: 100e-3, forcedGain: 1000, quote: "max" }],
  vceSatMaxFactor: 1.4,
  vbeOn: { icAmps: 10e-3, vceVolts: 5 },
  ft: { icAmps: 10e-3, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 10e-3, vceVolts: 5 },
  parts: [
    mlb472s,
    variant(mlb472s, { partNumber: "MLB474S", gainPoints: [0, 1], gainQuote: "min-typ", saturationPoints: [0], datasheetRevisionDate: "2015-03-12", onlyInMessyIntake: true }),
  ],
};

export const darlingtonFamilies: DeviceFamily[] = [vpd812, vpd816, vpd824, qx60, qx62, qx64, osk64, mlb47];
