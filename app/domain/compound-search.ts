// The best k Darlington and Sziklai pairs in a catalogue, found without walking all N × N pairs.
import { type BleedSuggestion, DEFAULT_BLEED_SHARE, suggestBleedForPair } from "./bleed-resistor";
import { judgeAgainstRating } from "./checks/rating";
import { checkThermal } from "./checks/thermal";
import {
  canPair,
  compoundBeta,
  type CompoundEvaluation,
  type CompoundTopology,
  COMPOUND_TOPOLOGIES,
  evaluateCompound,
  findCompoundExclusions,
  worstGainModel,
} from "./compound";
import { assessDataQuality } from "./data-quality";
import { chooseVbe, findExclusions } from "./evaluate-part";
import type { PartSpec, Polarity } from "./part";
import { compareText, type CatalogueEntry, type RankingOptions, readSupply, type SupplyFacts } from "./rank";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";
import {
  combineScore,
  DEFAULT_SCORE_WEIGHTS,
  FULL_MARGIN,
  type OrderPrice,
  type ScoreComponents,
  scoreCost,
  scoreDataQuality,
  scoreMargins,
  type ScoreWeights,
  shareOfMargin,
  validateWeights,
} from "./score";
import { TopK } from "./top-k";

export const DEFAULT_TOP_K = 20;

export interface CompoundSearchOptions extends RankingOptions {
  /** How many pairs to return. */
  k?: number;
  topologies?: readonly CompoundTopology[];
  /** Fit the suggested bleed resistor to every pair (default), or none. */
  bleed?: "suggested" | "none";
  /** Largest share of the driver's current the suggested bleed may take. */
  maxBleedShare?: number;
}

export interface RankedCompound<P extends PartSpec = PartSpec> {
  topology: CompoundTopology;
  driver: P;
  output: P;
  verdict: "fits" | "marginal";
  score: number;
  components: ScoreComponents;
  price: { driver: OrderPrice | null; output: OrderPrice | null; effectiveUnitPrice: number | null };
  bleed: BleedSuggestion | null;
  evaluation: CompoundEvaluation<P>;
}

export interface CompoundSearchResult<P extends PartSpec = PartSpec> {
  catalogueVersion: string;
  weights: ScoreWeights;
  orderQuantity: number;
  k: number;
  /** The best k pairs that fit or are marginal, best first. */
  ranked: RankedCompound<P>[];
  /** N² ordered (driver, output) pairs for each topology searched. */
  pairSpace: number;
  /** Pairs the search looked at: their bounds were computed. */
  pairsConsidered: number;
  /** Pairs whose currents, gain and checks were worked out. */
  pairsEvaluated: number;
  /** Evaluated pairs that failed a check. */
  pairsFailed: number;
}

/** Best score first; ties by driver, then output (manufacturer, part number), then topology. */
export function compareRankedCompounds(a: RankedCompound, b: RankedCompound): number {
  return (
    b.score - a.score ||
    compareText(a.driver.manufacturer, b.driver.manufacturer) ||
    compareText(a.driver.partNumber, b.driver.partNumber) ||
    compareText(a.output.manufacturer, b.output.manufacturer) ||
    compareText(a.output.partNumber, b.output.partNumber) ||
    compareText(a.topology, b.topology)
  );
}

/** What the search knows about a part before pairing it: supply, data quality, and bounds on its checks. */
interface PartFacts<P extends PartSpec> {
  index: number;
  part: P;
  supply: SupplyFacts;
  unitPrice: number | null;
  dataQuality: number;
  /** The voltage check's margin share, exact: both roles stand the full peak VCE. */
  voltageShare: number;
  /** Eligible at all: package allowed, VCEO clears the peak VCE, some gain quoted. */
  usable: boolean;
  /** Highest and lowest worst-case hFE anywhere on its curve. */
  maxGain: number;
  minGain: number;
  /** As an output: an upper bound on its current check's margin share. */
  outputCurrentShare: number;
  /** As an output it must fail: the least current it can carry is above IC max. */
  outputFails: boolean;
  /** As an output, the VBE(on) evaluateCompound gives it, which adds to the driver's VCE(sat). */
  outputVbeVolts: number;
  /** As a driver: the lowest VCE(sat) its curve can give (vceSatAt's source, max else typ); null when none is quoted. */
  leastSatVolts: number | null;
}

