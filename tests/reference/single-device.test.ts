// Single-device checks of the engine against ngspice runs of the invented Gummel-Poon models in models/invented-bjt.lib.
import { beforeAll, describe, expect, it } from "vitest";
import { checkDrive } from "#app/domain/checks/drive.ts";
import { checkVoltageGain, intrinsicParameters } from "#app/domain/checks/voltage-gain.ts";
import { thermalVoltage } from "#app/domain/constants.ts";
import { hfeAt, vceSatAt, worstCaseGain } from "#app/domain/gain-curve.ts";
import type { GainPoint, SaturationPoint } from "#app/domain/part.ts";
import { modelParameter, requireNgspice, simulate, valueAt, vectorOf } from "./ngspice.ts";

type Polarity = "npn" | "pnp";
const sign = (polarity: Polarity) => (polarity === "npn" ? 1 : -1);
// Simulations run at 25 °C with the model parameters referred to 25 °C, so VT matches the engine's thermalVoltage(25).
const AT_25_C = ".options tnom=25\n.temp 25";

interface GainCurve {
  icAmps: number[];
  hfe: number[];
  vbeVolts: number[];
}

/** hFE = IC / IB from a DC sweep of VBE at fixed VCE (magnitudes, either polarity). */
function simulateGainCurve(model: string, polarity: Polarity, vceVolts: number): GainCurve {
  const s = sign(polarity);
  const run = simulate({
    title: `${model} gain curve at VCE ${vceVolts} V`,
    circuit: `${AT_25_C}\nVC c 0 ${s * vceVolts}\nVB b 0 0\nQ1 c b 0 ${model}`,
    analysis: `dc VB ${s * 0.3} ${s * 1.2} ${s * 0.0005}`,
    vectors: ["i(VC)", "i(VB)"],
  });
  const icAmps = vectorOf(run, "i(VC)").map((i) => -s * i);
  const ibAmps = vectorOf(run, "i(VB)").map((i) => -s * i);
  return { icAmps, hfe: icAmps.map((ic, k) => ic / ibAmps[k]), vbeVolts: run.scale.map((v) => s * v) };
}

/** The simulated curve read at one IC, interpolated in log(IC). */
function curveAt(curve: GainCurve, values: number[], icAmps: number): number {
  return valueAt(curve.icAmps.map(Math.log), values, Math.log(icAmps));
}

/** ro = 1 / (dIC / dVCE) at fixed VBE, from a VCE sweep 9-11 V. */
function simulateOutputResistance(model: string, polarity: Polarity, vbeVolts: number) {
  const s = sign(polarity);
  const run = simulate({
    title: `${model} output slope`,
    circuit: `${AT_25_C}\nVC c 0 0\nVB b 0 ${s * vbeVolts}\nQ1 c b 0 ${model}`,
    analysis: `dc VC ${s * 9} ${s * 11} ${s * 0.05}`,
    vectors: ["i(VC)"],
  });
  const ic = vectorOf(run, "i(VC)").map((i) => -s * i);
  const vce = run.scale.map((v) => s * v);
  return { roOhms: (vce[vce.length - 1] - vce[0]) / (ic[ic.length - 1] - ic[0]), icAmps: valueAt(vce, ic, 10) };
}

/** VCE(sat) and VBE(sat) against IC at a fixed forced gain: a CCCS feeds the collector IC = βforced × IB. */
function simulateSaturation(model: string, polarity: Polarity, forcedGain: number, icMaxAmps: number) {
  const s = sign(polarity);
  // The sweep starts from 20 µA, not zero, so the operating point cannot settle on a false state (stack notes).
  const run = simulate({
    title: `${model} saturation at forced gain ${forcedGain}`,
    circuit: `${AT_25_C}\n${polarity === "npn" ? "IB 0 bb" : "IB bb 0"} 20u\nVIB bb b 0\nF1 0 c VIB ${forcedGain}\nQ1 c b 0 ${model}`,
    analysis: `dc IB 20u ${icMaxAmps / forcedGain} ${icMaxAmps / forcedGain / 1000}`,
    vectors: ["v(c)", "v(b)"],
  });
  return {
    icAmps: run.scale.map((ib) => ib * forcedGain),
    vceSatVolts: vectorOf(run, "v(c)").map((v) => s * v),
    vbeSatVolts: vectorOf(run, "v(b)").map((v) => s * v),
  };
}

const geometric = (a: number, b: number, t: number) => Math.exp(Math.log(a) + t * Math.log(b / a));
const typPoint = (icAmps: number, hfe: number, vceVolts: number): GainPoint => ({ icAmps, vceVolts, hfeMin: null, hfeTyp: hfe, hfeMax: null, tempC: 25 });

