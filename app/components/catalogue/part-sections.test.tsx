import { renderToString } from "react-dom/server";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { formatFieldValue, offerSummary } from "./field-display.ts";
import { FlagList } from "./flags.tsx";
import { OffersTable, partCaution, RevisionHistory, SaturationTable } from "./part-sections.tsx";

function render(element: React.ReactElement): string {
  const Stub = createRoutesStub([{ path: "/catalogue/:id", Component: () => element }]);
  return renderToString(<Stub initialEntries={["/catalogue/x"]} />);
}

describe("partCaution (design section 9)", () => {
  it("speaks for hazardous voltage and for large power, and not for a small-signal part", () => {
    expect(partCaution({ vceoVolts: 45, ptotWatts: 0.5 })).toBeNull();
    const high = partCaution({ vceoVolts: 80, ptotWatts: 0.6 });
    expect(high).toContain("rated 80 V VCEO");
    expect(high).toContain("the manufacturer's datasheet and its safe operating area govern, and local electrical codes and licensed practice come first");
    expect(partCaution({ vceoVolts: 40, ptotWatts: 65 })).toContain("rated 65 W Ptot");
  });
});

describe("OffersTable", () => {
  it("lists each offer with stock, minimum order, multiple, lead time, as-of date and its price breaks", () => {
    const html = render(
      <OffersTable
        offers={[
          {
            id: "o1",
            supplier: "Larkspur Component Supply",
            supplierSku: "LCS-1",
            stock: 12000,
            minimumOrder: 10,
            orderMultiple: 5,
            priceBreaks: [
              { quantity: 100, unitPrice: 0.072 },
              { quantity: 10, unitPrice: 0.085 },
            ],
            currency: "EUR",
            leadTimeDays: 28,
            asOf: "2026-11-02",
          },
        ]}
      />,
    );
    for (const text of ["Larkspur Component Supply", "LCS-1", ">12,000<", ">10<", ">5<", ">28 d<", ">2026-11-02<", ">0.085 EUR<", ">0.072 EUR<"]) {
      expect(html).toContain(text);
    }
    expect(html.indexOf("0.085 EUR")).toBeLessThan(html.indexOf("0.072 EUR"));
  });

  it("says how offers arrive when there are none", () => {
    expect(render(<OffersTable offers={[]} />)).toContain("No supplier offers yet");
  });
});

describe("SaturationTable", () => {
  it("shows each point with units and its forced gain", () => {
    const html = render(<SaturationTable points={[{ icAmps: 0.15, ibAmps: 0.015, vceSatMaxVolts: 0.3, vceSatTypVolts: null, vbeSatVolts: 0.9 }]} />);
    for (const text of [">150 mA<", ">15 mA<", ">10<", ">300 mV<", ">900 mV<"]) expect(html).toContain(text);
  });
});

describe("RevisionHistory", () => {
  it("names the intake file (linked) or the editor behind each revision, with each field before → after", () => {
    const html = render(
      <RevisionHistory
        revisions={[
          { id: "2", createdAt: "2026-12-01T10:00:00.000Z", source: { kind: "edit", editorName: "Lena Marsh" }, changes: [{ field: "vceoVolts", before: 40, after: 45 }] },
          { id: "1", createdAt: "2026-11-30T09:00:00.000Z", source: { kind: "intake", intakeId: "i-1", fileName: "parts-messy.csv" }, changes: [] },
        ]}
      />,
    );
    expect(html).toContain("corrected by Lena Marsh");
    expect(html).toContain('href="/intakes/i-1"');
    expect(html).toContain("parts-messy.csv");
    expect(html).toMatch(/VCEO<\/td><td[^>]*>40 V<\/td><td[^>]*>→<\/td><td[^>]*>45 V</);
    expect(html).toContain("2026-12-01 10:00 UTC");
  });
});

describe("FlagList", () => {
  it("explains each data-quality flag in one line", () => {
    const html = renderToString(<FlagList flags={["no-min-gain", "single-gain-point", "stale-datasheet", "early-unknown"]} />);
    expect(html).toContain("Only typical (or maximum) hFE is quoted");
    expect(html).toContain("single gain point");
    expect(html).toContain("The datasheet revision is old or unknown");
    expect(html).toContain("No Early voltage is quoted");
  });
});

describe("formatFieldValue", () => {
  it("prints stored SI values and point lists as a practitioner reads them", () => {
    expect(formatFieldValue("ftHz", 250e6)).toBe("250 MHz");
    expect(formatFieldValue("rthJaCPerW", 62.5)).toBe("62.5 °C/W");
    expect(formatFieldValue("ptotWatts", null)).toBe("—");
    expect(formatFieldValue("gainPoints", [{ icAmps: 2e-3, vceVolts: 5, hfeMin: 110, hfeTyp: null, hfeMax: 450, tempC: null }])).toBe("hFE 110/–/450 at 2 mA, 5 V");
    expect(formatFieldValue("saturationPoints", [{ icAmps: 0.01, ibAmps: 0.0005, vceSatMaxVolts: 0.25, vceSatTypVolts: null, vbeSatVolts: null }])).toBe(
      "VCE(sat) ≤ 250 mV at 10 mA / IB 500 µA",
    );
  });
});

describe("offerSummary", () => {
  it("puts a new offer on one line", () => {
    expect(
      offerSummary([
        { field: "supplier", after: "Larkspur Component Supply" },
        { field: "stock", after: 12000 },
        { field: "currency", after: "EUR" },
        { field: "priceBreaks", after: [{ quantity: 1, unitPrice: 0.12 }, { quantity: 100, unitPrice: 0.085 }] },
      ]),
    ).toBe("Larkspur Component Supply · 12,000 in stock · 1+ 0.12, 100+ 0.085 EUR");
  });
});