interface Settings {
  sheet: RequirementSheet;
  weights: ScoreWeights;
  fullMargin: number;
  referencePrice: number | null;
  bleed: "suggested" | "none";
  maxBleedShare: number;
  requiredHfe: number | null;
  options: CompoundSearchOptions;
}

type BaseSettings = Omit<Settings, "referencePrice">;

/** Rounding slack so that a bound computed in another order still stays above the score it bounds. */
const BOUND_SLACK = 1e-9;

function gainRange(part: PartSpec, options: CompoundSearchOptions): { maxGain: number; minGain: number } {
  // The same model the pair evaluation iterates on; log-log between points and flat beyond has its extremes on the points.
  const model = worstGainModel(part, options.evaluate);
  let maxGain = 0;
  let minGain = Number.POSITIVE_INFINITY;
  for (const point of part.gainPoints) {
    const hfe = model(point.icAmps);
    maxGain = Math.max(maxGain, hfe);
    minGain = Math.min(minGain, hfe);
  }
  return { maxGain, minGain: Number.isFinite(minGain) ? minGain : 0 };
}

/**
 * The least current an output carries at a pair current: IC2 ≥ (IC − Ibleed) β2 / (β2 + 1) in both
 * topologies, with Ibleed ≤ s / (1 − s) × IC(min) for the suggested bleed (it takes at most s at the lowest IC).
 */
function leastOutputCurrent(icAmps: number, minGain: number, settings: BaseSettings): number {
  if (minGain < 1) return 0;
  const bleedLimit = settings.bleed === "none" ? 0 : (settings.maxBleedShare / (1 - settings.maxBleedShare)) * minIcOf(settings.sheet);
  return (Math.max(0, icAmps - bleedLimit) * minGain) / (minGain + 1);
}

/** The lowest VCE(sat) vceSatAt can return: held flat below, log-log between and rising above the quoted points. */
function leastSaturationVolts(part: PartSpec): number | null {
  for (const source of ["max", "typ"] as const) {
    let least: number | null = null;
    for (const point of part.saturationPoints) {
      const volts = source === "max" ? point.vceSatMaxVolts : point.vceSatTypVolts;
      if (volts != null && volts > 0 && point.icAmps > 0) least = least === null ? volts : Math.min(least, volts);
    }
    if (least !== null) return least;
  }
  return null;
}

/** Whether the pair's VCE(sat) = VCE(sat)1 + VBE2 must exceed the allowed drop (a hair of slack for rounding). */
function saturationMustFail(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, allowedVolts: number | null): boolean {
  if (allowedVolts === null || driver.leastSatVolts === null) return false;
  return driver.leastSatVolts + output.outputVbeVolts > allowedVolts * (1 + 1e-9);
}

function collectFacts<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], settings: BaseSettings): PartFacts<P>[] {
  const { sheet, options, fullMargin } = settings;
  const anyPolarity: RequirementSheet = { ...sheet, polarity: "any" };
  const peakVce = peakVceOf(sheet);
  return entries.map((entry, index) => {
    const part = entry.part;
    const supply = readSupply(entry.offers, part.lifecycle, sheet.orderQuantity, options.currency ?? null);
    const voltage = judgeAgainstRating(peakVce, part.vceoVolts, sheet.derating.voltageFraction);
    const gains = gainRange(part, options);
    const current = judgeAgainstRating(leastOutputCurrent(peakIcOf(sheet), gains.minGain, settings), part.icMaxAmps, sheet.derating.currentFraction);
    return {
      index,
      part,
      supply,
      unitPrice: supply.price?.effectiveUnitPrice ?? null,
      dataQuality: assessDataQuality(part, options.evaluate).score,
      voltageShare: shareOfMargin(voltage.margin, fullMargin),
      usable: findExclusions(part, anyPolarity).length === 0 && voltage.verdict !== "fails" && gains.maxGain > 0,
      ...gains,
      outputCurrentShare: shareOfMargin(current.margin, fullMargin),
      outputFails: current.verdict === "fails",
      outputVbeVolts: chooseVbe(part, sheet.operatingIcAmps, "linear").volts,
      leastSatVolts: leastSaturationVolts(part),
    };
  });
}