// Three "datasheet" currents per model, spanning the flat top of each curve (about 1 to 1.5 decades apart).
const DEVICES: { model: string; polarity: Polarity; role: string; datasheetIcAmps: [number, number, number]; smallSignalIcAmps: number }[] = [
  { model: "QSF_HG1", polarity: "npn", role: "small-signal high-gain NPN", datasheetIcAmps: [1e-5, 1e-3, 1e-2], smallSignalIcAmps: 1e-4 },
  { model: "QGP_N1", polarity: "npn", role: "general-purpose NPN", datasheetIcAmps: [1e-4, 1e-2, 1e-1], smallSignalIcAmps: 1e-3 },
  { model: "QGP_P1", polarity: "pnp", role: "general-purpose PNP", datasheetIcAmps: [1e-4, 1e-2, 1e-1], smallSignalIcAmps: 1e-3 },
  { model: "QPW_N1", polarity: "npn", role: "power NPN", datasheetIcAmps: [1e-2, 3e-1, 2], smallSignalIcAmps: 2e-2 },
  { model: "QPW_P1", polarity: "pnp", role: "power PNP", datasheetIcAmps: [1e-2, 3e-1, 2], smallSignalIcAmps: 2e-2 },
];

beforeAll(() => {
  // No skipping: without ngspice these tests fail with the install command in the message.
  requireNgspice();
});

describe.each(DEVICES)("$model ($role) against ngspice", ({ model, polarity, datasheetIcAmps, smallSignalIcAmps }) => {
  let curve: GainCurve;
  let points: GainPoint[];
  beforeAll(() => {
    curve = simulateGainCurve(model, polarity, 5);
    points = datasheetIcAmps.map((ic) => typPoint(ic, curveAt(curve, curve.hfe, ic), 5));
  });

  it("interpolates hFE between simulated gain points within 10% of the simulated curve, never above it", () => {
    // Reference: ngspice DC sweep of VBE at VCE = 5 V, hFE = IC / IB of the model above.
    // Tolerance: between the ISE/NE fall at low current and the IKF roll-off the Gummel-Poon hFE is concave in log-log,
    // so the log-log chord the engine draws lies under the curve; over these spans the gap stays below 10%.
    for (let k = 0; k < 2; k += 1) {
      for (const t of [0.25, 0.5, 0.75]) {
        const icAmps = geometric(datasheetIcAmps[k], datasheetIcAmps[k + 1], t);
        const simulated = curveAt(curve, curve.hfe, icAmps);
        const engine = hfeAt(points, icAmps, "typ") ?? Number.NaN;
        expect(engine).toBeLessThanOrEqual(simulated * (1 + 1e-9));
        expect(engine).toBeGreaterThanOrEqual(simulated * 0.9);
      }
    }
  });

  it("holds the gain flat below the quoted points, where the simulated gain falls, and flags it", () => {
    // Reference: the same sweep a full decade below the lowest "datasheet" current; gain falls at low current (common practice).
    const icAmps = datasheetIcAmps[0] / 10;
    const minPoints = points.map((p) => ({ ...p, hfeMin: p.hfeTyp, hfeTyp: null }));
    const estimate = worstCaseGain(minPoints, icAmps);
    expect(estimate.hfe).toBeGreaterThan(curveAt(curve, curve.hfe, icAmps));
    expect(estimate.flags).toEqual(["gain-off-point"]);
  });

  it("gives ro = (VA + VCE) / IC and gm·ro within 10% of the simulated output slope", () => {
    // Reference: ngspice VCE sweep 9-11 V at the fixed VBE that gives the small-signal IC, and the VBE sweep's dIC/dVBE.
    // Tolerance: the Gummel-Poon base charge also holds the VBE/VAR and VBC terms and RE degenerates gm, worth a few per cent.
    // gm is read at the same VCE (10 V) as the output slope, since IC itself moves with VCE through the Early effect.
    const at10Volts = simulateGainCurve(model, polarity, 10);
    const vbeVolts = curveAt(at10Volts, at10Volts.vbeVolts, smallSignalIcAmps);
    const slope = simulateOutputResistance(model, polarity, vbeVolts);
    const earlyVolts = modelParameter(model, "VAF");
    const engine = intrinsicParameters(slope.icAmps, 10, earlyVolts, 25);
    expect(engine.roOhms / slope.roOhms).toBeGreaterThan(0.9);
    expect(engine.roOhms / slope.roOhms).toBeLessThan(1.1);
    const step = 1e-3;
    const gmSim =
      (valueAt(at10Volts.vbeVolts, at10Volts.icAmps, vbeVolts + step) - valueAt(at10Volts.vbeVolts, at10Volts.icAmps, vbeVolts - step)) / (2 * step);
    const ratio = engine.intrinsicGain / (gmSim * slope.roOhms);
    expect(ratio).toBeGreaterThan(0.9);
    expect(ratio).toBeLessThan(1.1);
  });

  it("interpolates VCE(sat) at forced gain 10 between two simulated points a decade apart, erring high, and is pessimistic above them", () => {
    // Reference: ngspice sweep with a CCCS holding IC = 10 × IB, the usual datasheet condition for VCE(sat).
    const [, mid, high] = datasheetIcAmps;
    const sat = simulateSaturation(model, polarity, 10, high * 3);
    const at = (ic: number) => valueAt(sat.icAmps, sat.vceSatVolts, ic);
    const satPoints: SaturationPoint[] = [mid, high].map((ic) => ({ icAmps: ic, ibAmps: ic / 10, vceSatMaxVolts: at(ic), vceSatTypVolts: null, vbeSatVolts: null }));
    const between = geometric(mid, high, 0.5);
    const engine = vceSatAt(satPoints, between);
    expect(engine?.forcedGain).toBeCloseTo(10, 9);
    // Tolerance: VCE(sat) is a junction term plus an ohmic IC × RC term that rises faster than a power law (convex in log-log),
    // so the log-log chord lies above the simulated curve: pessimistic, by less than 25% over a decade.
    expect((engine?.volts ?? 0) / at(between)).toBeGreaterThanOrEqual(1 - 1e-9);
    expect((engine?.volts ?? 0) / at(between)).toBeLessThan(1.25);
    // Above the quoted range the engine scales VCE(sat) with IC, which stays above the simulated (sub-linear) rise.
    const above = vceSatAt(satPoints, high * 2);
    expect(above?.extrapolated).toBe(true);
    expect(above?.volts ?? 0).toBeGreaterThanOrEqual(at(high * 2));
  });
});

