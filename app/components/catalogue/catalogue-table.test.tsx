import { renderToString } from "react-dom/server";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { parsePartListQuery, visibleColumns, type PartListQuery } from "#app/lib/catalogue-query.ts";
import { activeFilters, CatalogueFilters, EmptyResult, rawQueryOf } from "./catalogue-filters.tsx";
import { CatalogueTable, listHref, Pager, type CatalogueRow } from "./catalogue-table.tsx";

function render(element: React.ReactElement): string {
  const Stub = createRoutesStub([{ path: "/catalogue", Component: () => element }]);
  return renderToString(<Stub initialEntries={["/catalogue"]} />);
}

function queryOf(search: string): PartListQuery {
  const parsed = parsePartListQuery(new URLSearchParams(search));
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.fieldErrors));
  return parsed.query;
}

const ROW: CatalogueRow = {
  id: "6f0c5a43-5f0e-4a53-9d0e-0b0c8c7c1a11",
  manufacturer: "Ostrevik Semiconductor",
  partNumber: "OSK4560N",
  polarity: "npn",
  packageName: "SOT-23",
  configuration: "single",
  vceoVolts: 28,
  icMaxAmps: 0.06,
  ptotWatts: 0.27,
  ftHz: 240e6,
  lifecycle: "nrnd",
  hfeAtChosen: 212.4,
  hfeSummary: "340–930 @ 500 µA",
  offerCount: 2,
  bestUnitPrice: { amount: 0.085, currency: "EUR" },
  stockTotal: 12500,
  flags: ["early-unknown"],
};

describe("CatalogueTable", () => {
  it("prints values in engineering notation with units, right-aligned", () => {
    const query = queryOf("cols=partNumber&cols=vceo&cols=icMax&cols=ptot&cols=ft&cols=price&cols=stock&cols=lifecycle");
    const html = render(<CatalogueTable rows={[ROW]} columns={visibleColumns(query)} query={query} total={1} />);
    for (const text of [">28 V<", ">60 mA<", ">270 mW<", ">240 MHz<", ">0.085 EUR<", ">12,500<", ">NRND<"]) expect(html).toContain(text);
    expect(html).toMatch(/<td class="[^"]*text-right tabular-nums[^"]*">28 V<\/td>/);
    // Flags ride beside the part number when their own column is hidden.
    expect(html).toContain('data-flag="early-unknown"');
  });

  it("shows hFE at the chosen IC and links the part page with that operating point", () => {
    const query = queryOf("hfeAt=20mA&cols=partNumber&cols=hfe");
    const html = render(<CatalogueTable rows={[ROW]} columns={visibleColumns(query)} query={query} total={1} />);
    expect(html).toContain("hFE @ 20 mA");
    expect(html).toMatch(/title="worst-case hFE at 20 mA; quoted 340–930 @ 500 µA">212</);
    expect(html).toContain(`href="/catalogue/${ROW.id}?ic=20mA"`);
  });

  it("sorts by header links that keep the filters and flip the direction of the sorted column", () => {
    const query = queryOf("polarity=npn&sort=vceo");
    const html = render(<CatalogueTable rows={[ROW]} columns={visibleColumns(query)} query={query} total={1} />);
    expect(html).toContain('href="/catalogue?sort=vceo&amp;dir=desc&amp;polarity=npn"');
    expect(html).toContain('href="/catalogue?sort=icMax&amp;polarity=npn"');
    expect(html).toMatch(/aria-sort="ascending"[^>]*><a[^>]*>VCEO/);
  });
});

describe("Pager", () => {
  it("gives the range, the total and links to the neighbouring pages", () => {
    const html = render(<Pager query={queryOf("page=2&size=25&q=osk")} total={89} />);
    expect(html).toContain("26–50 of 89 parts");
    expect(html).toContain("page 2 of 4");
    expect(html).toContain('href="/catalogue?size=25&amp;q=osk"');
    expect(html).toContain('href="/catalogue?page=3&amp;size=25&amp;q=osk"');
  });
});

describe("filters", () => {
  it("keep the typed values and show each field's error", () => {
    const search = new URLSearchParams("vceoMin=30mA&polarity=npn&package=TO-92");
    const parsed = parsePartListQuery(search);
    expect(parsed.ok).toBe(false);
    const errors = parsed.ok ? {} : parsed.fieldErrors;
    const html = render(<CatalogueFilters raw={rawQueryOf(search)} errors={errors} packages={["SOT-23", "TO-92"]} visible={visibleColumns({ cols: [] })} />);
    const vceoMin = /<input[^>]*name="vceoMin"[^>]*>/.exec(html)?.[0] ?? "";
    expect(vceoMin).toContain('value="30mA"');
    expect(vceoMin).toContain('aria-invalid="true"');
    expect(html).toContain("vceoMin: a current (mA) where a voltage is expected");
    expect(html).toContain('id="vceoMin-error"');
    expect(html).toMatch(/<option value="npn" selected="">NPN<\/option>/);
    expect(html).toContain('name="package" checked="" value="TO-92"');
    expect(html).toMatch(/<form[^>]*action="\/catalogue" method="get"/);
  });

  it("in force are listed, each with a link that drops only it", () => {
    const query = queryOf("q=osk&vceoMin=30V&lifecycle=active&lifecycle=nrnd");
    const filters = activeFilters(query);
    expect(filters.map((f) => f.label)).toEqual(["“osk”", "VCEO ≥ 30 V", "active", "not recommended for new designs"]);
    expect(filters[1].href).toBe("/catalogue?q=osk&lifecycle=active&lifecycle=nrnd");
    expect(filters[3].href).toBe(listHref(query, { lifecycle: ["active"], page: 1 }));
    const html = render(<EmptyResult filters={filters} />);
    expect(html).toContain("No part in the catalogue matches all of these filters.");
    expect(html).toContain("Remove one of them, widen a range");
  });
});
