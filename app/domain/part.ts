// The catalogue's view of one orderable device, as the engine reads it.
// Every number carries its unit in its name; electrical values are SI base units
// (volts, amperes, watts, hertz, farads, ohms), temperatures are degrees Celsius.
import { identityKey } from "./intake/identity";

export const POLARITIES = ["npn", "pnp"] as const;
export type Polarity = (typeof POLARITIES)[number];

export const CONFIGURATIONS = ["single", "darlington", "dual"] as const;
export type Configuration = (typeof CONFIGURATIONS)[number];

export const LIFECYCLES = ["active", "nrnd", "last-time-buy", "obsolete"] as const;
export type Lifecycle = (typeof LIFECYCLES)[number];

export const LIFECYCLE_LABELS: Record<Lifecycle, string> = {
  active: "active",
  nrnd: "not recommended for new designs",
  "last-time-buy": "last-time buy",
  obsolete: "obsolete",
};

/** Whether Ptot at 25 °C is quoted with the ambient or the case held at 25 °C. */
export const PTOT_REFERENCES = ["ambient", "case"] as const;
export type PtotReference = (typeof PTOT_REFERENCES)[number];

/** hFE quoted by the datasheet at one collector current. At least one of min/typ/max is set. */
export interface GainPoint {
  icAmps: number;
  vceVolts: number | null;
  hfeMin: number | null;
  hfeTyp: number | null;
  hfeMax: number | null;
  tempC: number | null;
}

/** VCE(sat) quoted at one collector current and the base current that forces it. */
export interface SaturationPoint {
  icAmps: number;
  ibAmps: number | null;
  vceSatMaxVolts: number | null;
  vceSatTypVolts: number | null;
  vbeSatVolts: number | null;
}

export interface PartSpec {
  manufacturer: string;
  partNumber: string;
  polarity: Polarity;
  packageName: string;
  configuration: Configuration;
  vceoVolts: number;
  vcboVolts: number | null;
  veboVolts: number | null;
  icMaxAmps: number;
  ptotWatts: number | null;
  ptotReference: PtotReference | null;
  tjMaxC: number | null;
  rthJaCPerW: number | null;
  rthJcCPerW: number | null;
  gainPoints: GainPoint[];
  saturationPoints: SaturationPoint[];
  vbeOnVolts: number | null;
  ftHz: number | null;
  cobFarads: number | null;
  earlyVolts: number | null;
  lifecycle: Lifecycle;
  datasheetUrl: string | null;
  /** ISO date (YYYY-MM-DD) of the datasheet revision the values came from. */
  datasheetRevisionDate: string | null;
}

/** A part as stored: the spec plus its catalogue identity. */
export interface CataloguePart extends PartSpec {
  id: string;
}

export interface PriceBreak {
  quantity: number;
  unitPrice: number;
}

/** One supplier's offer for a part. Prices are in `currency` per unit. */
export interface Offer {
  supplier: string;
  supplierSku: string | null;
  stock: number;
  minimumOrder: number;
  orderMultiple: number;
  priceBreaks: PriceBreak[];
  currency: string;
  leadTimeDays: number | null;
  /** ISO date the stock and prices were read. */
  asOf: string;
}

/** Identity rule for parts: manufacturer + part number, compared as look-alike names (intake/identity.ts). */
export function partKey(manufacturer: string, partNumber: string): string {
  return `${identityKey(manufacturer)}\u0000${identityKey(partNumber)}`;
}
