// Darlington and Sziklai pairs from two catalogue parts: each device at its own current, checked on its own numbers.
import { type CheckResult, type FlagName, mergeFlags, type Verdict, worstVerdict } from "./check-result";
import { checkBandwidth } from "./checks/bandwidth";
import { checkCurrent } from "./checks/current";
import { checkDrive } from "./checks/drive";
import { formatValue } from "./checks/format";
import { checkGain, type GainAtCurrent } from "./checks/gain";
import { checkSaturation } from "./checks/saturation";
import { checkThermal } from "./checks/thermal";
import { checkVoltage } from "./checks/voltage";
import { assessDataQuality } from "./data-quality";
import { chooseVbe, DEFAULT_VCE_SAT_VOLTS, type EvaluateOptions, findExclusions } from "./evaluate-part";
import { DEFAULT_TYP_TO_MIN_FACTOR, type GainCorner, type GainEstimate, hfeAt, type SaturationEstimate, vceSatAt, type WorstCaseGainOptions, worstCaseGain } from "./gain-curve";
import type { GainPoint, PartSpec, Polarity } from "./part";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";

export const COMPOUND_TOPOLOGIES = ["darlington", "sziklai"] as const;
export type CompoundTopology = (typeof COMPOUND_TOPOLOGIES)[number];

/** Pair currents agree when successive output currents differ by less than this fraction of the pair's IC. */
export const PAIR_CURRENT_TOLERANCE = 1e-9;
/** The fixed point contracts by about 1/β per step, so a handful suffice; the cap only guards odd curves. */
export const PAIR_MAX_ITERATIONS = 50;

export interface PairCurrentsInput {
  topology: CompoundTopology;
  /** Current into the pair's collector terminal. */
  pairIcAmps: number;
  /** Base-emitter bleed resistor across the output device; null when none is fitted. */
  bleedOhms: number | null;
  /** VBE of the output device, which sets the bleed current VBE2 / Rbleed. */
  outputVbeVolts: number;
  /** Worst-case (or any corner's) hFE of the driver at a collector current. */
  driverHfeAt: (icAmps: number) => number;
  outputHfeAt: (icAmps: number) => number;
}

export interface PairCurrents {
  topology: CompoundTopology;
  pairIcAmps: number;
  /** Base current into the pair (the driver's base). */
  pairIbAmps: number;
  driverIcAmps: number;
  driverHfe: number;
  outputIcAmps: number;
  outputIbAmps: number;
  outputHfe: number;
  bleedAmps: number;
  /** Share of the driver's current the bleed resistor takes: of its emitter current (Darlington) or collector current (Sziklai). */
  bleedShare: number;
  /** Effective current gain of the pair, IC / IB, bleed included. */
  pairHfe: number;
  iterations: number;
  converged: boolean;
  /** False when a device has no gain or the bleed current alone exceeds the pair's current. */
  feasible: boolean;
}

/** β of a Darlington pair without bleed: β1 β2 + β1 + β2. */
export function darlingtonBeta(driverHfe: number, outputHfe: number): number {
  return driverHfe * outputHfe + driverHfe + outputHfe;
}

/** β of a Sziklai pair without bleed: β1 (β2 + 1). */
export function sziklaiBeta(driverHfe: number, outputHfe: number): number {
  return driverHfe * (outputHfe + 1);
}

/** The pair's β without bleed from each device's own β. */
export function compoundBeta(topology: CompoundTopology, driverHfe: number, outputHfe: number): number {
  return topology === "darlington" ? darlingtonBeta(driverHfe, outputHfe) : sziklaiBeta(driverHfe, outputHfe);
}

/** Base-emitter voltage of the pair: VBE1 + VBE2 for a Darlington, VBE1 for a Sziklai. */
export function compoundVbe(topology: CompoundTopology, driverVbeVolts: number, outputVbeVolts: number): number {
  return topology === "darlington" ? driverVbeVolts + outputVbeVolts : driverVbeVolts;
}

