// The best k Darlington and Sziklai pairs in a catalogue, found without walking all N × N pairs.
import { type BleedSuggestion, DEFAULT_BLEED_SHARE, suggestBleedForPair } from "./bleed-resistor";
import { FLAG_BITS } from "./check-result";
import type { DataQuality } from "./data-quality";
import { newRatingReading, readRating } from "./checks/rating";
import { judgeThermal } from "./checks/thermal";
import { canPair, compoundBeta, COMPOUND_TOPOLOGIES, type CompoundTopology, worstGainModel } from "./compound-currents";
import { type CompoundEvaluation, explainCompound } from "./compound-explain";
import { type CompoundScreen, findCompoundExclusions, screenCompound } from "./compound-screen";
import { decadesOutside, DEFAULT_GAIN_WINDOW_DECADES, DEFAULT_TYP_TO_MIN_FACTOR, prepareGain } from "./gain-curve";
import { chooseVbe, chooseVbeInto, isOutsidePackages, type PreparedPart, qualityOf } from "./evaluate-part";
import type { PartSpec, Polarity } from "./part";
import { compareText, type CatalogueEntry, type PreparedCatalogue, prepareCatalogue, type RankingOptions, supplyOf, type SupplyFacts } from "./rank";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";
import {
  combineScore,
  combineScoreParts,
  DEFAULT_SCORE_WEIGHTS,
  FULL_MARGIN,
  type OrderPrice,
  type ScoreComponents,
  scoreCost,
  scoreLeastMargin,
  scoreRecordQuality,
  type ScoreWeights,
  shareOfMargin,
  validateWeights,
} from "./score";
import { deviceThermalInput, planSheet, type SheetPlan } from "./screening";
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
  /** The full explanation; the search builds it on first read, so only the pairs a page shows pay for it. */
  readonly evaluation: CompoundEvaluation<P>;
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
  /** Copied from the part and its supply so the pair loops read one object. */
  polarity: Polarity;
  icMaxAmps: number;
  stockScore: number;
  lifecycleScore: number;
  quality: DataQuality;
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

/** Relative slack on the gain range so that it still bounds the model's exp(log(·)) round trip. */
const GAIN_RANGE_SLACK = 1e-12;

/**
 * The highest and lowest worst-case hFE anywhere on a part's curve. Log-log between points and flat
 * beyond has its extremes on the quoted points, so they are read off the prepared curve and scaled
 * as worstCaseGain scales them, widened by a hair to cover the gain model's rounding.
 */
