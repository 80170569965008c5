import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { CheckResult } from "./check-result";
import type { Offer } from "./part";
import {
  chooseOffer,
  combineScore,
  DEFAULT_SCORE_WEIGHTS,
  LIFECYCLE_SCORES,
  priceAtQuantity,
  scoreCost,
  scoreDataQuality,
  scoreMargins,
  shareOfMargin,
  scoreStock,
  validateWeights,
  type ScoreComponents,
} from "./score";

function makeOffer(overrides: Partial<Offer> = {}): Offer {
  return {
    supplier: "Northwind Components",
    supplierSku: "NW-1",
    stock: 10_000,
    minimumOrder: 1,
    orderMultiple: 1,
    priceBreaks: [
      { quantity: 1, unitPrice: 0.5 },
      { quantity: 100, unitPrice: 0.2 },
      { quantity: 1000, unitPrice: 0.1 },
    ],
    currency: "EUR",
    leadTimeDays: null,
    asOf: "2026-11-30",
    ...overrides,
  };
}

function makeCheck(margin: number | null): CheckResult {
  return { check: "voltage", subject: "part", verdict: "fits", margin, flags: [], formula: "", inputs: [], summary: "" };
}

describe("priceAtQuantity", () => {
  it("uses the highest break at or below the quantity bought", () => {
    const price = priceAtQuantity(makeOffer(), 250);
    expect(price?.unitPrice).toBe(0.2);
    expect(price?.orderedQuantity).toBe(250);
    expect(price?.totalPrice).toBeCloseTo(50, 10);
  });

  it("raises the quantity to the minimum order and a whole number of multiples, and spreads the surplus", () => {
    const price = priceAtQuantity(makeOffer({ minimumOrder: 500, orderMultiple: 300 }), 10);
    expect(price?.orderedQuantity).toBe(600);
    expect(price?.unitPrice).toBe(0.2);
    expect(price?.effectiveUnitPrice).toBeCloseTo((600 * 0.2) / 10, 10);
  });

  it("buys at least the first break and reports stock against what is ordered", () => {
    const price = priceAtQuantity(makeOffer({ stock: 40, priceBreaks: [{ quantity: 50, unitPrice: 1 }] }), 5);
    expect(price?.orderedQuantity).toBe(50);
    expect(price?.inStock).toBe(false);
  });

  it("returns null for an offer without prices", () => {
    expect(priceAtQuantity(makeOffer({ priceBreaks: [] }), 10)).toBeNull();
  });
});

describe("chooseOffer", () => {
  it("prefers an offer that has the quantity in stock over a cheaper one that has not", () => {
    const cheap = makeOffer({ supplier: "Cheap", stock: 5, priceBreaks: [{ quantity: 1, unitPrice: 0.01 }] });
    const stocked = makeOffer({ supplier: "Stocked" });
    expect(chooseOffer([cheap, stocked], 100)?.supplier).toBe("Stocked");
  });

  it("takes the lowest total among stocked offers and skips other currencies when asked", () => {
    const a = makeOffer({ supplier: "A", priceBreaks: [{ quantity: 1, unitPrice: 0.3 }] });
    const b = makeOffer({ supplier: "B", priceBreaks: [{ quantity: 1, unitPrice: 0.2 }], currency: "USD" });
    expect(chooseOffer([a, b], 10)?.supplier).toBe("B");
    expect(chooseOffer([a, b], 10, "EUR")?.supplier).toBe("A");
    expect(chooseOffer([], 10)).toBeNull();
  });
});

describe("score components", () => {
  it("scores margins from the tightest check, full at 50% headroom", () => {
    expect(scoreMargins([makeCheck(0.5), makeCheck(1)])).toBe(1);
    expect(scoreMargins([makeCheck(0.25), makeCheck(0.4)])).toBeCloseTo(0.5, 12);
    expect(scoreMargins([makeCheck(-0.2), makeCheck(null)])).toBe(0);
    expect(scoreMargins([])).toBe(1);
    expect(shareOfMargin(0.1)).toBeCloseTo(0.2, 12);
    expect(shareOfMargin(0.1, 0.2)).toBeCloseTo(0.5, 12);
  });

  it("scores cost against the cheapest candidate and gives nothing for a part without a price", () => {
    expect(scoreCost(0.2, 0.1)).toBeCloseTo(0.5, 12);
    expect(scoreCost(0.1, 0.1)).toBe(1);
    expect(scoreCost(null, 0.1)).toBe(0);
  });

  it("scores stock as the share of the quantity held, and lifecycle by state", () => {
    expect(scoreStock(50, 100)).toBe(0.5);
    expect(scoreStock(500, 100)).toBe(1);
    expect(scoreStock(null, 100)).toBe(0);
    expect(LIFECYCLE_SCORES.active).toBeGreaterThan(LIFECYCLE_SCORES.nrnd);
    expect(LIFECYCLE_SCORES.obsolete).toBe(0);
  });

  it("takes the record's completeness, less a quarter when the gain is quoted far from the operating point", () => {
    expect(scoreDataQuality(1, [])).toBe(1);
    expect(scoreDataQuality(0.75, ["no-min-gain", "gain-off-point"])).toBe(0.5);
    expect(scoreDataQuality(1, ["hot-junction"])).toBe(1);
    expect(scoreDataQuality(0, ["gain-off-point"])).toBe(0);
  });
});

describe("combineScore", () => {
  const unit = fc.double({ min: 0, max: 1, noNaN: true });
  const components = fc.record({ margin: unit, cost: unit, stock: unit, lifecycle: unit, dataQuality: unit });

  it("gives 100 for a perfect candidate and 0 for the worst", () => {
    const perfect: ScoreComponents = { margin: 1, cost: 1, stock: 1, lifecycle: 1, dataQuality: 1 };
    const none: ScoreComponents = { margin: 0, cost: 0, stock: 0, lifecycle: 0, dataQuality: 0 };
    expect(combineScore(perfect, DEFAULT_SCORE_WEIGHTS)).toBeCloseTo(100, 10);
    expect(combineScore(none, DEFAULT_SCORE_WEIGHTS)).toBe(0);
  });

  it("follows the weights: with only cost weighted, the score is the cost share", () => {
    const weights = { margin: 0, cost: 1, stock: 0, lifecycle: 0, dataQuality: 0 };
    expect(combineScore({ margin: 1, cost: 0.3, stock: 1, lifecycle: 1, dataQuality: 1 }, weights)).toBeCloseTo(30, 10);
  });

  it("never falls when a component rises (property)", () => {
    fc.assert(
      fc.property(components, unit, (base, raised) => {
        const higher = { ...base, cost: Math.max(base.cost, raised) };
        expect(combineScore(higher, DEFAULT_SCORE_WEIGHTS)).toBeGreaterThanOrEqual(combineScore(base, DEFAULT_SCORE_WEIGHTS));
      }),
    );
  });

  it("rejects negative or all-zero weights", () => {
    expect(() => validateWeights({ ...DEFAULT_SCORE_WEIGHTS, cost: -1 })).toThrow(RangeError);
    expect(() => validateWeights({ margin: 0, cost: 0, stock: 0, lifecycle: 0, dataQuality: 0 })).toThrow(RangeError);
    expect(validateWeights(DEFAULT_SCORE_WEIGHTS)).toBe(DEFAULT_SCORE_WEIGHTS);
  });
});