/** Saturation voltage of either pair: the driver saturates, the output stays one VBE above it. */
export function compoundVceSat(driverVceSatVolts: number, outputVbeVolts: number): number {
  return driverVceSatVolts + outputVbeVolts;
}

function infeasible(input: PairCurrentsInput, bleedAmps: number, iterations: number): PairCurrents {
  return {
    topology: input.topology,
    pairIcAmps: input.pairIcAmps,
    pairIbAmps: Number.POSITIVE_INFINITY,
    driverIcAmps: Number.NaN,
    driverHfe: 0,
    outputIcAmps: Number.NaN,
    outputIbAmps: Number.NaN,
    outputHfe: 0,
    bleedAmps,
    bleedShare: 1,
    pairHfe: 0,
    iterations,
    converged: false,
    feasible: false,
  };
}

/**
 * Solves Kirchhoff's current law at the pair's inner node with each β taken at its own device's
 * current, iterating on the output's collector current until it agrees.
 * Darlington: IE1 = IB2 + Ib, IC = IC1 + IC2. Sziklai: IC1 = IB2 + Ib, IC = IE2 + Ib.
 */
export function solvePairCurrents(input: PairCurrentsInput): PairCurrents {
  const total = input.pairIcAmps;
  const bleedAmps = input.bleedOhms === null ? 0 : input.outputVbeVolts / input.bleedOhms;
  let outputIc = total;
  let driverHfe = 0;
  let outputHfe = 0;
  let driverIc = 0;
  let iterations = 0;
  let converged = false;
  while (iterations < PAIR_MAX_ITERATIONS) {
    iterations += 1;
    outputHfe = input.outputHfeAt(outputIc);
    if (!(outputHfe > 0)) return infeasible(input, bleedAmps, iterations);
    let nextOutputIc: number;
    if (input.topology === "darlington") {
      const driverIe = outputIc / outputHfe + bleedAmps;
      // The driver's collector current is α1 IE1; α1 from the last β1 (1 on the first pass).
      const alpha = driverHfe > 0 ? driverHfe / (driverHfe + 1) : 1;
      driverHfe = input.driverHfeAt(driverIe * alpha);
      if (!(driverHfe > 0)) return infeasible(input, bleedAmps, iterations);
      driverIc = (driverIe * driverHfe) / (driverHfe + 1);
      nextOutputIc = total - driverIc;
    } else {
      const outputIb = (total - bleedAmps) / (outputHfe + 1);
      nextOutputIc = outputHfe * outputIb;
      driverIc = outputIb + bleedAmps;
      driverHfe = input.driverHfeAt(driverIc);
      if (!(driverHfe > 0)) return infeasible(input, bleedAmps, iterations);
    }
    if (!(nextOutputIc > 0)) return infeasible(input, bleedAmps, iterations);
    const change = Math.abs(nextOutputIc - outputIc);
    outputIc = nextOutputIc;
    if (change <= PAIR_CURRENT_TOLERANCE * total) {
      converged = true;
      break;
    }
  }
  outputHfe = input.outputHfeAt(outputIc);
  const outputIbAmps = outputIc / outputHfe;
  const pairIbAmps = input.topology === "darlington" ? (outputIbAmps + bleedAmps) / (driverHfe + 1) : driverIc / driverHfe;
  const driverShareBase = input.topology === "darlington" ? outputIbAmps + bleedAmps : driverIc;
  return {
    topology: input.topology,
    pairIcAmps: total,
    pairIbAmps,
    driverIcAmps: driverIc,
    driverHfe,
    outputIcAmps: outputIc,
    outputIbAmps,
    outputHfe,
    bleedAmps,
    bleedShare: driverShareBase > 0 ? bleedAmps / driverShareBase : 0,
    pairHfe: total / pairIbAmps,
    iterations,
    converged,
    feasible: true,
  };
}

/** hFE against IC with the curve built once, for use inside the pair iteration. */
export type GainModel = (icAmps: number) => number;

/**
 * One corner's curve, scaled, as a function of IC: log-log between the quoted currents, flat beyond,
 * as hfeAt draws it. Sampling hfeAt at every quoted current keeps the same line (a node on a log-log
 * segment leaves it straight), so the curve is read once instead of at every iteration step.
 */