describe("QGP_N1 common-emitter stage against ngspice", () => {
  it("predicts the stage's voltage gain gm × (RC ∥ ro) within 10%", () => {
    // Reference: ngspice DC transfer of a 24 V, 10 kΩ common-emitter stage; gain = −dVC/dVB around the bias point.
    const bias = simulateGainCurve("QGP_N1", "npn", 14);
    const vbeVolts = curveAt(bias, bias.vbeVolts, 1e-3);
    const step = 0.2e-3;
    const run = simulate({
      title: "QGP_N1 common-emitter stage",
      circuit: `${AT_25_C}\nVCC cc 0 24\nRC cc c 10k\nVB b 0 ${vbeVolts}\nQ1 c b 0 QGP_N1`,
      analysis: `dc VB ${vbeVolts - step} ${vbeVolts + step} ${step}`,
      vectors: ["v(c)"],
    });
    const vc = vectorOf(run, "v(c)");
    const simulatedGain = (vc[0] - vc[2]) / (2 * step);
    const icAmps = (24 - vc[1]) / 10e3;
    const result = checkVoltageGain({
      icAmps,
      vceVolts: vc[1],
      earlyVolts: modelParameter("QGP_N1", "VAF"),
      loadOhms: 10e3,
      requiredVoltageGain: 100,
      tempC: 25,
      hfe: 200,
    });
    const engineGain = result.inputs.find((input) => input.symbol === "Av")?.value ?? 0;
    expect(engineGain / simulatedGain).toBeGreaterThan(0.9);
    expect(engineGain / simulatedGain).toBeLessThan(1.1);
    expect(result.verdict).toBe("fits");
    // gm at this IC is IC / VT with VT from CODATA k and e.
    expect(result.inputs.find((input) => input.symbol === "gm")?.value).toBeCloseTo(icAmps / thermalVoltage(25), 12);
  });
});

describe("QGP_N1 low-side switch against ngspice", () => {
  it("suggests a base resistor that saturates the simulated switch, with the base current it predicted", () => {
    // Reference: ngspice operating point of a 12 V, 80 Ω load switched by QGP_N1 from 3.3 V through the suggested resistor.
    const sat = simulateSaturation("QGP_N1", "npn", 10, 0.3);
    const vbeSatVolts = valueAt(sat.icAmps, sat.vbeSatVolts, 0.15);
    const vceSatVolts = valueAt(sat.icAmps, sat.vceSatVolts, 0.15);
    const icAmps = (12 - vceSatVolts) / 80;
    const drive = checkDrive({
      mode: "switching",
      icAmps,
      worstHfe: 100,
      forcedGain: 10,
      vbeVolts: vbeSatVolts,
      vbeAssumed: false,
      drive: { kind: "source", volts: 3.3, sourceOhms: 1e3 },
    });
    expect(drive.verdict).toBe("fails");
    const baseOhms = drive.suggestedBaseOhms ?? Number.NaN;
    const run = simulate({
      title: "QGP_N1 low-side switch",
      circuit: `${AT_25_C}\nVCC cc 0 12\nRL cc c 80\nVD d 0 3.3\nRB d b ${baseOhms}\nQ1 c b 0 QGP_N1`,
      analysis: "op",
      vectors: ["v(c)", "v(b)", "i(VD)"],
    });
    const vce = vectorOf(run, "v(c)")[0];
    const ibAmps = -vectorOf(run, "i(VD)")[0];
    const predictedIbAmps = (3.3 - vbeSatVolts) / baseOhms;
    // Tolerance 5%: the engine takes VBE(sat) at IC / IB = 10, while the rounded-down resistor drives a little harder.
    expect(ibAmps / predictedIbAmps).toBeGreaterThan(0.95);
    expect(ibAmps / predictedIbAmps).toBeLessThan(1.05);
    expect(ibAmps).toBeGreaterThanOrEqual(drive.ibNeededAmps);
    // Saturated: at or below the simulated VCE(sat) at forced gain 10, as more base current only lowers it.
    expect(vce).toBeLessThanOrEqual(vceSatVolts + 1e-6);
  });
});
