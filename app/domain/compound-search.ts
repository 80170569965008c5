// The best k Darlington and Sziklai pairs in a catalogue, found without walking all N × N pairs.
import { type BleedSuggestion, DEFAULT_BLEED_SHARE, suggestBleedForPair } from "./bleed-resistor";
import { judgeAgainstRating } from "./checks/rating";
import { canPair, compoundBeta, type CompoundEvaluation, type CompoundTopology, COMPOUND_TOPOLOGIES, evaluateCompound, findCompoundExclusions } from "./compound";
import { assessDataQuality } from "./data-quality";
import { findExclusions } from "./evaluate-part";
import { worstCaseGain } from "./gain-curve";
import type { PartSpec, Polarity } from "./part";
import { compareText, type CatalogueEntry, type RankingOptions, readSupply, type SupplyFacts } from "./rank";
import { minIcOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";
import { combineScore, DEFAULT_SCORE_WEIGHTS, FULL_MARGIN, type OrderPrice, type ScoreComponents, scoreCost, scoreDataQuality, scoreMargins, type ScoreWeights, validateWeights } from "./score";
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

/** What the search knows about a part before pairing it: supply, data quality, ratings, gain range. */
interface PartFacts<P extends PartSpec> {
  index: number;
  part: P;
  supply: SupplyFacts;
  unitPrice: number | null;
  dataQuality: number;
  /** The voltage check's share of the margin score, exact: both roles stand the full peak VCE. */
  voltageShare: number;
  voltageFails: boolean;
  packageAllowed: boolean;
  /** Highest and lowest worst-case hFE anywhere on its curve (log-log between points, flat beyond). */
  maxGain: number;
  minGain: number;
}

interface Settings {
  sheet: RequirementSheet;
  weights: ScoreWeights;
  fullMargin: number;
  referencePrice: number | null;
  bleed: "suggested" | "none";
  maxBleedShare: number;
  options: CompoundSearchOptions;
}

function clampUnit(value: number): number {
  return value < 0 ? 0 : value > 1 ? 1 : value;
}

function gainRange(part: PartSpec, options: CompoundSearchOptions): { maxGain: number; minGain: number } {
  let maxGain = 0;
  let minGain = Number.POSITIVE_INFINITY;
  // The curve is piecewise monotone between quoted points and flat beyond, so its extremes sit on the points.
  for (const point of part.gainPoints) {
    const hfe = worstCaseGain(part.gainPoints, point.icAmps, options.evaluate).hfe;
    maxGain = Math.max(maxGain, hfe);
    minGain = Math.min(minGain, hfe);
  }
  return { maxGain, minGain: Number.isFinite(minGain) ? minGain : 0 };
}

function collectFacts<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], settings: Omit<Settings, "referencePrice">): PartFacts<P>[] {
  const { sheet, options } = settings;
  const anyPolarity: RequirementSheet = { ...sheet, polarity: "any" };
  const peakVce = peakVceOf(sheet);
  return entries.map((entry, index) => {
    const supply = readSupply(entry.offers, entry.part.lifecycle, sheet.orderQuantity, options.currency ?? null);
    const voltage = judgeAgainstRating(peakVce, entry.part.vceoVolts, sheet.derating.voltageFraction);
    return {
      index,
      part: entry.part,
      supply,
      unitPrice: supply.price?.effectiveUnitPrice ?? null,
      dataQuality: assessDataQuality(entry.part, options.evaluate).score,
      voltageShare: clampUnit(voltage.margin / settings.fullMargin),
      voltageFails: voltage.verdict === "fails",
      packageAllowed: findExclusions(entry.part, anyPolarity).length === 0,
      ...gainRange(entry.part, options),
    };
  });
}

/** The most a pair can score: exact cost, stock, lifecycle and data-quality bounds; margin at most the voltage check's. */
function pairBound(driver: PartFacts<PartSpec>, output: PartFacts<PartSpec>, settings: Settings): number {
  const price = driver.unitPrice === null || output.unitPrice === null ? null : driver.unitPrice + output.unitPrice;
  return combineScore(
    {
      margin: 0.5 * Math.min(driver.voltageShare, output.voltageShare) + 0.5,
      cost: scoreCost(price, settings.referencePrice),
      stock: Math.min(driver.supply.stockScore, output.supply.stockScore),
      lifecycle: Math.min(driver.supply.lifecycleScore, output.supply.lifecycleScore),
      dataQuality: Math.min(driver.dataQuality, output.dataQuality),
    },
    settings.weights,
  );
}

