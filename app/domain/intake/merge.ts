// A re-import changes only what the file speaks about: a column absent from the file leaves its value as the
// catalogue has it; an empty cell in a present column clears it (and the preview says so).
import type { GainPoint, Offer, PartSpec, SaturationPoint } from "../part";

type Point = GainPoint | SaturationPoint;
type Values = Record<string, unknown>;

const POINT_LISTS = ["gainPoints", "saturationPoints"] as const;

/**
 * The part as the catalogue would hold it after this row: fields the file has no column for come from `existing`.
 * A point list present in the file replaces the catalogue's; a point field the file lacks (say `gainN_temp`) is taken
 * from the catalogue's point at the same IC.
 */
export function mergePartSpec(existing: PartSpec, incoming: PartSpec, present: ReadonlySet<string>): PartSpec {
  const merged = { ...incoming } as unknown as Values;
  const before = existing as unknown as Values;
  for (const field of Object.keys(incoming)) {
    if ((POINT_LISTS as readonly string[]).includes(field)) continue;
    if (!present.has(field)) merged[field] = before[field];
  }
  for (const list of POINT_LISTS) {
    if (!present.has(list)) {
      merged[list] = existing[list];
      continue;
    }
    merged[list] = (incoming[list] as Point[]).map((point) => fillPoint(point, existing[list] as Point[], list, present));
  }
  return merged as unknown as PartSpec;
}

function fillPoint(point: Point, existing: readonly Point[], list: string, present: ReadonlySet<string>): Point {
  const match = existing.find((p) => p.icAmps === point.icAmps) as Values | undefined;
  if (!match) return point;
  const filled = { ...point } as unknown as Values;
  for (const field of Object.keys(point)) if (!present.has(`${list}.${field}`)) filled[field] = match[field];
  return filled as unknown as Point;
}

/** The offer after this row: fields the file has no column for stay as the catalogue's offer has them. */
export function mergeOffer(existing: Offer, incoming: Offer, present: ReadonlySet<string>): Offer {
  const merged = { ...incoming } as unknown as Values;
  const before = existing as unknown as Values;
  for (const field of Object.keys(incoming)) if (!present.has(field)) merged[field] = before[field];
  return merged as unknown as Offer;
}
