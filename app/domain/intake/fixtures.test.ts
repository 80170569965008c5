import { describe, expect, it } from "vitest";
import { BAD_FIXTURE_EXPECTATIONS } from "#fixtures/intake/expectations.ts";
import { listIntakeFixtures, readIntakeFixture } from "#fixtures/intake/read-fixtures.ts";
import type { PartSpec } from "../part";
import { parseIntakeFile } from "./parse-intake";
import { parseOffersFile } from "./parse-offers";
import { parsePartsFile } from "./parse-parts";

const badFiles = listIntakeFixtures("bad");
// The future-date warnings need today's date, as the server passes it.
const OPTIONS = { todayIso: new Date().toISOString().slice(0, 10) };

describe("bad intake fixtures", () => {
  it("has at least 40 files, each with an expectation and each expectation with a file", () => {
    expect(badFiles.length).toBeGreaterThanOrEqual(40);
    expect(Object.keys(BAD_FIXTURE_EXPECTATIONS).sort()).toEqual(badFiles);
  });

  it.each(badFiles)("%s gives exactly the expected problems and readings", (name) => {
    const expected = BAD_FIXTURE_EXPECTATIONS[name];
    const result = parseIntakeFile(expected.kind, readIntakeFixture("bad", name), OPTIONS);
    const problems = result.problems.map(({ row, column, severity, message }) => ({ row, column, severity, message }));
    expect(problems).toEqual(expected.problems);
    expect(result.rows).toHaveLength(expected.acceptedRows);
    expect(result.readings).toEqual(expected.readings ?? []);
  });

  it("rejects every row that has an error", () => {
    for (const name of badFiles) {
      const expected = BAD_FIXTURE_EXPECTATIONS[name];
      const result = parseIntakeFile(expected.kind, readIntakeFixture("bad", name), OPTIONS);
      const rowsWithErrors = new Set(result.problems.filter((p) => p.severity === "error").map((p) => p.row));
      expect(result.rows.filter((r) => rowsWithErrors.has(r.row))).toEqual([]);
    }
  });
});

describe("good intake fixtures", () => {
  const parts = (name: string) => parsePartsFile(readIntakeFixture("good", name));

  it.each(listIntakeFixtures("good"))("%s parses without a problem", (name) => {
    const result = parseIntakeFile(name.startsWith("offers") ? "offers" : "parts", readIntakeFixture("good", name));
    expect(result.problems).toEqual([]);
    expect(result.rows.length).toBeGreaterThan(0);
  });

  it("reads units in the header exactly like units in the cells", () => {
    const values = (result: { rows: Array<{ value: PartSpec }> }) => result.rows.map((r) => r.value);
    expect(values(parts("parts-units-in-headers.csv"))).toEqual(values(parts("parts-units-in-cells.csv")));
  });

  it("reads the values of the units-in-cells file in SI units", () => {
    const [npn, pnp, darlington] = parts("parts-units-in-cells.csv").rows.map((r) => r.value);
    expect(npn).toMatchObject({ polarity: "npn", vceoVolts: 45, icMaxAmps: 0.1, ptotWatts: 0.625, rthJaCPerW: 200, ftHz: 2.5e8, cobFarads: 4e-12 });
    expect(npn.saturationPoints).toEqual([{ icAmps: 0.01, ibAmps: 5e-4, vceSatMaxVolts: 0.25, vceSatTypVolts: null, vbeSatVolts: null }]);
    expect(pnp).toMatchObject({ polarity: "pnp", vbeOnVolts: 0.65, ftHz: 2e8, earlyVolts: null, lifecycle: "nrnd" });
    expect(darlington).toMatchObject({ configuration: "darlington", ptotReference: "case", lifecycle: "last-time-buy" });
    expect(darlington.gainPoints).toEqual([{ icAmps: 3, vceVolts: 3, hfeMin: 1000, hfeTyp: null, hfeMax: null, tempC: null }]);
  });

  it("reads decimal commas in a semicolon file, including three decimals", () => {
    const rows = parts("parts-semicolon-decimal-comma.csv").rows.map((r) => r.value);
    expect(rows.map((p) => p.icMaxAmps)).toEqual([0.1, 0.5, 1.25]);
    expect(rows[0]).toMatchObject({ ptotWatts: 0.25, vbeOnVolts: 0.65 });
  });

  it("strips the UTF-8 byte order mark from the first column name", () => {
    expect(parts("parts-bom.csv").rows.map((r) => r.value.manufacturer)).toEqual(["Larkfield Semiconductor", "Larkfield Semiconductor"]);
  });

  it("keeps three gain points in their order, with micro signs read", () => {
    const [first] = parts("parts-three-gain-points.csv").rows;
    expect(first.value.gainPoints.map((g) => g.icAmps)).toEqual([1e-4, 0.01, 0.5]);
    expect(first.value.gainPoints[2]).toEqual({ icAmps: 0.5, vceVolts: 10, hfeMin: 40, hfeTyp: null, hfeMax: null, tempC: 25 });
  });

  it("reads a tab file with a quoted newline inside a cell", () => {
    const [row] = parts("parts-tab-quoted.csv").rows;
    // A line break inside a name is spacing: it is collapsed, and the preview shows the reading.
    expect(row).toMatchObject({ row: 2, value: { packageName: "SOT-23 (tape and reel)", vceoVolts: 12 } });
  });

  it("reads offers with several price breaks and defaults", () => {
    const rows = parseOffersFile(readIntakeFixture("good", "offers-price-breaks.csv")).rows.map((r) => r.value);
    expect(rows[0].offer.priceBreaks).toEqual([
      { quantity: 10, unitPrice: 0.085 },
      { quantity: 100, unitPrice: 0.062 },
      { quantity: 1000, unitPrice: 0.041 },
    ]);
    expect(rows[1]).toEqual({
      manufacturer: "larkfield semiconductor",
      partNumber: "ls-p100",
      offer: { supplier: "Tenterden Parts", supplierSku: null, stock: 0, minimumOrder: 1, orderMultiple: 1, priceBreaks: [{ quantity: 1, unitPrice: 0.12 }], currency: "USD", leadTimeDays: null, asOf: "2024-06-03" },
    });
  });
});