/** A part's own bound in one role: the best any partner could make of it (cheapest partner, perfect otherwise). */
function soloBound(facts: PartFacts<PartSpec>, cheapestPartner: number | null, settings: Settings): number {
  const price = facts.unitPrice === null || cheapestPartner === null ? null : facts.unitPrice + cheapestPartner;
  return combineScore(
    {
      margin: 0.5 * facts.voltageShare + 0.5,
      cost: scoreCost(price, settings.referencePrice),
      stock: facts.supply.stockScore,
      lifecycle: facts.supply.lifecycleScore,
      dataQuality: facts.dataQuality,
    },
    settings.weights,
  );
}

function requiredPairHfe(sheet: RequirementSheet): number | null {
  return sheet.requiredHfe ?? (sheet.mode === "switching" ? sheet.forcedGain : null);
}

/** Evaluates one pair with its bleed resistor and scores it; null when it fails. */
function scorePair<P extends PartSpec>(
  topology: CompoundTopology,
  driver: PartFacts<P>,
  output: PartFacts<P>,
  settings: Settings,
): RankedCompound<P> | null {
  const { sheet, options } = settings;
  const bleed =
    settings.bleed === "suggested"
      ? suggestBleedForPair(topology, driver.part, output.part, sheet, { ...options.evaluate, maxShare: settings.maxBleedShare })
      : null;
  const evaluation = evaluateCompound(topology, driver.part, output.part, sheet, { ...options.evaluate, bleedOhms: bleed?.ohms ?? null });
  if (evaluation.verdict === "fails") return null;
  const price = driver.unitPrice === null || output.unitPrice === null ? null : driver.unitPrice + output.unitPrice;
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

function settle<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], sheet: RequirementSheet, options: CompoundSearchOptions) {
  const base = {
    sheet,
    weights: validateWeights(options.weights ?? { ...DEFAULT_SCORE_WEIGHTS }),
    fullMargin: options.fullMargin ?? FULL_MARGIN,
    bleed: options.bleed ?? "suggested",
    maxBleedShare: options.maxBleedShare ?? DEFAULT_BLEED_SHARE,
    options,
  } as const;
  const facts = collectFacts(entries, base);
  let cheapest: number | null = null;
  for (const fact of facts) {
    if (fact.unitPrice !== null && (cheapest === null || fact.unitPrice < cheapest)) cheapest = fact.unitPrice;
  }
  // A pair costs two parts: twice the catalogue's cheapest part is the price that scores 1.
  const settings: Settings = { ...base, referencePrice: cheapest === null ? null : 2 * cheapest };
  return { facts, settings, k: options.k ?? DEFAULT_TOP_K, topologies: options.topologies ?? COMPOUND_TOPOLOGIES };
}

function outputPolarity(topology: CompoundTopology, driverPolarity: Polarity): Polarity {
  if (topology === "darlington") return driverPolarity;
  return driverPolarity === "npn" ? "pnp" : "npn";
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
  return {
    catalogueVersion: options.catalogueVersion,
    weights: settings.weights,
    orderQuantity: sheet.orderQuantity,
    k,
    ranked: found.slice(0, k),
    pairSpace: facts.length * facts.length * topologies.length,
    pairsConsidered: evaluated,
    pairsEvaluated: evaluated,
    pairsFailed: evaluated - found.length,
  };
}

interface RoleList<P extends PartSpec> {
  facts: PartFacts<P>;
  bound: number;
}

function sortByBound<P extends PartSpec>(list: RoleList<P>[]): RoleList<P>[] {
  return list.sort((a, b) => b.bound - a.bound || a.facts.index - b.facts.index);
}

/**
 * The best k pairs. Prunes before any gain math (polarity per topology, packages, VCEO against the
 * peak VCE, each device's IC max against the least current it can carry, the highest gain the two
 * curves can reach against the gain required), then walks outputs and drivers in falling order of
 * their score bounds, stopping as soon as a bound cannot beat the k-th score kept in the heap.
 * Agrees with rankCompoundsExhaustively: a pair is skipped only when it must fail or cannot enter the top k.
 */
