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

/**
 * A curve sorted by IC with the logarithms its interpolation needs worked out once: the same
 * arithmetic as before (log of a ratio, then exp), so every value stays bit for bit.
 */
export interface PreparedCurve {
  icAmps: number[];
  values: number[];
  /** log(values[i]). */
  logValues: number[];
  /** log(icAmps[i + 1] / icAmps[i]) and log(values[i + 1] / values[i]) for the segment after point i. */
  segmentLogIc: number[];
  segmentLogValue: number[];
}

function prepareCurve(curve: readonly CurvePoint[]): PreparedCurve {
  const prepared: PreparedCurve = { icAmps: [], values: [], logValues: [], segmentLogIc: [], segmentLogValue: [] };
  for (let i = 0; i < curve.length; i += 1) {
    prepared.icAmps.push(curve[i].icAmps);
    prepared.values.push(curve[i].hfe);
    prepared.logValues.push(Math.log(curve[i].hfe));
    if (i + 1 < curve.length) {
      prepared.segmentLogIc.push(Math.log(curve[i + 1].icAmps / curve[i].icAmps));
      prepared.segmentLogValue.push(Math.log(curve[i + 1].hfe / curve[i].hfe));
    }
  }
  return prepared;
}

/** Interpolates linearly in log(x) and log(y) between sorted points, holding the end values beyond them. */
export function interpolateLogLog(curve: PreparedCurve, icAmps: number): number {
  const ic = curve.icAmps;
  const last = ic.length - 1;
  if (icAmps <= ic[0]) return curve.values[0];
  if (icAmps >= ic[last]) return curve.values[last];
  let upper = 1;
  while (ic[upper] < icAmps) upper += 1;
  if (ic[upper] === icAmps) return curve.values[upper];
  const lower = upper - 1;
  const t = Math.log(icAmps / ic[lower]) / curve.segmentLogIc[lower];
  return Math.exp(curve.logValues[lower] + t * curve.segmentLogValue[lower]);
}

/** The corner the worst case reads (the first of min, typ, max quoted) and its curve; both null when no gain is quoted. */
export interface WorstGain {
  worstCorner: GainCorner | null;
  worstCurve: PreparedCurve | null;
}

/** The min, typ and max curves of a gain-point list, and the corner the worst case reads. */
export interface PreparedGain extends WorstGain {
  min: PreparedCurve | null;
  typ: PreparedCurve | null;
  max: PreparedCurve | null;
}

// Gain-point lists are values, never changed once read, so their prepared curves are kept with them.
const preparedGains = new WeakMap<readonly GainPoint[], PreparedGain>();

/** The prepared curves of a gain-point list, built once per list. */
export function prepareGain(points: readonly GainPoint[]): PreparedGain {
  const known = preparedGains.get(points);
  if (known !== undefined) return known;
  const prepared = buildPreparedGain(points);
  preparedGains.set(points, prepared);
  return prepared;
}

/**
 * The prepared curves without the cache: a catalogue keeps its own, because a weak map holding
 * one entry per part of a large catalogue slows every garbage collection that follows.
 */
export function buildPreparedGain(points: readonly GainPoint[]): PreparedGain {
  const of = (corner: GainCorner) => {
    const curve = curveOf(points as GainPoint[], corner);
    return curve.length === 0 ? null : prepareCurve(curve);
  };
  const prepared: PreparedGain = { min: of("min"), typ: of("typ"), max: of("max"), worstCorner: null, worstCurve: null };
  prepared.worstCorner = prepared.min ? "min" : prepared.typ ? "typ" : prepared.max ? "max" : null;
  prepared.worstCurve = prepared.min ?? prepared.typ ?? prepared.max;
  return prepared;
}

/** Only the worst-case corner's curve, the one ranking reads: a third of the work and memory of buildPreparedGain. */
export function buildWorstGain(points: readonly GainPoint[]): WorstGain {
  for (const corner of ["min", "typ", "max"] as const) {
    const curve = curveOf(points as GainPoint[], corner);
    if (curve.length > 0) return { worstCorner: corner, worstCurve: prepareCurve(curve) };
  }
  return { worstCorner: null, worstCurve: null };
}

