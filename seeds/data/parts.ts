// The invented demo catalogue: every part fictional, from the manufacturers in manufacturers.ts, generated from the
// invented device families in seeds/device-families/ by seeds/generate-demo-catalogue.ts.
import { type PartSpec, partKey } from "#app/domain/part.ts";
import { generatedParts } from "./generated-parts.ts";
import { demoManufacturers } from "./manufacturers.ts";

export const demoParts: PartSpec[] = generatedParts;

export interface ComplementaryPair {
  npn: PartSpec;
  pnp: PartSpec;
}

/** NPN parts whose PNP complement (by the manufacturer's numbering) is in the catalogue too. */
export function listComplementaryPairs(parts: PartSpec[]): ComplementaryPair[] {
  const byKey = new Map(parts.map((part) => [partKey(part.manufacturer, part.partNumber), part]));
  return parts.flatMap((npn) => {
    const maker = demoManufacturers.find((candidate) => candidate.name === npn.manufacturer);
    if (npn.polarity !== "npn" || !maker) return [];
    const pnp = byKey.get(partKey(npn.manufacturer, maker.nameComplement(npn.partNumber)));
    return pnp && pnp.polarity === "pnp" ? [{ npn, pnp }] : [];
  });
}

export const demoComplementaryPairs: ComplementaryPair[] = listComplementaryPairs(demoParts);