interface ThermalBound {
  /** Upper bound on the output's thermal margin share; null when its thermal check gives no margin. */
  share: number | null;
  fails: boolean;
}

/**
 * The output's thermal check at the least current it can carry: its VCE is the operating VCE (linear) or
 * VCE(sat)1 + VBE2 ≥ VBE2 (switching), as evaluateCompound takes it. Worked out only for outputs the search reaches.
 */
function boundOutputThermal(facts: PartFacts<PartSpec>, settings: BaseSettings): ThermalBound {
  const { sheet } = settings;
  const part = facts.part;
  const switching = sheet.mode === "switching";
  const thermal = checkThermal({
    mode: sheet.mode,
    vceVolts: switching ? chooseVbe(part, sheet.operatingIcAmps, "linear").volts : operatingVceOf(sheet),
    icAmps: leastOutputCurrent(sheet.operatingIcAmps, facts.minGain, settings),
    dutyCycle: switching ? sheet.dutyCycle : 1,
    ambientC: sheet.ambientC,
    rthJaCPerW: part.rthJaCPerW,
    rthJcCPerW: part.rthJcCPerW,
    heatsinkRthCPerW: sheet.heatsinkRthCPerW,
    tjMaxC: part.tjMaxC,
    ptotWatts: part.ptotWatts,
    ptotReference: part.ptotReference,
    derating: sheet.derating,
  });
  return { share: thermal.margin === null ? null : shareOfMargin(thermal.margin, settings.fullMargin), fails: thermal.verdict === "fails" };
}

function requiredPairHfe(sheet: RequirementSheet): number | null {
  return sheet.requiredHfe ?? (sheet.mode === "switching" ? sheet.forcedGain : null);
}

function outputPolarity(topology: CompoundTopology, driverPolarity: Polarity): Polarity {
  if (topology === "darlington") return driverPolarity;
  return driverPolarity === "npn" ? "pnp" : "npn";
}

/** Whether the highest gains the two curves reach can make the β required; a bleed only lowers it. */
function reaches(topology: CompoundTopology, requiredHfe: number | null, driverGain: number, outputGain: number): boolean {
  return requiredHfe === null || compoundBeta(topology, driverGain, outputGain) >= requiredHfe;
}

/** The least current the driver carries at the peak: α IC / (β2 + α), α = β1 / (β1 + 1) at its lowest β1. */
function leastDriverCurrent(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, peakIcAmps: number): number {
  const alpha = driver.minGain / (driver.minGain + 1);
  return (alpha * peakIcAmps) / (output.maxGain + alpha);
}

interface Pass<P extends PartSpec> {
  topology: CompoundTopology;
  drivers: PartFacts<P>[];
  outputs: PartFacts<P>[];
}

