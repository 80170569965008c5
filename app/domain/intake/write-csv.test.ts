import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { GainPoint, Offer, PartSpec, SaturationPoint } from "../part";
import { CONFIGURATIONS, LIFECYCLES, partKey } from "../part";
import { parseOffersFile } from "./parse-offers";
import { parsePartsFile } from "./parse-parts";
import { writeOffersCsv, writePartsCsv } from "./write-csv";

const encode = (text: string) => new TextEncoder().encode(text);
// Invented names only; values stay inside the plausible ranges of the format.
const MANUFACTURERS = ["Larkfield Semiconductor", "Quillon Devices", "Brambling Electronics, Ltd.", 'Ostwind "Halbleiter"'];
const PACKAGES = ["TO-92", "SOT-23", "TO-220", "TO-3", "SOT-89 (tape)"];

const positive = (max: number) => fc.double({ min: 1e-9, max, noNaN: true });
const maybe = <T>(arbitrary: fc.Arbitrary<T>) => fc.option(arbitrary, { nil: null });
const celsius = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map((v) => (v === 0 ? 0 : v));
const isoDate = fc.date({ min: new Date("1990-01-01"), max: new Date("2030-12-31"), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));

const gainPoint: fc.Arbitrary<GainPoint> = fc
  .record({
    icAmps: positive(1000),
    vceVolts: maybe(positive(3000)),
    hfe: fc.uniqueArray(positive(100_000), { minLength: 3, maxLength: 3 }).map((v) => [...v].sort((a, b) => a - b)),
    keep: fc.constantFrom([true, false, false], [false, true, false], [true, true, true], [true, false, true], [false, true, true]),
    tempC: maybe(celsius(-100, 300)),
  })
  .map(({ icAmps, vceVolts, hfe, keep, tempC }) => ({
    icAmps,
    vceVolts,
    hfeMin: keep[0] ? hfe[0] : null,
    hfeTyp: keep[1] ? hfe[1] : null,
    hfeMax: keep[2] ? hfe[2] : null,
    tempC,
  }));

const saturationPoint: fc.Arbitrary<SaturationPoint> = fc
  .record({ icAmps: positive(1000), ibAmps: maybe(positive(1000)), sat: fc.tuple(positive(50), positive(50)), vbeSatVolts: maybe(positive(10)) })
  .map(({ icAmps, ibAmps, sat, vbeSatVolts }) => ({ icAmps, ibAmps, vceSatMaxVolts: Math.max(...sat), vceSatTypVolts: Math.min(...sat), vbeSatVolts }));

const partSpec: fc.Arbitrary<PartSpec> = fc
  .record({
    manufacturer: fc.constantFrom(...MANUFACTURERS),
    partNumber: fc.stringMatching(/^[A-Z]{2}-[A-Z0-9]{1,8}$/),
    polarity: fc.constantFrom("npn" as const, "pnp" as const),
    packageName: fc.constantFrom(...PACKAGES),
    configuration: fc.constantFrom(...CONFIGURATIONS),
    vceoVolts: positive(3000),
    vcboVolts: maybe(positive(3000)),
    veboVolts: maybe(positive(100)),
    icMaxAmps: positive(1000),
    ptot: maybe(fc.tuple(positive(2000), fc.constantFrom("ambient" as const, "case" as const))),
    tjMaxC: maybe(celsius(0, 300)),
    rthJaCPerW: maybe(positive(2000)),
    rthJcCPerW: maybe(positive(500)),
    gainPoints: fc.array(gainPoint, { minLength: 1, maxLength: 4 }),
    saturationPoints: fc.array(saturationPoint, { maxLength: 3 }),
    vbeOnVolts: maybe(positive(5)),
    // A bare fT below 100 kHz is refused as a missing unit, so the catalogue never holds one.
    ftHz: maybe(fc.double({ min: 1e5, max: 100e9, noNaN: true })),
    cobFarads: maybe(positive(100e-9)),
    earlyVolts: maybe(positive(10_000)),
    lifecycle: fc.constantFrom(...LIFECYCLES),
    datasheetUrl: maybe(fc.constant("https://example.com/datasheets/part.pdf?rev=3&lang=en")),
    datasheetRevisionDate: maybe(isoDate),
  })
  .map(({ ptot, ...rest }) => ({ ...rest, ptotWatts: ptot ? ptot[0] : null, ptotReference: ptot ? ptot[1] : null }));