export function cornerGainModel(points: GainPoint[], corner: GainCorner, scale = 1): GainModel {
  const currents = [...new Set(points.map((p) => p.icAmps).filter((ic) => ic > 0))].sort((a, b) => a - b);
  const logIc = currents.map(Math.log);
  const logHfe = currents.map((ic) => Math.log((hfeAt(points, ic, corner) ?? 0) * scale));
  if (currents.length === 0 || !logHfe.every(Number.isFinite)) return () => 0;
  const last = currents.length - 1;
  return (icAmps) => {
    if (icAmps <= currents[0]) return Math.exp(logHfe[0]);
    if (icAmps >= currents[last]) return Math.exp(logHfe[last]);
    let upper = 1;
    while (currents[upper] < icAmps) upper += 1;
    const t = (Math.log(icAmps) - logIc[upper - 1]) / (logIc[upper] - logIc[upper - 1]);
    return Math.exp(logHfe[upper - 1] + t * (logHfe[upper] - logHfe[upper - 1]));
  };
}

// Parts are values: a gain-point list is never changed after it is read, so its models can be kept with it.
const worstModels = new WeakMap<GainPoint[], Map<number, GainModel>>();

/** The worst-case hFE of a part as worstCaseGain gives it (min, else typ or max derated), curve built once per part. */
export function worstGainModel(part: PartSpec, options: WorstCaseGainOptions = {}): GainModel {
  const factor = options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  let byFactor = worstModels.get(part.gainPoints);
  if (byFactor === undefined) {
    byFactor = new Map();
    worstModels.set(part.gainPoints, byFactor);
  }
  const known = byFactor.get(factor);
  if (known !== undefined) return known;
  const model = buildWorstGainModel(part.gainPoints, options);
  byFactor.set(factor, model);
  return model;
}

function buildWorstGainModel(points: GainPoint[], options: WorstCaseGainOptions): GainModel {
  const first = points[0];
  if (first === undefined) return () => 0;
  const estimate = worstCaseGain(points, first.icAmps, options);
  if (estimate.source === "none") return () => 0;
  const corner: GainCorner = estimate.source === "min" ? "min" : estimate.source === "typ-derated" ? "typ" : "max";
  return cornerGainModel(points, corner, estimate.typToMinFactor ?? 1);
}

/** The polarity a pair acts with: its driver's, in both topologies. */
export function compoundPolarity(driver: PartSpec): Polarity {
  return driver.polarity;
}

/** Darlington: driver and output of one polarity; Sziklai: of opposite polarities. */
export function canPair(topology: CompoundTopology, driver: PartSpec, output: PartSpec): boolean {
  return topology === "darlington" ? driver.polarity === output.polarity : driver.polarity !== output.polarity;
}

export interface CompoundOptions extends EvaluateOptions {
  /** Base-emitter bleed resistor across the output; null or absent when none is fitted. */
  bleedOhms?: number | null;
}

export type PairRole = "driver" | "output";

export interface DeviceInPair<P extends PartSpec = PartSpec> {
  role: PairRole;
  part: P;
  /** The device's own collector current at the pair's operating and peak IC. */
  icAmps: number;
  peakIcAmps: number;
  /** Worst-case hFE at its own operating current, with its flags. */
  gain: GainEstimate;
  vbeVolts: number;
  vbeAssumed: boolean;
  /** The VCE its dissipation uses: the driver's is one VBE2 below the pair's. */
  vceVolts: number;
  dissipationWatts: number;
  junctionC: number | null;
  checks: CheckResult[];
}

/** A derived number of the pair, with the formula that gave it. */
export interface CompoundFigure {
  symbol: string;
  label: string;
  value: number;
  unit: string;
  formula: string;
}

