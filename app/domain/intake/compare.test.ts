import { describe, expect, it } from "vitest";
import { partKey, type PartSpec } from "../part";
import { compareWithCatalogue, listPartChanges, matchOffersToParts } from "./compare";
import type { OfferRow } from "./offer-schema";
import { cellProblem } from "./problems";

const part: PartSpec = {
  manufacturer: "Larkfield Semiconductor",
  partNumber: "LS-N100",
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
  gainPoints: [
    { icAmps: 0.002, vceVolts: 5, hfeMin: 110, hfeTyp: null, hfeMax: 450, tempC: 25 },
    { icAmps: 0.1, vceVolts: 1, hfeMin: 40, hfeTyp: null, hfeMax: null, tempC: 25 },
  ],
  saturationPoints: [{ icAmps: 0.01, ibAmps: 0.0005, vceSatMaxVolts: 0.25, vceSatTypVolts: null, vbeSatVolts: null }],
  vbeOnVolts: 0.65,
  ftHz: 2.5e8,
  cobFarads: 4e-12,
  earlyVolts: null,
  lifecycle: "active",
  datasheetUrl: null,
  datasheetRevisionDate: "2024-03-15",
};
const other: PartSpec = { ...part, partNumber: "LS-N200" };

describe("compareWithCatalogue", () => {
  it("classifies new, changed and unchanged parts and counts rejected rows from the problems", () => {
    const existing = new Map([[partKey(part.manufacturer, part.partNumber), part]]);
    const changed = { ...part, partNumber: "ls-n100 ", vceoVolts: 50 };
    const problems = [cellProblem(5, "vceo", "x", "bad"), cellProblem(5, "ic_max", "y", "bad"), cellProblem(6, "vceo", "z", "bad"), cellProblem(1, "colour", "colour", "unknown", "warning")];
    const result = compareWithCatalogue(
      [
        { row: 2, value: part },
        { row: 3, value: changed },
        { row: 4, value: other },
      ],
      existing,
      problems,
    );
    expect(result.counts).toEqual({ new: 1, changed: 1, unchanged: 1, rejected: 2 });
    expect(result.rows.map((r) => [r.row, r.status])).toEqual([
      [2, "unchanged"],
      [3, "changed"],
      [4, "new"],
    ]);
    expect(result.rows[1].changes).toEqual([
      { field: "partNumber", before: "LS-N100", after: "ls-n100 " },
      { field: "vceoVolts", before: 45, after: 50 },
    ]);
  });
});

describe("listPartChanges", () => {
  it("compares gain and saturation points as lists, whatever their order", () => {
    expect(listPartChanges(part, { ...part, gainPoints: [...part.gainPoints].reverse() })).toEqual([]);
  });

  it("shows a changed point list whole, sorted by IC", () => {
    const after = { ...part, gainPoints: [{ ...part.gainPoints[1], hfeMin: 50 }, part.gainPoints[0]] };
    expect(listPartChanges(part, after)).toEqual([
      { field: "gainPoints", before: part.gainPoints, after: [part.gainPoints[0], { ...part.gainPoints[1], hfeMin: 50 }] },
    ]);
  });

  it("reports a value that became null and one that appeared", () => {
    expect(listPartChanges(part, { ...part, vcboVolts: null, earlyVolts: 80 })).toEqual([
      { field: "vcboVolts", before: 50, after: null },
      { field: "earlyVolts", before: null, after: 80 },
    ]);
  });
});

describe("matchOffersToParts", () => {
  const offer = (manufacturer: string, partNumber: string): OfferRow => ({
    manufacturer,
    partNumber,
    offer: { supplier: "Harbour Components", supplierSku: null, stock: 1, minimumOrder: 1, orderMultiple: 1, priceBreaks: [{ quantity: 1, unitPrice: 0.1 }], currency: "EUR", leadTimeDays: null, asOf: "2024-06-01" },
  });

  it("names each offer whose part is not in the catalogue, matching trimmed and in any case", () => {
    const known = new Set([partKey("Larkfield Semiconductor", "LS-N100")]);
    const problems = matchOffersToParts(
      [
        { row: 2, value: offer(" LARKFIELD semiconductor", "ls-n100 ") },
        { row: 3, value: offer("Larkfield Semiconductor", "LS-N999") },
      ],
      known,
    );
    expect(problems).toEqual([
      {
        row: 3,
        column: "part_number",
        value: "LS-N999",
        severity: "error",
        message: 'no part "LS-N999" by "Larkfield Semiconductor" in the catalogue: import the part with a parts file first',
      },
    ]);
  });
});
