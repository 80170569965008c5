// The base-emitter bleed resistor across a pair's output device: the value, and what it costs in gain.
import { formatValue } from "./checks/format";
import { type CompoundTopology, cornerGainModel, type GainModel, solvePairCurrents, worstGainModel } from "./compound-currents";
import { roundToSeries, type ESeriesName } from "./e-series";
import { chooseVbe } from "./evaluate-part";
import { hfeAt, worstCaseGain } from "./gain-curve";
import type { GainPoint, PartSpec } from "./part";
import { minIcOf, type RequirementSheet } from "./requirement";
import type { EvaluateOptions } from "./screening";

/** The bleed may take at most this share of the driver's current at the lowest operating current (a product decision). */
export const DEFAULT_BLEED_SHARE = 0.1;
/** The share falls as R rises, so stepping up clears it; the cap (ten decades of E24) guards pathological curves. */
const MAX_SERIES_STEPS = 240;

export interface PairGainModel {
  driverHfeAt: (icAmps: number) => number;
  outputHfeAt: (icAmps: number) => number;
}

export interface BleedInput {
  topology: CompoundTopology;
  /** Lowest collector current the pair runs at: where the bleed takes its largest share. */
  minIcAmps: number;
  operatingIcAmps: number;
  outputVbeVolts: number;
  /** The highest gain the devices may show (max, else typ, corner): the smallest output base current, so the largest bleed share. */
  highGain: PairGainModel;
  /** Worst-case gain, which the checks use: the cost in gain is shown on it. */
  worstGain: PairGainModel;
  maxShare?: number;
  series?: ESeriesName;
}

/** The suggestion; the gain costs and the summary may be worked out when first read. */
export interface BleedSuggestion {
  ohms: number;
  series: ESeriesName;
  /** The unrounded resistance the share rule gives before rounding up onto the series. */
  exactOhms: number;
  maxShare: number;
  /** The share of the driver's current the chosen resistor takes at the lowest current, with the highest gains. */
  shareAtMinIc: number;
  bleedAmps: number;
  /** Worst-case pair hFE at the operating current without and with the resistor. */
  pairHfeWithout: number;
  pairHfeWith: number;
  /** Fraction of the pair's gain the resistor costs at the operating current: 1 − hFE(with) / hFE(without). */
  gainCost: number;
  /** Same cost at the lowest current, where it is largest. */
  gainCostAtMinIc: number;
  formula: string;
  summary: string;
}

function shareWith(input: BleedInput, ohms: number): number {
  return solvePairCurrents({
    topology: input.topology,
    pairIcAmps: input.minIcAmps,
    bleedOhms: ohms,
    outputVbeVolts: input.outputVbeVolts,
    ...input.highGain,
  }).bleedShare;
}

function worstPairHfe(input: BleedInput, icAmps: number, ohms: number | null): number {
  return solvePairCurrents({
    topology: input.topology,
    pairIcAmps: icAmps,
    bleedOhms: ohms,
    outputVbeVolts: input.outputVbeVolts,
    ...input.worstGain,
  }).pairHfe;
}

function nextSeriesValue(ohms: number, series: ESeriesName): number {
  return roundToSeries(ohms * 1.0001, series, "up");
}

/**
 * The smallest series value whose current VBE2 / R is at most `maxShare` of the driver's current
 * (its emitter current in a Darlington, its collector current in a Sziklai) at the lowest current:
 * R ≥ VBE2 (1 − share) / (share × IB2), rounded up, so the rounding only lowers the share.
 */
export function suggestBleedResistor(input: BleedInput): BleedSuggestion {
  const maxShare = input.maxShare ?? DEFAULT_BLEED_SHARE;
  const series = input.series ?? "E24";
  if (!(maxShare > 0 && maxShare < 1)) throw new RangeError(`bleed share must lie between 0 and 1, got ${maxShare}`);
  const noBleed = solvePairCurrents({
    topology: input.topology,
    pairIcAmps: input.minIcAmps,
    bleedOhms: null,
    outputVbeVolts: input.outputVbeVolts,
    ...input.highGain,
  });
  const exactOhms = (input.outputVbeVolts * (1 - maxShare)) / (maxShare * noBleed.outputIbAmps);
  let ohms = roundToSeries(exactOhms, series, "up");
  let share = shareWith(input, ohms);
  for (let step = 0; share > maxShare && step < MAX_SERIES_STEPS; step += 1) {
    ohms = nextSeriesValue(ohms, series);
    share = shareWith(input, ohms);
  }
  return new Suggestion(input, { ohms, series, exactOhms, maxShare, shareAtMinIc: share, bleedAmps: input.outputVbeVolts / ohms });
}

