// Sorts an intake's rows against the catalogue into new, changed and unchanged parts, with each change.
import { partKey, type GainPoint, type PartSpec, type SaturationPoint } from "../part";
import { mergePartSpec } from "./merge";
import type { OfferRow } from "./offer-schema";
import { cellProblem, countRejectedRows, type IntakeProblem, type IntakeRow } from "./problems";

export type ChangeStatus = "new" | "changed" | "unchanged";

export interface FieldChange {
  field: keyof PartSpec;
  before: PartSpec[keyof PartSpec];
  after: PartSpec[keyof PartSpec];
  /** The file's cell was empty, so the value is cleared (or back to its default). */
  cleared?: true;
}

export interface ComparedRow {
  row: number;
  partKey: string;
  value: PartSpec;
  status: ChangeStatus;
  /** Empty unless `changed`; point lists appear sorted by IC. */
  changes: FieldChange[];
}

export interface IntakeCounts {
  new: number;
  changed: number;
  unchanged: number;
  rejected: number;
}

export interface CatalogueComparison {
  rows: ComparedRow[];
  counts: IntakeCounts;
}

const POINT_LISTS = new Set<keyof PartSpec>(["gainPoints", "saturationPoints"]);

/**
 * Classifies accepted rows against the catalogue; `problems` (from the parse) gives the rejected count.
 * With `present` (the file's columns) a row is merged into the catalogue's part first, so absent columns stay.
 */
export function compareWithCatalogue(
  rows: ReadonlyArray<IntakeRow<PartSpec>>,
  existing: ReadonlyMap<string, PartSpec>,
  problems: readonly IntakeProblem[] = [],
  present?: ReadonlySet<string>,
): CatalogueComparison {
  const counts: IntakeCounts = { new: 0, changed: 0, unchanged: 0, rejected: countRejectedRows(problems) };
  const compared = rows.map(({ row, value: incoming, empty }): ComparedRow => {
    const key = partKey(incoming.manufacturer, incoming.partNumber);
    const before = existing.get(key);
    const value = before && present ? mergePartSpec(before, incoming, present) : incoming;
    const changes = before ? markCleared(listPartChanges(before, value), empty) : [];
    const status: ChangeStatus = !before ? "new" : changes.length > 0 ? "changed" : "unchanged";
    counts[status] += 1;
    return { row, partKey: key, value, status, changes };
  });
  return { rows: compared, counts };
}

/** Marks the changes an empty cell made; `empty` lists the fields whose cells were empty in the row. */
export function markCleared<C extends { field: string }>(changes: C[], empty: readonly string[] | undefined): Array<C & { cleared?: true }> {
  if (!empty || empty.length === 0) return changes;
  return changes.map((change) => (empty.includes(change.field) ? { ...change, cleared: true as const } : change));
}

/** Every field that differs; gain and saturation points are compared as whole lists, in IC order. */
export function listPartChanges(before: PartSpec, after: PartSpec): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of Object.keys(after) as Array<keyof PartSpec>) {
    if (POINT_LISTS.has(field)) {
      const sortedBefore = sortPoints(before[field] as Array<GainPoint | SaturationPoint>);
      const sortedAfter = sortPoints(after[field] as Array<GainPoint | SaturationPoint>);
      if (!samePoints(sortedBefore, sortedAfter)) changes.push({ field, before: sortedBefore as PartSpec[keyof PartSpec], after: sortedAfter as PartSpec[keyof PartSpec] });
    } else if (!Object.is(before[field] ?? null, after[field] ?? null)) {
      changes.push({ field, before: before[field], after: after[field] });
    }
  }
  return changes;
}

function sortPoints<P extends GainPoint | SaturationPoint>(points: readonly P[]): P[] {
  return [...points].sort((a, b) => a.icAmps - b.icAmps || pointText(a).localeCompare(pointText(b)));
}

function pointText(point: GainPoint | SaturationPoint): string {
  return JSON.stringify(point, Object.keys(point).sort());
}

function samePoints(a: ReadonlyArray<GainPoint | SaturationPoint>, b: ReadonlyArray<GainPoint | SaturationPoint>): boolean {
  return a.length === b.length && a.every((point, i) => pointText(point) === pointText(b[i]));
}

/** Problems for offer rows that name a part the catalogue does not have. */
export function matchOffersToParts(offerRows: ReadonlyArray<IntakeRow<OfferRow>>, knownPartKeys: ReadonlySet<string>): IntakeProblem[] {
  return offerRows
    .filter(({ value }) => !knownPartKeys.has(partKey(value.manufacturer, value.partNumber)))
    .map(({ row, value }) =>
      cellProblem(
        row,
        "part_number",
        value.partNumber,
        `no part "${value.partNumber}" by "${value.manufacturer}" in the catalogue: import the part with a parts file first`,
      ),
    );
}