/** Drivers and outputs per topology and pair polarity, after every prune that needs no partner. */
function buildPasses<P extends PartSpec>(facts: PartFacts<P>[], settings: BaseSettings, topologies: readonly CompoundTopology[]): Pass<P>[] {
  const { sheet, requiredHfe } = settings;
  const polarities: Polarity[] = sheet.polarity === "any" ? ["npn", "pnp"] : [sheet.polarity];
  const passes: Pass<P>[] = [];
  for (const topology of topologies) {
    for (const polarity of polarities) {
      const drivers = facts.filter((f) => f.usable && f.part.polarity === polarity);
      const outputs = facts.filter((f) => f.usable && !f.outputFails && f.part.polarity === outputPolarity(topology, polarity));
      if (drivers.length === 0 || outputs.length === 0) continue;
      const bestDriverGain = Math.max(...drivers.map((f) => f.maxGain));
      const bestOutputGain = Math.max(...outputs.map((f) => f.maxGain));
      passes.push({
        topology,
        drivers: drivers.filter((f) => reaches(topology, requiredHfe, f.maxGain, bestOutputGain)),
        outputs: outputs.filter((f) => reaches(topology, requiredHfe, bestDriverGain, f.maxGain)),
      });
    }
  }
  return passes.filter((pass) => pass.drivers.length > 0 && pass.outputs.length > 0);
}

function cheapestPrice(list: readonly PartFacts<PartSpec>[]): number | null {
  let low: number | null = null;
  for (const f of list) if (f.unitPrice !== null && (low === null || f.unitPrice < low)) low = f.unitPrice;
  return low;
}

/** Margin-share bounds a pair cannot beat: the tightest check governs the margin score. */
function pairMarginBound(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, thermal: ThermalBound, topology: CompoundTopology, settings: Settings): number {
  const { sheet, requiredHfe, fullMargin } = settings;
  let least = Math.min(driver.voltageShare, output.voltageShare, output.outputCurrentShare);
  if (thermal.share !== null) least = Math.min(least, thermal.share);
  // The same arithmetic as judgeAgainstRating, without building its result in the innermost loop.
  const deratedLimit = driver.part.icMaxAmps * sheet.derating.currentFraction;
  least = Math.min(least, shareOfMargin((deratedLimit - leastDriverCurrent(driver, output, peakIcOf(sheet))) / deratedLimit, fullMargin));
  // VCE(sat) = VCE(sat)1 + VBE2, and VCE(sat)1 is no lower than the least the driver's curve gives.
  const allowed = sheet.allowedSatDropVolts;
  if (sheet.mode === "switching" && allowed !== null && driver.leastSatVolts !== null) {
    least = Math.min(least, shareOfMargin((allowed - (driver.leastSatVolts + output.outputVbeVolts)) / allowed, fullMargin));
  }
  if (requiredHfe !== null) {
    const beta = compoundBeta(topology, driver.maxGain, output.maxGain);
    least = Math.min(least, shareOfMargin((beta - requiredHfe) / beta, fullMargin));
  }
  return least;
}

function scoreBound(margin: number, price: number | null, stock: number, lifecycle: number, dataQuality: number, settings: Settings): number {
  return combineScore({ margin, cost: scoreCost(price, settings.referencePrice), stock, lifecycle, dataQuality }, settings.weights) + BOUND_SLACK;
}

function sumPrices(a: number | null, b: number | null): number | null {
  return a === null || b === null ? null : a + b;
}

/** A part's bound in one role: the best any partner could make of it (the cheapest partner, perfect otherwise). */
function soloBound(facts: PartFacts<PartSpec>, role: "driver" | "output", cheapestPartner: number | null, settings: Settings, thermal?: ThermalBound): number {
  let margin = role === "output" ? Math.min(facts.voltageShare, facts.outputCurrentShare) : facts.voltageShare;
  if (thermal?.share != null) margin = Math.min(margin, thermal.share);
  return scoreBound(margin, sumPrices(facts.unitPrice, cheapestPartner), facts.supply.stockScore, facts.supply.lifecycleScore, facts.dataQuality, settings);
}

function pairBound(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, thermal: ThermalBound, topology: CompoundTopology, settings: Settings): number {
  return scoreBound(
    pairMarginBound(driver, output, thermal, topology, settings),
    sumPrices(driver.unitPrice, output.unitPrice),
    Math.min(driver.supply.stockScore, output.supply.stockScore),
    Math.min(driver.supply.lifecycleScore, output.supply.lifecycleScore),
    Math.min(driver.dataQuality, output.dataQuality),
    settings,
  );
}