/** The chosen resistor at once; what it costs in gain, and the sentence, worked out when first read (the pair search reads them for the pairs it shows). */
class Suggestion implements BleedSuggestion {
  readonly ohms: number;
  readonly series: ESeriesName;
  readonly exactOhms: number;
  readonly maxShare: number;
  readonly shareAtMinIc: number;
  readonly bleedAmps: number;
  readonly formula = "R ≥ VBE2 (1 − s) / (s × IB2), rounded up onto the series; hFE cost = 1 − hFE(with R) / hFE(without)";
  readonly #input: BleedInput;
  #costs: { pairHfeWithout: number; pairHfeWith: number; gainCost: number; gainCostAtMinIc: number } | null = null;

  constructor(input: BleedInput, chosen: Pick<BleedSuggestion, "ohms" | "series" | "exactOhms" | "maxShare" | "shareAtMinIc" | "bleedAmps">) {
    this.ohms = chosen.ohms;
    this.series = chosen.series;
    this.exactOhms = chosen.exactOhms;
    this.maxShare = chosen.maxShare;
    this.shareAtMinIc = chosen.shareAtMinIc;
    this.bleedAmps = chosen.bleedAmps;
    this.#input = input;
  }

  #costsOf() {
    if (this.#costs === null) {
      const input = this.#input;
      const pairHfeWithout = worstPairHfe(input, input.operatingIcAmps, null);
      const pairHfeWith = worstPairHfe(input, input.operatingIcAmps, this.ohms);
      this.#costs = {
        pairHfeWithout,
        pairHfeWith,
        gainCost: 1 - pairHfeWith / pairHfeWithout,
        gainCostAtMinIc: 1 - worstPairHfe(input, input.minIcAmps, this.ohms) / worstPairHfe(input, input.minIcAmps, null),
      };
    }
    return this.#costs;
  }

  get pairHfeWithout(): number {
    return this.#costsOf().pairHfeWithout;
  }

  get pairHfeWith(): number {
    return this.#costsOf().pairHfeWith;
  }

  get gainCost(): number {
    return this.#costsOf().gainCost;
  }

  get gainCostAtMinIc(): number {
    return this.#costsOf().gainCostAtMinIc;
  }

  get summary(): string {
    return (
      `A ${formatValue(this.ohms, "Ω")} ${this.series} bleed resistor takes ${(this.shareAtMinIc * 100).toFixed(1)}% of the driver's current at the lowest IC ` +
      `(limit ${(this.maxShare * 100).toFixed(0)}%) and costs ${(this.gainCost * 100).toFixed(1)}% of the pair's gain at the operating IC.`
    );
  }
}

/** The highest gain a part may show at IC: its max curve, else typ, else the worst case. */
export function highestGainAt(part: PartSpec, icAmps: number, options: EvaluateOptions = {}): number {
  return hfeAt(part.gainPoints, icAmps, "max") ?? hfeAt(part.gainPoints, icAmps, "typ") ?? worstCaseGain(part.gainPoints, icAmps, options).hfe;
}

const highestModels = new WeakMap<GainPoint[], GainModel>();

/** highestGainAt as a model with its curve built once per part (gain-point lists are never changed once read). */
export function highestGainModel(part: PartSpec, options: EvaluateOptions = {}): GainModel {
  const known = highestModels.get(part.gainPoints);
  if (known !== undefined) return known;
  const model = buildHighestGainModel(part, options);
  highestModels.set(part.gainPoints, model);
  return model;
}

function buildHighestGainModel(part: PartSpec, options: EvaluateOptions): GainModel {
  for (const corner of ["max", "typ"] as const) {
    const first = part.gainPoints[0];
    if (first !== undefined && hfeAt(part.gainPoints, first.icAmps, corner) !== null) return cornerGainModel(part.gainPoints, corner);
  }
  return worstGainModel(part, options);
}

/** The bleed resistor for a pair of catalogue parts on a sheet: its lowest current, each part's gain curves and VBE. */
export function suggestBleedForPair(
  topology: CompoundTopology,
  driver: PartSpec,
  output: PartSpec,
  sheet: RequirementSheet,
  options: EvaluateOptions & { maxShare?: number } = {},
): BleedSuggestion {
  return suggestBleedResistor({
    topology,
    minIcAmps: minIcOf(sheet),
    operatingIcAmps: sheet.operatingIcAmps,
    outputVbeVolts: chooseVbe(output, sheet.operatingIcAmps, "linear").volts,
    highGain: { driverHfeAt: highestGainModel(driver, options), outputHfeAt: highestGainModel(output, options) },
    worstGain: { driverHfeAt: worstGainModel(driver, options), outputHfeAt: worstGainModel(output, options) },
    maxShare: options.maxShare,
    series: options.series,
  });
}
