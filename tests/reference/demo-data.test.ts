// The invented demo catalogue: size, identity, physical consistency and the deliberate data-quality cases.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { parseOffersFile } from "#app/domain/intake/parse-offers.ts";
import { parsePartsFile } from "#app/domain/intake/parse-parts.ts";
import { writeOffersCsv, writePartsCsv } from "#app/domain/intake/write-csv.ts";
import { type GainPoint, type PartSpec, partKey } from "#app/domain/part.ts";
import { messyIntakeParts } from "#seeds/data/generated-parts.ts";
import { demoManufacturers } from "#seeds/data/manufacturers.ts";
import { demoOffers, demoSuppliers } from "#seeds/data/offers.ts";
import { demoComplementaryPairs, demoParts } from "#seeds/data/parts.ts";
import { offersTemplateExample, partsTemplateExample, TEMPLATE_EXAMPLE_PART_NUMBER } from "#seeds/data/template-example.ts";
import { renderDemoFixtures } from "#seeds/demo-fixtures.ts";

// Numbering schemes of registered and house-coded parts that the demo must never imitate (the project's rule).
const REGISTERED_LOOKING =
  /\b(2N\d{3,5}|2S[A-D]\d{3,5}|B[CDFU]\d{3}[A-Z]?|TIP\d{2,3}|MJ[EL]?\d{3,5}|MMBT[A-Z]*\d{2,5}|PN\d{4}|KS[AC]\d{3,4}|ZTX\d{3}|FZT\d{3})\b/;

// Ptot at 25 °C = (Tj max − 25 °C) / Rth is the linear derating datasheets print (common practice);
// datasheets round both figures, so 2% is allowed (common practice).
const THERMAL_TOLERANCE = 0.02;

const byMaker = new Map(demoManufacturers.map((maker) => [maker.name, maker]));

/** The gain figure used to compare points of one part: typical, else minimum, else maximum. */
function pickRepresentativeHfe(point: GainPoint): number {
  return point.hfeTyp ?? point.hfeMin ?? point.hfeMax ?? Number.NaN;
}

function findBestHfe(part: PartSpec): number {
  return Math.max(...part.gainPoints.map(pickRepresentativeHfe));
}

function listQuotedHfes(part: PartSpec): number[] {
  return part.gainPoints.flatMap((point) =>
    [point.hfeMin, point.hfeTyp, point.hfeMax].filter((value): value is number => value !== null),
  );
}

function isNonDecreasing(values: number[]): boolean {
  return values.every((value, index) => index === 0 || value >= values[index - 1]);
}

function sortSaturationPoints(part: PartSpec) {
  return [...part.saturationPoints].sort((a, b) => a.icAmps - b.icAmps);
}

const isTypOnly = (part: PartSpec) => part.gainPoints.every((point) => point.hfeMin === null);
// stale-datasheet: the demo's old datasheets are from before 2015 (the brief for the demo data).
const isStale = (part: PartSpec) => part.datasheetRevisionDate !== null && part.datasheetRevisionDate < "2015-01-01";

describe("demo catalogue: size and identity", () => {
  it("has at least 80 parts from 4 to 6 invented manufacturers, offered by 3 suppliers", () => {
    expect(demoParts.length).toBeGreaterThanOrEqual(80);
    const makers = new Set(demoParts.map((part) => part.manufacturer));
    expect(makers.size).toBeGreaterThanOrEqual(4);
    expect(makers.size).toBeLessThanOrEqual(6);
    expect([...makers].every((name) => byMaker.has(name))).toBe(true);
    expect(new Set(demoOffers.map((row) => row.offer.supplier)).size).toBe(3);
    expect(demoSuppliers).toHaveLength(3);
  });

  it("identifies every part once by manufacturer and part number", () => {
    const keys = demoParts.map((part) => partKey(part.manufacturer, part.partNumber));
    expect(new Set(keys).size).toBe(demoParts.length);
  });

  it("uses no registered-looking part number or name anywhere", () => {
    const texts = [
      ...demoParts.flatMap((part) => [part.partNumber, part.manufacturer, part.datasheetUrl ?? ""]),
      ...demoOffers.flatMap((row) => [row.offer.supplier, row.offer.supplierSku ?? ""]),
    ];
    expect(texts.filter((text) => REGISTERED_LOOKING.test(text.toUpperCase()))).toEqual([]);
  });

  it("numbers every part by its manufacturer's own scheme", () => {
    const offScheme = demoParts.filter((part) => !byMaker.get(part.manufacturer)?.partNumberPattern.test(part.partNumber));
    expect(offScheme.map((part) => part.partNumber)).toEqual([]);
  });

  it("links every datasheet on the example domain", () => {
    expect(demoParts.every((part) => part.datasheetUrl?.startsWith("https://datasheets.example.com/"))).toBe(true);
  });
});

