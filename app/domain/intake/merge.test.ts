import { describe, expect, it } from "vitest";
import type { Offer, PartSpec } from "../part";
import { mergeOffer, mergePartSpec } from "./merge";

const catalogue: PartSpec = {
  manufacturer: "Keepwell Devices",
  partNumber: "KPW-1",
  polarity: "npn",
  packageName: "TO-92",
  configuration: "single",
  vceoVolts: 45,
  vcboVolts: 50,
  veboVolts: 6,
  icMaxAmps: 0.1,
  ptotWatts: 0.5,
  ptotReference: "ambient",
  tjMaxC: 150,
  rthJaCPerW: 250,
  rthJcCPerW: null,
  gainPoints: [{ icAmps: 0.002, vceVolts: 5, hfeMin: 110, hfeTyp: 250, hfeMax: 450, tempC: 25 }],
  saturationPoints: [{ icAmps: 0.01, ibAmps: 0.001, vceSatMaxVolts: 0.25, vceSatTypVolts: null, vbeSatVolts: null }],
  vbeOnVolts: 0.65,
  ftHz: 2.5e8,
  cobFarads: 4e-12,
  earlyVolts: 100,
  lifecycle: "obsolete",
  datasheetUrl: null,
  datasheetRevisionDate: "2024-03-15",
};

describe("mergePartSpec", () => {
  it("keeps every field the file has no column for, and takes the file's value for the others (empty ones too)", () => {
    const incoming: PartSpec = {
      ...catalogue,
      vceoVolts: 60,
      cobFarads: null,
      ftHz: null,
      lifecycle: "active",
      gainPoints: [{ icAmps: 0.002, vceVolts: null, hfeMin: 120, hfeTyp: null, hfeMax: null, tempC: null }],
      saturationPoints: [],
    };
    const present = new Set(["manufacturer", "partNumber", "vceoVolts", "cobFarads", "gainPoints", "gainPoints.icAmps", "gainPoints.hfeMin"]);
    expect(mergePartSpec(catalogue, incoming, present)).toEqual({
      ...catalogue,
      vceoVolts: 60,
      cobFarads: null,
      gainPoints: [{ icAmps: 0.002, vceVolts: 5, hfeMin: 120, hfeTyp: 250, hfeMax: 450, tempC: 25 }],
    });
  });

  it("replaces a present point list; a point at a new IC keeps no value from the catalogue", () => {
    const incoming = { ...catalogue, gainPoints: [{ icAmps: 0.003, vceVolts: null, hfeMin: 90, hfeTyp: null, hfeMax: null, tempC: null }] };
    const merged = mergePartSpec(catalogue, incoming, new Set(["gainPoints", "gainPoints.icAmps", "gainPoints.hfeMin"]));
    expect(merged.gainPoints).toEqual(incoming.gainPoints);
  });
});

describe("mergeOffer", () => {
  it("keeps offer fields the file has no column for", () => {
    const before: Offer = { supplier: "Harbourline Stock", supplierSku: "HL-77", stock: 1000, minimumOrder: 10, orderMultiple: 1, priceBreaks: [{ quantity: 1, unitPrice: 0.2 }], currency: "EUR", leadTimeDays: 28, asOf: "2026-11-01" };
    const after: Offer = { ...before, supplierSku: null, stock: 40, minimumOrder: 1, leadTimeDays: null, asOf: "2026-11-30" };
    expect(mergeOffer(before, after, new Set(["supplier", "stock", "currency", "asOf", "priceBreaks"]))).toEqual({ ...before, stock: 40, asOf: "2026-11-30" });
  });
});
