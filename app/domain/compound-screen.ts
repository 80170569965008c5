// Judges a Darlington or Sziklai pair in numbers only: its currents solved, each device checked at its own current.
import { FLAG_BITS, type Judgement, mergeFlags, type Verdict, worseVerdict } from "./check-result";
import { type BandwidthCheckInput, type BandwidthJudgement, judgeBandwidth } from "./checks/bandwidth";
import { type CurrentCheckInput, type CurrentJudgement, judgeCurrent } from "./checks/current";
import { type DriveCheckInput, type DriveJudgement, judgeDrive } from "./checks/drive";
import { type GainJudgement, judgeGain } from "./checks/gain";
import { judgeSaturation, type SaturationCheckInput, type SaturationJudgement } from "./checks/saturation";
import { judgeThermal, type ThermalCheckInput, type ThermalJudgement } from "./checks/thermal";
import { judgeVoltage, type VoltageCheckInput, type VoltageJudgement } from "./checks/voltage";
import {
  canPair,
  compoundPolarity,
  type CompoundTopology,
  compoundVbe,
  compoundVceSat,
  type PairCurrents,
  solvePairCurrents,
  worstGainModel,
} from "./compound-currents";
import { assessDataQuality, type DataQuality } from "./data-quality";
import { chooseVbe, findExclusions } from "./evaluate-part";
import {
  DEFAULT_GAIN_WINDOW_DECADES,
  DEFAULT_TYP_TO_MIN_FACTOR,
  type GainReading,
  newGainReading,
  type PreparedGain,
  prepareGain,
  readWorstCaseGain,
  type SaturationEstimate,
  vceSatAt,
} from "./gain-curve";
import type { PartSpec } from "./part";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";
import { DEFAULT_VCE_SAT_VOLTS, type EvaluateOptions } from "./screening";

export interface CompoundOptions extends EvaluateOptions {
  /** Base-emitter bleed resistor across the output; null or absent when none is fitted. */
  bleedOhms?: number | null;
}

export type PairRole = "driver" | "output";

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
export interface PairGainAt {
  icAmps: number;
  currents: PairCurrents;
  driver: GainReading;
  output: GainReading;
  pair: GainReading;
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
export interface DeviceScreen<P extends PartSpec> {
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
