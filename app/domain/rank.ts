// A ranking of single parts against a requirement sheet: scored fits and marginals, and failures with reasons.
import type { CheckResult, FlagName, Verdict } from "./check-result";
import { type EvaluateOptions, evaluatePart, findExclusions, type PartEvaluation } from "./evaluate-part";
import type { Lifecycle, Offer, PartSpec } from "./part";
import type { RequirementSheet } from "./requirement";
import {
  chooseOffer,
  combineScore,
  DEFAULT_SCORE_WEIGHTS,
  FULL_MARGIN,
  LIFECYCLE_SCORES,
  type OrderPrice,
  type ScoreComponents,
  scoreCost,
  scoreDataQuality,
  scoreMargins,
  scoreStock,
  type ScoreWeights,
  validateWeights,
} from "./score";

/** A part with the offers it can be bought from. */
export interface CatalogueEntry<P extends PartSpec = PartSpec> {
  part: P;
  offers: readonly Offer[];
}

export interface RankingOptions {
  /** The catalogue state the ranking read, so that it can be reproduced (the caller knows it). */
  catalogueVersion: string;
  weights?: ScoreWeights;
  /** Compare only offers in this currency; null compares every offer as quoted. */
  currency?: string | null;
  /** Margin that counts as full headroom in the score. */
  fullMargin?: number;
  /** Passed to the evaluation: gain-curve factors, E-series, the date staleness is judged against. */
  evaluate?: EvaluateOptions;
}

export interface RankedPart<P extends PartSpec = PartSpec> {
  part: P;
  verdict: Exclude<Verdict, "fails">;
  score: number;
  components: ScoreComponents;
  price: OrderPrice | null;
  evaluation: PartEvaluation;
}

export interface FailedCandidate<P extends PartSpec = PartSpec> {
  part: P;
  /** One sentence per failing check. */
  reasons: string[];
  flags: FlagName[];
  evaluation: PartEvaluation;
}

export interface ExcludedCandidate<P extends PartSpec = PartSpec> {
  part: P;
  /** Why the sheet rules it out before any check: polarity, package. */
  reasons: string[];
}

export interface Ranking<R, F, X = never> {
  catalogueVersion: string;
  weights: ScoreWeights;
  orderQuantity: number;
  /** Fits and marginals, best score first, ties broken by manufacturer then part number. */
  ranked: R[];
  /** Candidates that failed a check, by manufacturer then part number, with their reasons. */
  failing: F[];
  /** Candidates outside the sheet's polarity or packages, by manufacturer then part number. */
  excluded: X[];
}

/** Plain code-unit order, so rankings agree on every machine and locale. */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

export function compareParts(a: PartSpec, b: PartSpec): number {
  return compareText(a.manufacturer, b.manufacturer) || compareText(a.partNumber, b.partNumber);
}

/** Best score first; equal scores fall back to manufacturer, then part number. */
export function compareRankedParts(a: RankedPart, b: RankedPart): number {
  return b.score - a.score || compareParts(a.part, b.part);
}

/** The sentences that say why a candidate failed. */
export function failureReasons(checks: readonly CheckResult[]): string[] {
  return checks.filter((check) => check.verdict === "fails").map((check) => check.summary);
}

/** The score's inputs that do not depend on the circuit: lifecycle, and what the order costs and finds in stock. */
export interface SupplyFacts {
  price: OrderPrice | null;
  stockScore: number;
  lifecycleScore: number;
}

export function readSupply(offers: readonly Offer[], lifecycle: Lifecycle, orderQuantity: number, currency: string | null): SupplyFacts {
  const price = chooseOffer(offers, orderQuantity, currency);
  return { price, stockScore: scoreStock(price?.stock ?? null, orderQuantity), lifecycleScore: LIFECYCLE_SCORES[lifecycle] };
}

/** Ranks every entry against the sheet; nothing is dropped: each part lands in `ranked`, `failing` or `excluded`. */
export function rankParts<P extends PartSpec>(
  entries: readonly CatalogueEntry<P>[],
  sheet: RequirementSheet,
  options: RankingOptions,
): Ranking<RankedPart<P>, FailedCandidate<P>, ExcludedCandidate<P>> {
  const weights = validateWeights(options.weights ?? { ...DEFAULT_SCORE_WEIGHTS });
  const currency = options.currency ?? null;
  const fullMargin = options.fullMargin ?? FULL_MARGIN;
  const passing: { entry: CatalogueEntry<P>; evaluation: PartEvaluation; supply: SupplyFacts }[] = [];
  const failing: FailedCandidate<P>[] = [];
  const excluded: ExcludedCandidate<P>[] = [];
  let referencePrice: number | null = null;
  for (const entry of entries) {
    // Polarity and package rule a part out before any check, so its evaluation is never built.
    const exclusions = findExclusions(entry.part, sheet);
    if (exclusions.length > 0) {
      excluded.push({ part: entry.part, reasons: exclusions });
      continue;
    }
    const evaluation = evaluatePart(entry.part, sheet, options.evaluate);
    if (evaluation.verdict === "fails") {
      failing.push({ part: entry.part, reasons: failureReasons(evaluation.checks), flags: evaluation.flags, evaluation });
      continue;
    }
    const supply = readSupply(entry.offers, entry.part.lifecycle, sheet.orderQuantity, currency);
    const unit = supply.price?.effectiveUnitPrice;
    if (unit !== undefined && (referencePrice === null || unit < referencePrice)) referencePrice = unit;
    passing.push({ entry, evaluation, supply });
  }
  const ranked = passing.map(({ entry, evaluation, supply }): RankedPart<P> => {
    const components: ScoreComponents = {
      margin: scoreMargins(evaluation.checks, fullMargin),
      cost: scoreCost(supply.price?.effectiveUnitPrice ?? null, referencePrice),
      stock: supply.stockScore,
      lifecycle: supply.lifecycleScore,
      dataQuality: scoreDataQuality(evaluation.dataQuality.score, evaluation.flags),
    };
    return {
      part: entry.part,
      verdict: evaluation.verdict === "marginal" ? "marginal" : "fits",
      score: combineScore(components, weights),
      components,
      price: supply.price,
      evaluation,
    };
  });
  ranked.sort(compareRankedParts);
  failing.sort((a, b) => compareParts(a.part, b.part));
  excluded.sort((a, b) => compareParts(a.part, b.part));
  return { catalogueVersion: options.catalogueVersion, weights, orderQuantity: sheet.orderQuantity, ranked, failing, excluded };
}
