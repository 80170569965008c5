// Complementary NPN/PNP pairs for push-pull stages, matched on worst-case gain at the operating current.
import { worstCaseGain } from "./gain-curve";
import type { PartSpec } from "./part";

/** Gains within 20% of each other count as matched (common practice for an unadjusted output stage). */
export const DEFAULT_MATCH_TOLERANCE = 0.2;

export interface PushPullMatch<P extends PartSpec = PartSpec> {
  npn: P;
  pnp: P;
  npnHfe: number;
  pnpHfe: number;
  /** Gain mismatch: the larger hFE over the smaller, less 1 (0 is a perfect match). */
  mismatch: number;
}

export interface PushPullOptions {
  tolerance?: number;
  /** Keep only the best `limit` matches. */
  limit?: number;
}

/** Mismatch between two gains: max / min − 1, symmetric in its arguments. */
export function gainMismatch(a: number, b: number): number {
  return Math.max(a, b) / Math.min(a, b) - 1;
}

function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function compareMatches(a: PushPullMatch, b: PushPullMatch): number {
  return (
    a.mismatch - b.mismatch ||
    compareText(a.npn.manufacturer, b.npn.manufacturer) ||
    compareText(a.npn.partNumber, b.npn.partNumber) ||
    compareText(a.pnp.manufacturer, b.pnp.manufacturer) ||
    compareText(a.pnp.partNumber, b.pnp.partNumber)
  );
}

/**
 * Every NPN/PNP pair whose worst-case hFE at `icAmps` agree within the tolerance, closest first.
 * PNPs are sorted by gain once, so each NPN scans only the window of gains that can match.
 */
export function matchPushPull<P extends PartSpec>(parts: readonly P[], icAmps: number, options: PushPullOptions = {}): PushPullMatch<P>[] {
  const tolerance = options.tolerance ?? DEFAULT_MATCH_TOLERANCE;
  if (!(tolerance >= 0)) throw new RangeError(`tolerance must not be negative, got ${tolerance}`);
  const withGain = parts
    .map((part) => ({ part, hfe: worstCaseGain(part.gainPoints, icAmps).hfe }))
    .filter((entry) => entry.hfe > 0);
  const pnps = withGain.filter((entry) => entry.part.polarity === "pnp").sort((a, b) => a.hfe - b.hfe);
  const matches: PushPullMatch<P>[] = [];
  for (const npn of withGain) {
    if (npn.part.polarity !== "npn") continue;
    const low = npn.hfe / (1 + tolerance);
    const high = npn.hfe * (1 + tolerance);
    for (let i = lowerBound(pnps, low); i < pnps.length && pnps[i].hfe <= high; i += 1) {
      const pnp = pnps[i];
      const mismatch = gainMismatch(npn.hfe, pnp.hfe);
      if (mismatch <= tolerance) matches.push({ npn: npn.part, pnp: pnp.part, npnHfe: npn.hfe, pnpHfe: pnp.hfe, mismatch });
    }
  }
  matches.sort(compareMatches);
  return options.limit === undefined ? matches : matches.slice(0, options.limit);
}

function lowerBound(sorted: readonly { hfe: number }[], value: number): number {
  let low = 0;
  let high = sorted.length;
  while (low < high) {
    const mid = (low + high) >> 1;
    if (sorted[mid].hfe < value) low = mid + 1;
    else high = mid;
  }
  return low;
}
