// A ranking of single parts against a requirement sheet: scored fits and marginals, and failures with reasons.
// Every part is screened (numeric judgements only); explanations are built when a row's evaluation is read.
import { type CheckResult, FLAG_BITS, type FlagName, flagsOfMask, type Verdict } from "./check-result";
import {
  explainScreen,
  findExclusions,
  isExcluded,
  newPartScreen,
  type PartEvaluation,
  type PartScreen,
  type PreparedPart,
  preparePart,
  screenPart,
} from "./evaluate-part";
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
  scoreLeastMargin,
  scoreRecordQuality,
  scoreStock,
  type ScoreWeights,
  validateWeights,
} from "./score";
import { type EvaluateOptions, planSheet, type SheetPlan } from "./screening";

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
  /** The full explanation; rankParts builds it on first read, so only the rows a page shows pay for it. */
  readonly evaluation: PartEvaluation;
}

export interface FailedCandidate<P extends PartSpec = PartSpec> {
  part: P;
  /** One sentence per failing check; rankParts builds them on first read. */
  readonly reasons: string[];
  /** rankParts gives them in FLAG_NAMES order (the evaluation keeps check order). */
  readonly flags: FlagName[];
  readonly evaluation: PartEvaluation;
}

export interface ExcludedCandidate<P extends PartSpec = PartSpec> {
  part: P;
  /** Why the sheet rules it out before any check: polarity, package; rankParts builds them on first read. */
  readonly reasons: string[];
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

/** A catalogue part with what the engine works out once per catalogue state. */
export interface PreparedEntry<P extends PartSpec = PartSpec> extends PreparedPart<P> {
  offers: readonly Offer[];
  /** Position in compareParts order, for sorting results without comparing strings. */
  order: number;
  /** The supply facts for the order quantity and currency last asked for; they depend on nothing else. */
  supplyQuantity: number;
  supplyCurrency: string | null;
  supply: SupplyFacts | null;
}

/** A catalogue ready to rank: every part prepared, kept in catalogue order (the order they sit in memory, so the loop reads it fastest). */
export interface PreparedCatalogue<P extends PartSpec = PartSpec> {
  catalogueVersion: string;
  size: number;
  parts: PreparedEntry<P>[];
}

// One prepared catalogue per entries array, reused while the caller passes the same catalogue version.
const preparedCatalogues = new WeakMap<readonly CatalogueEntry[], PreparedCatalogue>();

/** Prepares a catalogue once per catalogue version: a version names one immutable state of the entries. */
export function prepareCatalogue<P extends PartSpec>(entries: readonly CatalogueEntry<P>[], catalogueVersion: string): PreparedCatalogue<P> {
  const known = preparedCatalogues.get(entries) as PreparedCatalogue<P> | undefined;
  if (known !== undefined && known.catalogueVersion === catalogueVersion && known.size === entries.length) return known;
  // Listed field by field: a spread here leaves objects that V8 reads many times slower in the ranking loop.
  const parts = entries.map((entry): PreparedEntry<P> => {
    const part = preparePart(entry.part);
    return {
      part: part.part,
      gain: part.gain,
      saturation: part.saturation,
      packageKey: part.packageKey,
      worstGainMax: part.worstGainMax,
      worstGainMin: part.worstGainMin,
      leastSatVolts: part.leastSatVolts,
      qualityKey: part.qualityKey,
      quality: part.quality,
      offers: entry.offers,
      order: 0,
      supplyQuantity: Number.NaN,
      supplyCurrency: null,
      supply: null,
    };
  });
  // A stable sort, so parts with equal keys keep their catalogue order.
  const sorted = [...parts].sort((a, b) => compareParts(a.part, b.part));
  for (let i = 0; i < sorted.length; i += 1) sorted[i].order = i;
  const prepared: PreparedCatalogue<P> = { catalogueVersion, size: entries.length, parts };
  preparedCatalogues.set(entries, prepared as unknown as PreparedCatalogue);
  return prepared;
}

/** readSupply for a prepared part, worked out once per order quantity and currency. */
export function supplyOf(entry: PreparedEntry<PartSpec>, orderQuantity: number, currency: string | null): SupplyFacts {
  if (entry.supply === null || entry.supplyQuantity !== orderQuantity || entry.supplyCurrency !== currency) {
    entry.supply = readSupply(entry.offers, entry.part.lifecycle, orderQuantity, currency);
    entry.supplyQuantity = orderQuantity;
    entry.supplyCurrency = currency;
  }
  return entry.supply;
}

/** The explanation of one prepared part under a plan, screened afresh so it owns its numbers. */
function explainPrepared(prepared: PreparedPart, plan: SheetPlan): PartEvaluation {
  return explainScreen(screenPart(prepared, plan, newPartScreen(plan)), plan);
}

class RankedRow<P extends PartSpec> implements RankedPart<P> {
  readonly part: P;
  readonly verdict: "fits" | "marginal";
  score = 0;
  readonly components: ScoreComponents;
  readonly price: OrderPrice | null;
  readonly #prepared: PreparedEntry<P>;
  readonly #plan: SheetPlan;
  #evaluation: PartEvaluation | null = null;

