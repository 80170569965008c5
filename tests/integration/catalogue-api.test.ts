// GET /api/parts (every filter, sort, paging) and GET /api/parts/:partId (offers, history, flags) over HTTP.
import { beforeAll, describe, expect, it } from "vitest";
import { newAgent, signIn, type Agent } from "../setup/http.ts";
import { commitParts, LIBRARIAN, makeOffer, makeSpec, offersFile, operate, uploadIntake } from "../setup/intake-helpers.ts";

const MAKER = "Filterby Instruments";
let agent: Agent;
let engineer: Agent;

// Twelve invented parts whose values make each filter pick out a known set.
const parts = [
  makeSpec(MAKER, "FBY-01", { vceoVolts: 30, icMaxAmps: 0.1, packageName: "TO-92" }),
  makeSpec(MAKER, "FBY-02", { vceoVolts: 45, icMaxAmps: 0.2, packageName: "SOT-23", polarity: "pnp" }),
  makeSpec(MAKER, "FBY-03", { vceoVolts: 60, icMaxAmps: 0.5, packageName: "SOT-23", lifecycle: "nrnd" }),
  makeSpec(MAKER, "FBY-04", { vceoVolts: 80, icMaxAmps: 1, packageName: "TO-220", lifecycle: "obsolete" }),
  makeSpec(MAKER, "FBY-05", { vceoVolts: 100, icMaxAmps: 3, packageName: "TO-220", configuration: "darlington", gainPoints: [{ icAmps: 1, vceVolts: 3, hfeMin: 1000, hfeTyp: null, hfeMax: null, tempC: 25 }] }),
  makeSpec(MAKER, "FBY-06", { vceoVolts: 120, icMaxAmps: 5, packageName: "TO-247", polarity: "pnp" }),
  // Gain quoted only at 1 mA (hFE min 300) and 100 mA (hFE min 30): at 10 mA the log-log curve gives 94.87.
  makeSpec(MAKER, "FBY-07", {
    gainPoints: [
      { icAmps: 0.001, vceVolts: 5, hfeMin: 300, hfeTyp: null, hfeMax: null, tempC: 25 },
      { icAmps: 0.1, vceVolts: 5, hfeMin: 30, hfeTyp: null, hfeMax: null, tempC: 25 },
    ],
  }),
  // Typical gain only: worst case is typ × 0.5 (the engine's stated factor).
  makeSpec(MAKER, "FBY-08", { gainPoints: [{ icAmps: 0.01, vceVolts: 5, hfeMin: null, hfeTyp: 400, hfeMax: null, tempC: 25 }], earlyVolts: null }),
  makeSpec(MAKER, "FBY-09", { vceoVolts: 25 }),
  makeSpec(MAKER, "FBY-10", { vceoVolts: 26 }),
  makeSpec(MAKER, "FBY-11", { vceoVolts: 27 }),
  makeSpec(MAKER, "FBY-12", { vceoVolts: 28, ftHz: null }),
];

async function list(query: Record<string, string | string[]>, who: Agent = engineer) {
  const params = new URLSearchParams({ q: "FBY-" });
  for (const [key, value] of Object.entries(query)) for (const v of [value].flat()) params.append(key, v);
  const response = await who.get(`/api/parts?${params.toString()}`);
  expect(response.status).toBe(200);
  return response.body as { rows: Array<Record<string, unknown>>; total: number; page: number; pageSize: number; packages: string[] };
}

const numbers = (body: { rows: Array<Record<string, unknown>> }) => body.rows.map((r) => r.partNumber);

beforeAll(async () => {
  agent = newAgent();
  engineer = newAgent();
  await signIn(agent, LIBRARIAN);
  await signIn(engineer, "engineer@larkfield.example.com");
  await commitParts(agent, "filterby-parts.csv", parts);
  const offers = await uploadIntake(
    agent,
    "offers",
    "filterby-offers.csv",
    offersFile([
      { manufacturer: MAKER, partNumber: "FBY-01", offer: makeOffer("Quayside Stock", { stock: 100, priceBreaks: [{ quantity: 1, unitPrice: 0.3 }] }) },
      { manufacturer: MAKER, partNumber: "FBY-01", offer: makeOffer("Harrowgate Supply", { stock: 50, priceBreaks: [{ quantity: 1, unitPrice: 0.25 }] }) },
      { manufacturer: MAKER, partNumber: "FBY-02", offer: makeOffer("Quayside Stock", { stock: 10, priceBreaks: [{ quantity: 1, unitPrice: 0.1 }] }) },
    ]),
  );
  expect((await operate(agent, offers.body.id, "commit")).status).toBe(200);
});