/** Evaluates one pair with its bleed resistor and scores it; null when it fails. */
function scorePair<P extends PartSpec>(topology: CompoundTopology, driver: PartFacts<P>, output: PartFacts<P>, settings: Settings): RankedCompound<P> | null {
  const { sheet, options } = settings;
  const bleed =
    settings.bleed === "suggested"
      ? suggestBleedForPair(topology, driver.part, output.part, sheet, { ...options.evaluate, maxShare: settings.maxBleedShare })
      : null;
  const evaluation = evaluateCompound(topology, driver.part, output.part, sheet, { ...options.evaluate, bleedOhms: bleed?.ohms ?? null });
  if (evaluation.verdict === "fails") return null;
  const price = sumPrices(driver.unitPrice, output.unitPrice);
  const components: ScoreComponents = {
    margin: scoreMargins(evaluation.checks, settings.fullMargin),
    cost: scoreCost(price, settings.referencePrice),
    stock: Math.min(driver.supply.stockScore, output.supply.stockScore),
    lifecycle: Math.min(driver.supply.lifecycleScore, output.supply.lifecycleScore),
    dataQuality: scoreDataQuality(evaluation.dataQuality.score, evaluation.flags),
  };
  return {
    topology,
    driver: driver.part,
    output: output.part,
    verdict: evaluation.verdict,
    score: combineScore(components, settings.weights),
    components,
    price: { driver: driver.supply.price, output: output.supply.price, effectiveUnitPrice: price },
    bleed,
    evaluation,
  };
}

/** Facts, passes and the price that scores 1: the cheapest driver plus the cheapest output of any pass. */
function settle<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], sheet: RequirementSheet, options: CompoundSearchOptions) {
  const base: BaseSettings = {
    sheet,
    weights: validateWeights(options.weights ?? { ...DEFAULT_SCORE_WEIGHTS }),
    fullMargin: options.fullMargin ?? FULL_MARGIN,
    bleed: options.bleed ?? "suggested",
    maxBleedShare: options.maxBleedShare ?? DEFAULT_BLEED_SHARE,
    requiredHfe: requiredPairHfe(sheet),
    options,
  };
  const topologies = options.topologies ?? COMPOUND_TOPOLOGIES;
  const facts = collectFacts(entries, base);
  const passes = buildPasses(facts, base, topologies);
  let referencePrice: number | null = null;
  for (const pass of passes) {
    const price = sumPrices(cheapestPrice(pass.drivers), cheapestPrice(pass.outputs));
    if (price !== null && (referencePrice === null || price < referencePrice)) referencePrice = price;
  }
  const settings: Settings = { ...base, referencePrice };
  return { facts, passes, settings, k: options.k ?? DEFAULT_TOP_K, topologies };
}

function resultOf<P extends PartSpec>(
  options: CompoundSearchOptions,
  settings: Settings,
  k: number,
  ranked: RankedCompound<P>[],
  pairSpace: number,
  counts: { considered: number; evaluated: number; failed: number },
): CompoundSearchResult<P> {
  return {
    catalogueVersion: options.catalogueVersion,
    weights: settings.weights,
    orderQuantity: settings.sheet.orderQuantity,
    k,
    ranked,
    pairSpace,
    pairsConsidered: counts.considered,
    pairsEvaluated: counts.evaluated,
    pairsFailed: counts.failed,
  };
}

/**
 * Every structurally valid pair inside the sheet's polarity and packages, evaluated and sorted:
 * the reference the pruned search must agree with. Walks all N × N pairs: for tests and small catalogues.
 */
