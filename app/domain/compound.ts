// Darlington and Sziklai pairs from two catalogue parts: each device at its own current, checked on its own numbers.
import { type CheckResult, FLAG_BITS, type FlagName, type Judgement, mergeFlags, type Verdict, worseVerdict } from "./check-result";
import { type BandwidthCheckInput, type BandwidthJudgement, explainBandwidth, judgeBandwidth } from "./checks/bandwidth";
import { type CurrentCheckInput, type CurrentJudgement, explainCurrent, judgeCurrent } from "./checks/current";
import { type DriveCheckInput, type DriveJudgement, explainDrive, judgeDrive } from "./checks/drive";
import { formatValue } from "./checks/format";
import { explainGain, type GainAtCurrent, type GainJudgement, judgeGain } from "./checks/gain";
import { explainSaturation, judgeSaturation, type SaturationCheckInput, type SaturationJudgement } from "./checks/saturation";
import { explainThermal, judgeThermal, type ThermalCheckInput, type ThermalJudgement } from "./checks/thermal";
import { explainVoltage, judgeVoltage, type VoltageCheckInput, type VoltageJudgement } from "./checks/voltage";
import { assessDataQuality, type DataQuality } from "./data-quality";
import { chooseVbe, findExclusions } from "./evaluate-part";
import {
  DEFAULT_GAIN_WINDOW_DECADES,
  DEFAULT_TYP_TO_MIN_FACTOR,
  explainGainReading,
  type GainCorner,
  type GainEstimate,
  type GainReading,
  hfeAt,
  newGainReading,
  type PreparedGain,
  prepareGain,
  readWorstCaseGain,
  type SaturationEstimate,
  vceSatAt,
  type WorstCaseGainOptions,
  worstCaseGain,
} from "./gain-curve";
import type { GainPoint, PartSpec, Polarity } from "./part";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";
import { DEFAULT_VCE_SAT_VOLTS, type EvaluateOptions } from "./screening";

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


/** The pair's gain as one reading, so the single-device gain judgement can judge it. */
function pairGainReading(currents: PairCurrents, driverGain: GainReading, outputGain: GainReading): GainReading {
  const anyNone = !currents.feasible || driverGain.source === "none" || outputGain.source === "none";
  const source = anyNone ? "none" : driverGain.source !== "min" ? driverGain.source : outputGain.source;
  return {
    hfe: currents.feasible ? currents.pairHfe : 0,
    source,
    typToMinFactor: driverGain.typToMinFactor ?? outputGain.typToMinFactor,
    flags: mergeFlags([...driverGain.flags], [...outputGain.flags]),
    decadesOffPoint: Math.max(driverGain.decadesOffPoint, outputGain.decadesOffPoint),
  };
}

/** The pair's gain at one of the circuit's currents: the solved currents and each device's reading there. */
interface PairGainAt {
  icAmps: number;
  currents: PairCurrents;
  driver: GainReading;
  output: GainReading;
  pair: GainReading;
}

