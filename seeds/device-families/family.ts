// How a demo device family is described: its invented models, the conditions its datasheet quotes, and its parts.
// The numbers a datasheet reads off the silicon (hFE, VBE, VCE(sat), fT, Cob, Early voltage) are not written here:
// seeds/generate-demo-catalogue.ts simulates them from the family's models. Everything here is chosen.
import type { Configuration, Lifecycle, Polarity } from "#app/domain/part.ts";
import { type PartThermals, rateAtAmbient, rateAtCase } from "#seeds/data/part-builders.ts";

/** Which of hFE min, typ and max a datasheet prints at one gain point. */
export type GainQuote = "min-typ-max" | "min-typ" | "min-max" | "typ" | "min";

/** Which of VCE(sat) max and typ a datasheet prints, and whether it gives VBE(sat) too. */
export type SaturationQuote = "max-typ-vbe" | "max-vbe" | "max";

export interface GainCondition {
  icAmps: number;
  vceVolts: number;
  quote: GainQuote;
}

/** VCE(sat) and VBE(sat) at IC with the base overdriven to IC / IB = forcedGain. */
export interface SaturationCondition {
  icAmps: number;
  forcedGain: number;
  quote: SaturationQuote;
}

/** A model card (`.model`) or, for a Darlington in one package, a subcircuit (`.subckt name c b e`). */
export interface DeviceRef {
  kind: "model" | "subckt";
  name: string;
}

export interface FamilyPart {
  partNumber: string;
  polarity: Polarity;
  packageName: string;
  configuration?: Configuration;
  vceoVolts: number;
  vcboVolts: number;
  veboVolts: number;
  icMaxAmps: number;
  thermals: PartThermals;
  /** Gain group (a key of the family's gainGroups); none for an ungrouped part. */
  group?: string;
  /** Indices into the family's gain conditions that this part's datasheet quotes (all when absent). */
  gainPoints?: number[];
  /** Replaces the family's quote at every point (e.g. "typ" for a datasheet that gives typical gain only). */
  gainQuote?: GainQuote;
  /** Indices into the family's saturation conditions (all when absent; [] for none). */
  saturationPoints?: number[];
  /** Whether the catalogue row carries the Early voltage read from the model. */
  quotesEarlyVoltage: boolean;
  /** An old datasheet without Cob. */
  omitsCob?: boolean;
  /** A part the catalogue does not hold yet: it arrives in the messy librarian file (fixtures/demo/parts-messy.csv). */
  onlyInMessyIntake?: boolean;
  /** An old datasheet that does not say at what temperature its gain was measured. */
  gainTemperatureUnstated?: boolean;
  lifecycle?: Lifecycle;
  datasheetRevisionDate: string | null;
}

export interface DeviceFamily {
  /** Short identifier, also the model library's file name without .lib. */
  id: string;
  /** One line on what the family is for, for readers of the generated data. */
  title: string;
  manufacturer: string;
  devices: Partial<Record<Polarity, DeviceRef>>;
  /** Highest |VBE| the gain sweep reaches; enough to pass the family's highest quoted current. */
  vbeSweepMaxVolts: number;
  /** The gain table of the datasheet, lowest current first. */
  gain: GainCondition[];
  /** Index of the gain condition at which min and max (or the gain groups) are defined. */
  mainGain: number;
  /** Production spread of hFE around the typical device at the main condition: min = typ × low, max = typ × high. */
  hfeSpread: { low: number; high: number };
  /** Gain groups: hFE min and max at the main condition, our own boundaries. */
  gainGroups?: Record<string, [min: number, max: number]>;
  saturation: SaturationCondition[];
  /** VCE(sat) max = simulated typical × this factor (the production spread of the saturation voltage). */
  vceSatMaxFactor: number;
  vbeOn: { icAmps: number; vceVolts: number };
  /** fT: where the small-signal |h21e| of the device biased here falls to 1. */
  ft: { icAmps: number; vceVolts: number };
  /** Cob at 1 MHz with the emitter open. */
  cob: { vcbVolts: number };
  /** Early voltage read from the output slope at this point (VCE and VCE + 1 V at the same VBE). */
  early: { icAmps: number; vceVolts: number };
  parts: FamilyPart[];
}

/** Three significant digits, as datasheets print thermal resistances. */
const threeDigits = (value: number) => Number(value.toPrecision(3));

/** Ptot with the ambient at 25 °C; Rth(j-a) follows from the linear derating, (Tj max − 25 °C) / Ptot. */
export function ambientRated(ptotWatts: number, tjMaxC = 150): PartThermals {
  return rateAtAmbient(ptotWatts, tjMaxC, threeDigits((tjMaxC - 25) / ptotWatts));
}

/** Ptot with the case at 25 °C; Rth(j-c) follows from the derating, Rth(j-a) is the package's free-air figure. */
export function caseRated(ptotWatts: number, freeAirCPerW: number, tjMaxC = 150): PartThermals {
  return rateAtCase(ptotWatts, tjMaxC, threeDigits((tjMaxC - 25) / ptotWatts), freeAirCPerW);
}