describe("demo catalogue: families", () => {
  it("covers the small-signal, medium-power and power package outlines", () => {
    const packages = new Set(demoParts.map((part) => part.packageName));
    for (const outline of ["TO-92", "SOT-23", "SOT-89", "TO-126", "TO-220", "TO-247", "TO-3"]) {
      expect(packages.has(outline), outline).toBe(true);
    }
  });

  it("has packaged Darlingtons, a few duals and complementary pairs with matching numbers", () => {
    expect(demoParts.filter((part) => part.configuration === "darlington").length).toBeGreaterThanOrEqual(8);
    expect(demoParts.filter((part) => part.configuration === "dual").length).toBeGreaterThanOrEqual(3);
    expect(demoComplementaryPairs.length).toBeGreaterThanOrEqual(10);
    for (const { npn, pnp } of demoComplementaryPairs) {
      expect([pnp.packageName, pnp.configuration, pnp.vceoVolts], npn.partNumber).toEqual([
        npn.packageName,
        npn.configuration,
        npn.vceoVolts,
      ]);
    }
  });

  // The bins issue 9 names as a well-known commercial family's: the demo's gain groups must be its own.
  it("sells gain groups of its own, not the bin set issue 9 names", () => {
    const ranges = demoParts.flatMap((part) =>
      part.gainPoints.filter((point) => point.hfeMin !== null && point.hfeMax !== null).map((point) => [point.hfeMin, point.hfeMax]),
    );
    for (const named of [[110, 220], [200, 450], [420, 800]]) expect(ranges).not.toContainEqual(named);
  });

  it("has high-gain small-signal parts, most of them with an Early voltage", () => {
    const highGain = demoParts.filter(
      (part) => part.configuration !== "darlington" && part.icMaxAmps <= 0.2 && findBestHfe(part) >= 400,
    );
    expect(highGain.length).toBeGreaterThanOrEqual(8);
    expect(highGain.filter((part) => part.earlyVolts !== null).length / highGain.length).toBeGreaterThan(0.75);
  });
});