export function searchCompounds<P extends PartSpec>(
  entries: readonly CatalogueEntry<P>[],
  sheet: RequirementSheet,
  options: CompoundSearchOptions,
): CompoundSearchResult<P> {
  const { facts, settings, k, topologies } = settle(entries, sheet, options);
  const heap = new TopK<RankedCompound<P>>(k, compareRankedCompounds);
  const peakIc = peakIcOf(sheet);
  const minIc = minIcOf(sheet);
  const requiredHfe = requiredPairHfe(sheet);
  // The suggested bleed takes at most s of the driver's current at the lowest IC, so Ibleed ≤ s / (1 − s) × IC(min).
  const bleedLimitAmps = settings.bleed === "none" ? 0 : (settings.maxBleedShare / (1 - settings.maxBleedShare)) * minIc;
  const usable = facts.filter((f) => f.packageAllowed && !f.voltageFails && f.maxGain > 0);
  let considered = 0;
  let evaluated = 0;
  let failed = 0;

  const pairPolarities: Polarity[] = sheet.polarity === "any" ? ["npn", "pnp"] : [sheet.polarity];
  const passes: { topology: CompoundTopology; drivers: RoleList<P>[]; output: RoleList<P> }[] = [];
  for (const topology of topologies) {
    for (const polarity of pairPolarities) {
      const driverFacts = usable.filter((f) => f.part.polarity === polarity);
      const outputFacts = usable.filter((f) => {
        if (f.part.polarity !== outputPolarity(topology, polarity)) return false;
        // IC2 ≥ (IC − Ibleed) β2 / (β2 + 1) in both topologies; above IC max the output fails its current check.
        if (f.minGain >= 1 && ((peakIc - bleedLimitAmps) * f.minGain) / (f.minGain + 1) > f.part.icMaxAmps) return false;
        return true;
      });
      if (driverFacts.length === 0 || outputFacts.length === 0) continue;
      const bestDriverGain = Math.max(...driverFacts.map((f) => f.maxGain));
      const bestOutputGain = Math.max(...outputFacts.map((f) => f.maxGain));
      const cheapest = (list: PartFacts<P>[]) => list.reduce<number | null>((low, f) => (f.unitPrice !== null && (low === null || f.unitPrice < low) ? f.unitPrice : low), null);
      const cheapestDriver = cheapest(driverFacts);
      const cheapestOutput = cheapest(outputFacts);
      const drivers = sortByBound(
        driverFacts.filter((f) => reaches(topology, requiredHfe, f.maxGain, bestOutputGain)).map((f) => ({ facts: f, bound: soloBound(f, cheapestOutput, settings) })),
      );
      for (const f of outputFacts) {
        if (reaches(topology, requiredHfe, bestDriverGain, f.maxGain)) passes.push({ topology, drivers, output: { facts: f, bound: soloBound(f, cheapestDriver, settings) } });
      }
    }
  }
  passes.sort((a, b) => b.output.bound - a.output.bound || a.output.facts.index - b.output.facts.index || compareText(a.topology, b.topology));

  const kthScore = () => (heap.isFull ? (heap.worst()?.score ?? Number.NEGATIVE_INFINITY) : Number.NEGATIVE_INFINITY);
  for (const pass of passes) {
    if (pass.output.bound < kthScore()) break;
    const output = pass.output.facts;
    for (const { facts: driver, bound } of pass.drivers) {
      if (bound < kthScore()) break;
      considered += 1;
      if (!reaches(pass.topology, requiredHfe, driver.maxGain, output.maxGain)) continue;
      // The driver carries at least α IC / (β2 + α) at the peak, α = β1 / (β1 + 1) at its lowest β1.
      const alpha = driver.minGain / (driver.minGain + 1);
      if ((alpha * peakIc) / (output.maxGain + alpha) > driver.part.icMaxAmps) continue;
      if (pairBound(driver, output, settings) < kthScore()) continue;
      evaluated += 1;
      const ranked = scorePair(pass.topology, driver, output, settings);
      if (ranked === null) failed += 1;
      else heap.push(ranked);
    }
  }
  return {
    catalogueVersion: options.catalogueVersion,
    weights: settings.weights,
    orderQuantity: sheet.orderQuantity,
    k,
    ranked: heap.toSortedArray(),
    pairSpace: facts.length * facts.length * topologies.length,
    pairsConsidered: considered,
    pairsEvaluated: evaluated,
    pairsFailed: failed,
  };
}

/** Whether the highest gains the two curves reach can make the pair's β required; bleed only lowers it. */
function reaches(topology: CompoundTopology, requiredHfe: number | null, driverGain: number, outputGain: number): boolean {
  return requiredHfe === null || compoundBeta(topology, driverGain, outputGain) >= requiredHfe;
}
