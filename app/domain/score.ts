// The 0-100 score of a candidate that passed its checks: margins, cost, stock, lifecycle, data quality.
import type { CheckResult, FlagName } from "./check-result";
import type { Lifecycle, Offer } from "./part";

/** Relative weights of the score's parts; only their ratios matter. */
export interface ScoreWeights {
  margin: number;
  cost: number;
  stock: number;
  lifecycle: number;
  dataQuality: number;
}

/**
 * Defaults: engineering headroom first (35), then what it costs (25), whether it can be had (20),
 * how long it will be made (10) and how far the data can be trusted (10).
 */
export const DEFAULT_SCORE_WEIGHTS: Readonly<ScoreWeights> = {
  margin: 35,
  cost: 25,
  stock: 20,
  lifecycle: 10,
  dataQuality: 10,
};

/** Each part of the score on 0..1, 1 being best. */
export interface ScoreComponents {
  margin: number;
  cost: number;
  stock: number;
  lifecycle: number;
  dataQuality: number;
}

/** What buying `quantity` from one offer costs once minimum order, order multiple and price breaks apply. */
export interface OrderPrice {
  supplier: string;
  supplierSku: string | null;
  currency: string;
  requestedQuantity: number;
  /** The quantity actually bought: at least the minimum order and the first break, a whole number of multiples. */
  orderedQuantity: number;
  unitPrice: number;
  totalPrice: number;
  /** Total price spread over the quantity needed, so that forced surplus counts against the offer. */
  effectiveUnitPrice: number;
  stock: number;
  inStock: boolean;
}

/** A margin of this fraction or more counts as full headroom. */
export const FULL_MARGIN = 0.5;

/** Share of the lifecycle score each state earns. */
export const LIFECYCLE_SCORES: Readonly<Record<Lifecycle, number>> = {
  active: 1,
  nrnd: 0.5,
  "last-time-buy": 0.25,
  obsolete: 0,
};

/** What an operating current far from the quoted gain points costs the data-quality score. */
export const GAIN_OFF_POINT_PENALTY = 0.25;


function roundUpToMultiple(quantity: number, multiple: number): number {
  const step = multiple >= 1 ? Math.floor(multiple) : 1;
  return Math.ceil(quantity / step) * step;
}

/** The price of buying `quantity` from `offer`; null when the offer quotes no price. */
export function priceAtQuantity(offer: Offer, quantity: number): OrderPrice | null {
  if (offer.priceBreaks.length === 0) return null;
  const breaks = [...offer.priceBreaks].sort((a, b) => a.quantity - b.quantity);
  const needed = Math.max(1, Math.ceil(quantity));
  const floor = Math.max(needed, offer.minimumOrder, breaks[0].quantity);
  const orderedQuantity = roundUpToMultiple(floor, offer.orderMultiple);
  let unitPrice = breaks[0].unitPrice;
  for (const priceBreak of breaks) {
    if (priceBreak.quantity <= orderedQuantity) unitPrice = priceBreak.unitPrice;
  }
  const totalPrice = unitPrice * orderedQuantity;
  return {
    supplier: offer.supplier,
    supplierSku: offer.supplierSku,
    currency: offer.currency,
    requestedQuantity: needed,
    orderedQuantity,
    unitPrice,
    totalPrice,
    effectiveUnitPrice: totalPrice / needed,
    stock: offer.stock,
    inStock: offer.stock >= orderedQuantity,
  };
}

function comparePrices(a: OrderPrice, b: OrderPrice): number {
  if (a.inStock !== b.inStock) return a.inStock ? -1 : 1;
  if (a.totalPrice !== b.totalPrice) return a.totalPrice - b.totalPrice;
  if (a.supplier !== b.supplier) return a.supplier < b.supplier ? -1 : 1;
  return (a.supplierSku ?? "") < (b.supplierSku ?? "") ? -1 : (a.supplierSku ?? "") > (b.supplierSku ?? "") ? 1 : 0;
}

/**
 * The offer to buy from: one that has the quantity in stock before one that has not, then the
 * lowest total, then supplier name. Prices are not converted: pass `currency` to compare only
 * offers in that currency when a catalogue mixes them.
 */