export interface CompoundEvaluation<P extends PartSpec = PartSpec> {
  topology: CompoundTopology;
  polarity: Polarity;
  verdict: Verdict;
  /** Every check: the devices' own (voltage, current, thermal) and the pair's (gain, drive, saturation, bandwidth). */
  checks: CheckResult[];
  flags: FlagName[];
  devices: { driver: DeviceInPair<P>; output: DeviceInPair<P> };
  /** Worst-case effective β of the pair at the operating IC, bleed included. */
  hfeAtOperatingPoint: number;
  hfeWithoutBleed: number;
  vbeVolts: number;
  vceSatVolts: number | null;
  /** The pair's ratings: the lower VCEO of the two, the output's IC max. */
  vceoVolts: number;
  icMaxAmps: number;
  bleedOhms: number | null;
  bleedAmps: number;
  bleedShare: number;
  currents: PairCurrents;
  figures: CompoundFigure[];
  /** Why the pair lies outside the sheet's polarity or packages; empty when eligible. */
  excludedBy: string[];
  dataQuality: { score: number; flags: string[] };
}

const TOPOLOGY_BETA_FORMULA: Record<CompoundTopology, string> = {
  darlington: "β = β1 β2 + β1 + β2 without bleed; with bleed β = IC / IB, IE1 = IC2 / β2 + VBE2 / Rbleed",
  sziklai: "β = β1 (β2 + 1) without bleed; with bleed β = IC / IB, IC1 = IB2 + VBE2 / Rbleed",
};


/** The pair's gain as one estimate, so the single-device gain check can judge it. */
function pairGainEstimate(currents: PairCurrents, driverGain: GainEstimate, outputGain: GainEstimate): GainEstimate {
  const sources = [driverGain.source, outputGain.source];
  const source = !currents.feasible || sources.includes("none") ? "none" : (sources.find((s) => s !== "min") ?? "min");
  return {
    hfe: currents.feasible ? currents.pairHfe : 0,
    source,
    typToMinFactor: driverGain.typToMinFactor ?? outputGain.typToMinFactor,
    flags: mergeFlags(driverGain.flags, outputGain.flags),
    decadesOffPoint: Math.max(driverGain.decadesOffPoint, outputGain.decadesOffPoint),
    note:
      `pair β from β1 ${formatValue(currents.driverHfe, "")} at IC1 ${formatValue(currents.driverIcAmps, "A")} (${driverGain.note}) ` +
      `and β2 ${formatValue(currents.outputHfe, "")} at IC2 ${formatValue(currents.outputIcAmps, "A")} (${outputGain.note})`,
  };
}

function thermalFor(part: PartSpec, role: PairRole, sheet: RequirementSheet, vceVolts: number, icAmps: number): CheckResult {
  const switching = sheet.mode === "switching";
  return checkThermal({
    subject: role,
    mode: sheet.mode,
    vceVolts,
    icAmps,
    dutyCycle: switching ? sheet.dutyCycle : 1,
    ambientC: sheet.ambientC,
    rthJaCPerW: part.rthJaCPerW,
    rthJcCPerW: part.rthJcCPerW,
    heatsinkRthCPerW: sheet.heatsinkRthCPerW,
    tjMaxC: part.tjMaxC,
    ptotWatts: part.ptotWatts,
    ptotReference: part.ptotReference,
    derating: sheet.derating,
  });
}

function inputValue(check: CheckResult, symbol: string): number | null {
  return check.inputs.find((input) => input.symbol === symbol)?.value ?? null;
}

/** Why a pair lies outside the sheet: the pair's polarity, and each device's package. */
export function findCompoundExclusions(driver: PartSpec, output: PartSpec, sheet: RequirementSheet): string[] {
  const reasons: string[] = [];
  const polarity = compoundPolarity(driver);
  if (sheet.polarity !== "any" && polarity !== sheet.polarity) {
    reasons.push(`the pair acts as ${polarity.toUpperCase()}, the sheet asks for ${sheet.polarity.toUpperCase()}`);
  }
  const anyPolarity: RequirementSheet = { ...sheet, polarity: "any" };
  for (const [role, part] of [["driver", driver], ["output", output]] as const) {
    for (const reason of findExclusions(part, anyPolarity)) reasons.push(`${role}: ${reason}`);
  }
  return reasons;
}

