// Data-quality findings on a part's datasheet values, independent of any requirement sheet.
import type { PartSpec } from "./part";

export const DATA_QUALITY_FLAGS = ["no-min-gain", "early-unknown", "single-gain-point", "stale-datasheet"] as const;
export type DataQualityFlag = (typeof DATA_QUALITY_FLAGS)[number];

/** A datasheet revision older than this many years is called stale (a product decision). */
export const DEFAULT_STALE_AFTER_YEARS = 10;

export interface DataQualityOptions {
  /** ISO date (YYYY-MM-DD) to judge staleness against; without it staleness is not judged. */
  todayIso?: string | null;
  staleAfterYears?: number;
}

export interface DataQuality {
  flags: DataQualityFlag[];
  /** 1 for a complete record, lowered a quarter for each finding, never below 0. */
  score: number;
}

/** Flags what the datasheet leaves out: hFE min, Early voltage, a second gain current, a recent revision. */
export function assessDataQuality(part: PartSpec, options: DataQualityOptions = {}): DataQuality {
  const flags: DataQualityFlag[] = [];
  if (!part.gainPoints.some((point) => point.hfeMin != null)) flags.push("no-min-gain");
  if (part.earlyVolts == null) flags.push("early-unknown");
  if (new Set(part.gainPoints.map((point) => point.icAmps)).size < 2) flags.push("single-gain-point");
  if (isStale(part.datasheetRevisionDate, options)) flags.push("stale-datasheet");
  return { flags, score: Math.max(0, 1 - flags.length / 4) };
}

/** True when the revision date lies more than the allowed years before today; an unknown revision counts as stale. */
export function isStale(revisionIso: string | null, options: DataQualityOptions): boolean {
  if (options.todayIso == null) return false;
  if (revisionIso == null) return true;
  const today = Date.parse(options.todayIso);
  const revision = Date.parse(revisionIso);
  if (Number.isNaN(today) || Number.isNaN(revision)) return true;
  const years = options.staleAfterYears ?? DEFAULT_STALE_AFTER_YEARS;
  const limit = new Date(today);
  limit.setUTCFullYear(limit.getUTCFullYear() - years);
  return revision < limit.getTime();
}
