// Medium-power families in SOT-89 and TO-126, power families in TO-220, TO-247 and TO-3.
import { QUARROW, TARNWELL, VELLACOTT } from "#seeds/data/manufacturers.ts";
import { ambientRated, caseRated, type DeviceFamily, type FamilyPart } from "./family.ts";

/** A sibling of a part (complement, other grade) that differs only in `changes`. */
const variant = (base: FamilyPart, changes: Partial<FamilyPart> & { partNumber: string }): FamilyPart => ({ ...base, ...changes });

// Free-air junction-to-ambient figures of the power packages, the same for every family in them.
const TO126_FREE_AIR_C_PER_W = 95;
const TO220_FREE_AIR_C_PER_W = 62;
const TO247_FREE_AIR_C_PER_W = 40;
const TO3_FREE_AIR_C_PER_W = 35;
// SOT-89 is rated on a 1 cm² copper pad, with the ambient at 25 °C.
const SOT89 = ambientRated(1.05);

const twG2350: FamilyPart = {
  partNumber: "TW-G2350",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 50,
  vcboVolts: 65,
  veboVolts: 5,
  icMaxAmps: 1.2,
  thermals: SOT89,
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2021-06-07",
};

const twg23: DeviceFamily = {
  id: "twg23",
  title: "Tarnwell 50 V / 1.2 A medium-power NPN and PNP in SOT-89",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWG23N" }, pnp: { kind: "model", name: "TWG23P" } },
  vbeSweepMaxVolts: 1.6,
  gain: [
    { icAmps: 0.1, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 0.5, vceVolts: 2, quote: "min-typ" },
    { icAmps: 1.2, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.5, high: 1.6 },
  saturation: [
    { icAmps: 0.5, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 1, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 0.5, vceVolts: 2 },
  ft: { icAmps: 50e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.1, vceVolts: 2 },
  parts: [
    twG2350,
    variant(twG2350, { partNumber: "TW-G2350C", polarity: "pnp" }),
    variant(twG2350, { partNumber: "TW-G2370", gainPoints: [0, 1], saturationPoints: [0], datasheetRevisionDate: "2025-02-03", onlyInMessyIntake: true }),
    variant(twG2350, { partNumber: "TW-G2370C", polarity: "pnp", gainPoints: [0, 1], saturationPoints: [0], datasheetRevisionDate: "2025-02-03", onlyInMessyIntake: true }),
  ],
};

const twG2390: FamilyPart = {
  partNumber: "TW-G2390",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 95,
  vcboVolts: 115,
  veboVolts: 5,
  icMaxAmps: 1,
  thermals: SOT89,
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2019-01-21",
};

const twg39: DeviceFamily = {
  id: "twg39",
  title: "Tarnwell 95 V / 1 A medium-power NPN and PNP in SOT-89",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWG39N" }, pnp: { kind: "model", name: "TWG39P" } },
  vbeSweepMaxVolts: 1.6,
  gain: [
    { icAmps: 0.15, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 0.5, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.4, high: 1.8 },
  saturation: [{ icAmps: 0.5, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 0.5, vceVolts: 2 },
  ft: { icAmps: 50e-3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.15, vceVolts: 2 },
  parts: [twG2390, variant(twG2390, { partNumber: "TW-G2390C", polarity: "pnp" })],
};

const twG2420: FamilyPart = {
  partNumber: "TW-G2420",
  polarity: "npn",
  packageName: "SOT-89",
  vceoVolts: 25,
  vcboVolts: 40,
  veboVolts: 6,
  icMaxAmps: 3.5,
  thermals: SOT89,
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2024-06-19",
};

const twg24: DeviceFamily = {
  id: "twg24",
  title: "Tarnwell low-saturation 25 V / 3.5 A NPN and PNP in SOT-89",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWG24N" }, pnp: { kind: "model", name: "TWG24P" } },
  vbeSweepMaxVolts: 1.6,
  gain: [
    { icAmps: 0.5, vceVolts: 2, quote: "min-typ" },
    { icAmps: 2, vceVolts: 2, quote: "min-typ" },
    { icAmps: 3.5, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.55, high: 1.7 },
  saturation: [
    { icAmps: 1, forcedGain: 50, quote: "max-typ-vbe" },
    { icAmps: 3, forcedGain: 30, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.7,
  vbeOn: { icAmps: 1, vceVolts: 2 },
  ft: { icAmps: 0.1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.5, vceVolts: 2 },
  parts: [twG2420, variant(twG2420, { partNumber: "TW-G2420C", polarity: "pnp" })],
};

const twG3152: FamilyPart = {
  partNumber: "TW-G3152",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 55,
  vcboVolts: 70,
  veboVolts: 5,
  icMaxAmps: 1.8,
  thermals: caseRated(14, TO126_FREE_AIR_C_PER_W),
  group: "2",
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2022-03-14",
};
const twG3190 = { vceoVolts: 95, vcboVolts: 110, group: undefined, gainPoints: [1, 2], quotesEarlyVoltage: false, datasheetRevisionDate: "2017-03-21" };

const twg31: DeviceFamily = {
  id: "twg31",
  title: "Tarnwell 55 V / 1.8 A NPN and PNP in TO-126, sold in gain groups 1 and 2, and a 95 V grade",
  manufacturer: TARNWELL,
  devices: { npn: { kind: "model", name: "TWG31N" }, pnp: { kind: "model", name: "TWG31P" } },
  vbeSweepMaxVolts: 1.8,
  gain: [
    { icAmps: 5e-3, vceVolts: 2, quote: "min-typ" },
    { icAmps: 0.2, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 0.8, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.35, high: 1.8 },
  gainGroups: { "1": [62, 118], "2": [108, 205] },
  saturation: [{ icAmps: 0.8, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 0.8, vceVolts: 2 },
  ft: { icAmps: 0.1, vceVolts: 5 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.2, vceVolts: 2 },
  parts: [
    variant(twG3152, { partNumber: "TW-G3151", group: "1" }),
    twG3152,
    variant(twG3152, { partNumber: "TW-G3151C", polarity: "pnp", group: "1" }),
    variant(twG3152, { partNumber: "TW-G3152C", polarity: "pnp" }),
    variant(twG3152, { partNumber: "TW-G3190", ...twG3190 }),
    variant(twG3152, { partNumber: "TW-G3190C", polarity: "pnp", ...twG3190 }),
  ],
};

const qx12070: FamilyPart = {
  partNumber: "QX12-070",
  polarity: "npn",
  packageName: "TO-126",
  vceoVolts: 70,
  vcboVolts: 85,
  veboVolts: 5,
  icMaxAmps: 3.5,
  thermals: caseRated(22, TO126_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2019-02-26",
};
const qx14060 = { vceoVolts: 60, vcboVolts: 75, lifecycle: "last-time-buy", datasheetRevisionDate: "2013-10-01", onlyInMessyIntake: true } as const;

const qx12: DeviceFamily = {
  id: "qx12",
  title: "Quarrow 70 V / 3.5 A NPN and PNP in TO-126, and an older 60 V grade",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX12N" }, pnp: { kind: "model", name: "QX12P" } },
  vbeSweepMaxVolts: 2,
  gain: [
    { icAmps: 0.5, vceVolts: 2, quote: "min-typ" },
    { icAmps: 2, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.6 },
  saturation: [
    { icAmps: 1, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 3, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 1, vceVolts: 2 },
  ft: { icAmps: 0.25, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.5, vceVolts: 2 },
  parts: [
    qx12070,
    variant(qx12070, { partNumber: "QX13-070", polarity: "pnp" }),
    variant(qx12070, { partNumber: "QX14-060", ...qx14060 }),
    variant(qx12070, { partNumber: "QX15-060", polarity: "pnp", ...qx14060 }),
  ],
};

const qx18: DeviceFamily = {
  id: "qx18",
  title: "Quarrow 110 V / 1.2 A NPN in TO-126 whose datasheet gives typical gain only",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX18N" } },
  vbeSweepMaxVolts: 1.8,
  gain: [
    { icAmps: 0.15, vceVolts: 2, quote: "typ" },
    { icAmps: 0.5, vceVolts: 2, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 2 },
  saturation: [{ icAmps: 0.5, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 0.5, vceVolts: 2 },
  ft: { icAmps: 0.1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.15, vceVolts: 2 },
  parts: [
    {
      partNumber: "QX18-110",
      polarity: "npn",
      packageName: "TO-126",
      vceoVolts: 110,
      vcboVolts: 130,
      veboVolts: 5,
      icMaxAmps: 1.2,
      thermals: caseRated(12, TO126_FREE_AIR_C_PER_W),
      quotesEarlyVoltage: true,
      lifecycle: "nrnd",
      datasheetRevisionDate: "2015-08-11",
    },
  ],
};

const qx16: DeviceFamily = {
  id: "qx16",
  title: "Quarrow 270 V / 400 mA NPN in TO-126 whose datasheet gives typical gain only",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX16N" } },
  vbeSweepMaxVolts: 1.6,
  gain: [
    { icAmps: 20e-3, vceVolts: 10, quote: "typ" },
    { icAmps: 80e-3, vceVolts: 10, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.4, high: 2 },
  saturation: [{ icAmps: 80e-3, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 20e-3, vceVolts: 10 },
  ft: { icAmps: 20e-3, vceVolts: 20 },
  cob: { vcbVolts: 20 },
  early: { icAmps: 20e-3, vceVolts: 10 },
  parts: [
    {
      partNumber: "QX16-270",
      polarity: "npn",
      packageName: "TO-126",
      vceoVolts: 270,
      vcboVolts: 320,
      veboVolts: 6,
      icMaxAmps: 0.4,
      thermals: caseRated(9, 110),
      quotesEarlyVoltage: false,
      lifecycle: "nrnd",
      datasheetRevisionDate: "2016-05-03",
    },
  ],
};

const vpd6145: FamilyPart = {
  partNumber: "VPD6145",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 110,
  vcboVolts: 120,
  veboVolts: 5,
  icMaxAmps: 7,
  thermals: caseRated(70, TO220_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2017-09-18",
};
const vpd6147 = { vceoVolts: 90, vcboVolts: 100, datasheetRevisionDate: "2022-04-19", onlyInMessyIntake: true };

const vpd614: DeviceFamily = {
  id: "vpd614",
  title: "Vellacott 110 V / 7 A NPN and PNP in TO-220, and a 90 V grade",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD614N" }, pnp: { kind: "model", name: "VPD614P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 0.4, vceVolts: 4, quote: "min-typ" },
    { icAmps: 3.5, vceVolts: 4, quote: "min-typ-max" },
  ],
  mainGain: 1,
  hfeSpread: { low: 0.4, high: 1.6 },
  saturation: [{ icAmps: 3.5, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 3.5, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.4, vceVolts: 4 },
  parts: [
    vpd6145,
    variant(vpd6145, { partNumber: "VPD7145", polarity: "pnp" }),
    variant(vpd6145, { partNumber: "VPD6147", ...vpd6147 }),
    variant(vpd6145, { partNumber: "VPD7147", polarity: "pnp", ...vpd6147 }),
  ],
};

const vpd6165: FamilyPart = {
  partNumber: "VPD6165",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 70,
  vcboVolts: 85,
  veboVolts: 5,
  icMaxAmps: 9,
  thermals: caseRated(80, TO220_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: false,
  datasheetRevisionDate: "2015-11-23",
};

const vpd616: DeviceFamily = {
  id: "vpd616",
  title: "Vellacott 70 V / 9 A NPN and PNP in TO-220, gain quoted only at 3.5 A",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD616N" }, pnp: { kind: "model", name: "VPD616P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [{ icAmps: 3.5, vceVolts: 4, quote: "min-typ-max" }],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.5 },
  saturation: [{ icAmps: 3.5, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 3.5, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 4 },
  parts: [vpd6165, variant(vpd6165, { partNumber: "VPD7165", polarity: "pnp" })],
};

const vpd6185: FamilyPart = {
  partNumber: "VPD6185",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 90,
  vcboVolts: 100,
  veboVolts: 5,
  icMaxAmps: 3.5,
  thermals: caseRated(36, TO220_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2020-04-27",
};

const vpd618: DeviceFamily = {
  id: "vpd618",
  title: "Vellacott 90 V / 3.5 A NPN and PNP in TO-220",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD618N" }, pnp: { kind: "model", name: "VPD618P" } },
  vbeSweepMaxVolts: 2.2,
  gain: [
    { icAmps: 0.3, vceVolts: 2, quote: "min-typ-max" },
    { icAmps: 1, vceVolts: 2, quote: "min-typ" },
    { icAmps: 3.5, vceVolts: 2, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.8 },
  saturation: [
    { icAmps: 1, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 3, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 1, vceVolts: 2 },
  ft: { icAmps: 0.3, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.3, vceVolts: 2 },
  parts: [vpd6185, variant(vpd6185, { partNumber: "VPD7185", polarity: "pnp" })],
};

const vpd6125: FamilyPart = {
  partNumber: "VPD6125",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 40,
  vcboVolts: 55,
  veboVolts: 6,
  icMaxAmps: 9,
  thermals: caseRated(55, TO220_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2023-11-02",
};

const vpd612: DeviceFamily = {
  id: "vpd612",
  title: "Vellacott low-saturation fast-switching 40 V / 9 A NPN and PNP in TO-220",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD612N" }, pnp: { kind: "model", name: "VPD612P" } },
  vbeSweepMaxVolts: 2,
  gain: [
    { icAmps: 2, vceVolts: 2, quote: "min-typ" },
    { icAmps: 5, vceVolts: 2, quote: "min-typ" },
    { icAmps: 9, vceVolts: 2, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.5, high: 1.6 },
  saturation: [
    { icAmps: 2, forcedGain: 50, quote: "max-typ-vbe" },
    { icAmps: 5, forcedGain: 20, quote: "max-typ-vbe" },
    { icAmps: 9, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 1.8,
  vbeOn: { icAmps: 2, vceVolts: 2 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 2 },
  parts: [vpd6125, variant(vpd6125, { partNumber: "VPD7125", polarity: "pnp" })],
};

const vpd6195: FamilyPart = {
  partNumber: "VPD6195",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 195,
  vcboVolts: 210,
  veboVolts: 5,
  icMaxAmps: 11,
  thermals: caseRated(125, TO247_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2022-08-09",
};

const vpd619: DeviceFamily = {
  id: "vpd619",
  title: "Vellacott 195 V / 11 A audio-output NPN and PNP in TO-247",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD619N" }, pnp: { kind: "model", name: "VPD619P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 1, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 6, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.55, high: 1.45 },
  saturation: [{ icAmps: 6, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.1,
  vbeOn: { icAmps: 6, vceVolts: 5 },
  ft: { icAmps: 1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 5 },
  parts: [vpd6195, variant(vpd6195, { partNumber: "VPD7195", polarity: "pnp" })],
};

const vpd6175: FamilyPart = {
  partNumber: "VPD6175",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 175,
  vcboVolts: 190,
  veboVolts: 5,
  icMaxAmps: 13,
  thermals: caseRated(160, TO247_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2021-11-30",
};

const vpd617: DeviceFamily = {
  id: "vpd617",
  title: "Vellacott 175 V / 13 A audio-output NPN and PNP in TO-247",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD617N" }, pnp: { kind: "model", name: "VPD617P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 1, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 4, vceVolts: 5, quote: "min-typ" },
    { icAmps: 9, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.55, high: 1.5 },
  saturation: [
    { icAmps: 4, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 9, forcedGain: 10, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2,
  vbeOn: { icAmps: 4, vceVolts: 5 },
  ft: { icAmps: 1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 5 },
  parts: [vpd6175, variant(vpd6175, { partNumber: "VPD7175", polarity: "pnp" })],
};

const vpd6310: FamilyPart = {
  partNumber: "VPD6310",
  polarity: "npn",
  packageName: "TO-3",
  vceoVolts: 75,
  vcboVolts: 110,
  veboVolts: 7,
  icMaxAmps: 12,
  thermals: caseRated(100, TO3_FREE_AIR_C_PER_W, 200),
  quotesEarlyVoltage: false,
  omitsCob: true,
  lifecycle: "last-time-buy",
  datasheetRevisionDate: "2009-05-11",
};

const vpd631: DeviceFamily = {
  id: "vpd631",
  title: "Vellacott 75 V / 12 A NPN and PNP in TO-3, an older line near the end of its life",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD631N" }, pnp: { kind: "model", name: "VPD631P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 3, vceVolts: 4, quote: "min-max" },
    { icAmps: 9, vceVolts: 4, quote: "min" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.7 },
  saturation: [
    { icAmps: 3, forcedGain: 10, quote: "max" },
    { icAmps: 9, forcedGain: 5, quote: "max" },
  ],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 3, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 4 },
  parts: [vpd6310, variant(vpd6310, { partNumber: "VPD7310", polarity: "pnp", lifecycle: "obsolete" })],
};

const vpd6360: FamilyPart = {
  partNumber: "VPD6360",
  polarity: "npn",
  packageName: "TO-3",
  vceoVolts: 280,
  vcboVolts: 300,
  veboVolts: 5,
  icMaxAmps: 14,
  thermals: caseRated(220, TO3_FREE_AIR_C_PER_W, 200),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2018-02-20",
};

const vpd636: DeviceFamily = {
  id: "vpd636",
  title: "Vellacott 280 V / 14 A NPN and PNP in TO-3, and a 240 V grade",
  manufacturer: VELLACOTT,
  devices: { npn: { kind: "model", name: "VPD636N" }, pnp: { kind: "model", name: "VPD636P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 1, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 7, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.35, high: 1.75 },
  saturation: [{ icAmps: 7, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 7, vceVolts: 5 },
  ft: { icAmps: 1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 5 },
  parts: [
    vpd6360,
    variant(vpd6360, { partNumber: "VPD7360", polarity: "pnp" }),
    variant(vpd6360, { partNumber: "VPD6340", vceoVolts: 240, vcboVolts: 260, datasheetRevisionDate: "2020-11-11", onlyInMessyIntake: true }),
  ],
};

const qx40125: FamilyPart = {
  partNumber: "QX40-125",
  polarity: "npn",
  packageName: "TO-220",
  vceoVolts: 125,
  vcboVolts: 135,
  veboVolts: 5,
  icMaxAmps: 8.5,
  thermals: caseRated(75, TO220_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2019-10-14",
};

const qx40: DeviceFamily = {
  id: "qx40",
  title: "Quarrow 125 V / 8.5 A NPN and PNP in TO-220",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX40N" }, pnp: { kind: "model", name: "QX40P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 1, vceVolts: 4, quote: "min-typ" },
    { icAmps: 4, vceVolts: 4, quote: "min-typ" },
    { icAmps: 8, vceVolts: 4, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.4, high: 1.7 },
  saturation: [
    { icAmps: 4, forcedGain: 10, quote: "max-typ-vbe" },
    { icAmps: 8, forcedGain: 5, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 4, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 4 },
  parts: [qx40125, variant(qx40125, { partNumber: "QX41-125", polarity: "pnp" })],
};

const qx42: DeviceFamily = {
  id: "qx42",
  title: "Quarrow 65 V / 3.5 A NPN in TO-220, an older datasheet with typical gain only",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX42N" } },
  vbeSweepMaxVolts: 2.2,
  gain: [
    { icAmps: 0.5, vceVolts: 4, quote: "typ" },
    { icAmps: 3, vceVolts: 4, quote: "typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 2 },
  saturation: [{ icAmps: 3, forcedGain: 10, quote: "max" }],
  vceSatMaxFactor: 2.5,
  vbeOn: { icAmps: 3, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.5, vceVolts: 4 },
  parts: [
    {
      partNumber: "QX42-065",
      polarity: "npn",
      packageName: "TO-220",
      vceoVolts: 65,
      vcboVolts: 75,
      veboVolts: 5,
      icMaxAmps: 3.5,
      thermals: caseRated(38, TO220_FREE_AIR_C_PER_W),
      quotesEarlyVoltage: false,
      omitsCob: true,
      lifecycle: "nrnd",
      datasheetRevisionDate: "2012-05-08",
    },
  ],
};

const qx44: DeviceFamily = {
  id: "qx44",
  title: "Quarrow 420 V / 3.5 A high-voltage switching NPN in TO-220",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX44N" } },
  vbeSweepMaxVolts: 2.2,
  gain: [
    { icAmps: 1, vceVolts: 5, quote: "min-typ-max" },
    { icAmps: 2.5, vceVolts: 5, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.6 },
  saturation: [
    { icAmps: 1, forcedGain: 5, quote: "max-typ-vbe" },
    { icAmps: 2.5, forcedGain: 4, quote: "max-typ-vbe" },
  ],
  vceSatMaxFactor: 2.2,
  vbeOn: { icAmps: 1, vceVolts: 5 },
  ft: { icAmps: 0.2, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 0.5, vceVolts: 5 },
  parts: [
    {
      partNumber: "QX44-420",
      polarity: "npn",
      packageName: "TO-220",
      vceoVolts: 420,
      vcboVolts: 650,
      veboVolts: 9,
      icMaxAmps: 3.5,
      thermals: caseRated(70, TO220_FREE_AIR_C_PER_W),
      quotesEarlyVoltage: false,
      datasheetRevisionDate: "2018-03-27",
    },
  ],
};

const qx46150: FamilyPart = {
  partNumber: "QX46-150",
  polarity: "npn",
  packageName: "TO-247",
  vceoVolts: 150,
  vcboVolts: 165,
  veboVolts: 5,
  icMaxAmps: 10,
  thermals: caseRated(115, TO247_FREE_AIR_C_PER_W),
  quotesEarlyVoltage: true,
  datasheetRevisionDate: "2024-10-01",
};

const qx46: DeviceFamily = {
  id: "qx46",
  title: "Quarrow 150 V / 10 A NPN and PNP in TO-247",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX46N" }, pnp: { kind: "model", name: "QX46P" } },
  vbeSweepMaxVolts: 2.5,
  gain: [
    { icAmps: 1, vceVolts: 4, quote: "min-typ-max" },
    { icAmps: 5, vceVolts: 4, quote: "min-typ" },
  ],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.6 },
  saturation: [{ icAmps: 5, forcedGain: 10, quote: "max-typ-vbe" }],
  vceSatMaxFactor: 2.1,
  vbeOn: { icAmps: 5, vceVolts: 4 },
  ft: { icAmps: 1, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 4 },
  parts: [qx46150, variant(qx46150, { partNumber: "QX47-150", polarity: "pnp" })],
};

const qx52: DeviceFamily = {
  id: "qx52",
  title: "Quarrow 170 V / 14 A NPN in TO-3, an older line with gain quoted only at 7 A",
  manufacturer: QUARROW,
  devices: { npn: { kind: "model", name: "QX52N" } },
  vbeSweepMaxVolts: 2.5,
  gain: [{ icAmps: 7, vceVolts: 4, quote: "min-typ" }],
  mainGain: 0,
  hfeSpread: { low: 0.45, high: 1.8 },
  saturation: [{ icAmps: 7, forcedGain: 10, quote: "max" }],
  vceSatMaxFactor: 2.3,
  vbeOn: { icAmps: 7, vceVolts: 4 },
  ft: { icAmps: 0.5, vceVolts: 10 },
  cob: { vcbVolts: 10 },
  early: { icAmps: 1, vceVolts: 4 },
  parts: [
    {
      partNumber: "QX52-170",
      polarity: "npn",
      packageName: "TO-3",
      vceoVolts: 170,
      vcboVolts: 190,
      veboVolts: 5,
      icMaxAmps: 14,
      thermals: caseRated(180, TO3_FREE_AIR_C_PER_W, 200),
      quotesEarlyVoltage: false,
      lifecycle: "last-time-buy",
      datasheetRevisionDate: "2008-10-14",
    },
  ],
};

export const mediumPowerFamilies: DeviceFamily[] = [twg23, twg39, twg24, twg31, qx12, qx18, qx16];
export const powerFamilies: DeviceFamily[] = [vpd614, vpd616, vpd618, vpd612, vpd619, vpd617, vpd631, vpd636, qx40, qx42, qx44, qx46, qx52];