function gainRange(prepared: PreparedPart, factor: number, out: { maxGain: number; minGain: number }): void {
  const corner = prepared.gain.worstCorner;
  // Scaling by a positive factor keeps the order, so the extremes of the scaled curve are the scaled extremes.
  const scale = corner === "min" ? 1 : corner === "typ" ? factor : factor * factor;
  out.maxGain = corner === null ? 0 : prepared.worstGainMax * scale * (1 + GAIN_RANGE_SLACK);
  out.minGain = corner === null ? 0 : prepared.worstGainMin * scale * (1 - GAIN_RANGE_SLACK);
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

const factBuffers = new WeakMap<PreparedCatalogue, PartFacts<PartSpec>[]>();

function blankFacts<P extends PartSpec>(index: number, part: P): PartFacts<P> {
  return {
    index,
    part,
    supply: { price: null, stockScore: 0, lifecycleScore: 0 },
    unitPrice: null,
    polarity: part.polarity,
    icMaxAmps: part.icMaxAmps,
    stockScore: 0,
    lifecycleScore: 0,
    quality: { flags: [], score: 0 },
    dataQuality: 0,
    voltageShare: 0,
    usable: false,
    maxGain: 0,
    minGain: 0,
    outputCurrentShare: 0,
    outputFails: true,
    outputVbeVolts: 0,
    leastSatVolts: null,
  };
}

function collectFacts<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], settings: BaseSettings): PartFacts<P>[] {
  const { sheet, options, fullMargin } = settings;
  const plan: SheetPlan = planSheet(sheet, options.evaluate);
  const catalogue = prepareCatalogue(entries, options.catalogueVersion);
  const prepared = catalogue.parts;
  const peakVce = peakVceOf(sheet);
  const peakIc = peakIcOf(sheet);
  const currency = options.currency ?? null;
  const voltage = newRatingReading();
  const current = newRatingReading();
  const factor = options.evaluate?.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  // The fact objects are kept with the prepared catalogue and overwritten by each search, so the search allocates no 10 000 fresh ones.
  let facts = factBuffers.get(catalogue) as PartFacts<P>[] | undefined;
  if (facts === undefined) {
    facts = prepared.map((entry, index) => blankFacts(index, entry.part));
    factBuffers.set(catalogue, facts as unknown as PartFacts<PartSpec>[]);
  }
  const range = { maxGain: 0, minGain: 0 };
  const vbe = { volts: 0, assumed: false };
  for (let index = 0; index < prepared.length; index += 1) {
    const entry = prepared[index];
    const part = entry.part;
    const supply = supplyOf(entry, sheet.orderQuantity, currency);
    const quality = qualityOf(entry, plan);
    readRating(peakVce, part.vceoVolts, sheet.derating.voltageFraction, voltage);
    gainRange(entry, factor, range);
    readRating(leastOutputCurrent(peakIc, range.minGain, settings), part.icMaxAmps, sheet.derating.currentFraction, current);
    const fact = facts[index];
    fact.supply = supply;
    fact.unitPrice = supply.price?.effectiveUnitPrice ?? null;
    fact.stockScore = supply.stockScore;
    fact.lifecycleScore = supply.lifecycleScore;
    fact.quality = quality;
    fact.dataQuality = quality.score;
    fact.voltageShare = shareOfMargin(voltage.margin, fullMargin);
    fact.usable = !isOutsidePackages(entry, plan) && voltage.verdict !== "fails" && range.maxGain > 0;
    fact.maxGain = range.maxGain;
    fact.minGain = range.minGain;
    fact.outputCurrentShare = shareOfMargin(current.margin, fullMargin);
    fact.outputFails = current.verdict === "fails";
    fact.outputVbeVolts = chooseVbeInto(part, sheet.operatingIcAmps, "linear", vbe).volts;
    fact.leastSatVolts = entry.leastSatVolts;
  }
  return facts;
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
  const vceVolts = sheet.mode === "switching" ? chooseVbe(part, sheet.operatingIcAmps, "linear").volts : operatingVceOf(sheet);
  const thermal = judgeThermal(deviceThermalInput(part, "output", sheet, vceVolts, leastOutputCurrent(sheet.operatingIcAmps, facts.minGain, settings)));
  return { share: thermal.margin === null ? null : shareOfMargin(thermal.margin, settings.fullMargin), fails: thermal.verdict === "fails" };
}

/**
 * At each of the circuit's currents the output carries between the least current it can carry and
 * the pair's own. The lowest maximum of its gain over those spans caps the β the gain check sees
 * (log-log between points and flat beyond, the model's maximum over a span lies at its ends or a
 * point inside); a span lying wholly beyond the gain window means gain-off-point for every pair.
 */
