// The ngspice harness itself: netlist building, wrdata parsing, reading model cards, and one real run.
import { describe, expect, it } from "vitest";
import { buildNetlist, MODEL_LIBRARY, modelParameter, parseWrdata, requireNgspice, simulate, valueAt, vectorOf } from "./ngspice.ts";

describe("buildNetlist", () => {
  it("includes the models, runs the analysis, writes the vectors and quits with 0", () => {
    const text = buildNetlist({ title: "divider", circuit: "V1 a 0 10\nR1 a b 1k\nR2 b 0 1k", analysis: "op", vectors: ["v(b)"] });
    expect(text.split("\n")).toEqual([
      "divider",
      `.include ${MODEL_LIBRARY}`,
      "V1 a 0 10",
      "R1 a b 1k",
      "R2 b 0 1k",
      ".control",
      "set wr_singlescale",
      "set wr_vecnames",
      "op",
      "wrdata @OUT@ v(b)",
      "quit 0",
      ".endc",
      ".end",
      "",
    ]);
  });
});

describe("parseWrdata", () => {
  it("reads a swept table into a scale and named vectors", () => {
    const text = " i-sweep   i(VC)   v(b)\n 1.0e-06 -2.2e-04 6.0e-01\n 2.0e-06 -4.4e-04 6.2e-01\n";
    expect(parseWrdata(text)).toEqual({ scale: [1e-6, 2e-6], "i(vc)": [-2.2e-4, -4.4e-4], "v(b)": [0.6, 0.62] });
  });
  it("fails loudly on an empty or broken table", () => {
    expect(() => parseWrdata(" v(b)\n")).toThrow(/no data rows/);
    expect(() => parseWrdata(" v-sweep v(b)\n 1 x\n")).toThrow(/Unreadable/);
  });
});

describe("valueAt and vectorOf", () => {
  it("interpolate over rising and falling sweeps and fail outside them", () => {
    expect(valueAt([0, 1, 2], [0, 10, 30], 1.5)).toBe(20);
    expect(valueAt([2, 1, 0], [30, 10, 0], 0.5)).toBe(5);
    expect(() => valueAt([0, 1], [0, 1], 2)).toThrow(RangeError);
    expect(vectorOf({ "v(b)": [1] }, "V(B)")).toEqual([1]);
    expect(() => vectorOf({ "v(b)": [1] }, "v(c)")).toThrow(/No vector v\(c\)/);
  });
});

describe("modelParameter", () => {
  it("reads parameters with SPICE suffixes from the invented model cards", () => {
    // Values as written in models/invented-bjt.lib.
    expect(modelParameter("QGP_N1", "VAF")).toBe(90);
    expect(modelParameter("QSF_HG1", "IS")).toBeCloseTo(20e-15, 27);
    expect(modelParameter("QPW_P1", "CJE")).toBeCloseTo(700e-12, 21);
    expect(modelParameter("QPW_N1", "TR")).toBeCloseTo(1e-6, 15);
    expect(() => modelParameter("QNONE", "BF")).toThrow(/No model/);
  });
});

describe("simulate", () => {
  it("runs ngspice in batch mode and returns its vectors", () => {
    expect(requireNgspice()).toMatch(/^ngspice/);
    // Reference: Ohm's law, a 1 kΩ / 1 kΩ divider from 10 V gives 5 V.
    const run = simulate({ title: "divider", circuit: "V1 a 0 10\nR1 a b 1k\nR2 b 0 1k", analysis: "op", vectors: ["v(b)"] });
    expect(vectorOf(run, "v(b)")[0]).toBeCloseTo(5, 9);
  });
  it("accepts every invented model card", () => {
    for (const model of ["QSF_HG1", "QGP_N1", "QPW_N1"]) {
      const run = simulate({ title: model, circuit: `VC c 0 5\nVB b 0 0.6\nQ1 c b 0 ${model}`, analysis: "op", vectors: ["i(VC)"] });
      expect(vectorOf(run, "i(VC)")[0]).toBeLessThan(0);
    }
    for (const model of ["QGP_P1", "QPW_P1"]) {
      const run = simulate({ title: model, circuit: `VC c 0 -5\nVB b 0 -0.6\nQ1 c b 0 ${model}`, analysis: "op", vectors: ["i(VC)"] });
      expect(vectorOf(run, "i(VC)")[0]).toBeGreaterThan(0);
    }
  });
  it("reports ngspice's complaint when a netlist is wrong", () => {
    expect(() => simulate({ title: "broken", circuit: "Q1 c b 0 QMISSING", analysis: "op", vectors: ["v(c)"] })).toThrow(/ngspice/);
  });
});
