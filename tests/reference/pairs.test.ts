// Darlington and Sziklai pairs of the engine against ngspice runs of the invented Gummel-Poon models in models/invented-bjt.lib.
import { beforeAll, describe, expect, it } from "vitest";
import { suggestBleedResistor } from "#app/domain/bleed-resistor.ts";
import { compoundVbe, compoundVceSat, solvePairCurrents, type CompoundTopology } from "#app/domain/compound-currents.ts";
import { hfeAt, vceSatAt } from "#app/domain/gain-curve.ts";
import type { GainPoint, SaturationPoint } from "#app/domain/part.ts";
import { requireNgspice, simulate, valueAt, vectorOf } from "./ngspice.ts";

type Polarity = "npn" | "pnp";
const sign = (polarity: Polarity) => (polarity === "npn" ? 1 : -1);
// Simulations at 25 °C with the model parameters referred to 25 °C.
const AT_25_C = ".options tnom=25\n.temp 25";
const PAIR_VCE_VOLTS = 5;

interface Curve {
  icAmps: number[];
  hfe: number[];
  vbeVolts: number[];
}

/** One device's hFE = IC / IB and VBE against IC, from a DC sweep of VBE at fixed VCE (magnitudes). */
function simulateDevice(model: string, polarity: Polarity, vceVolts: number): Curve {
  const s = sign(polarity);
  const run = simulate({
    title: `${model} at VCE ${vceVolts} V`,
    circuit: `${AT_25_C}\nVC c 0 ${s * vceVolts}\nVB b 0 0\nQ1 c b 0 ${model}`,
    analysis: `dc VB ${s * 0.3} ${s * 1.8} ${s * 0.0005}`,
    vectors: ["i(VC)", "i(VB)"],
  });
  const icAmps = vectorOf(run, "i(VC)").map((i) => -s * i);
  const ibAmps = vectorOf(run, "i(VB)").map((i) => -s * i);
  return { icAmps, hfe: icAmps.map((ic, k) => ic / ibAmps[k]), vbeVolts: run.scale.map((v) => s * v) };
}

/** A simulated quantity read at one current, interpolated in log(IC). */
function readAt(icAmps: number[], values: number[], atAmps: number): number {
  return valueAt(icAmps.map(Math.log), values, Math.log(atAmps));
}

/** "Datasheet" gain points every third of a decade, quoted as hFE min so that the engine's worst case is the simulated curve. */
function gainPointsOf(curve: Curve, fromAmps: number, toAmps: number): GainPoint[] {
  const points: GainPoint[] = [];
  // Up to the largest current the sweep reached, so every point is read off the simulated curve.
  const top = Math.min(toAmps, Math.max(...curve.icAmps));
  for (let exponent = Math.log10(fromAmps); exponent <= Math.log10(top); exponent += 1 / 3) {
    const icAmps = 10 ** exponent;
    points.push({ icAmps, vceVolts: null, hfeMin: readAt(curve.icAmps, curve.hfe, icAmps), hfeTyp: null, hfeMax: null, tempC: 25 });
  }
  return points;
}

interface PairRun {
  icAmps: number[];
  ibAmps: number[];
  vbeVolts: number[];
  driverIcAmps: number[];
  driverIeAmps: number[];
  innerVolts: number[];
}

/**
 * A pair's DC sweep at a fixed pair VCE, with 0 V ammeters in the driver's collector and emitter.
 * Darlington: Q1 drives Q2's base from its emitter. Sziklai: Q1's collector drives Q2's base, Q2's emitter is the pair's collector.
 */
