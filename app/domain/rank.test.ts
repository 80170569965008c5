import { describe, expect, it } from "vitest";
import type { CheckResult } from "./check-result";
import type { Offer, PartSpec } from "./part";
import { compareParts, compareText, failureReasons, rankParts, readSupply, type CatalogueEntry } from "./rank";
import { parseRequirementSheet } from "./requirement";

function makePart(manufacturer: string, partNumber: string, overrides: Partial<PartSpec> = {}): PartSpec {
  return {
    manufacturer,
    partNumber,
    polarity: "npn",
    packageName: "TO-92",
    configuration: "single",
    vceoVolts: 45,
    vcboVolts: null,
    veboVolts: 5,
    icMaxAmps: 0.5,
    ptotWatts: 0.625,
    ptotReference: "ambient",
    tjMaxC: 150,
    rthJaCPerW: 200,
    rthJcCPerW: null,
    gainPoints: [
      { icAmps: 1e-4, vceVolts: 5, hfeMin: 150, hfeTyp: 250, hfeMax: null, tempC: 25 },
      { icAmps: 1e-2, vceVolts: 5, hfeMin: 200, hfeTyp: 300, hfeMax: null, tempC: 25 },
    ],
    saturationPoints: [],
    vbeOnVolts: 0.65,
    ftHz: 2e8,
    cobFarads: null,
    earlyVolts: 100,
    lifecycle: "active",
    datasheetUrl: null,
    datasheetRevisionDate: "2024-01-01",
    ...overrides,
  };
}

function offer(unitPrice: number, stock = 100_000): Offer {
  return {
    supplier: "Calder Parts",
    supplierSku: null,
    stock,
    minimumOrder: 1,
    orderMultiple: 1,
    priceBreaks: [{ quantity: 1, unitPrice }],
    currency: "EUR",
    leadTimeDays: null,
    asOf: "2026-11-30",
  };
}

const sheet = parseRequirementSheet({
  supplyVolts: 24,
  operatingIcAmps: 1e-3,
  mode: "linear",
  vceOperatingVolts: 12,
  requiredHfe: 100,
  polarity: "npn",
  orderQuantity: 1000,
});

describe("rankParts", () => {
  const entries: CatalogueEntry[] = [
    { part: makePart("Tessaly Electronics", "TS-200"), offers: [offer(0.05)] },
    { part: makePart("Ardent Devices", "AD-110"), offers: [offer(0.05)] },
    { part: makePart("Ardent Devices", "AD-100"), offers: [offer(0.05)] },
    { part: makePart("Quillon Semiconductor", "QL-7"), offers: [offer(0.5)] },
    { part: makePart("Quillon Semiconductor", "QL-LOWV", { vceoVolts: 20 }), offers: [offer(0.01)] },
    { part: makePart("Quillon Semiconductor", "QL-PNP", { polarity: "pnp" }), offers: [offer(0.01)] },
  ];

  it("keeps failures in their own list with reasons, and parts outside polarity or package in another", () => {
    const ranking = rankParts(entries, sheet, { catalogueVersion: "cat-42" });
    expect(ranking.catalogueVersion).toBe("cat-42");
    expect(ranking.orderQuantity).toBe(1000);
    expect(ranking.failing.map((f) => f.part.partNumber)).toEqual(["QL-LOWV"]);
    expect(ranking.failing[0].reasons[0]).toContain("VCEO");
    expect(ranking.failing[0].flags).toContain("rating-below-supply");
    expect(ranking.excluded.map((x) => x.part.partNumber)).toEqual(["QL-PNP"]);
    expect(ranking.ranked).toHaveLength(4);
  });

  it("sorts by score, breaking ties by manufacturer then part number", () => {
    const ranking = rankParts(entries, sheet, { catalogueVersion: "v" });
    expect(ranking.ranked.map((r) => r.part.partNumber)).toEqual(["AD-100", "AD-110", "TS-200", "QL-7"]);
    expect(ranking.ranked[0].score).toBe(ranking.ranked[2].score);
    expect(ranking.ranked[3].score).toBeLessThan(ranking.ranked[2].score);
    expect(ranking.ranked[3].components.cost).toBeCloseTo(0.1, 12);
    for (const r of ranking.ranked) {
      expect(r.score).toBeGreaterThanOrEqual(0);
      expect(r.score).toBeLessThanOrEqual(100);
    }
  });

  it("is deterministic whatever order the catalogue arrives in", () => {
    const forward = rankParts(entries, sheet, { catalogueVersion: "v" });
    const backward = rankParts([...entries].reverse(), sheet, { catalogueVersion: "v" });
    expect(backward.ranked.map((r) => r.part.partNumber)).toEqual(forward.ranked.map((r) => r.part.partNumber));
  });

  it("follows the weights the engineer sets: with stock alone weighted, a part short of stock drops to the end", () => {
    const shortStock = [...entries.slice(0, 3), { part: makePart("Ardent Devices", "AD-050"), offers: [offer(0.01, 10)] }];
    const weights = { margin: 0, cost: 0, stock: 1, lifecycle: 0, dataQuality: 0 };
    const ranking = rankParts(shortStock, sheet, { catalogueVersion: "v", weights });
    expect(ranking.ranked.at(-1)?.part.partNumber).toBe("AD-050");
    expect(ranking.ranked.at(-1)?.score).toBeCloseTo(1, 9);
    expect(rankParts(shortStock, sheet, { catalogueVersion: "v" }).ranked[0].part.partNumber).toBe("AD-050");
  });

  it("gives a part without offers no cost or stock score but still ranks it", () => {
    const ranking = rankParts([{ part: makePart("Meridel Micro", "MR-1"), offers: [] }], sheet, { catalogueVersion: "v" });
    expect(ranking.ranked[0].price).toBeNull();
    expect(ranking.ranked[0].components.cost).toBe(0);
    expect(ranking.ranked[0].components.stock).toBe(0);
  });
});

describe("ranking helpers", () => {
  it("orders text by code unit, the same on every machine", () => {
    expect(compareText("B", "a")).toBeLessThan(0);
    expect(compareText("a", "a")).toBe(0);
    expect(compareParts(makePart("A", "2"), makePart("A", "10"))).toBeGreaterThan(0);
  });

  it("collects the summaries of failing checks as reasons", () => {
    const check = (verdict: CheckResult["verdict"], summary: string): CheckResult => ({
      check: "voltage",
      subject: "part",
      verdict,
      margin: null,
      flags: [],
      formula: "",
      inputs: [],
      summary,
    });
    expect(failureReasons([check("fits", "ok"), check("fails", "too hot"), check("marginal", "close")])).toEqual(["too hot"]);
  });

  it("reads the supply facts the score uses", () => {
    const facts = readSupply([offer(0.2, 50)], "nrnd", 100, null);
    expect(facts.price?.unitPrice).toBe(0.2);
    expect(facts.stockScore).toBe(0.5);
    expect(facts.lifecycleScore).toBe(0.5);
  });
});