export function chooseOffer(offers: readonly Offer[], quantity: number, currency: string | null = null): OrderPrice | null {
  let best: OrderPrice | null = null;
  for (const offer of offers) {
    if (currency !== null && offer.currency !== currency) continue;
    const price = priceAtQuantity(offer, quantity);
    if (price !== null && (best === null || comparePrices(price, best) < 0)) best = price;
  }
  return best;
}

function clampUnit(value: number): number {
  return value < 0 ? 0 : value > 1 ? 1 : value;
}

/** Headroom on 0..1 from the tightest check, as the verdict follows the worst one; full at FULL_MARGIN. */
export function scoreMargins(checks: readonly CheckResult[], fullMargin = FULL_MARGIN): number {
  let least: number | null = null;
  for (const check of checks) {
    if (check.margin !== null) least = least === null ? check.margin : Math.min(least, check.margin);
  }
  return scoreLeastMargin(least, fullMargin);
}

/** The margin score from the tightest margin alone (the share is monotone, so the least margin gives the least share); 1 when no check gives one. */
export function scoreLeastMargin(leastMargin: number | null, fullMargin = FULL_MARGIN): number {
  return leastMargin === null ? 1 : Math.min(1, shareOfMargin(leastMargin, fullMargin));
}

/** One margin's share of the margin score: 0 at no headroom, 1 at fullMargin or more. */
export function shareOfMargin(margin: number, fullMargin = FULL_MARGIN): number {
  return clampUnit(margin / fullMargin);
}

/** Cost on 0..1 against the cheapest candidate: the cheapest scores 1, twice its price 0.5; no price 0. */
export function scoreCost(effectiveUnitPrice: number | null, referenceUnitPrice: number | null): number {
  if (effectiveUnitPrice === null) return 0;
  if (referenceUnitPrice === null || effectiveUnitPrice <= 0) return 1;
  return clampUnit(referenceUnitPrice / effectiveUnitPrice);
}

/** Stock on 0..1: the share of the quantity one supplier holds. */
export function scoreStock(stock: number | null, quantity: number): number {
  if (stock === null) return 0;
  return clampUnit(stock / Math.max(1, quantity));
}

/**
 * Data quality on 0..1: the record's own completeness (assessDataQuality's score) less a
 * quarter when the circuit runs the part far from its quoted gain points.
 */
export function scoreDataQuality(recordScore: number, flags: readonly FlagName[]): number {
  return scoreRecordQuality(recordScore, flags.includes("gain-off-point"));
}

/** scoreDataQuality with the gain-off-point finding given as a yes or no. */
export function scoreRecordQuality(recordScore: number, gainOffPoint: boolean): number {
  return clampUnit(recordScore - (gainOffPoint ? GAIN_OFF_POINT_PENALTY : 0));
}

/** Rejects weights that cannot make a score: negative, not finite, or all zero. */
export function validateWeights(weights: ScoreWeights): ScoreWeights {
  const values = [weights.margin, weights.cost, weights.stock, weights.lifecycle, weights.dataQuality];
  if (values.some((value) => !Number.isFinite(value) || value < 0)) {
    throw new RangeError("score weights must be finite and not negative");
  }
  if (values.every((value) => value === 0)) throw new RangeError("at least one score weight must be above zero");
  return weights;
}

/**
 * The 0-100 score from its components. Monotone in every component, so that bounds on the
 * components give a bound on the score with the same arithmetic.
 */
export function combineScore(components: ScoreComponents, weights: ScoreWeights): number {
  return combineScoreParts(components.margin, components.cost, components.stock, components.lifecycle, components.dataQuality, weights);
}

/** combineScore from the five components as numbers, for bounds worked out many times over without building objects. */
export function combineScoreParts(margin: number, cost: number, stock: number, lifecycle: number, dataQuality: number, weights: ScoreWeights): number {
  const total = weights.margin + weights.cost + weights.stock + weights.lifecycle + weights.dataQuality;
  const weighted =
    weights.margin * margin + weights.cost * cost + weights.stock * stock + weights.lifecycle * lifecycle + weights.dataQuality * dataQuality;
  return (100 * weighted) / total;
}