const offerRow = fc.record({
  manufacturer: fc.constantFrom(...MANUFACTURERS),
  partNumber: fc.stringMatching(/^[A-Z]{2}-[A-Z0-9]{1,8}$/),
  offer: fc.record<Offer>({
    supplier: fc.constantFrom("Harbour Components", "Tenterden Parts", "Marlow & Daughters"),
    supplierSku: maybe(fc.stringMatching(/^[A-Z]{2}-\d{3,7}$/)),
    stock: fc.integer({ min: 0, max: 1e9 }),
    minimumOrder: fc.integer({ min: 1, max: 10_000 }),
    orderMultiple: fc.integer({ min: 1, max: 1000 }),
    priceBreaks: fc.uniqueArray(fc.record({ quantity: fc.integer({ min: 1, max: 1e6 }), unitPrice: fc.double({ min: 0, max: 1e6, noNaN: true }) }), {
      minLength: 1,
      maxLength: 5,
      selector: (b) => b.quantity,
    }),
    currency: fc.constantFrom("EUR", "USD", "GBP", "CHF", "JPY"),
    leadTimeDays: maybe(fc.integer({ min: 0, max: 3650 })),
    asOf: isoDate,
  }),
});

describe("writePartsCsv", () => {
  it("writes parts that parse back to exactly the same values", () => {
    fc.assert(
      fc.property(fc.uniqueArray(partSpec, { minLength: 1, maxLength: 8, selector: (p) => partKey(p.manufacturer, p.partNumber) }), (parts) => {
        const result = parsePartsFile(encode(writePartsCsv(parts)));
        // Plausibility warnings (random values) do not reject a row; only errors would break the round trip.
        expect(result.problems.filter((p) => p.severity === "error")).toEqual([]);
        expect(result.rows.map((r) => r.value)).toEqual(parts);
        expect(result.rows.map((r) => r.row)).toEqual(parts.map((_, i) => i + 2));
      }),
      { numRuns: 200 },
    );
  });

  it("writes as many gain and saturation columns as the longest list needs", () => {
    const fixed =
      "manufacturer,part_number,polarity,package,configuration,vceo,vcbo,vebo,ic_max,ptot,ptot_ref,tj_max,rth_ja,rth_jc,vbe_on,ft,cob,early_voltage,lifecycle,datasheet_url,datasheet_date";
    expect(writePartsCsv([]).split("\r\n")[0]).toBe(fixed);
    const [part] = fc.sample(partSpec, { numRuns: 1, seed: 7 });
    const twoGainPoints = { ...part, gainPoints: [part.gainPoints[0], { ...part.gainPoints[0], icAmps: 0.5 }], saturationPoints: [] };
    const [header, row] = writePartsCsv([twoGainPoints]).split("\r\n");
    const gain = (n: number) => ["ic", "vce", "hfe_min", "hfe_typ", "hfe_max", "temp"].map((c) => `gain${n}_${c}`).join(",");
    expect(header).toBe(`${fixed},${gain(1)},${gain(2)}`);
    expect(row.split(",")).toContain("0.5");
  });
});

describe("writeOffersCsv", () => {
  it("writes offers that parse back to exactly the same values", () => {
    fc.assert(
      fc.property(fc.uniqueArray(offerRow, { minLength: 1, maxLength: 8, selector: (o) => `${partKey(o.manufacturer, o.partNumber)}|${o.offer.supplier.toLowerCase()}` }), (rows) => {
        const result = parseOffersFile(encode(writeOffersCsv(rows)));
        // Plausibility warnings (random values) do not reject a row; only errors would break the round trip.
        expect(result.problems.filter((p) => p.severity === "error")).toEqual([]);
        expect(result.rows.map((r) => r.value)).toEqual(rows);
      }),
      { numRuns: 200 },
    );
  });
});
