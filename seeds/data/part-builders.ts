// Small helpers for the demo catalogue's thermal ratings and datasheet links.
import type { PartSpec } from "#app/domain/part.ts";

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

/** Where the demo pretends each datasheet lives. */
export function buildDatasheetUrl(manufacturer: string, partNumber: string): string {
  const maker = manufacturer.toLowerCase().replace(/[^a-z0-9]+/g, "-");
  return `https://datasheets.example.com/${maker}/${partNumber.toLowerCase()}.pdf`;
}