describe("demo catalogue: physical consistency", () => {
  it("quotes Ptot at 25 °C consistent with Tj max and the thermal resistance it refers to", () => {
    for (const part of demoParts) {
      const rth = part.ptotReference === "case" ? part.rthJcCPerW : part.rthJaCPerW;
      expect(part.ptotWatts !== null && part.tjMaxC !== null && rth !== null, part.partNumber).toBe(true);
      const expected = ((part.tjMaxC ?? 0) - 25) / (rth ?? 1);
      expect(Math.abs((part.ptotWatts ?? 0) - expected) / expected, part.partNumber).toBeLessThanOrEqual(THERMAL_TOLERANCE);
    }
  });

  it("rates power parts at the case and gives their free-air Rth(j-a) above Rth(j-c)", () => {
    const power = demoParts.filter((part) => ["TO-126", "TO-220", "TO-247", "TO-3"].includes(part.packageName));
    for (const part of power) {
      expect(part.ptotReference, part.partNumber).toBe("case");
      expect(part.rthJaCPerW ?? 0, part.partNumber).toBeGreaterThan(part.rthJcCPerW ?? Infinity);
    }
  });

  it("keeps ratings in order: VCBO at least VCEO, quoted points inside IC max and VCEO", () => {
    for (const part of demoParts) {
      expect(part.vcboVolts ?? part.vceoVolts, part.partNumber).toBeGreaterThanOrEqual(part.vceoVolts);
      for (const point of part.gainPoints) {
        expect(point.icAmps, part.partNumber).toBeLessThanOrEqual(part.icMaxAmps);
        expect(point.vceVolts ?? 0, part.partNumber).toBeLessThanOrEqual(part.vceoVolts);
      }
      for (const point of part.saturationPoints) expect(point.icAmps, part.partNumber).toBeLessThanOrEqual(part.icMaxAmps);
    }
  });

  it("orders hFE min ≤ typ ≤ max at every gain point, and every point quotes one of them", () => {
    for (const part of demoParts) {
      for (const { hfeMin, hfeTyp, hfeMax } of part.gainPoints) {
        const quoted = [hfeMin, hfeTyp, hfeMax].filter((value): value is number => value !== null);
        expect(quoted.length, part.partNumber).toBeGreaterThan(0);
        expect(isNonDecreasing(quoted), part.partNumber).toBe(true);
      }
    }
  });

  it("raises VCE(sat) and VBE(sat) with IC", () => {
    for (const part of demoParts) {
      const points = sortSaturationPoints(part);
      for (const pick of [
        (p: (typeof points)[number]) => p.vceSatMaxVolts,
        (p: (typeof points)[number]) => p.vceSatTypVolts,
        (p: (typeof points)[number]) => p.vbeSatVolts,
      ]) {
        const values = points.map(pick).filter((value): value is number => value !== null);
        expect(isNonDecreasing(values), part.partNumber).toBe(true);
      }
      for (const point of points) {
        if (point.vceSatMaxVolts !== null && point.vceSatTypVolts !== null) {
          expect(point.vceSatTypVolts, part.partNumber).toBeLessThanOrEqual(point.vceSatMaxVolts);
        }
      }
    }
  });

  // Gain falls at low current (recombination) and at high current (high injection): common practice.
  it("rolls gain off towards IC max and below 100 µA", () => {
    for (const part of demoParts.filter((candidate) => candidate.gainPoints.length >= 2)) {
      const best = findBestHfe(part);
      for (const point of part.gainPoints) {
        const nearMax = point.icAmps >= 0.5 * part.icMaxAmps;
        const veryLow = point.icAmps <= 100e-6 && part.icMaxAmps >= 0.1;
        if (nearMax || veryLow) expect(pickRepresentativeHfe(point), part.partNumber).toBeLessThan(best);
      }
    }
  });

  // The span the demo brief sets, from slow power Darlingtons to fast small-signal parts (common practice).
  it("keeps fT between about 1 MHz (power Darlington) and 300 MHz (small-signal)", () => {
    for (const part of demoParts) {
      expect(part.ftHz ?? 0, part.partNumber).toBeGreaterThanOrEqual(1e6);
      expect(part.ftHz ?? Infinity, part.partNumber).toBeLessThanOrEqual(300e6);
    }
  });

  // Packaged Darlington figures as the demo brief sets them (common practice for such parts).
  it("gives Darlingtons hFE of 1,000 to 20,000, VBE(on) of 1.2 to 1.4 V and VCE(sat) of 1 to 2 V", () => {
    for (const part of demoParts.filter((candidate) => candidate.configuration === "darlington")) {
      for (const hfe of listQuotedHfes(part)) {
        expect(hfe, part.partNumber).toBeGreaterThanOrEqual(1000);
        expect(hfe, part.partNumber).toBeLessThanOrEqual(20000);
      }
      expect(part.vbeOnVolts ?? 0, part.partNumber).toBeGreaterThanOrEqual(1.2);
      expect(part.vbeOnVolts ?? 0, part.partNumber).toBeLessThanOrEqual(1.4);
      const vceSats = part.saturationPoints.flatMap((point) =>
        [point.vceSatMaxVolts, point.vceSatTypVolts].filter((value): value is number => value !== null),
      );
      expect(vceSats.length, part.partNumber).toBeGreaterThan(0);
      for (const vceSat of vceSats) {
        expect(vceSat, part.partNumber).toBeGreaterThanOrEqual(1);
        expect(vceSat, part.partNumber).toBeLessThanOrEqual(2);
      }
    }
  });
});

