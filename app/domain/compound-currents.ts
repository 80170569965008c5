// How a Darlington or Sziklai pair works out electrically: topology and polarity rules, the β, VBE and VCE(sat)
// formulas, the gain models each device is read through, and the current balance solved with them.
import { DEFAULT_TYP_TO_MIN_FACTOR, type GainCorner, hfeAt, type WorstCaseGainOptions, worstCaseGain } from "./gain-curve";
import type { GainPoint, PartSpec, Polarity } from "./part";

export const COMPOUND_TOPOLOGIES = ["darlington", "sziklai"] as const;
export type CompoundTopology = (typeof COMPOUND_TOPOLOGIES)[number];

/** Pair currents agree when successive output currents differ by less than this fraction of the pair's IC. */
export const PAIR_CURRENT_TOLERANCE = 1e-9;
/** The fixed point contracts by about 1/β per step, so a handful suffice; the cap only guards odd curves. */
export const PAIR_MAX_ITERATIONS = 50;

export interface PairCurrentsInput {
  topology: CompoundTopology;
  /** Current into the pair's collector terminal. */
  pairIcAmps: number;
  /** Base-emitter bleed resistor across the output device; null when none is fitted. */
  bleedOhms: number | null;
  /** VBE of the output device, which sets the bleed current VBE2 / Rbleed. */
  outputVbeVolts: number;
  /** Worst-case (or any corner's) hFE of the driver at a collector current. */
  driverHfeAt: (icAmps: number) => number;
  outputHfeAt: (icAmps: number) => number;
}

export interface PairCurrents {
  topology: CompoundTopology;
  pairIcAmps: number;
  /** Base current into the pair (the driver's base). */
  pairIbAmps: number;
  driverIcAmps: number;
  driverHfe: number;
  outputIcAmps: number;
  outputIbAmps: number;
  outputHfe: number;
  bleedAmps: number;
  /** Share of the driver's current the bleed resistor takes: of its emitter current (Darlington) or collector current (Sziklai). */
  bleedShare: number;
  /** Effective current gain of the pair, IC / IB, bleed included. */
  pairHfe: number;
  iterations: number;
  converged: boolean;
  /** False when a device has no gain or the bleed current alone exceeds the pair's current. */
  feasible: boolean;
}

/** β of a Darlington pair without bleed: β1 β2 + β1 + β2. */
export function darlingtonBeta(driverHfe: number, outputHfe: number): number {
  return driverHfe * outputHfe + driverHfe + outputHfe;
}

/** β of a Sziklai pair without bleed: β1 (β2 + 1). */
export function sziklaiBeta(driverHfe: number, outputHfe: number): number {
  return driverHfe * (outputHfe + 1);
}

/** The pair's β without bleed from each device's own β. */
export function compoundBeta(topology: CompoundTopology, driverHfe: number, outputHfe: number): number {
  return topology === "darlington" ? darlingtonBeta(driverHfe, outputHfe) : sziklaiBeta(driverHfe, outputHfe);
}

/** Base-emitter voltage of the pair: VBE1 + VBE2 for a Darlington, VBE1 for a Sziklai. */
export function compoundVbe(topology: CompoundTopology, driverVbeVolts: number, outputVbeVolts: number): number {
  return topology === "darlington" ? driverVbeVolts + outputVbeVolts : driverVbeVolts;
}

/** Saturation voltage of either pair: the driver saturates, the output stays one VBE above it. */
export function compoundVceSat(driverVceSatVolts: number, outputVbeVolts: number): number {
  return driverVceSatVolts + outputVbeVolts;
}

/** The polarity a pair acts with: its driver's, in both topologies. */
export function compoundPolarity(driver: PartSpec): Polarity {
  return driver.polarity;
}

/** Darlington: driver and output of one polarity; Sziklai: of opposite polarities. */
export function canPair(topology: CompoundTopology, driver: PartSpec, output: PartSpec): boolean {
  return topology === "darlington" ? driver.polarity === output.polarity : driver.polarity !== output.polarity;
}

function infeasible(input: PairCurrentsInput, bleedAmps: number, iterations: number): PairCurrents {
  return {
    topology: input.topology,
    pairIcAmps: input.pairIcAmps,
    pairIbAmps: Number.POSITIVE_INFINITY,
    driverIcAmps: Number.NaN,
    driverHfe: 0,
    outputIcAmps: Number.NaN,
    outputIbAmps: Number.NaN,
    outputHfe: 0,
    bleedAmps,
    bleedShare: 1,
    pairHfe: 0,
    iterations,
    converged: false,
    feasible: false,
  };
}

/**
 * Solves Kirchhoff's current law at the pair's inner node with each β taken at its own device's
 * current, iterating on the output's collector current until it agrees.
 * Darlington: IE1 = IB2 + Ib, IC = IC1 + IC2. Sziklai: IC1 = IB2 + Ib, IC = IE2 + Ib.
 */