function simulatePair(topology: CompoundTopology, driverModel: string, outputModel: string, polarity: Polarity, bleedOhms: number | null, sweep: [number, number]): PairRun {
  const s = sign(polarity);
  const bleed = bleedOhms === null ? "" : topology === "darlington" ? `RBL x 0 ${bleedOhms}` : `RBL c x ${bleedOhms}`;
  const devices =
    topology === "darlington"
      ? `VA1 c c1 0\nQ1 c1 b e1 ${driverModel}\nVA2 e1 x 0\nQ2 c x 0 ${outputModel}`
      : `VA1 x c1 0\nQ1 c1 b e1 ${driverModel}\nVA2 e1 0 0\nQ2 0 x c ${outputModel}`;
  const run = simulate({
    title: `${topology} ${driverModel} + ${outputModel}${bleedOhms === null ? "" : ` with ${bleedOhms} Ω bleed`}`,
    circuit: `${AT_25_C}\nVC c 0 ${s * PAIR_VCE_VOLTS}\nVB b 0 0\n${devices}\n${bleed}`,
    analysis: `dc VB ${s * sweep[0]} ${s * sweep[1]} ${s * 0.0005}`,
    vectors: ["i(VC)", "i(VB)", "i(VA1)", "i(VA2)", "v(x)"],
  });
  // Sziklai: VA1 runs from node x into the driver's collector, so i(VA1) is the driver's IC for an NPN driver.
  const driverIc = vectorOf(run, "i(VA1)").map((i) => s * i);
  return {
    icAmps: vectorOf(run, "i(VC)").map((i) => -s * i),
    ibAmps: vectorOf(run, "i(VB)").map((i) => -s * i),
    vbeVolts: run.scale.map((v) => s * v),
    driverIcAmps: driverIc,
    driverIeAmps: vectorOf(run, "i(VA2)").map((i) => s * i),
    innerVolts: vectorOf(run, "v(x)").map((v) => s * v),
  };
}

interface PairCase {
  name: string;
  topology: CompoundTopology;
  polarity: Polarity;
  driver: { model: string; polarity: Polarity };
  output: { model: string; polarity: Polarity };
  sweep: [number, number];
  pairIcAmps: number[];
}

const CASES: PairCase[] = [
  {
    name: "power Darlington QGP_N1 + QPW_N1",
    topology: "darlington",
    polarity: "npn",
    driver: { model: "QGP_N1", polarity: "npn" },
    output: { model: "QPW_N1", polarity: "npn" },
    sweep: [0.9, 1.9],
    pairIcAmps: [0.05, 0.3, 1, 2],
  },
  {
    name: "small-signal Darlington QSF_HG1 + QGP_N1",
    topology: "darlington",
    polarity: "npn",
    driver: { model: "QSF_HG1", polarity: "npn" },
    output: { model: "QGP_N1", polarity: "npn" },
    sweep: [0.9, 1.8],
    pairIcAmps: [1e-3, 1e-2, 5e-2],
  },
  {
    name: "NPN Sziklai QGP_N1 + QPW_P1",
    topology: "sziklai",
    polarity: "npn",
    driver: { model: "QGP_N1", polarity: "npn" },
    output: { model: "QPW_P1", polarity: "pnp" },
    sweep: [0.4, 1.3],
    pairIcAmps: [0.05, 0.3, 1],
  },
  {
    name: "PNP Sziklai QGP_P1 + QPW_N1",
    topology: "sziklai",
    polarity: "pnp",
    driver: { model: "QGP_P1", polarity: "pnp" },
    output: { model: "QPW_N1", polarity: "npn" },
    sweep: [0.4, 1.3],
    pairIcAmps: [0.05, 0.3, 1],
  },
];

beforeAll(() => {
  // No skipping: without ngspice these tests fail with the install command in the message.
  requireNgspice();
});