describe("demo catalogue: deliberate data-quality cases", () => {
  it("quotes gain at one, two or three currents, each case present", () => {
    const counts = new Set(demoParts.map((part) => part.gainPoints.length));
    expect([...counts].sort()).toEqual([1, 2, 3]);
  });

  it("quotes some parts only at an inconvenient current", () => {
    const powerOnlyHigh = demoParts.filter(
      (part) => part.icMaxAmps >= 5 && part.gainPoints.length === 1 && part.gainPoints[0].icAmps >= 3,
    );
    const smallOnlyLow = demoParts.filter(
      (part) => part.icMaxAmps <= 0.5 && part.gainPoints.length === 1 && part.gainPoints[0].icAmps <= 100e-6,
    );
    expect(powerOnlyHigh.length).toBeGreaterThanOrEqual(2);
    expect(smallOnlyLow.length).toBeGreaterThanOrEqual(2);
  });

  it("has about 8 parts with typical gain only (no-min-gain)", () => {
    const typOnly = demoParts.filter(isTypOnly);
    expect(typOnly.length).toBeGreaterThanOrEqual(6);
    expect(typOnly.length).toBeLessThanOrEqual(10);
    expect(typOnly.every((part) => part.gainPoints.every((point) => point.hfeTyp !== null))).toBe(true);
  });

  it("leaves about a third without an Early voltage (early-unknown)", () => {
    const share = demoParts.filter((part) => part.earlyVolts === null).length / demoParts.length;
    expect(share).toBeGreaterThanOrEqual(0.25);
    expect(share).toBeLessThanOrEqual(0.42);
  });

  it("has a few datasheets from before 2015 (stale-datasheet)", () => {
    const stale = demoParts.filter(isStale).length;
    expect(stale).toBeGreaterThanOrEqual(3);
    expect(stale).toBeLessThanOrEqual(8);
  });

  it("mixes lifecycles: mostly active, some nrnd, a couple of last-time-buy and obsolete", () => {
    const count = (lifecycle: PartSpec["lifecycle"]) => demoParts.filter((part) => part.lifecycle === lifecycle).length;
    expect(count("active") / demoParts.length).toBeGreaterThan(0.75);
    expect(count("nrnd")).toBeGreaterThanOrEqual(4);
    expect(count("last-time-buy")).toBeGreaterThanOrEqual(2);
    expect(count("obsolete")).toBeGreaterThanOrEqual(2);
  });
});