export function solvePairCurrents(input: PairCurrentsInput): PairCurrents {
  const total = input.pairIcAmps;
  const bleedAmps = input.bleedOhms === null ? 0 : input.outputVbeVolts / input.bleedOhms;
  let outputIc = total;
  let driverHfe = 0;
  let outputHfe = 0;
  let driverIc = 0;
  let iterations = 0;
  let converged = false;
  while (iterations < PAIR_MAX_ITERATIONS) {
    iterations += 1;
    outputHfe = input.outputHfeAt(outputIc);
    if (!(outputHfe > 0)) return infeasible(input, bleedAmps, iterations);
    let nextOutputIc: number;
    if (input.topology === "darlington") {
      const driverIe = outputIc / outputHfe + bleedAmps;
      // The driver's collector current is α1 IE1; α1 from the last β1 (1 on the first pass).
      const alpha = driverHfe > 0 ? driverHfe / (driverHfe + 1) : 1;
      driverHfe = input.driverHfeAt(driverIe * alpha);
      if (!(driverHfe > 0)) return infeasible(input, bleedAmps, iterations);
      driverIc = (driverIe * driverHfe) / (driverHfe + 1);
      nextOutputIc = total - driverIc;
    } else {
      const outputIb = (total - bleedAmps) / (outputHfe + 1);
      nextOutputIc = outputHfe * outputIb;
      driverIc = outputIb + bleedAmps;
      driverHfe = input.driverHfeAt(driverIc);
      if (!(driverHfe > 0)) return infeasible(input, bleedAmps, iterations);
    }
    if (!(nextOutputIc > 0)) return infeasible(input, bleedAmps, iterations);
    const change = Math.abs(nextOutputIc - outputIc);
    outputIc = nextOutputIc;
    if (change <= PAIR_CURRENT_TOLERANCE * total) {
      converged = true;
      break;
    }
  }
  outputHfe = input.outputHfeAt(outputIc);
  const outputIbAmps = outputIc / outputHfe;
  const pairIbAmps = input.topology === "darlington" ? (outputIbAmps + bleedAmps) / (driverHfe + 1) : driverIc / driverHfe;
  const driverShareBase = input.topology === "darlington" ? outputIbAmps + bleedAmps : driverIc;
  return {
    topology: input.topology,
    pairIcAmps: total,
    pairIbAmps,
    driverIcAmps: driverIc,
    driverHfe,
    outputIcAmps: outputIc,
    outputIbAmps,
    outputHfe,
    bleedAmps,
    bleedShare: driverShareBase > 0 ? bleedAmps / driverShareBase : 0,
    pairHfe: total / pairIbAmps,
    iterations,
    converged,
    feasible: true,
  };
}

/** hFE against IC with the curve built once, for use inside the pair iteration. */
export type GainModel = (icAmps: number) => number;

/**
 * One corner's curve, scaled, as a function of IC: log-log between the quoted currents, flat beyond,
 * as hfeAt draws it. Sampling hfeAt at every quoted current keeps the same line (a node on a log-log
 * segment leaves it straight), so the curve is read once instead of at every iteration step.
 */
export function cornerGainModel(points: GainPoint[], corner: GainCorner, scale = 1): GainModel {
  const currents = [...new Set(points.map((p) => p.icAmps).filter((ic) => ic > 0))].sort((a, b) => a - b);
  const logIc = currents.map(Math.log);
  const logHfe = currents.map((ic) => Math.log((hfeAt(points, ic, corner) ?? 0) * scale));
  if (currents.length === 0 || !logHfe.every(Number.isFinite)) return () => 0;
  const last = currents.length - 1;
  return (icAmps) => {
    if (icAmps <= currents[0]) return Math.exp(logHfe[0]);
    if (icAmps >= currents[last]) return Math.exp(logHfe[last]);
    let upper = 1;
    while (currents[upper] < icAmps) upper += 1;
    const t = (Math.log(icAmps) - logIc[upper - 1]) / (logIc[upper] - logIc[upper - 1]);
    return Math.exp(logHfe[upper - 1] + t * (logHfe[upper] - logHfe[upper - 1]));
  };
}

// Parts are values: a gain-point list is never changed after it is read, so its models can be kept with it.
const worstModels = new WeakMap<GainPoint[], Map<number, GainModel>>();

/** The worst-case hFE of a part as worstCaseGain gives it (min, else typ or max derated), curve built once per part. */
export function worstGainModel(part: PartSpec, options: WorstCaseGainOptions = {}): GainModel {
  const factor = options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  let byFactor = worstModels.get(part.gainPoints);
  if (byFactor === undefined) {
    byFactor = new Map();
    worstModels.set(part.gainPoints, byFactor);
  }
  const known = byFactor.get(factor);
  if (known !== undefined) return known;
  const model = buildWorstGainModel(part.gainPoints, options);
  byFactor.set(factor, model);
  return model;
}

function buildWorstGainModel(points: GainPoint[], options: WorstCaseGainOptions): GainModel {
  const first = points[0];
  if (first === undefined) return () => 0;
  const estimate = worstCaseGain(points, first.icAmps, options);
  if (estimate.source === "none") return () => 0;
  const corner: GainCorner = estimate.source === "min" ? "min" : estimate.source === "typ-derated" ? "typ" : "max";
  return cornerGainModel(points, corner, estimate.typToMinFactor ?? 1);
}
