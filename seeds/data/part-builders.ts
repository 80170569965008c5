// Small constructors that keep the demo catalogue's part literals short and their nullable fields explicit.
import type {
  Configuration,
  GainPoint,
  Lifecycle,
  PartSpec,
  Polarity,
  SaturationPoint,
} from "#app/domain/part.ts";

export type PartThermals = Pick<PartSpec, "ptotWatts" | "ptotReference" | "tjMaxC" | "rthJaCPerW" | "rthJcCPerW">;

/** Ptot quoted with the ambient at 25 °C, as small-signal datasheets do. */
export function rateAtAmbient(ptotWatts: number, tjMaxC: number, rthJaCPerW: number): PartThermals {
  return { ptotWatts, ptotReference: "ambient", tjMaxC, rthJaCPerW, rthJcCPerW: null };
}

/** Ptot quoted with the case held at 25 °C, as power datasheets do; Rth(j-a) is the free-air figure. */
export function rateAtCase(
  ptotWatts: number,
  tjMaxC: number,
  rthJcCPerW: number,
  rthJaCPerW: number | null,
): PartThermals {
  return { ptotWatts, ptotReference: "case", tjMaxC, rthJaCPerW, rthJcCPerW };
}

export interface HfeValues {
  min?: number;
  typ?: number;
  max?: number;
}

export function quoteGain(icAmps: number, vceVolts: number | null, hfe: HfeValues, tempC: number | null = 25): GainPoint {
  return {
    icAmps,
    vceVolts,
    hfeMin: hfe.min ?? null,
    hfeTyp: hfe.typ ?? null,
    hfeMax: hfe.max ?? null,
    tempC,
  };
}

export interface VceSatValues {
  max?: number;
  typ?: number;
}

export function quoteSaturation(
  icAmps: number,
  ibAmps: number | null,
  vceSat: VceSatValues,
  vbeSatVolts: number | null = null,
): SaturationPoint {
  return {
    icAmps,
    ibAmps,
    vceSatMaxVolts: vceSat.max ?? null,
    vceSatTypVolts: vceSat.typ ?? null,
    vbeSatVolts,
  };
}

export interface DemoPartInput {
  manufacturer: string;
  partNumber: string;
  polarity: Polarity;
  packageName: string;
  configuration?: Configuration;
  vceoVolts: number;
  vcboVolts: number | null;
  veboVolts: number | null;
  icMaxAmps: number;
  thermals: PartThermals;
  gainPoints: GainPoint[];
  saturationPoints: SaturationPoint[];
  vbeOnVolts: number | null;
  ftHz: number | null;
  cobFarads: number | null;
  earlyVolts: number | null;
  lifecycle?: Lifecycle;
  datasheetRevisionDate: string | null;
}

/** Where the demo pretends each datasheet lives. */
export function buildDatasheetUrl(manufacturer: string, partNumber: string): string {
  const maker = manufacturer.toLowerCase().replace(/[^a-z0-9]+/g, "-");
  return `https://datasheets.example.com/${maker}/${partNumber.toLowerCase()}.pdf`;
}

export function definePart(input: DemoPartInput): PartSpec {
  const { thermals, configuration, lifecycle, ...rest } = input;
  return {
    ...rest,
    ...thermals,
    configuration: configuration ?? "single",
    lifecycle: lifecycle ?? "active",
    datasheetUrl: buildDatasheetUrl(input.manufacturer, input.partNumber),
  };
}

export type VariantChanges = Partial<Omit<PartSpec, "manufacturer" | "datasheetUrl">> & { partNumber: string };

/** A sibling of `base` (complement, other package, dual) that differs only in `changes`. */
export function deriveVariant(base: PartSpec, changes: VariantChanges): PartSpec {
  return {
    ...base,
    ...changes,
    datasheetUrl: buildDatasheetUrl(base.manufacturer, changes.partNumber),
  };
}