describe.each(CASES)("$name against ngspice", (pairCase) => {
  let driverCurve: Curve;
  let outputCurve: Curve;
  let driverPoints: GainPoint[];
  let outputPoints: GainPoint[];
  let pair: PairRun;
  beforeAll(() => {
    // Inside the pair the driver stands one VBE2 less than the pair's VCE; the output the full VCE.
    driverCurve = simulateDevice(pairCase.driver.model, pairCase.driver.polarity, PAIR_VCE_VOLTS - 0.7);
    outputCurve = simulateDevice(pairCase.output.model, pairCase.output.polarity, PAIR_VCE_VOLTS);
    driverPoints = gainPointsOf(driverCurve, 1e-6, 0.3);
    outputPoints = gainPointsOf(outputCurve, 1e-4, 3);
    pair = simulatePair(pairCase.topology, pairCase.driver.model, pairCase.output.model, pairCase.polarity, null, pairCase.sweep);
  });

  const engineAt = (icAmps: number, bleedOhms: number | null, outputVbeVolts: number) =>
    solvePairCurrents({
      topology: pairCase.topology,
      pairIcAmps: icAmps,
      bleedOhms,
      outputVbeVolts,
      driverHfeAt: (ic) => hfeAt(driverPoints, ic, "min") ?? 0,
      outputHfeAt: (ic) => hfeAt(outputPoints, ic, "min") ?? 0,
    });

  it("predicts the pair's β within 5% of the simulated pair, each device at its own current", () => {
    // Reference: ngspice DC sweep of the pair at VCE = 5 V, β = IC / IB; the engine reads each device's β at its own current.
    // Tolerance: the engine interpolates log-log between points a third of a decade apart and ignores each device's VCE shift.
    for (const icAmps of pairCase.pairIcAmps) {
      const simulated = readAt(pair.icAmps, pair.icAmps.map((ic, k) => ic / pair.ibAmps[k]), icAmps);
      const engine = engineAt(icAmps, null, 0.7);
      expect(engine.converged).toBe(true);
      expect(engine.pairHfe / simulated).toBeGreaterThan(0.95);
      expect(engine.pairHfe / simulated).toBeLessThan(1.05);
      // The driver's own current, read from its collector ammeter, within 5%.
      const simulatedDriverIc = readAt(pair.icAmps, pair.driverIcAmps, icAmps);
      expect(engine.driverIcAmps / simulatedDriverIc).toBeGreaterThan(0.95);
      expect(engine.driverIcAmps / simulatedDriverIc).toBeLessThan(1.05);
    }
  });

  it("predicts the pair's VBE from each device's own VBE within 25 mV", () => {
    // Reference: the pair's simulated base voltage against VBE1 + VBE2 (Darlington) or VBE1 (Sziklai) read from single-device sweeps
    // at each device's own current. Tolerance: the single sweeps run at slightly different VCE, and the base resistances see other currents.
    for (const icAmps of pairCase.pairIcAmps) {
      const engine = engineAt(icAmps, null, 0.7);
      const vbe1 = readAt(driverCurve.icAmps, driverCurve.vbeVolts, engine.driverIcAmps);
      const vbe2 = readAt(outputCurve.icAmps, outputCurve.vbeVolts, engine.outputIcAmps);
      const simulated = readAt(pair.icAmps, pair.vbeVolts, icAmps);
      expect(Math.abs(compoundVbe(pairCase.topology, vbe1, vbe2) - simulated)).toBeLessThan(0.025);
    }
  });

  if (pairCase.topology === "darlington") {
    it("shows a VBE of about two diode drops", () => {
      // Common practice: a Darlington's VBE is about two diode drops (about 1.1 V to 1.6 V across the working currents).
      for (const icAmps of pairCase.pairIcAmps) {
        const simulated = readAt(pair.icAmps, pair.vbeVolts, icAmps);
        expect(simulated).toBeGreaterThan(1.0);
        expect(simulated).toBeLessThan(1.7);
      }
    });
  }
});

/** VCE(sat) against IC at forced gain 10 for one device: a CCCS holds IC = 10 × IB. */
function simulateSaturation(model: string, icMaxAmps: number) {
  const run = simulate({
    title: `${model} saturation at forced gain 10`,
    circuit: `${AT_25_C}\nIB 0 bb 20u\nVIB bb b 0\nF1 0 c VIB 10\nQ1 c b 0 ${model}`,
    analysis: `dc IB 20u ${icMaxAmps / 10} ${icMaxAmps / 10 / 1000}`,
    vectors: ["v(c)"],
  });
  return { icAmps: run.scale.map((ib) => ib * 10), vceSatVolts: vectorOf(run, "v(c)") };
}

