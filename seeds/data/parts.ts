// The invented demo catalogue: every part below is fictional, from the manufacturers in manufacturers.ts.
import { type PartSpec, partKey } from "#app/domain/part.ts";
import { demoManufacturers } from "./manufacturers.ts";
import { darlingtonParts } from "./parts-darlington.ts";
import { dualParts, highGainParts } from "./parts-high-gain.ts";
import { mediumPowerParts } from "./parts-medium-power.ts";
import { powerParts } from "./parts-power.ts";
import { smallSignalParts } from "./parts-small-signal.ts";

export const demoParts: PartSpec[] = [
  ...smallSignalParts,
  ...highGainParts,
  ...dualParts,
  ...mediumPowerParts,
  ...powerParts,
  ...darlingtonParts,
];

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
