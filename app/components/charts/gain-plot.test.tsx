import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { decadeDomain, GainPlot, type GainPlotPoint } from "./gain-plot.tsx";

const point = (icAmps: number, hfeMin: number | null, hfeTyp: number | null, hfeMax: number | null, tempC: number | null = 25): GainPlotPoint => ({
  icAmps,
  vceVolts: 5,
  hfeMin,
  hfeTyp,
  hfeMax,
  tempC,
});

const POINTS = [point(10e-6, 90, 200, null), point(2e-3, 110, 250, 450), point(100e-3, 60, 140, null)];

function seriesCircles(html: string, name: string): number {
  const match = new RegExp(`<g data-series="${name}">(.*?)</g>`, "s").exec(html);
  return match ? (match[1].match(/<circle/g) ?? []).length : 0;
}

describe("decadeDomain", () => {
  it("spans whole decades around the values, at least one decade wide", () => {
    expect(decadeDomain([2e-3, 150e-3])).toEqual({ domain: [1e-3, 1], decades: [1e-3, 1e-2, 1e-1, 1] });
    expect(decadeDomain([100, 300])).toEqual({ domain: [100, 1000], decades: [100, 1000] });
    expect(decadeDomain([100])).toEqual({ domain: [100, 1000], decades: [100, 1000] });
  });
});

describe("GainPlot", () => {
  it("draws min, typ and max series on the server with one marker per quoted value", () => {
    const html = renderToString(<GainPlot points={POINTS} />);
    expect(html).toContain("<svg");
    expect(seriesCircles(html, "min")).toBe(3);
    expect(seriesCircles(html, "typ")).toBe(3);
    expect(seriesCircles(html, "max")).toBe(1);
    expect(html).not.toContain('data-series="operating-point"');
  });

  it("labels the IC axis in decades with SI prefixes and the hFE axis in decades", () => {
    const html = renderToString(<GainPlot points={POINTS} />);
    for (const label of ["10 µA", "100 µA", "1 mA", "10 mA", "100 mA"]) expect(html).toContain(`>${label}<`);
    for (const label of [">10<", ">100<", ">1k<"]) expect(html).toContain(label);
    expect(html).toContain(">IC<");
    expect(html).toContain(">hFE<");
  });

  it("marks the operating point with its worst-case hFE, in the fault colour when off the quoted window", () => {
    const inside = renderToString(<GainPlot points={POINTS} operatingPoint={{ icAmps: 20e-3, hfe: 85, offPoint: false }} />);
    expect(inside).toContain('data-series="operating-point"');
    expect(inside).toContain("hFE ≥ 85 at 20 mA");
    expect(inside).toContain("var(--color-signal)");
    const outside = renderToString(<GainPlot points={POINTS} operatingPoint={{ icAmps: 3, hfe: 60, offPoint: true }} />);
    expect(outside).toContain("hFE ≥ 60 at 3 A");
    expect(outside).toMatch(/<circle[^>]*fill="var\(--color-fault\)"/);
    // The x axis grows to take in the operating current.
    expect(outside).toContain(">10 A<");
  });

  it("leaves out points at other temperatures and says so", () => {
    const html = renderToString(<GainPlot points={[...POINTS, point(2e-3, 40, null, null, -55)]} />);
    expect(seriesCircles(html, "min")).toBe(3);
    expect(html).toContain("1 point at other temperatures not plotted");
  });

  it("says so when there is nothing to plot", () => {
    expect(renderToString(<GainPlot points={[]} />)).toContain("No gain point at room temperature to plot.");
  });
});