describe("GET /api/parts", () => {
  it("searches manufacturer and part number, sorts by part number, and pages with totals", async () => {
    const first = await list({ sort: "partNumber", size: "10" });
    expect(first).toMatchObject({ total: 12, page: 1, pageSize: 10 });
    expect(numbers(first)).toEqual(parts.slice(0, 10).map((p) => p.partNumber));
    const second = await list({ sort: "partNumber", size: "10", page: "2" });
    expect(numbers(second)).toEqual(["FBY-11", "FBY-12"]);
    expect(second.total).toBe(12);
    const beyond = await list({ sort: "partNumber", size: "10", page: "3" });
    expect(beyond).toMatchObject({ rows: [], total: 12 });
    expect((await list({ q: "filterby instr" })).total).toBe(12);
    expect(first.packages).toEqual(expect.arrayContaining(["TO-92", "SOT-23", "TO-220", "TO-247"]));
  });

  it("filters by polarity, package (repeatable), configuration and lifecycle (repeatable)", async () => {
    expect(numbers(await list({ polarity: "pnp", sort: "partNumber" }))).toEqual(["FBY-02", "FBY-06"]);
    expect(numbers(await list({ package: ["TO-220", "to-247"], sort: "partNumber" }))).toEqual(["FBY-04", "FBY-05", "FBY-06"]);
    expect(numbers(await list({ configuration: "darlington" }))).toEqual(["FBY-05"]);
    expect(numbers(await list({ lifecycle: ["nrnd", "obsolete"], sort: "partNumber" }))).toEqual(["FBY-03", "FBY-04"]);
  });

  it("filters ranges of VCEO and IC max, with units typed the trade's way", async () => {
    expect(numbers(await list({ vceoMin: "60V", vceoMax: "100 V", sort: "vceo" }))).toEqual(["FBY-03", "FBY-04", "FBY-05"]);
    expect(numbers(await list({ icMaxMin: "500mA", icMaxMax: "1", sort: "icMax", dir: "desc" }))).toEqual(["FBY-04", "FBY-03"]);
  });

  it("filters and sorts by worst-case hFE at a chosen IC through the engine's gain curve", async () => {
    const at10mA = await list({ hfeAt: "10mA", hfeMin: "90", hfeMax: "100" });
    expect(numbers(at10mA)).toEqual(["FBY-07"]);
    // Reference: log-log interpolation between (1 mA, 300) and (100 mA, 30) at 10 mA gives 300 × 0.1^0.5 = 94.868.
    expect(at10mA.rows[0]!.hfeAtChosen).toBeCloseTo(94.868, 2);
    const typOnly = await list({ hfeAt: "10mA", q: "FBY-08" });
    expect(typOnly.rows[0]).toMatchObject({ hfeAtChosen: 200, flags: expect.arrayContaining(["no-min-gain", "early-unknown", "single-gain-point"]) });
    const sorted = await list({ hfeAt: "1A", sort: "hfe", dir: "desc", size: "10" });
    expect(sorted.rows[0]).toMatchObject({ partNumber: "FBY-05", hfeAtChosen: 1000 });
  });

  it("filters on offers and shows the best first-break price and total stock", async () => {
    expect(numbers(await list({ hasOffers: "yes", sort: "price" }))).toEqual(["FBY-02", "FBY-01"]);
    expect((await list({ hasOffers: "no" })).total).toBe(10);
    const [withOffers] = (await list({ q: "FBY-01" })).rows;
    expect(withOffers).toMatchObject({ offerCount: 2, stockTotal: 150, bestUnitPrice: { amount: 0.25, currency: "EUR" } });
  });

  it("answers 400 naming each bad filter", async () => {
    const response = await engineer.get("/api/parts?polarity=sideways&hfeAt=3V&size=5000");
    expect(response.status).toBe(400);
    expect(response.body.error).toMatchObject({
      code: "invalid-query",
      details: { polarity: "polarity must be one of npn, pnp", size: "size must be at most 200", hfeAt: expect.stringMatching(/^hfeAt: /) },
    });
    expect((await engineer.get("/api/parts?hfeMin=10")).body.error.details).toEqual({ hfeAt: expect.stringContaining("collector current") });
  });
});