/**
 * Evaluates a Darlington or Sziklai pair against the sheet. Each device runs at its own current
 * (solved by solvePairCurrents) and gets its own voltage, current and thermal checks; the pair's
 * gain, drive, saturation and bandwidth are judged on the pair's own numbers.
 */
export function evaluateCompound<P extends PartSpec>(
  topology: CompoundTopology,
  driver: P,
  output: P,
  sheet: RequirementSheet,
  options: CompoundOptions = {},
): CompoundEvaluation<P> {
  if (!canPair(topology, driver, output)) {
    throw new RangeError(`a ${topology} pair needs ${topology === "darlington" ? "one polarity" : "opposite polarities"}`);
  }
  const bleedOhms = options.bleedOhms ?? null;
  const switching = sheet.mode === "switching";
  const icAmps = sheet.operatingIcAmps;
  const peakIcAmps = peakIcOf(sheet);
  const peakVceVolts = peakVceOf(sheet);
  // The output is never saturated in either pair, so its VBE is VBE(on) even when switching.
  const outputVbe = chooseVbe(output, icAmps, "linear");
  const driverHfeAt = worstGainModel(driver, options);
  const outputHfeAt = worstGainModel(output, options);
  const solve = (current: number, ohms: number | null) =>
    solvePairCurrents({ topology, pairIcAmps: current, bleedOhms: ohms, outputVbeVolts: outputVbe.volts, driverHfeAt, outputHfeAt });

  const operating = solve(icAmps, bleedOhms);
  const peak = peakIcAmps === icAmps ? operating : solve(peakIcAmps, bleedOhms);
  const withoutBleed = bleedOhms === null ? operating : solve(icAmps, null);
  const driverGain = worstCaseGain(driver.gainPoints, operating.driverIcAmps, options);
  const outputGain = worstCaseGain(output.gainPoints, operating.outputIcAmps, options);
  const driverVbe = chooseVbe(driver, operating.driverIcAmps, sheet.mode);
  const pairVbeVolts = compoundVbe(topology, driverVbe.volts, outputVbe.volts);

  const gainCurrents = [...new Set([minIcOf(sheet), icAmps, peakIcAmps])];
  const gains: GainAtCurrent[] = gainCurrents.map((current) => {
    const currents = current === icAmps ? operating : current === peakIcAmps ? peak : solve(current, bleedOhms);
    const estimate = pairGainEstimate(
      currents,
      worstCaseGain(driver.gainPoints, currents.driverIcAmps, options),
      worstCaseGain(output.gainPoints, currents.outputIcAmps, options),
    );
    return { icAmps: current, estimate };
  });
  const pairChecks: CheckResult[] = [
    { ...checkGain({ requiredHfe: sheet.requiredHfe ?? (switching ? sheet.forcedGain : null), gains }), subject: "pair" },
  ];

  let drivenForcedGain = sheet.forcedGain;
  if (sheet.drive != null) {
    // Switching saturates the driver at the sheet's forced gain; the output takes what the driver's emitter gives.
    const pairForcedGain = operating.feasible ? (icAmps * sheet.forcedGain) / operating.driverIcAmps : sheet.forcedGain;
    const drive = checkDrive({
      subject: "pair",
      mode: sheet.mode,
      icAmps,
      worstHfe: operating.feasible ? operating.pairHfe : 0,
      forcedGain: pairForcedGain,
      vbeVolts: pairVbeVolts,
      vbeAssumed: driverVbe.assumed || outputVbe.assumed,
      drive: sheet.drive,
      series: options.series,
    });
    pairChecks.push(drive);
    drivenForcedGain = drive.ibAvailableAmps > 0 ? operating.driverIcAmps / drive.ibAvailableAmps : Number.POSITIVE_INFINITY;
  }

  let driverSat: SaturationEstimate | null = null;
  let pairSat: SaturationEstimate | null = null;
  if (switching) {
    driverSat = operating.feasible ? vceSatAt(driver.saturationPoints, operating.driverIcAmps) : null;
    pairSat = driverSat === null ? null : { ...driverSat, volts: compoundVceSat(driverSat.volts, outputVbe.volts) };
    pairChecks.push(
      checkSaturation({
        subject: "pair",
        icAmps,
        drivenForcedGain,
        worstHfe: operating.driverHfe,
        saturation: pairSat,
        allowedSatDropVolts: sheet.allowedSatDropVolts,
      }),
    );
  }

  const gainNeeded = sheet.requiredVoltageGain ?? sheet.requiredHfe;
  if (!switching && sheet.requiredVoltageGain != null && sheet.loadOhms != null) {
    pairChecks.push({
      check: "voltage-gain",
      subject: "pair",
      verdict: "marginal",
      margin: null,
      flags: [],
      formula: "not modelled for compound pairs",
      inputs: [{ symbol: "Av(req)", label: "voltage gain the circuit needs", value: sheet.requiredVoltageGain, unit: "" }],
      summary: "The voltage gain of a compound pair is not modelled here; confirm it on the circuit.",
    });
  }
  if (sheet.bandwidthHz != null && gainNeeded != null) {
    // The pair is no faster than its slower device.
    const ftHz = driver.ftHz === null || output.ftHz === null ? null : Math.min(driver.ftHz, output.ftHz);
    pairChecks.push(checkBandwidth({ subject: "pair", ftHz, bandwidthHz: sheet.bandwidthHz, gainNeeded }));
  }

  const satVolts = driverSat?.volts ?? sheet.allowedSatDropVolts ?? DEFAULT_VCE_SAT_VOLTS;
  const driverVce = switching ? satVolts : Math.max(0, operatingVceOf(sheet) - outputVbe.volts);
  const outputVce = switching ? compoundVceSat(satVolts, outputVbe.volts) : operatingVceOf(sheet);
  const deviceOf = (role: PairRole, part: P, gain: GainEstimate, vbe: { volts: number; assumed: boolean }, ownIc: number, ownPeakIc: number, vceVolts: number): DeviceInPair<P> => {
    const thermal = thermalFor(part, role, sheet, vceVolts, ownIc);
    const checks: CheckResult[] = [
      checkVoltage({
        subject: role,
        // When the pair is off VBE2 collapses, so the driver too stands the full VCE.
        peakVceVolts,
        vceoVolts: part.vceoVolts,
        reverseVbeVolts: role === "driver" ? sheet.reverseVbeVolts : null,
        veboVolts: part.veboVolts,
        voltageFraction: sheet.derating.voltageFraction,
      }),
      checkCurrent({ subject: role, peakIcAmps: ownPeakIc, icMaxAmps: part.icMaxAmps, currentFraction: sheet.derating.currentFraction }),
      thermal,
    ];
    return {
      role,
      part,
      icAmps: ownIc,
      peakIcAmps: ownPeakIc,
      gain,
      vbeVolts: vbe.volts,
      vbeAssumed: vbe.assumed,
      vceVolts,
      dissipationWatts: inputValue(thermal, "P") ?? 0,
      junctionC: inputValue(thermal, "Tj"),
      checks,
    };
  };
  const feasibleOr = (value: number, fallback: number) => (Number.isFinite(value) ? value : fallback);
  const driverDevice = deviceOf("driver", driver, driverGain, driverVbe, feasibleOr(operating.driverIcAmps, 0), feasibleOr(peak.driverIcAmps, 0), driverVce);
  const outputDevice = deviceOf("output", output, outputGain, outputVbe, feasibleOr(operating.outputIcAmps, icAmps), feasibleOr(peak.outputIcAmps, peakIcAmps), outputVce);

  const checks = [...pairChecks, ...driverDevice.checks, ...outputDevice.checks];
  const quality = [assessDataQuality(driver, options), assessDataQuality(output, options)];
  const qualityFlags = [...new Set(quality.flatMap((q) => q.flags))];
  const staleFlags: FlagName[] = qualityFlags.includes("stale-datasheet") ? ["stale-datasheet"] : [];
  const vceoVolts = Math.min(driver.vceoVolts, output.vceoVolts);
  const figures: CompoundFigure[] = [
    { symbol: "β", label: "pair current gain, worst case, bleed included", value: operating.pairHfe, unit: "", formula: TOPOLOGY_BETA_FORMULA[topology] },
    { symbol: "β(no bleed)", label: "pair current gain without the bleed resistor", value: withoutBleed.pairHfe, unit: "", formula: topology === "darlington" ? "β1 β2 + β1 + β2" : "β1 (β2 + 1)" },
    { symbol: "β1", label: "driver hFE at its own current", value: operating.driverHfe, unit: "", formula: "worst-case hFE at IC1" },
    { symbol: "IC1", label: "driver collector current", value: operating.driverIcAmps, unit: "A", formula: topology === "darlington" ? "IC1 = α1 (IC2 / β2 + Ibleed)" : "IC1 = IB2 + Ibleed" },
    { symbol: "β2", label: "output hFE at its own current", value: operating.outputHfe, unit: "", formula: "worst-case hFE at IC2" },
    { symbol: "IC2", label: "output collector current", value: operating.outputIcAmps, unit: "A", formula: topology === "darlington" ? "IC2 = IC − IC1" : "IC2 = β2 (IC − Ibleed) / (β2 + 1)" },
    { symbol: "VBE", label: "pair base-emitter voltage", value: pairVbeVolts, unit: "V", formula: topology === "darlington" ? "VBE = VBE1 + VBE2" : "VBE = VBE1" },
    { symbol: "VCEO", label: "pair VCEO, the lower of the two", value: vceoVolts, unit: "V", formula: "min(VCEO1, VCEO2)" },
    { symbol: "IC(max)", label: "pair IC max, the output's", value: output.icMaxAmps, unit: "A", formula: "IC max of the output" },
    { symbol: "P1", label: "driver dissipation", value: driverDevice.dissipationWatts, unit: "W", formula: switching ? "P1 = VCE(sat)1 × IC1 × D" : "P1 = (VCE − VBE2) × IC1" },
    { symbol: "P2", label: "output dissipation", value: outputDevice.dissipationWatts, unit: "W", formula: switching ? "P2 = (VCE(sat)1 + VBE2) × IC2 × D" : "P2 = VCE × IC2" },
  ];
  if (pairSat !== null) figures.push({ symbol: "VCE(sat)", label: "pair saturation voltage", value: pairSat.volts, unit: "V", formula: "VCE(sat) = VCE(sat)1 + VBE2" });
  if (bleedOhms !== null) {
    figures.push(
      { symbol: "Rbleed", label: "bleed resistor across the output's base and emitter", value: bleedOhms, unit: "Ω", formula: "chosen" },
      { symbol: "Ibleed", label: "bleed current", value: operating.bleedAmps, unit: "A", formula: "Ibleed = VBE2 / Rbleed" },
      { symbol: "s", label: "share of the driver's current the bleed takes", value: operating.bleedShare, unit: "", formula: topology === "darlington" ? "s = Ibleed / IE1" : "s = Ibleed / IC1" },
    );
  }
  return {
    topology,
    polarity: compoundPolarity(driver),
    verdict: worstVerdict(checks.map((check) => check.verdict)),
    checks,
    flags: mergeFlags(...checks.map((check) => check.flags), staleFlags),
    devices: { driver: driverDevice, output: outputDevice },
    hfeAtOperatingPoint: operating.feasible ? operating.pairHfe : 0,
    hfeWithoutBleed: withoutBleed.feasible ? withoutBleed.pairHfe : 0,
    vbeVolts: pairVbeVolts,
    vceSatVolts: pairSat?.volts ?? null,
    vceoVolts,
    icMaxAmps: output.icMaxAmps,
    bleedOhms,
    bleedAmps: operating.bleedAmps,
    bleedShare: operating.bleedShare,
    currents: operating,
    figures,
    excludedBy: findCompoundExclusions(driver, output, sheet),
    dataQuality: { score: Math.min(quality[0].score, quality[1].score), flags: qualityFlags },
  };
}