describe("demo offers", () => {
  const offeredKeys = demoOffers.map((row) => partKey(row.manufacturer, row.partNumber));
  const partKeys = new Set(demoParts.map((part) => partKey(part.manufacturer, part.partNumber)));

  it("names a catalogue part in every offer, once per supplier", () => {
    expect(offeredKeys.filter((key) => !partKeys.has(key))).toEqual([]);
    const pairs = demoOffers.map((row) => `${partKey(row.manufacturer, row.partNumber)}|${row.offer.supplier}`);
    expect(new Set(pairs).size).toBe(pairs.length);
  });

  it("covers most parts, leaves some without an offer and gives some two or three suppliers", () => {
    const suppliersPerPart = new Map<string, number>();
    for (const key of offeredKeys) suppliersPerPart.set(key, (suppliersPerPart.get(key) ?? 0) + 1);
    expect(suppliersPerPart.size / demoParts.length).toBeGreaterThan(0.8);
    expect(suppliersPerPart.size).toBeLessThan(demoParts.length);
    const counts = [...suppliersPerPart.values()];
    expect(counts.filter((count) => count === 2).length).toBeGreaterThanOrEqual(10);
    expect(counts.filter((count) => count === 3).length).toBeGreaterThanOrEqual(3);
  });

  it("prices in falling breaks that respect the minimum order and order multiple", () => {
    for (const { partNumber, offer } of demoOffers) {
      const quantities = offer.priceBreaks.map((item) => item.quantity);
      const prices = offer.priceBreaks.map((item) => item.unitPrice);
      expect(quantities.length, partNumber).toBeGreaterThan(0);
      expect(isNonDecreasing(quantities) && new Set(quantities).size === quantities.length, partNumber).toBe(true);
      expect(isNonDecreasing([...prices].reverse()), partNumber).toBe(true);
      expect(quantities[0], partNumber).toBeGreaterThanOrEqual(offer.minimumOrder);
      expect(quantities.every((quantity) => quantity % offer.orderMultiple === 0), partNumber).toBe(true);
    }
  });

  it("sells SOT-23 parts by reels of 3000, among others", () => {
    const sot23 = new Set(demoParts.filter((part) => part.packageName === "SOT-23").map((part) => part.partNumber));
    const reels = demoOffers.filter((row) => sot23.has(row.partNumber) && row.offer.orderMultiple === 3000);
    expect(reels.length).toBeGreaterThanOrEqual(5);
  });

  it("has stock from none to tens of thousands, EUR and USD (mostly EUR), read in 2026", () => {
    const stocks = demoOffers.map((row) => row.offer.stock);
    expect(Math.min(...stocks)).toBe(0);
    expect(Math.max(...stocks)).toBeGreaterThanOrEqual(10_000);
    const currencies = demoOffers.map((row) => row.offer.currency);
    expect(new Set(currencies)).toEqual(new Set(["EUR", "USD"]));
    expect(currencies.filter((currency) => currency === "EUR").length / currencies.length).toBeGreaterThan(0.5);
    expect(demoOffers.every((row) => row.offer.asOf.startsWith("2026-"))).toBe(true);
    expect(demoOffers.every((row) => row.offer.leadTimeDays !== null)).toBe(true);
  });
});

function readFixture(name: string): Buffer {
  return readFileSync(fileURLToPath(new URL(`../../fixtures/demo/${name}`, import.meta.url)));
}

function errorsOf<P extends { severity: string }>(problems: P[]): P[] {
  return problems.filter((problem) => problem.severity === "error");
}

describe("demo intake files in fixtures/demo", () => {
  it("are up to date with the TypeScript data (rerun npx tsx seeds/write-demo-fixtures.ts)", () => {
    expect(readFixture("parts.csv").toString("utf8")).toBe(writePartsCsv(demoParts));
    expect(readFixture("offers.csv").toString("utf8")).toBe(writeOffersCsv(demoOffers));
    const rendered = renderDemoFixtures(demoParts, messyIntakeParts, demoOffers);
    for (const name of ["parts.csv", "offers.csv", "parts-messy.csv"]) expect(readFixture(name).toString("utf8"), name).toBe(rendered[name]);
  });

  it("parse back to the demo parts with no error", () => {
    const result = parsePartsFile(readFixture("parts.csv"));
    expect(errorsOf(result.problems)).toEqual([]);
    expect(result.rows.map((row) => row.value)).toEqual(demoParts);
  });

  it("parse back to the demo offers with no error", () => {
    const result = parseOffersFile(readFixture("offers.csv"));
    expect(errorsOf(result.problems)).toEqual([]);
    expect(result.rows.map((row) => row.value)).toEqual(demoOffers);
  });
});

