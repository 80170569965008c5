import { describe, expect, it } from "vitest";
import type { Offer, PartSpec } from "../part";
import type { OfferRow } from "./offer-schema";
import { warnAboutOffer, warnAboutPart } from "./plausibility";
import type { ColumnLocator } from "./validate-rows";

const columnOf: ColumnLocator = (field, group) => (group ? `${group.field}[${group.index}].${field}` : field);

const part: PartSpec = {
  manufacturer: "Oddmix Devices",
  partNumber: "ODM-9",
  polarity: "npn",
  packageName: "TO-92",
  configuration: "single",
  vceoVolts: 45,
  vcboVolts: null,
  veboVolts: null,
  icMaxAmps: 0.1,
  ptotWatts: 0.625,
  ptotReference: "ambient",
  tjMaxC: null,
  rthJaCPerW: null,
  rthJcCPerW: null,
  gainPoints: [{ icAmps: 0.002, vceVolts: 5, hfeMin: 110, hfeTyp: null, hfeMax: null, tempC: null }],
  saturationPoints: [],
  vbeOnVolts: null,
  ftHz: null,
  cobFarads: null,
  earlyVolts: null,
  lifecycle: "active",
  datasheetUrl: null,
  datasheetRevisionDate: "2026-12-02",
};

describe("warnAboutPart", () => {
  it("has nothing to say about a plausible part, dated today", () => {
    expect(warnAboutPart(part, columnOf, "2026-12-02")).toEqual([]);
  });

  it("flags IC max beyond the outline and Ptot, a gain point above IC max, and a datasheet from the future", () => {
    const odd = { ...part, icMaxAmps: 8, gainPoints: [{ ...part.gainPoints[0]!, icAmps: 10 }], datasheetRevisionDate: "2026-12-03" };
    expect(warnAboutPart(odd, columnOf, "2026-12-02").map((w) => w.column)).toEqual(["icMaxAmps", "icMaxAmps", "gainPoints[0].icAmps", "datasheetRevisionDate"]);
  });

  it("accepts an IC max a low-saturation part can carry within Ptot (0.1 V × IC max ≤ Ptot, common practice)", () => {
    expect(warnAboutPart({ ...part, packageName: "SOT-23", icMaxAmps: 3, ptotWatts: 0.3 }, columnOf)).toEqual([]);
  });
});

describe("warnAboutOffer", () => {
  const offer: Offer = { supplier: "Harbourline Stock", supplierSku: null, stock: 10, minimumOrder: 1, orderMultiple: 1, priceBreaks: [{ quantity: 1, unitPrice: 0.2 }, { quantity: 100, unitPrice: 0.1 }], currency: "EUR", leadTimeDays: null, asOf: "2026-12-01" };
  const row = (o: Partial<Offer>): OfferRow => ({ manufacturer: "Oddmix Devices", partNumber: "ODM-9", offer: { ...offer, ...o } });

  it("has nothing to say about falling prices from the minimum order on", () => {
    expect(warnAboutOffer(row({}), columnOf, "2026-12-02")).toEqual([]);
  });

  it("flags a zero price, a rising price, a break below the minimum order and a future as-of date", () => {
    const odd = row({ minimumOrder: 50, priceBreaks: [{ quantity: 100, unitPrice: 0 }, { quantity: 10, unitPrice: 0.3 }, { quantity: 1000, unitPrice: 0.4 }], asOf: "2026-12-09" });
    expect(warnAboutOffer(odd, columnOf, "2026-12-02").map((w) => w.message)).toEqual([
      "price break 1: the price is zero",
      "price break 2: quantity 10 is below the minimum order of 50, so this price cannot be ordered",
      "price break 3: the price rises with quantity (0 from 100, 0.4 from 1000)",
      "as-of date 2026-12-09 is in the future",
    ]);
  });
});