/** hFE of one corner at IC; null when no gain point quotes that corner. */
export function hfeAt(points: GainPoint[], icAmps: number, corner: GainCorner): number | null {
  const curve = prepareGain(points)[corner];
  return curve === null ? null : interpolateLogLog(curve, icAmps);
}

/** How many decades of IC the operating current lies outside the quoted range (0 inside it). */
export function decadesOutside(quotedIcAmps: number[], icAmps: number): number {
  if (quotedIcAmps.length === 0) return Number.POSITIVE_INFINITY;
  return decadesBeyond(Math.min(...quotedIcAmps), Math.max(...quotedIcAmps), icAmps);
}

function decadesBeyond(low: number, high: number, icAmps: number): number {
  if (icAmps < low) return Math.log10(low / icAmps);
  if (icAmps > high) return Math.log10(icAmps / high);
  return 0;
}

export type GainSource = "min" | "typ-derated" | "max-derated" | "none";

/** worstCaseGain's numbers without its note; flags are shared read-only lists, so reading allocates nothing. */
export interface GainReading {
  hfe: number;
  /** "min" from quoted minimums; "typ-derated" and "max-derated" scaled by typToMinFactor; "none" when no gain is quoted (hfe 0). */
  source: GainSource;
  typToMinFactor: number | null;
  flags: readonly FlagName[];
  decadesOffPoint: number;
}

export interface GainEstimate extends GainReading {
  flags: FlagName[];
  note: string;
}

export interface WorstCaseGainOptions {
  typToMinFactor?: number;
  windowDecades?: number;
}

const NO_GAIN_FLAGS: readonly FlagName[] = Object.freeze([]);
const NO_MIN_FLAGS: readonly FlagName[] = Object.freeze(["no-min-gain"] as FlagName[]);
const OFF_POINT_FLAGS: readonly FlagName[] = Object.freeze(["gain-off-point"] as FlagName[]);
const BOTH_GAIN_FLAGS: readonly FlagName[] = Object.freeze(["no-min-gain", "gain-off-point"] as FlagName[]);

export function newGainReading(): GainReading {
  return { hfe: 0, source: "none", typToMinFactor: null, flags: NO_GAIN_FLAGS, decadesOffPoint: 0 };
}

/** The worst-case hFE at IC: from hFE min, else typ (or max) scaled by a stated factor, with the flags that apply. */
export function readWorstCaseGain(prepared: WorstGain, icAmps: number, factor: number, windowDecades: number, out: GainReading): GainReading {
  const corner = prepared.worstCorner;
  const curve = prepared.worstCurve;
  if (corner === null || curve === null) {
    out.hfe = 0;
    out.source = "none";
    out.typToMinFactor = null;
    out.flags = BOTH_GAIN_FLAGS;
    out.decadesOffPoint = Number.POSITIVE_INFINITY;
    return out;
  }
  // A max-only quote is a gain group's ceiling; the spread below it is taken as twice the typ spread (common practice).
  const scale = corner === "min" ? 1 : corner === "typ" ? factor : factor * factor;
  const decadesOffPoint = decadesBeyond(curve.icAmps[0], curve.icAmps[curve.icAmps.length - 1], icAmps);
  const offPoint = decadesOffPoint > windowDecades;
  out.hfe = interpolateLogLog(curve, icAmps) * scale;
  out.source = corner === "min" ? "min" : corner === "typ" ? "typ-derated" : "max-derated";
  out.typToMinFactor = corner === "min" ? null : scale;
  out.flags = corner === "min" ? (offPoint ? OFF_POINT_FLAGS : NO_GAIN_FLAGS) : offPoint ? BOTH_GAIN_FLAGS : NO_MIN_FLAGS;
  out.decadesOffPoint = decadesOffPoint;
  return out;
}

/** A reading with its note, the sentence the gain check quotes. */
export function explainGainReading(reading: GainReading): GainEstimate {
  if (reading.source === "none") return { ...reading, flags: [...reading.flags], note: "no gain quoted" };
  const corner = reading.source === "typ-derated" ? "typ" : "max";
  const basis = reading.source === "min" ? "hFE min" : `hFE ${corner} × ${reading.typToMinFactor}, no minimum quoted`;
  const where =
    reading.decadesOffPoint > 0
      ? `, held from the nearest quoted point ${reading.decadesOffPoint.toFixed(2)} decades away`
      : ", interpolated between quoted points";
  return { ...reading, flags: [...reading.flags], note: `${basis}${where}` };
}