describe("messy librarian file fixtures/demo/parts-messy.csv", () => {
  const result = parsePartsFile(readFixture("parts-messy.csv"));
  const byNumber = new Map(result.rows.map((row) => [row.value.partNumber, row.value]));

  it("holds only new invented parts, none of them registered-looking", () => {
    const demoNumbers = new Set(demoParts.map((part) => part.partNumber));
    expect(result.rows.length).toBeGreaterThanOrEqual(12);
    for (const { value } of result.rows) {
      expect(demoNumbers.has(value.partNumber), value.partNumber).toBe(false);
      expect(REGISTERED_LOOKING.test(value.partNumber), value.partNumber).toBe(false);
      expect(byMaker.get(value.manufacturer)?.partNumberPattern.test(value.partNumber), value.partNumber).toBe(true);
    }
  });

  it("has exactly four rows a librarian must fix, each found at its cell", () => {
    const errors = errorsOf(result.problems);
    expect([...new Set(errors.map((problem) => problem.row))]).toEqual([6, 8, 11, 14]);
    expect(errors.map((problem) => `${problem.row} ${problem.column}`)).toEqual(
      expect.arrayContaining(["6 gain2_hfe_min", "8 ic_max", "11 part_number", "14 gain2_ic"]),
    );
  });

  it("reads units typed in cells, both micro spellings and the header's unit", () => {
    // Expected values: the generated parts of the same families (seeds/data/generated-parts.ts, messyIntakeParts).
    const generated = (partNumber: string) => messyIntakeParts.find((part) => part.partNumber === partNumber);
    expect(byNumber.get("OSK4560N")?.gainPoints[0].icAmps).toBeCloseTo(10e-6, 15);
    expect(byNumber.get("MLB468T")?.gainPoints[0].icAmps).toBeCloseTo(10e-6, 15);
    expect(byNumber.get("OSK2750N")?.icMaxAmps).toBeCloseTo(0.35, 12);
    expect(byNumber.get("VPD6147")?.icMaxAmps).toBe(7);
    expect(byNumber.get("OSK2750P")?.saturationPoints[0].vceSatMaxVolts).toBeCloseTo(generated("OSK2750P")!.saturationPoints[0].vceSatMaxVolts!, 12);
    expect(byNumber.get("QX15-060")?.lifecycle).toBe("last-time-buy");
  });

  it("carries the generated parts' ratings, gain and saturation figures, however they are spelled", () => {
    expect(result.rows.length).toBe(12);
    for (const { value } of result.rows) {
      const part = messyIntakeParts.find((candidate) => candidate.partNumber === value.partNumber)!;
      expect(part, value.partNumber).toBeDefined();
      const close = (a: number | null, b: number | null) => (a === null || b === null ? a === b : Math.abs(a - b) <= 1e-12 * Math.abs(b));
      for (const field of ["vceoVolts", "vcboVolts", "veboVolts", "icMaxAmps", "ptotWatts", "tjMaxC", "vbeOnVolts", "ftHz", "cobFarads", "earlyVolts"] as const) {
        expect(close(value[field], part[field]), `${value.partNumber} ${field}`).toBe(true);
      }
      part.gainPoints.slice(0, 2).forEach((point, k) => {
        for (const field of ["icAmps", "hfeMin", "hfeTyp", "hfeMax"] as const) {
          expect(close(value.gainPoints[k][field], point[field]), `${value.partNumber} gain ${k + 1} ${field}`).toBe(true);
        }
      });
      expect(close(value.saturationPoints[0].vceSatMaxVolts, part.saturationPoints[0].vceSatMaxVolts), value.partNumber).toBe(true);
    }
  });
});

describe("intake template example rows (seeds/data/template-example.ts)", () => {
  const encode = (row: Record<string, string>) =>
    new TextEncoder().encode(`${Object.keys(row).join(",")}\n${Object.values(row).map((cell) => (cell.includes(",") ? `"${cell}"` : cell)).join(",")}\n`);

  it("come from a demo part and one of its offers, and parse back to them without a problem", () => {
    const part = demoParts.find((candidate) => candidate.partNumber === TEMPLATE_EXAMPLE_PART_NUMBER)!;
    expect(part.manufacturer).not.toMatch(/larkfield/i);
    const parts = parsePartsFile(encode(partsTemplateExample));
    expect(parts.problems).toEqual([]);
    const { gainPoints, saturationPoints, ...ratings } = parts.rows[0].value;
    const { gainPoints: partGain, saturationPoints: partSat, ...partRatings } = part;
    expect(ratings).toEqual(partRatings);
    expect(partGain).toContainEqual(gainPoints[0]);
    expect(saturationPoints[0]).toEqual(partSat[0]);
    const offers = parseOffersFile(encode(offersTemplateExample));
    expect(offers.problems).toEqual([]);
    const offer = offers.rows[0].value;
    const demo = demoOffers.find((row) => row.partNumber === offer.partNumber && row.offer.supplier === offer.offer.supplier)!;
    expect(offer.offer).toEqual({ ...demo.offer, priceBreaks: demo.offer.priceBreaks.slice(0, 1) });
  });
});