export function rankCompoundsExhaustively<P extends PartSpec>(
  entries: readonly CatalogueEntry<P>[],
  sheet: RequirementSheet,
  options: CompoundSearchOptions,
): CompoundSearchResult<P> {
  const { facts, settings, k, topologies } = settle(entries, sheet, options);
  const found: RankedCompound<P>[] = [];
  let evaluated = 0;
  for (const topology of topologies) {
    for (const driver of facts) {
      for (const output of facts) {
        if (!canPair(topology, driver.part, output.part)) continue;
        if (findCompoundExclusions(driver.part, output.part, sheet).length > 0) continue;
        evaluated += 1;
        const ranked = scorePair(topology, driver, output, settings);
        if (ranked !== null) found.push(ranked);
      }
    }
  }
  found.sort(compareRankedCompounds);
  const counts = { considered: evaluated, evaluated, failed: evaluated - found.length };
  return resultOf(options, settings, k, found.slice(0, k), facts.length * facts.length * topologies.length, counts);
}

interface Bounded<T> {
  item: T;
  bound: number;
}

function byBound<T extends { index: number }>(list: Bounded<T>[]): Bounded<T>[] {
  return list.sort((a, b) => b.bound - a.bound || a.item.index - b.item.index);
}

/**
 * The best k pairs. Prunes before any gain math (polarity per topology, packages, VCEO against the
 * peak VCE, each device's IC max and the output's heat against the least current it can carry, the
 * highest gain the two curves can reach against the gain required), then walks outputs and drivers
 * in falling order of their score bounds, stopping once a bound cannot beat the k-th score kept.
 * Agrees with rankCompoundsExhaustively: a pair is skipped only when it must fail or cannot enter the top k.
 */
export function searchCompounds<P extends PartSpec>(
  entries: readonly CatalogueEntry<P>[],
  sheet: RequirementSheet,
  options: CompoundSearchOptions,
): CompoundSearchResult<P> {
  const { facts, passes, settings, k, topologies } = settle(entries, sheet, options);
  const heap = new TopK<RankedCompound<P>>(k, compareRankedCompounds);
  const peakIc = peakIcOf(sheet);
  const counts = { considered: 0, evaluated: 0, failed: 0 };
  const slots: { topology: CompoundTopology; output: Bounded<PartFacts<P>>; drivers: Bounded<PartFacts<P>>[]; cheapestDriver: number | null }[] = [];
  for (const pass of passes) {
    const cheapestDriver = cheapestPrice(pass.drivers);
    const cheapestOutput = cheapestPrice(pass.outputs);
    const drivers = byBound(pass.drivers.map((item) => ({ item, bound: soloBound(item, "driver", cheapestOutput, settings) })));
    for (const item of pass.outputs) {
      slots.push({ topology: pass.topology, output: { item, bound: soloBound(item, "output", cheapestDriver, settings) }, drivers, cheapestDriver });
    }
  }
  slots.sort((a, b) => b.output.bound - a.output.bound || a.output.item.index - b.output.item.index || compareText(a.topology, b.topology));

  const kthScore = () => (heap.isFull ? (heap.worst()?.score ?? Number.POSITIVE_INFINITY) : Number.NEGATIVE_INFINITY);
  for (const slot of slots) {
    if (slot.output.bound < kthScore()) break;
    const output = slot.output.item;
    const thermal = boundOutputThermal(output, settings);
    // Even at the least current it can carry, the output overheats: every pair with it fails.
    if (thermal.fails) continue;
    if (soloBound(output, "output", slot.cheapestDriver, settings, thermal) < kthScore()) continue;
    for (const { item: driver, bound } of slot.drivers) {
      if (bound < kthScore()) break;
      counts.considered += 1;
      if (!reaches(slot.topology, settings.requiredHfe, driver.maxGain, output.maxGain)) continue;
      if (leastDriverCurrent(driver, output, peakIc) > driver.part.icMaxAmps) continue;
      if (sheet.mode === "switching" && saturationMustFail(driver, output, sheet.allowedSatDropVolts)) continue;
      if (pairBound(driver, output, thermal, slot.topology, settings) < kthScore()) continue;
      counts.evaluated += 1;
      const ranked = scorePair(slot.topology, driver, output, settings);
      if (ranked === null) counts.failed += 1;
      else heap.push(ranked);
    }
  }
  return resultOf(options, settings, k, heap.toSortedArray(), facts.length * facts.length * topologies.length, counts);
}
