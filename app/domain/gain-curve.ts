// hFE and VCE(sat) at any collector current from the few points a datasheet quotes.
import type { FlagName } from "./check-result";
import type { GainPoint, SaturationPoint } from "./part";

export type GainCorner = "min" | "typ" | "max";

/** Worst-case hFE taken as typ × 0.5 when no minimum is quoted (common practice: spreads run about 2:1 either side of typ). */
export const DEFAULT_TYP_TO_MIN_FACTOR = 0.5;
/** Gain is trusted up to half a decade of IC beyond the quoted points (a product decision). */
export const DEFAULT_GAIN_WINDOW_DECADES = 0.5;
/** Gain points within this many kelvin of 25 °C count as room-temperature points. */
const ROOM_TEMP_TOLERANCE_K = 5;

interface CurvePoint {
  icAmps: number;
  hfe: number;
}

function pickCorner(point: GainPoint, corner: GainCorner): number | null {
  if (corner === "min") return point.hfeMin;
  if (corner === "typ") return point.hfeTyp;
  return point.hfeMax;
}

/** Room-temperature points when any exist (datasheets quote extra temperatures separately), else all. */
function roomTemperaturePoints(points: GainPoint[]): GainPoint[] {
  const room = points.filter((p) => p.tempC == null || Math.abs(p.tempC - 25) <= ROOM_TEMP_TOLERANCE_K);
  return room.length > 0 ? room : points;
}

/** The points of one corner sorted by IC; at a repeated IC the lower gain (the higher for max) wins. */
function curveOf(points: GainPoint[], corner: GainCorner): CurvePoint[] {
  const byIc = new Map<number, number>();
  for (const point of roomTemperaturePoints(points)) {
    const hfe = pickCorner(point, corner);
    if (hfe == null || !(hfe > 0) || !(point.icAmps > 0)) continue;
    const seen = byIc.get(point.icAmps);
    if (seen == null) byIc.set(point.icAmps, hfe);
    else byIc.set(point.icAmps, corner === "max" ? Math.max(seen, hfe) : Math.min(seen, hfe));
  }
  return [...byIc.entries()].map(([icAmps, hfe]) => ({ icAmps, hfe })).sort((a, b) => a.icAmps - b.icAmps);
}

/** Interpolates linearly in log(x) and log(y) between sorted points, holding the end values beyond them. */
function interpolateLogLog(curve: CurvePoint[], icAmps: number): number {
  const first = curve[0];
  const last = curve[curve.length - 1];
  if (icAmps <= first.icAmps) return first.hfe;
  if (icAmps >= last.icAmps) return last.hfe;
  let upper = 1;
  while (curve[upper].icAmps < icAmps) upper += 1;
  const a = curve[upper - 1];
  const b = curve[upper];
  if (b.icAmps === icAmps) return b.hfe;
  const t = Math.log(icAmps / a.icAmps) / Math.log(b.icAmps / a.icAmps);
  return Math.exp(Math.log(a.hfe) + t * Math.log(b.hfe / a.hfe));
}

/** hFE of one corner at IC; null when no gain point quotes that corner. */
export function hfeAt(points: GainPoint[], icAmps: number, corner: GainCorner): number | null {
  const curve = curveOf(points, corner);
  if (curve.length === 0) return null;
  return interpolateLogLog(curve, icAmps);
}

/** How many decades of IC the operating current lies outside the quoted range (0 inside it). */
export function decadesOutside(quotedIcAmps: number[], icAmps: number): number {
  if (quotedIcAmps.length === 0) return Number.POSITIVE_INFINITY;
  const low = Math.min(...quotedIcAmps);
  const high = Math.max(...quotedIcAmps);
  if (icAmps < low) return Math.log10(low / icAmps);
  if (icAmps > high) return Math.log10(icAmps / high);
  return 0;
}

export interface GainEstimate {
  hfe: number;
  /** "min" from quoted minimums; "typ-derated" and "max-derated" scaled by typToMinFactor; "none" when no gain is quoted (hfe 0). */
  source: "min" | "typ-derated" | "max-derated" | "none";
  typToMinFactor: number | null;
  flags: FlagName[];
  decadesOffPoint: number;
  note: string;
}