/** The pair's gain reading with its note, naming each device's own current and gain. */
function explainPairGain(at: PairGainAt): GainEstimate {
  const driverGain = explainGainReading(at.driver);
  const outputGain = explainGainReading(at.output);
  return {
    ...at.pair,
    flags: [...at.pair.flags],
    note:
      `pair β from β1 ${formatValue(at.currents.driverHfe, "")} at IC1 ${formatValue(at.currents.driverIcAmps, "A")} (${driverGain.note}) ` +
      `and β2 ${formatValue(at.currents.outputHfe, "")} at IC2 ${formatValue(at.currents.outputIcAmps, "A")} (${outputGain.note})`,
  };
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

/** One device's own judgements inside a pair, with the inputs they read. */
interface DeviceScreen<P extends PartSpec> {
  role: PairRole;
  part: P;
  icAmps: number;
  peakIcAmps: number;
  gain: GainReading;
  vbe: { volts: number; assumed: boolean };
  vceVolts: number;
  voltageInput: VoltageCheckInput;
  voltage: VoltageJudgement;
  currentInput: CurrentCheckInput;
  current: CurrentJudgement;
  thermalInput: ThermalCheckInput;
  thermal: ThermalJudgement;
}

/** Every judgement of a pair with the inputs each read: numbers only, for the search to score pairs without explaining them. */
export interface CompoundScreen<P extends PartSpec = PartSpec> {
  topology: CompoundTopology;
  sheet: RequirementSheet;
  verdict: Verdict;
  /** The tightest margin of any check; null when none gives one. */
  margin: number | null;
  /** Every check's flags and stale-datasheet, as a mask of FLAG_BITS. */
  flags: number;
  /** The lower data-quality score of the two devices. */
  dataQualityScore: number;
  bleedOhms: number | null;
  operating: PairCurrents;
  /** The pair's currents at the operating IC without the bleed resistor, solved when the explanation asks. */
  solveWithoutBleed: () => PairCurrents;
  pairVbeVolts: number;
  gains: PairGainAt[];
  gain: GainJudgement;
  drive: { input: DriveCheckInput; judged: DriveJudgement } | null;
  saturation: { input: SaturationCheckInput; judged: SaturationJudgement } | null;
  pairSat: SaturationEstimate | null;
  /** The sheet asks for a voltage gain, which is not modelled for pairs: marginal. */
  voltageGainUnmodelled: boolean;
  bandwidth: { input: BandwidthCheckInput; judged: BandwidthJudgement } | null;
  devices: { driver: DeviceScreen<P>; output: DeviceScreen<P> };
  quality: [DataQuality, DataQuality];
}

function foldInto(screen: { verdict: Verdict; margin: number | null; flags: number }, judged: Judgement): void {
  screen.verdict = worseVerdict(screen.verdict, judged.verdict);
  if (judged.margin !== null) screen.margin = screen.margin === null ? judged.margin : Math.min(screen.margin, judged.margin);
  screen.flags |= judged.flags;
}

/** The thermal check input for one device of a pair; the search's bounds use the same one. */
export function thermalInputFor(part: PartSpec, role: PairRole, sheet: RequirementSheet, vceVolts: number, icAmps: number): ThermalCheckInput {
  const switching = sheet.mode === "switching";
  return {
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
  };
}

/**
 * Judges a Darlington or Sziklai pair against the sheet. Each device runs at its own current
 * (solved by solvePairCurrents) and gets its own voltage, current and thermal judgements; the pair's
 * gain, drive, saturation and bandwidth are judged on the pair's own numbers. No explanation is built.
 */
export function screenCompound<P extends PartSpec>(
  topology: CompoundTopology,
  driver: P,
  output: P,
  sheet: RequirementSheet,
  options: CompoundOptions = {},
  /** The devices' data-quality findings when the caller already has them (the search does). */
  qualities?: [DataQuality, DataQuality],
): CompoundScreen<P> {
  if (!canPair(topology, driver, output)) {
    throw new RangeError(`a ${topology} pair needs ${topology === "darlington" ? "one polarity" : "opposite polarities"}`);
  }
  const bleedOhms = options.bleedOhms ?? null;
  const switching = sheet.mode === "switching";
  const icAmps = sheet.operatingIcAmps;
  const peakIcAmps = peakIcOf(sheet);
  const peakVceVolts = peakVceOf(sheet);
  const factor = options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR;
  const windowDecades = options.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES;
  const driverGains = prepareGain(driver.gainPoints);
  const outputGains = prepareGain(output.gainPoints);
  const readGain = (gains: PreparedGain, current: number) => readWorstCaseGain(gains, current, factor, windowDecades, newGainReading());
  // The output is never saturated in either pair, so its VBE is VBE(on) even when switching.
  const outputVbe = chooseVbe(output, icAmps, "linear");
  const driverHfeAt = worstGainModel(driver, options);
  const outputHfeAt = worstGainModel(output, options);
  const solve = (current: number, ohms: number | null) =>
    solvePairCurrents({ topology, pairIcAmps: current, bleedOhms: ohms, outputVbeVolts: outputVbe.volts, driverHfeAt, outputHfeAt });

  const operating = solve(icAmps, bleedOhms);
  const peak = peakIcAmps === icAmps ? operating : solve(peakIcAmps, bleedOhms);
  const driverGain = readGain(driverGains, operating.driverIcAmps);
  const outputGain = readGain(outputGains, operating.outputIcAmps);
  const driverVbe = chooseVbe(driver, operating.driverIcAmps, sheet.mode);
  const pairVbeVolts = compoundVbe(topology, driverVbe.volts, outputVbe.volts);
  const screen = { verdict: "fits" as Verdict, margin: null as number | null, flags: 0 };

  const gainCurrents = [...new Set([minIcOf(sheet), icAmps, peakIcAmps])];
  const gains: PairGainAt[] = gainCurrents.map((current) => {
    const currents = current === icAmps ? operating : current === peakIcAmps ? peak : solve(current, bleedOhms);
    const driverAt = readGain(driverGains, currents.driverIcAmps);
    const outputAt = readGain(outputGains, currents.outputIcAmps);
    return { icAmps: current, currents, driver: driverAt, output: outputAt, pair: pairGainReading(currents, driverAt, outputAt) };
  });
  const gain = judgeGain({ requiredHfe: sheet.requiredHfe ?? (switching ? sheet.forcedGain : null), gains: gains.map((g) => ({ icAmps: g.icAmps, estimate: g.pair })) });
  foldInto(screen, gain);

  let drivenForcedGain = sheet.forcedGain;
  let drive: CompoundScreen<P>["drive"] = null;
  if (sheet.drive != null) {
    // Switching saturates the driver at the sheet's forced gain; the output takes what the driver's emitter gives.
    const pairForcedGain = operating.feasible ? (icAmps * sheet.forcedGain) / operating.driverIcAmps : sheet.forcedGain;
    const input: DriveCheckInput = {
      subject: "pair",
      mode: sheet.mode,
      icAmps,
      worstHfe: operating.feasible ? operating.pairHfe : 0,
      forcedGain: pairForcedGain,
      vbeVolts: pairVbeVolts,
      vbeAssumed: driverVbe.assumed || outputVbe.assumed,
      drive: sheet.drive,
      series: options.series,
    };
    drive = { input, judged: judgeDrive(input) };
    foldInto(screen, drive.judged);
    drivenForcedGain = drive.judged.ibAvailableAmps > 0 ? operating.driverIcAmps / drive.judged.ibAvailableAmps : Number.POSITIVE_INFINITY;
  }

  let driverSat: SaturationEstimate | null = null;
  let pairSat: SaturationEstimate | null = null;
  let saturation: CompoundScreen<P>["saturation"] = null;
  if (switching) {
    driverSat = operating.feasible ? vceSatAt(driver.saturationPoints, operating.driverIcAmps) : null;
    pairSat = driverSat === null ? null : { ...driverSat, volts: compoundVceSat(driverSat.volts, outputVbe.volts) };
    const input: SaturationCheckInput = {
      subject: "pair",
      icAmps,
      drivenForcedGain,
      worstHfe: operating.driverHfe,
      saturation: pairSat,
      allowedSatDropVolts: sheet.allowedSatDropVolts,
    };
    saturation = { input, judged: judgeSaturation(input) };
    foldInto(screen, saturation.judged);
  }

  const gainNeeded = sheet.requiredVoltageGain ?? sheet.requiredHfe;
  const voltageGainUnmodelled = !switching && sheet.requiredVoltageGain != null && sheet.loadOhms != null;
  if (voltageGainUnmodelled) screen.verdict = worseVerdict(screen.verdict, "marginal");
  let bandwidth: CompoundScreen<P>["bandwidth"] = null;
  if (sheet.bandwidthHz != null && gainNeeded != null) {
    // The pair is no faster than its slower device.
    const ftHz = driver.ftHz === null || output.ftHz === null ? null : Math.min(driver.ftHz, output.ftHz);
    const input: BandwidthCheckInput = { subject: "pair", ftHz, bandwidthHz: sheet.bandwidthHz, gainNeeded };
    bandwidth = { input, judged: judgeBandwidth(input) };
    foldInto(screen, bandwidth.judged);
  }

  const satVolts = driverSat?.volts ?? sheet.allowedSatDropVolts ?? DEFAULT_VCE_SAT_VOLTS;
  const driverVce = switching ? satVolts : Math.max(0, operatingVceOf(sheet) - outputVbe.volts);
  const outputVce = switching ? compoundVceSat(satVolts, outputVbe.volts) : operatingVceOf(sheet);
  const deviceOf = (role: PairRole, part: P, gainAt: GainReading, vbe: { volts: number; assumed: boolean }, ownIc: number, ownPeakIc: number, vceVolts: number): DeviceScreen<P> => {
    const voltageInput: VoltageCheckInput = {
      subject: role,
      // When the pair is off VBE2 collapses, so the driver too stands the full VCE.
      peakVceVolts,
      vceoVolts: part.vceoVolts,
      reverseVbeVolts: role === "driver" ? sheet.reverseVbeVolts : null,
      veboVolts: part.veboVolts,
      voltageFraction: sheet.derating.voltageFraction,
    };
    const currentInput: CurrentCheckInput = { subject: role, peakIcAmps: ownPeakIc, icMaxAmps: part.icMaxAmps, currentFraction: sheet.derating.currentFraction };
    const thermalInput = thermalInputFor(part, role, sheet, vceVolts, ownIc);
    const device: DeviceScreen<P> = {
      role,
      part,
      icAmps: ownIc,
      peakIcAmps: ownPeakIc,
      gain: gainAt,
      vbe,
      vceVolts,
      voltageInput,
      voltage: judgeVoltage(voltageInput),
      currentInput,
      current: judgeCurrent(currentInput),
      thermalInput,
      thermal: judgeThermal(thermalInput),
    };
    foldInto(screen, device.voltage);
    foldInto(screen, device.current);
    foldInto(screen, device.thermal);
    return device;
  };
  const feasibleOr = (value: number, fallback: number) => (Number.isFinite(value) ? value : fallback);
  const driverDevice = deviceOf("driver", driver, driverGain, driverVbe, feasibleOr(operating.driverIcAmps, 0), feasibleOr(peak.driverIcAmps, 0), driverVce);
  const outputDevice = deviceOf("output", output, outputGain, outputVbe, feasibleOr(operating.outputIcAmps, icAmps), feasibleOr(peak.outputIcAmps, peakIcAmps), outputVce);

  const quality: [DataQuality, DataQuality] = qualities ?? [assessDataQuality(driver, options), assessDataQuality(output, options)];
  if (quality[0].flags.includes("stale-datasheet") || quality[1].flags.includes("stale-datasheet")) screen.flags |= FLAG_BITS["stale-datasheet"];
  return {
    topology,
    sheet,
    verdict: screen.verdict,
    margin: screen.margin,
    flags: screen.flags,
    dataQualityScore: Math.min(quality[0].score, quality[1].score),
    bleedOhms,
    operating,
    solveWithoutBleed: () => (bleedOhms === null ? operating : solve(icAmps, null)),
    pairVbeVolts,
    gains,
    gain,
    drive,
    saturation,
    pairSat,
    voltageGainUnmodelled,
    bandwidth,
    devices: { driver: driverDevice, output: outputDevice },
    quality,
  };
}

function explainDevice<P extends PartSpec>(device: DeviceScreen<P>): DeviceInPair<P> {
  return {
    role: device.role,
    part: device.part,
    icAmps: device.icAmps,
    peakIcAmps: device.peakIcAmps,
    gain: explainGainReading(device.gain),
    vbeVolts: device.vbe.volts,
    vbeAssumed: device.vbe.assumed,
    vceVolts: device.vceVolts,
    dissipationWatts: device.thermal.powerWatts,
    junctionC: device.thermal.path === "none" ? null : device.thermal.tjC,
    checks: [
      explainVoltage(device.voltageInput, device.voltage),
      explainCurrent(device.currentInput, device.current),
      explainThermal(device.thermalInput, device.thermal),
    ],
  };
}

/** The explanations of a screened pair: every check's formula, inputs and summary, and the pair's figures. */
export function explainCompound<P extends PartSpec>(screen: CompoundScreen<P>): CompoundEvaluation<P> {
  const { topology, sheet, operating, pairVbeVolts, bleedOhms, pairSat } = screen;
  const withoutBleed = screen.solveWithoutBleed();
  const switching = sheet.mode === "switching";
  const driver = screen.devices.driver.part;
  const output = screen.devices.output.part;
  const gains: GainAtCurrent[] = screen.gains.map((g) => ({ icAmps: g.icAmps, estimate: explainPairGain(g) }));
  const pairChecks: CheckResult[] = [
    { ...explainGain({ requiredHfe: sheet.requiredHfe ?? (switching ? sheet.forcedGain : null), gains }, screen.gain), subject: "pair" },
  ];
  if (screen.drive !== null) pairChecks.push(explainDrive(screen.drive.input, screen.drive.judged));
  if (screen.saturation !== null) pairChecks.push(explainSaturation(screen.saturation.input, screen.saturation.judged));
  if (screen.voltageGainUnmodelled) {
    pairChecks.push({
      check: "voltage-gain",
      subject: "pair",
      verdict: "marginal",
      margin: null,
      flags: [],
      formula: "not modelled for compound pairs",
      inputs: [{ symbol: "Av(req)", label: "voltage gain the circuit needs", value: sheet.requiredVoltageGain ?? 0, unit: "" }],
      summary: "The voltage gain of a compound pair is not modelled here; confirm it on the circuit.",
    });
  }
  if (screen.bandwidth !== null) pairChecks.push(explainBandwidth(screen.bandwidth.input, screen.bandwidth.judged));
  const driverDevice = explainDevice(screen.devices.driver);
  const outputDevice = explainDevice(screen.devices.output);

  const checks = [...pairChecks, ...driverDevice.checks, ...outputDevice.checks];
  const quality = screen.quality;
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
    verdict: screen.verdict,
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

/**
 * Evaluates a Darlington or Sziklai pair against the sheet: screenCompound's judgements with
 * every check explained.
 */
export function evaluateCompound<P extends PartSpec>(
  topology: CompoundTopology,
  driver: P,
  output: P,
  sheet: RequirementSheet,
  options: CompoundOptions = {},
): CompoundEvaluation<P> {
  return explainCompound(screenCompound(topology, driver, output, sheet, options));
}