describe("GET /api/parts/:partId", () => {
  it("shows the part with its offers, data-quality flags and the intake or edit behind each revision", async () => {
    await commitParts(agent, "filterby-correction.csv", [{ ...parts[0]!, vceoVolts: 32 }]);
    const [row] = (await list({ q: "FBY-01" })).rows;
    const response = await engineer.get(`/api/parts/${row!.id}`);
    expect(response.status).toBe(200);
    expect(response.body.part).toMatchObject({ partNumber: "FBY-01", vceoVolts: 32, gainPoints: parts[0]!.gainPoints });
    expect(response.body.offers.map((o: { supplier: string }) => o.supplier)).toEqual(["Harrowgate Supply", "Quayside Stock"]);
    expect(response.body.dataQuality.flags).toEqual([]);
    expect(response.body.catalogueVersion).toEqual(expect.any(Number));
    const [latest, created] = response.body.revisions;
    expect(latest).toMatchObject({ action: "intake", source: { kind: "intake", fileName: "filterby-correction.csv" }, changes: [{ field: "vceoVolts", before: 30, after: 32 }] });
    expect(created).toMatchObject({ action: "intake", source: { kind: "intake", fileName: "filterby-parts.csv" } });
    expect(created.changes).toEqual(expect.arrayContaining([{ field: "partNumber", before: null, after: "FBY-01" }]));
  });

  it("answers 404 JSON for an unknown or malformed id", async () => {
    for (const id of ["00000000-0000-4000-8000-000000000000", "not-a-uuid"]) {
      const response = await engineer.get(`/api/parts/${id}`);
      expect(response.status).toBe(404);
      expect(response.body.error).toMatchObject({ code: "not-found", message: "No part in the catalogue has that id." });
    }
  });
});

describe("best-price sort across currencies (issue item 18)", () => {
  it("never orders an amount in one currency against an amount in another", async () => {
    const maker = "Tillbury Devices";
    await commitParts(agent, "tillbury-parts.csv", ["TLB-1", "TLB-2", "TLB-3", "TLB-4"].map((n) => makeSpec(maker, n)));
    const offer = (partNumber: string, currency: string, unitPrice: number) => ({
      manufacturer: maker,
      partNumber,
      offer: makeOffer("Harbourline Stock", { currency, priceBreaks: [{ quantity: 1, unitPrice }] }),
    });
    const offers = await uploadIntake(
      agent,
      "offers",
      "tillbury-offers.csv",
      offersFile([offer("TLB-1", "EUR", 0.5), offer("TLB-2", "USD", 0.2), offer("TLB-3", "EUR", 0.3), offer("TLB-4", "USD", 0.1)]),
    );
    expect((await operate(agent, offers.body.id, "commit")).status).toBe(200);
    const inEuro = await list({ q: "TLB-", sort: "price", currency: "EUR" });
    expect(numbers(inEuro)).toEqual(["TLB-3", "TLB-1", "TLB-4", "TLB-2"]);
    expect(inEuro).toMatchObject({ priceCurrency: "EUR" });
    expect(inEuro.rows.map((r) => r.bestUnitPrice)).toEqual([
      { amount: 0.3, currency: "EUR" },
      { amount: 0.5, currency: "EUR" },
      { amount: 0.1, currency: "USD" },
      { amount: 0.2, currency: "USD" },
    ]);
    expect(numbers(await list({ q: "TLB-", sort: "price", currency: "usd" }))).toEqual(["TLB-4", "TLB-2", "TLB-3", "TLB-1"]);
    // Descending keeps the chosen currency first; within each currency the amounts run high to low.
    expect(numbers(await list({ q: "TLB-", sort: "price", dir: "desc", currency: "EUR" }))).toEqual(["TLB-1", "TLB-3", "TLB-2", "TLB-4"]);
  });
});