export interface WorstCaseGainOptions {
  typToMinFactor?: number;
  windowDecades?: number;
}

/** The worst-case hFE at IC: from hFE min, else typ (or max) scaled by a stated factor, with the flags that apply. */
export function worstCaseGain(points: GainPoint[], icAmps: number, options: WorstCaseGainOptions = {}): GainEstimate {
  const factor = options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  const windowDecades = options.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES;
  const corners: { corner: GainCorner; source: GainEstimate["source"]; scale: number }[] = [
    { corner: "min", source: "min", scale: 1 },
    { corner: "typ", source: "typ-derated", scale: factor },
    // A max-only quote is a gain group's ceiling; the spread below it is taken as twice the typ spread (common practice).
    { corner: "max", source: "max-derated", scale: factor * factor },
  ];
  for (const { corner, source, scale } of corners) {
    const curve = curveOf(points, corner);
    if (curve.length === 0) continue;
    const decadesOffPoint = decadesOutside(
      curve.map((p) => p.icAmps),
      icAmps,
    );
    const flags: FlagName[] = [];
    if (source !== "min") flags.push("no-min-gain");
    if (decadesOffPoint > windowDecades) flags.push("gain-off-point");
    const hfe = interpolateLogLog(curve, icAmps) * scale;
    const basis = source === "min" ? "hFE min" : `hFE ${corner} × ${scale}, no minimum quoted`;
    const where =
      decadesOffPoint > 0
        ? `, held from the nearest quoted point ${decadesOffPoint.toFixed(2)} decades away`
        : ", interpolated between quoted points";
    return {
      hfe,
      source,
      typToMinFactor: source === "min" ? null : scale,
      flags,
      decadesOffPoint,
      note: `${basis}${where}`,
    };
  }
  return {
    hfe: 0,
    source: "none",
    typToMinFactor: null,
    flags: ["no-min-gain", "gain-off-point"],
    decadesOffPoint: Number.POSITIVE_INFINITY,
    note: "no gain quoted",
  };
}

export interface SaturationEstimate {
  volts: number;
  /** IC / IB of the datasheet point nearest the operating current; null when IB is not quoted. */
  forcedGain: number | null;
  /** True when IC lies above the highest quoted point and VCE(sat) was scaled up with IC. */
  extrapolated: boolean;
  source: "max" | "typ";
}

/** VCE(sat) at IC from the saturation points (max values, else typ): log-log between points, held flat below, scaled with IC above. */
export function vceSatAt(points: SaturationPoint[], icAmps: number): SaturationEstimate | null {
  for (const source of ["max", "typ"] as const) {
    const usable = points
      .map((p) => ({ point: p, volts: source === "max" ? p.vceSatMaxVolts : p.vceSatTypVolts }))
      .filter((entry): entry is { point: SaturationPoint; volts: number } => entry.volts != null && entry.volts > 0 && entry.point.icAmps > 0)
      .sort((a, b) => a.point.icAmps - b.point.icAmps);
    if (usable.length === 0) continue;
    const curve = usable.map((entry) => ({ icAmps: entry.point.icAmps, hfe: entry.volts }));
    const last = usable[usable.length - 1];
    const nearest = usable.reduce((best, entry) =>
      Math.abs(Math.log(entry.point.icAmps / icAmps)) < Math.abs(Math.log(best.point.icAmps / icAmps)) ? entry : best,
    );
    const forcedGain = nearest.point.ibAmps != null && nearest.point.ibAmps > 0 ? nearest.point.icAmps / nearest.point.ibAmps : null;
    if (icAmps > last.point.icAmps) {
      // Above the quoted range the drop is taken as resistive, rising in proportion to IC (common practice, pessimistic).
      return { volts: last.volts * (icAmps / last.point.icAmps), forcedGain, extrapolated: true, source };
    }
    return { volts: interpolateLogLog(curve, icAmps), forcedGain, extrapolated: false, source };
  }
  return null;
}