export function worstCaseGain(points: GainPoint[], icAmps: number, options: WorstCaseGainOptions = {}): GainEstimate {
  const factor = options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  const windowDecades = options.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES;
  return explainGainReading(readWorstCaseGain(prepareGain(points), icAmps, factor, windowDecades, newGainReading()));
}

export interface SaturationEstimate {
  volts: number;
  /** IC / IB of the datasheet point nearest the operating current; null when IB is not quoted. */
  forcedGain: number | null;
  /** True when IC lies above the highest quoted point and VCE(sat) was scaled up with IC. */
  extrapolated: boolean;
  source: "max" | "typ";
}

/** How far apart two currents lie on a log scale, as the ratio ≥ 1 (it orders like |log(a / b)| without a logarithm). */
export function ratioDistance(a: number, b: number): number {
  return a >= b ? a / b : b / a;
}

/** The saturation points of the first source quoted (max, else typ), sorted by IC, ready to read. */
export interface PreparedSaturation {
  source: "max" | "typ";
  curve: PreparedCurve;
  /** IC / IB of each point; null when IB is not quoted. */
  forcedGains: (number | null)[];
}

const preparedSaturations = new WeakMap<readonly SaturationPoint[], PreparedSaturation | null>();

/** The prepared saturation curve of a point list, built once per list; null when no VCE(sat) is quoted. */
export function prepareSaturation(points: readonly SaturationPoint[]): PreparedSaturation | null {
  const known = preparedSaturations.get(points);
  if (known !== undefined) return known;
  const prepared = buildPreparedSaturation(points);
  preparedSaturations.set(points, prepared);
  return prepared;
}

/** The prepared saturation curve without the cache, as buildPreparedGain. */
export function buildPreparedSaturation(points: readonly SaturationPoint[]): PreparedSaturation | null {
  let prepared: PreparedSaturation | null = null;
  for (const source of ["max", "typ"] as const) {
    const usable = points
      .map((p) => ({ point: p, volts: source === "max" ? p.vceSatMaxVolts : p.vceSatTypVolts }))
      .filter((entry): entry is { point: SaturationPoint; volts: number } => entry.volts != null && entry.volts > 0 && entry.point.icAmps > 0)
      .sort((a, b) => a.point.icAmps - b.point.icAmps);
    if (usable.length === 0) continue;
    prepared = {
      source,
      curve: prepareCurve(usable.map((entry) => ({ icAmps: entry.point.icAmps, hfe: entry.volts }))),
      forcedGains: usable.map((entry) => (entry.point.ibAmps != null && entry.point.ibAmps > 0 ? entry.point.icAmps / entry.point.ibAmps : null)),
    };
    break;
  }
  return prepared;
}

export function newSaturationEstimate(): SaturationEstimate {
  return { volts: 0, forcedGain: null, extrapolated: false, source: "max" };
}

/** vceSatAt written into a reusable estimate; null when no VCE(sat) is quoted. */
export function readSaturation(prepared: PreparedSaturation | null, icAmps: number, out: SaturationEstimate): SaturationEstimate | null {
  if (prepared === null) return null;
  const ic = prepared.curve.icAmps;
  let nearest = 0;
  for (let i = 1; i < ic.length; i += 1) {
    if (ratioDistance(ic[i], icAmps) < ratioDistance(ic[nearest], icAmps)) nearest = i;
  }
  const last = ic.length - 1;
  out.forcedGain = prepared.forcedGains[nearest];
  out.source = prepared.source;
  out.extrapolated = icAmps > ic[last];
  // Above the quoted range the drop is taken as resistive, rising in proportion to IC (common practice, pessimistic).
  out.volts = out.extrapolated ? prepared.curve.values[last] * (icAmps / ic[last]) : interpolateLogLog(prepared.curve, icAmps);
  return out;
}

/** VCE(sat) at IC from the saturation points (max values, else typ): log-log between points, held flat below, scaled with IC above. */
export function vceSatAt(points: SaturationPoint[], icAmps: number): SaturationEstimate | null {
  return readSaturation(prepareSaturation(points), icAmps, newSaturationEstimate());
}