describe("power Darlington QGP_N1 + QPW_N1 saturation against ngspice", () => {
  it("predicts VCE(sat) = VCE(sat)1 + VBE2 within 60 mV, never below one VBE", () => {
    // Reference: ngspice sweep of the base current into a Darlington switching a 6 Ω load from 12 V; read where the driver's
    // forced gain IC1 / IB is 10 (the usual datasheet condition), against the driver's simulated VCE(sat) at forced gain 10
    // and the output's simulated VBE at its own current.
    // Sweep from 20 µA, not zero, so the operating point cannot settle on a false state (stack notes).
    const run = simulate({
      title: "Darlington switching a 6 Ω load",
      circuit: `${AT_25_C}\nVCC cc 0 12\nRL cc c 6\nIB 0 bb 20u\nVIB bb b 0\nVA1 c c1 0\nQ1 c1 b e1 QGP_N1\nQ2 c e1 0 QPW_N1`,
      analysis: "dc IB 20u 20m 20u",
      vectors: ["v(c)", "v(e1)", "i(VA1)"],
    });
    const ib = run.scale;
    const driverIc = vectorOf(run, "i(VA1)");
    const forced = driverIc.map((ic, k) => ic / ib[k]);
    const vce = vectorOf(run, "v(c)");
    const vbe2 = vectorOf(run, "v(e1)");
    const start = forced.findIndex((f) => f < 30);
    const tail = (values: number[]) => values.slice(start);
    const at10 = (values: number[]) => valueAt(tail(forced), tail(values), 10);
    const ic1 = at10(driverIc);
    const pairIc = (12 - at10(vce)) / 6;
    const single = simulateSaturation("QGP_N1", 0.5);
    const satPoints: SaturationPoint[] = [ic1 / 2, ic1 * 2].map((ic) => ({
      icAmps: ic,
      ibAmps: ic / 10,
      vceSatMaxVolts: valueAt(single.icAmps, single.vceSatVolts, ic),
      vceSatTypVolts: null,
      vbeSatVolts: null,
    }));
    const outputCurve = simulateDevice("QPW_N1", "npn", 1);
    const outputVbe = readAt(outputCurve.icAmps, outputCurve.vbeVolts, pairIc - ic1);
    const engine = compoundVceSat(vceSatAt(satPoints, ic1)?.volts ?? Number.NaN, outputVbe);
    expect(Math.abs(engine - at10(vce))).toBeLessThan(0.06);
    // Common practice: a Darlington's VCE(sat) cannot fall below about one VBE.
    expect(at10(vce)).toBeGreaterThan(at10(vbe2));
    expect(at10(vce)).toBeGreaterThan(0.6);
  });
});