  constructor(prepared: PreparedEntry<P>, plan: SheetPlan, verdict: "fits" | "marginal", components: ScoreComponents, price: OrderPrice | null) {
    this.part = prepared.part;
    this.verdict = verdict;
    this.components = components;
    this.price = price;
    this.#prepared = prepared;
    this.#plan = plan;
  }

  /** compareRankedParts, with the part order read from the prepared catalogue. */
  static compare(a: RankedRow<PartSpec>, b: RankedRow<PartSpec>): number {
    return b.score - a.score || a.#prepared.order - b.#prepared.order;
  }

  get evaluation(): PartEvaluation {
    this.#evaluation ??= explainPrepared(this.#prepared, this.#plan);
    return this.#evaluation;
  }
}

class FailedRow<P extends PartSpec> implements FailedCandidate<P> {
  readonly part: P;
  readonly #flagMask: number;
  readonly #prepared: PreparedEntry<P>;
  readonly #plan: SheetPlan;
  #evaluation: PartEvaluation | null = null;

  constructor(prepared: PreparedEntry<P>, plan: SheetPlan, flagMask: number) {
    this.part = prepared.part;
    this.#flagMask = flagMask;
    this.#prepared = prepared;
    this.#plan = plan;
  }

  static compare(a: FailedRow<PartSpec>, b: FailedRow<PartSpec>): number {
    return a.#prepared.order - b.#prepared.order;
  }

  get flags(): FlagName[] {
    return flagsOfMask(this.#flagMask);
  }

  get evaluation(): PartEvaluation {
    this.#evaluation ??= explainPrepared(this.#prepared, this.#plan);
    return this.#evaluation;
  }

  get reasons(): string[] {
    return failureReasons(this.evaluation.checks);
  }
}

class ExcludedRow<P extends PartSpec> implements ExcludedCandidate<P> {
  readonly part: P;
  readonly #prepared: PreparedEntry<P>;
  readonly #sheet: RequirementSheet;

  constructor(prepared: PreparedEntry<P>, sheet: RequirementSheet) {
    this.part = prepared.part;
    this.#prepared = prepared;
    this.#sheet = sheet;
  }

  static compare(a: ExcludedRow<PartSpec>, b: ExcludedRow<PartSpec>): number {
    return a.#prepared.order - b.#prepared.order;
  }

  get reasons(): string[] {
    return findExclusions(this.part, this.#sheet);
  }
}

/** Ranks every entry against the sheet; nothing is dropped: each part lands in `ranked`, `failing` or `excluded`. */
export function rankParts<P extends PartSpec>(
  entries: readonly CatalogueEntry<P>[],
  sheet: RequirementSheet,
  options: RankingOptions,
): Ranking<RankedPart<P>, FailedCandidate<P>, ExcludedCandidate<P>> {
  return rankPrepared(prepareCatalogue(entries, options.catalogueVersion), sheet, options);
}

/** rankParts on a catalogue prepared by prepareCatalogue. */
export function rankPrepared<P extends PartSpec>(
  catalogue: PreparedCatalogue<P>,
  sheet: RequirementSheet,
  options: RankingOptions,
): Ranking<RankedPart<P>, FailedCandidate<P>, ExcludedCandidate<P>> {
  const weights = validateWeights(options.weights ?? { ...DEFAULT_SCORE_WEIGHTS });
  const currency = options.currency ?? null;
  const fullMargin = options.fullMargin ?? FULL_MARGIN;
  const plan = planSheet(sheet, options.evaluate);
  const screen: PartScreen = newPartScreen(plan);
  const ranked: RankedRow<P>[] = [];
  const failing: FailedRow<P>[] = [];
  const excluded: ExcludedRow<P>[] = [];
  let referencePrice: number | null = null;
  const parts = catalogue.parts;
  for (let i = 0; i < parts.length; i += 1) {
    const prepared = parts[i];
    // Polarity and package rule a part out before any check, so it is never screened.
    if (isExcluded(prepared, plan)) {
      excluded.push(new ExcludedRow(prepared, sheet));
      continue;
    }
    screenPart(prepared, plan, screen);
    if (screen.verdict === "fails") {
      failing.push(new FailedRow(prepared, plan, screen.flags));
      continue;
    }
    const supply = supplyOf(prepared, sheet.orderQuantity, currency);
    const unit = supply.price?.effectiveUnitPrice;
    if (unit !== undefined && (referencePrice === null || unit < referencePrice)) referencePrice = unit;
    const components: ScoreComponents = {
      margin: scoreLeastMargin(screen.margin, fullMargin),
      cost: 0,
      stock: supply.stockScore,
      lifecycle: supply.lifecycleScore,
      dataQuality: scoreRecordQuality(screen.dataQuality.score, (screen.flags & FLAG_BITS["gain-off-point"]) !== 0),
    };
    ranked.push(new RankedRow(prepared, plan, screen.verdict, components, supply.price));
  }
  for (let i = 0; i < ranked.length; i += 1) {
    const row = ranked[i];
    row.components.cost = scoreCost(row.price?.effectiveUnitPrice ?? null, referencePrice);
    row.score = combineScore(row.components, weights);
  }
  ranked.sort(RankedRow.compare);
  failing.sort(FailedRow.compare);
  excluded.sort(ExcludedRow.compare);
  return { catalogueVersion: options.catalogueVersion, weights, orderQuantity: sheet.orderQuantity, ranked, failing, excluded };
}