function reachOutput(output: PartFacts<PartSpec>, settings: BaseSettings): OutputReach {
  const { sheet } = settings;
  const evaluate = settings.options.evaluate;
  const model = worstGainModel(output.part, evaluate);
  const curve = prepareGain(output.part.gainPoints).worstCurve;
  const windowDecades = evaluate?.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES;
  let cap = Number.POSITIVE_INFINITY;
  let offPoint = false;
  for (const icAmps of [minIcOf(sheet), sheet.operatingIcAmps, peakIcOf(sheet)]) {
    const low = leastOutputCurrent(icAmps, output.minGain, settings);
    let most = Math.max(model(Math.max(low, Number.MIN_VALUE)), model(icAmps));
    for (const point of output.part.gainPoints) if (point.icAmps > low && point.icAmps < icAmps) most = Math.max(most, model(point.icAmps));
    cap = Math.min(cap, most);
    if (curve !== null && low > 0) {
      // Both ends beyond the window on the same side: every current between them is too.
      const below = icAmps < curve.icAmps[0] && decadesOutside(curve.icAmps, icAmps) > windowDecades;
      const above = low > curve.icAmps[curve.icAmps.length - 1] && decadesOutside(curve.icAmps, low) > windowDecades;
      if (below || above) offPoint = true;
    }
  }
  return { gainCap: Math.min(output.maxGain, cap * (1 + GAIN_RANGE_SLACK)), offPoint };
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
function leastDriverCurrent(driverMinGain: number, outputMaxGain: number, peakIcAmps: number): number {
  const alpha = driverMinGain / (driverMinGain + 1);
  return (alpha * peakIcAmps) / (outputMaxGain + alpha);
}

/** The best a pass's partners can offer a part in the other role: the highest gain, the lowest VBE2, the lowest VCE(sat)1. */
interface PartnerExtremes {
  /** For drivers: the highest output gain and the lowest output VBE. */
  bestOutputGain: number;
  leastOutputVbe: number;
  /** For outputs: the highest driver gain, and the lowest driver VCE(sat) (null when some driver quotes none, so VCE(sat) bounds nothing). */
  bestDriverGain: number;
  leastDriverSat: number | null;
}

interface Pass<P extends PartSpec> {
  topology: CompoundTopology;
  drivers: PartFacts<P>[];
  outputs: PartFacts<P>[];
  partners: PartnerExtremes;
}

function extremesOf(drivers: readonly PartFacts<PartSpec>[], outputs: readonly PartFacts<PartSpec>[]): PartnerExtremes {
  let bestOutputGain = 0;
  let leastOutputVbe = Number.POSITIVE_INFINITY;
  for (const f of outputs) {
    bestOutputGain = Math.max(bestOutputGain, f.maxGain);
    leastOutputVbe = Math.min(leastOutputVbe, f.outputVbeVolts);
  }
  let bestDriverGain = 0;
  let leastDriverSat: number | null = Number.POSITIVE_INFINITY;
  for (const f of drivers) {
    bestDriverGain = Math.max(bestDriverGain, f.maxGain);
    leastDriverSat = leastDriverSat === null || f.leastSatVolts === null ? null : Math.min(leastDriverSat, f.leastSatVolts);
  }
  return { bestOutputGain, leastOutputVbe, bestDriverGain, leastDriverSat };
}

/** Whether VCE(sat) = VCE(sat)1 + VBE2 must exceed the allowed drop (a hair of slack for rounding); false when either is unknown. */
function saturationExceeds(driverSatVolts: number | null, outputVbeVolts: number, sheet: RequirementSheet): boolean {
  const allowed = sheet.allowedSatDropVolts;
  if (sheet.mode !== "switching" || allowed === null || driverSatVolts === null) return false;
  return driverSatVolts + outputVbeVolts > allowed * (1 + 1e-9);
}

/**
 * Drivers and outputs per topology and pair polarity, after every prune that needs no particular
 * partner: each part is tested against the best its pass's partners can offer.
 */
function buildPasses<P extends PartSpec>(facts: PartFacts<P>[], settings: BaseSettings, topologies: readonly CompoundTopology[]): Pass<P>[] {
  const { sheet, requiredHfe } = settings;
  const peakIc = peakIcOf(sheet);
  const polarities: Polarity[] = sheet.polarity === "any" ? ["npn", "pnp"] : [sheet.polarity];
  const passes: Pass<P>[] = [];
  for (const topology of topologies) {
    for (const polarity of polarities) {
      const drivers = facts.filter((f) => f.usable && f.polarity === polarity);
      const outputs = facts.filter((f) => f.usable && !f.outputFails && f.polarity === outputPolarity(topology, polarity));
      if (drivers.length === 0 || outputs.length === 0) continue;
      const partners = extremesOf(drivers, outputs);
      passes.push({
        topology,
        drivers: drivers.filter(
          (f) =>
            reaches(topology, requiredHfe, f.maxGain, partners.bestOutputGain) &&
            leastDriverCurrent(f.minGain, partners.bestOutputGain, peakIc) <= f.icMaxAmps &&
            !saturationExceeds(f.leastSatVolts, partners.leastOutputVbe, sheet),
        ),
        outputs: outputs.filter(
          (f) => reaches(topology, requiredHfe, partners.bestDriverGain, f.maxGain) && !saturationExceeds(partners.leastDriverSat, f.outputVbeVolts, sheet),
        ),
        partners,
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

/**
 * The margin shares that depend on both devices, bounded from the driver's and the output's numbers:
 * the driver's current (skipped when driverIcMaxAmps is null), VCE(sat)1 + VBE2, and the pair's β.
 * Each share rises with the output's gain and falls with its VBE, so the best partner gives a bound for a part alone.
 * outputBetaGain, when given, is a tighter cap on the output's gain at the circuit's currents, for the β term.
 */
function crossShareBound(
  driverIcMaxAmps: number | null,
  driverMinGain: number,
  driverMaxGain: number,
  driverSatVolts: number | null,
  outputMaxGain: number,
  outputVbeVolts: number,
  topology: CompoundTopology,
  settings: Settings,
  outputBetaGain = outputMaxGain,
): number {
  const { sheet, requiredHfe, fullMargin } = settings;
  let least = 1;
  if (driverIcMaxAmps !== null) {
    // The same arithmetic as judgeAgainstRating, without building its result in the innermost loop.
    const deratedLimit = driverIcMaxAmps * sheet.derating.currentFraction;
    least = Math.min(least, shareOfMargin((deratedLimit - leastDriverCurrent(driverMinGain, outputMaxGain, peakIcOf(sheet))) / deratedLimit, fullMargin));
  }
  // VCE(sat) = VCE(sat)1 + VBE2, and VCE(sat)1 is no lower than the least the driver's curve gives.
  const allowed = sheet.allowedSatDropVolts;
  if (sheet.mode === "switching" && allowed !== null && driverSatVolts !== null) {
    least = Math.min(least, shareOfMargin((allowed - (driverSatVolts + outputVbeVolts)) / allowed, fullMargin));
  }
  if (requiredHfe !== null) {
    const beta = compoundBeta(topology, driverMaxGain, outputBetaGain);
    least = Math.min(least, shareOfMargin((beta - requiredHfe) / beta, fullMargin));
  }
  return least;
}

/** Margin-share bounds a pair cannot beat: the tightest check governs the margin score. */
function pairMarginBound(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, thermal: ThermalBound, topology: CompoundTopology, settings: Settings, outputGainCap: number): number {
  let least = Math.min(driver.voltageShare, output.voltageShare, output.outputCurrentShare);
  if (thermal.share !== null) least = Math.min(least, thermal.share);
  return Math.min(
    least,
    crossShareBound(driver.icMaxAmps, driver.minGain, driver.maxGain, driver.leastSatVolts, output.maxGain, output.outputVbeVolts, topology, settings, outputGainCap),
  );
}

function scoreBound(margin: number, price: number | null, stock: number, lifecycle: number, dataQuality: number, settings: Settings): number {
  return combineScoreParts(margin, scoreCost(price, settings.referencePrice), stock, lifecycle, dataQuality, settings.weights) + BOUND_SLACK;
}

function sumPrices(a: number | null, b: number | null): number | null {
  return a === null || b === null ? null : a + b;
}

/** A part's bound in one role: the best any partner of its pass could make of it (the cheapest, the highest gain, the lowest drops). */
function soloBound(
  facts: PartFacts<PartSpec>,
  role: "driver" | "output",
  cheapestPartner: number | null,
  pass: Pass<PartSpec>,
  settings: Settings,
  thermal?: ThermalBound,
): number {
  const { partners, topology } = pass;
  let margin =
    role === "output"
      ? Math.min(
          facts.voltageShare,
          facts.outputCurrentShare,
          crossShareBound(null, 0, partners.bestDriverGain, partners.leastDriverSat, facts.maxGain, facts.outputVbeVolts, topology, settings),
        )
      : Math.min(
          facts.voltageShare,
          crossShareBound(facts.icMaxAmps, facts.minGain, facts.maxGain, facts.leastSatVolts, partners.bestOutputGain, partners.leastOutputVbe, topology, settings),
        );
  if (thermal?.share != null) margin = Math.min(margin, thermal.share);
  return scoreBound(margin, sumPrices(facts.unitPrice, cheapestPartner), facts.stockScore, facts.lifecycleScore, facts.dataQuality, settings);
}

/** What the search learns about an output once it reaches it: a cap on its gain and whether its gain is surely quoted far off. */
interface OutputReach {
  gainCap: number;
  /** Its current lies beyond the gain window at one of the circuit's currents whatever the driver, so the pair carries gain-off-point. */
  offPoint: boolean;
}

function pairBound(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, thermal: ThermalBound, topology: CompoundTopology, settings: Settings, reach: OutputReach): number {
  return scoreBound(
    pairMarginBound(driver, output, thermal, topology, settings, reach.gainCap),
    sumPrices(driver.unitPrice, output.unitPrice),
    Math.min(driver.stockScore, output.stockScore),
    Math.min(driver.lifecycleScore, output.lifecycleScore),
    scoreRecordQuality(Math.min(driver.dataQuality, output.dataQuality), reach.offPoint),
    settings,
  );
}

class RankedPair<P extends PartSpec> implements RankedCompound<P> {
  readonly topology: CompoundTopology;
  readonly driver: P;
  readonly output: P;
  readonly verdict: "fits" | "marginal";
  readonly score: number;
  readonly components: ScoreComponents;
  readonly price: RankedCompound<P>["price"];
  readonly bleed: BleedSuggestion | null;
  readonly #screen: CompoundScreen<P>;
  #evaluation: CompoundEvaluation<P> | null = null;

  constructor(screen: CompoundScreen<P>, fields: Omit<RankedCompound<P>, "evaluation">) {
    this.topology = fields.topology;
    this.driver = fields.driver;
    this.output = fields.output;
    this.verdict = fields.verdict;
    this.score = fields.score;
    this.components = fields.components;
    this.price = fields.price;
    this.bleed = fields.bleed;
    this.#screen = screen;
  }

  get evaluation(): CompoundEvaluation<P> {
    this.#evaluation ??= explainCompound(this.#screen);
    return this.#evaluation;
  }
}

/** Screens one pair with its bleed resistor and scores it; null when it fails. The explanation waits until it is read. */
function scorePair<P extends PartSpec>(topology: CompoundTopology, driver: PartFacts<P>, output: PartFacts<P>, settings: Settings): RankedCompound<P> | null {
  const { sheet, options } = settings;
  const bleed =
    settings.bleed === "suggested"
      ? suggestBleedForPair(topology, driver.part, output.part, sheet, { ...options.evaluate, maxShare: settings.maxBleedShare })
      : null;
  const screen = screenCompound(topology, driver.part, output.part, sheet, { ...options.evaluate, bleedOhms: bleed?.ohms ?? null }, [driver.quality, output.quality]);
  if (screen.verdict === "fails") return null;
  const price = sumPrices(driver.unitPrice, output.unitPrice);
  const components: ScoreComponents = {
    margin: scoreLeastMargin(screen.margin, settings.fullMargin),
    cost: scoreCost(price, settings.referencePrice),
    stock: Math.min(driver.supply.stockScore, output.supply.stockScore),
    lifecycle: Math.min(driver.supply.lifecycleScore, output.supply.lifecycleScore),
    dataQuality: scoreRecordQuality(screen.dataQualityScore, (screen.flags & FLAG_BITS["gain-off-point"]) !== 0),
  };
  return new RankedPair(screen, {
    topology,
    driver: driver.part,
    output: output.part,
    verdict: screen.verdict,
    score: combineScore(components, settings.weights),
    components,
    price: { driver: driver.supply.price, output: output.supply.price, effectiveUnitPrice: price },
    bleed,
  });
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

/** Drivers in falling order of their bounds (ties by catalogue position), with the bounds beside them. */
interface RankedDrivers<P extends PartSpec> {
  items: PartFacts<P>[];
  bounds: Float64Array;
}

function rankDrivers<P extends PartSpec>(drivers: PartFacts<P>[], boundOf: (facts: PartFacts<P>) => number): RankedDrivers<P> {
  const bounds = new Float64Array(drivers.length);
  for (let i = 0; i < drivers.length; i += 1) bounds[i] = boundOf(drivers[i]);
  const order = Array.from(drivers.keys()).sort((a, b) => bounds[b] - bounds[a] || drivers[a].index - drivers[b].index);
  const sortedBounds = new Float64Array(drivers.length);
  for (let i = 0; i < order.length; i += 1) sortedBounds[i] = bounds[order[i]];
  return { items: order.map((i) => drivers[i]), bounds: sortedBounds };
}

/** One pass made ready to walk: its drivers in falling order of their bounds, and the bound of each output. */
interface PassWalk<P extends PartSpec> {
  pass: Pass<P>;
  drivers: RankedDrivers<P>;
  outputBounds: Float64Array;
  cheapestDriver: number | null;
}

/** A binary heap with the best item on top: yields items best first without sorting them all. */
class BestFirst<T> {
  readonly #items: T[];
  readonly #before: (a: T, b: T) => boolean;

  constructor(items: T[], before: (a: T, b: T) => boolean) {
    this.#items = items;
    this.#before = before;
    for (let i = (items.length >> 1) - 1; i >= 0; i -= 1) this.#siftDown(i);
  }

  pop(): T | undefined {
    const items = this.#items;
    const top = items[0];
    const last = items.pop();
    if (items.length > 0 && last !== undefined) {
      items[0] = last;
      this.#siftDown(0);
    }
    return top;
  }

  #siftDown(start: number): void {
    const items = this.#items;
    let i = start;
    for (;;) {
      const left = 2 * i + 1;
      let best = i;
      if (left < items.length && this.#before(items[left], items[best])) best = left;
      if (left + 1 < items.length && this.#before(items[left + 1], items[best])) best = left + 1;
      if (best === i) return;
      const held = items[i];
      items[i] = items[best];
      items[best] = held;
      i = best;
    }
  }
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
  // Every (pass, output) slot as a number, so ordering them builds no object per output.
  const walks: PassWalk<P>[] = [];
  const slotWalk: number[] = [];
  const slotOutput: number[] = [];
  for (const pass of passes) {
    const cheapestDriver = cheapestPrice(pass.drivers);
    const cheapestOutput = cheapestPrice(pass.outputs);
    const drivers = rankDrivers(pass.drivers, (item) => soloBound(item, "driver", cheapestOutput, pass, settings));
    const outputBounds = new Float64Array(pass.outputs.length);
    for (let i = 0; i < pass.outputs.length; i += 1) {
      outputBounds[i] = soloBound(pass.outputs[i], "output", cheapestDriver, pass, settings);
      slotWalk.push(walks.length);
      slotOutput.push(i);
    }
    walks.push({ pass, drivers, outputBounds, cheapestDriver });
  }
  const boundOf = (slot: number) => walks[slotWalk[slot]].outputBounds[slotOutput[slot]];
  const outputOf = (slot: number) => walks[slotWalk[slot]].pass.outputs[slotOutput[slot]];
  // Best bound first; ties by catalogue position, then topology, as a sort by compareSlots would give.
  const before = (a: number, b: number) =>
    (boundOf(b) - boundOf(a) || outputOf(a).index - outputOf(b).index || compareText(walks[slotWalk[a]].pass.topology, walks[slotWalk[b]].pass.topology)) < 0;
  const kthScore = () => (heap.isFull ? (heap.worst()?.score ?? Number.POSITIVE_INFINITY) : Number.NEGATIVE_INFINITY);
  // A heap rather than a sort: the walk stops after a few outputs, so ordering them all would be wasted.
  const slotQueue = new BestFirst(Array.from(slotWalk.keys()), before);
  for (let id = slotQueue.pop(); id !== undefined; id = slotQueue.pop()) {
    if (boundOf(id) < kthScore()) break;
    const slot = walks[slotWalk[id]];
    const topology = slot.pass.topology;
    const output = outputOf(id);
    const thermal = boundOutputThermal(output, settings);
    // Even at the least current it can carry, the output overheats: every pair with it fails.
    if (thermal.fails) continue;
    if (soloBound(output, "output", slot.cheapestDriver, slot.pass, settings, thermal) < kthScore()) continue;
    const reach = reachOutput(output, settings);
    const { items: drivers, bounds } = slot.drivers;
    for (let i = 0; i < drivers.length; i += 1) {
      if (bounds[i] < kthScore()) break;
      const driver = drivers[i];
      counts.considered += 1;
      if (!reaches(topology, settings.requiredHfe, driver.maxGain, output.maxGain)) continue;
      if (leastDriverCurrent(driver.minGain, output.maxGain, peakIc) > driver.icMaxAmps) continue;
      if (saturationExceeds(driver.leastSatVolts, output.outputVbeVolts, sheet)) continue;
      if (pairBound(driver, output, thermal, topology, settings, reach) < kthScore()) continue;
      counts.evaluated += 1;
      const ranked = scorePair(topology, driver, output, settings);
      if (ranked === null) counts.failed += 1;
      else heap.push(ranked);
    }
  }
  return resultOf(options, settings, k, heap.toSortedArray(), facts.length * facts.length * topologies.length, counts);
}