describe("power Darlington QGP_N1 + QPW_N1 bleed resistor against ngspice", () => {
  let driverPoints: GainPoint[];
  let outputPoints: GainPoint[];
  let outputCurve: Curve;
  beforeAll(() => {
    outputCurve = simulateDevice("QPW_N1", "npn", PAIR_VCE_VOLTS);
    driverPoints = gainPointsOf(simulateDevice("QGP_N1", "npn", PAIR_VCE_VOLTS - 0.7), 1e-6, 0.3);
    outputPoints = gainPointsOf(outputCurve, 1e-4, 3);
  });

  it("predicts the share of the driver's current the bleed takes within 15%, and the suggested value keeps it near 10%", () => {
    // Reference: ngspice sweep of the pair with the suggested bleed; the share is the bleed current VBE2 / R over the driver's
    // emitter current (ammeter), read at the lowest operating current 0.1 A. Tolerance: the engine takes VBE2 at the operating current.
    const gains = { driverHfeAt: (ic: number) => hfeAt(driverPoints, ic, "min") ?? 0, outputHfeAt: (ic: number) => hfeAt(outputPoints, ic, "min") ?? 0 };
    const outputVbeVolts = readAt(outputCurve.icAmps, outputCurve.vbeVolts, 0.1);
    const suggestion = suggestBleedResistor({ topology: "darlington", minIcAmps: 0.1, operatingIcAmps: 1, outputVbeVolts, highGain: gains, worstGain: gains });
    const run = simulatePair("darlington", "QGP_N1", "QPW_N1", "npn", suggestion.ohms, [0.9, 1.9]);
    const simulatedShare = readAt(run.icAmps, run.innerVolts.map((v, k) => v / suggestion.ohms / run.driverIeAmps[k]), 0.1);
    expect(suggestion.shareAtMinIc / simulatedShare).toBeGreaterThan(0.85);
    expect(suggestion.shareAtMinIc / simulatedShare).toBeLessThan(1.15);
    expect(simulatedShare).toBeLessThan(0.11);
    // Its cost in gain at the operating current, against the simulated β with and without the resistor, within 3 points.
    const plain = simulatePair("darlington", "QGP_N1", "QPW_N1", "npn", null, [0.9, 1.9]);
    const beta = (r: PairRun) => readAt(r.icAmps, r.icAmps.map((ic, k) => ic / r.ibAmps[k]), 1);
    expect(Math.abs(suggestion.gainCost - (1 - beta(run) / beta(plain)))).toBeLessThan(0.03);
  });

  it("takes a larger share with a smaller resistor, as simulated", () => {
    // Reference: the same sweep with 1 kΩ and 100 Ω bleeds, read at 0.3 A.
    const shareWith = (ohms: number) => {
      const run = simulatePair("darlington", "QGP_N1", "QPW_N1", "npn", ohms, [0.9, 1.9]);
      return readAt(run.icAmps, run.innerVolts.map((v, k) => v / ohms / run.driverIeAmps[k]), 0.3);
    };
    const engineShare = (ohms: number) =>
      solvePairCurrents({
        topology: "darlington",
        pairIcAmps: 0.3,
        bleedOhms: ohms,
        outputVbeVolts: readAt(outputCurve.icAmps, outputCurve.vbeVolts, 0.3),
        driverHfeAt: (ic) => hfeAt(driverPoints, ic, "min") ?? 0,
        outputHfeAt: (ic) => hfeAt(outputPoints, ic, "min") ?? 0,
      }).bleedShare;
    const large = shareWith(1000);
    const small = shareWith(100);
    expect(small).toBeGreaterThan(large);
    for (const [ohms, simulated] of [[1000, large], [100, small]] as const) {
      expect(engineShare(ohms) / simulated).toBeGreaterThan(0.85);
      expect(engineShare(ohms) / simulated).toBeLessThan(1.15);
    }
  });
});

describe("NPN Sziklai QGP_N1 + QPW_P1 bleed resistor against ngspice", () => {
  it("predicts the share of the driver's collector current a 330 Ω bleed takes within 15%", () => {
    // Reference: ngspice sweep of the Sziklai pair with 330 Ω across the output's base and emitter, read at 0.3 A;
    // the bleed current is (VCE − v(x)) / R, the driver's collector current comes from its ammeter.
    const driverPoints = gainPointsOf(simulateDevice("QGP_N1", "npn", PAIR_VCE_VOLTS - 0.7), 1e-6, 0.3);
    const outputCurve = simulateDevice("QPW_P1", "pnp", PAIR_VCE_VOLTS);
    const outputPoints = gainPointsOf(outputCurve, 1e-4, 3);
    const run = simulatePair("sziklai", "QGP_N1", "QPW_P1", "npn", 330, [0.4, 1.3]);
    const simulated = readAt(run.icAmps, run.innerVolts.map((v, k) => (PAIR_VCE_VOLTS - v) / 330 / run.driverIcAmps[k]), 0.3);
    const engine = solvePairCurrents({
      topology: "sziklai",
      pairIcAmps: 0.3,
      bleedOhms: 330,
      outputVbeVolts: readAt(outputCurve.icAmps, outputCurve.vbeVolts, 0.3),
      driverHfeAt: (ic) => hfeAt(driverPoints, ic, "min") ?? 0,
      outputHfeAt: (ic) => hfeAt(outputPoints, ic, "min") ?? 0,
    });
    expect(engine.bleedShare / simulated).toBeGreaterThan(0.85);
    expect(engine.bleedShare / simulated).toBeLessThan(1.15);
  });
});
