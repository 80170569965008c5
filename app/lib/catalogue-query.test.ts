import { describe, expect, it } from "vitest";
import { defaultPartListQuery, parsePartListQuery, toSearchParams, visibleColumns } from "./catalogue-query.ts";

const parse = (text: string) => parsePartListQuery(new URLSearchParams(text));

describe("parsePartListQuery", () => {
  it("fills the defaults for an empty query", () => {
    expect(parse("")).toEqual({ ok: true, query: defaultPartListQuery() });
    expect(defaultPartListQuery()).toMatchObject({ sort: "manufacturer", dir: "asc", page: 1, size: 50, package: [], lifecycle: [], cols: [] });
  });

  it("reads currents and voltages with units through the engine's parser", () => {
    const result = parse("hfeAt=100mA&hfeMin=50&vceoMin=45%20V&icMaxMax=2&package=TO-92&package=SOT-23&lifecycle=active");
    expect(result).toMatchObject({
      ok: true,
      query: { hfeAt: 0.1, hfeMin: 50, vceoMin: 45, icMaxMax: 2, package: ["TO-92", "SOT-23"], lifecycle: ["active"] },
    });
  });

  it("names each bad filter", () => {
    const result = parse("polarity=sideways&size=5&hfeAt=3V&sort=colour&cols=nope");
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.fieldErrors).toMatchObject({
      polarity: "polarity must be one of npn, pnp",
      size: "size must be at least 10",
      sort: expect.stringContaining("sort must be one of"),
      cols: expect.stringContaining("cols must be among"),
    });
    expect(result.fieldErrors.hfeAt).toMatch(/^hfeAt: /);
  });

  it("refuses a range whose low end is above its high end", () => {
    expect(parse("vceoMin=80&vceoMax=40")).toEqual({ ok: false, fieldErrors: { vceoMax: "vceoMax must not be below vceoMin" } });
  });

  it("asks for the collector current when an hFE range is given without it", () => {
    expect(parse("hfeMin=100")).toEqual({ ok: false, fieldErrors: { hfeAt: expect.stringContaining("collector current") } });
  });
});

describe("toSearchParams", () => {
  it("round-trips a query through the URL, leaving defaults out", () => {
    const first = parse("sort=hfe&dir=desc&page=3&size=20&q=LS&polarity=pnp&package=TO-92&configuration=single&vceoMin=30V&vceoMax=100&icMaxMin=100mA&hfeAt=2mA&hfeMin=100&hfeMax=800&lifecycle=nrnd&hasOffers=yes&cols=hfe&cols=price");
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const params = toSearchParams(first.query);
    expect(params.get("hfeAt")).toBe("2mA");
    expect(parse(params.toString())).toEqual(first);
    expect(toSearchParams(defaultPartListQuery()).toString()).toBe("");
  });

  it("shows the default columns unless some are chosen", () => {
    expect(visibleColumns({ cols: [] }).map((c) => c.id)).toContain("vceo");
    expect(visibleColumns({ cols: ["price", "hfe"] }).map((c) => c.id)).toEqual(["hfe", "price"]);
  });
});
