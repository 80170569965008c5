// Evaluates one part against a requirement sheet: every check that applies, at the circuit's own currents.
// The work is split in two: screenPart fills the shared screening skeleton with one part's numbers (what
// ranking needs for every part), and explainScreen turns one screen into the explanations the pages show.
import { type CheckResult, type FlagName, mergeFlags, type Verdict } from "./check-result";
import { explainBandwidth } from "./checks/bandwidth";
import { explainDrive } from "./checks/drive";
import { explainGain } from "./checks/gain";
import { explainSaturation } from "./checks/saturation";
import { explainVoltageGain } from "./checks/voltage-gain";
import { assessDataQuality, type DataQuality } from "./data-quality";
import {
  buildPreparedSaturation,
  buildWorstGain,
  explainGainReading,
  type GainEstimate,
  newSaturationEstimate,
  type PreparedSaturation,
  ratioDistance,
  readSaturation,
  readWorstCaseGain,
  type SaturationEstimate,
  type WorstGain,
} from "./gain-curve";
import type { PartSpec } from "./part";
import type { RequirementSheet } from "./requirement";
import {
  type DeviceRatings,
  type EvaluateOptions,
  explainDeviceRatings,
  judgeScreening,
  newDeviceRatings,
  newScreening,
  packageKeyOf,
  planSheet,
  saturationDropVolts,
  type Screening,
  setDeviceRatings,
  type SheetPlan,
} from "./screening";

/** VBE(on) when none is quoted: 0.7 V for a small-signal silicon junction (common practice). */
export const DEFAULT_VBE_SMALL_SIGNAL_VOLTS = 0.7;
/** VBE(on) at an ampere or more, where base spreading resistance adds to the junction (common practice). */
export const DEFAULT_VBE_POWER_VOLTS = 1.0;
/** VBE(on) of a one-package Darlington: two diode drops (common practice). */
export const DEFAULT_VBE_DARLINGTON_VOLTS = 1.4;
export interface PartEvaluation {
  verdict: Verdict;
  checks: CheckResult[];
  /** Flags of every check plus stale-datasheet when judged. */
  flags: FlagName[];
  /** Worst-case hFE at the operating IC. */
  hfeAtOperatingPoint: number;
  gainAtOperatingPoint: GainEstimate;
  vbeVolts: number;
  vbeAssumed: boolean;
  vceSatVolts: number | null;
  dissipationWatts: number;
  /** Junction temperature from the thermal check; null when no thermal data is quoted. */
  junctionC: number | null;
  /** Total series base resistance to aim for, when the drive is a voltage source. */
  suggestedBaseOhms: number | null;
  /** Why the part lies outside the sheet's polarity or packages; empty when it is eligible. */
  excludedBy: string[];
  dataQuality: DataQuality;
}

interface VbeChoice {
  volts: number;
  assumed: boolean;
}

/** VBE to use: quoted VBE(sat) when switching, else VBE(on), else a default by configuration and current. */
export function chooseVbe(part: PartSpec, icAmps: number, mode: RequirementSheet["mode"]): { volts: number; assumed: boolean } {
  return chooseVbeInto(part, icAmps, mode, { volts: 0, assumed: false });
}

/** chooseVbe written into a reusable object. */
export function chooseVbeInto(part: PartSpec, icAmps: number, mode: RequirementSheet["mode"], out: VbeChoice): VbeChoice {
  if (mode === "switching") {
    const nearest = nearestSaturationPoint(part, icAmps);
    if (nearest?.vbeSatVolts != null) {
      out.volts = nearest.vbeSatVolts;
      out.assumed = false;
      return out;
    }
  }
  out.assumed = part.vbeOnVolts == null;
  if (part.vbeOnVolts != null) out.volts = part.vbeOnVolts;
  else if (part.configuration === "darlington") out.volts = DEFAULT_VBE_DARLINGTON_VOLTS;
  else out.volts = icAmps >= 1 ? DEFAULT_VBE_POWER_VOLTS : DEFAULT_VBE_SMALL_SIGNAL_VOLTS;
  return out;
}

function nearestSaturationPoint(part: PartSpec, icAmps: number) {
  let best = null;
  for (const point of part.saturationPoints) {
    if (!(point.icAmps > 0)) continue;
    if (best == null || ratioDistance(point.icAmps, icAmps) < ratioDistance(best.icAmps, icAmps)) best = point;
  }
  return best;
}

function outsidePolarity(part: PartSpec, sheet: RequirementSheet): boolean {
  return sheet.polarity !== "any" && part.polarity !== sheet.polarity;
}

function outsidePackages(packageKey: string, allowed: readonly string[]): boolean {
  return allowed.length > 0 && !allowed.includes(packageKey);
}

/** Reasons the part is outside the sheet's polarity or allowed packages. */
export function findExclusions(part: PartSpec, sheet: RequirementSheet): string[] {
  const reasons: string[] = [];
  if (outsidePolarity(part, sheet)) reasons.push(`${part.polarity.toUpperCase()}, the sheet asks for ${sheet.polarity.toUpperCase()}`);
  if (outsidePackages(packageKeyOf(part.packageName), sheet.packages.map(packageKeyOf))) {
    reasons.push(`package ${part.packageName} is not among ${sheet.packages.join(", ")}`);
  }
  return reasons;
}

/** What the engine works out once per part and reuses in every ranking of its catalogue. */
export interface PreparedPart<P extends PartSpec = PartSpec> {
  part: P;
  gain: WorstGain;
  saturation: PreparedSaturation | null;
  packageKey: string;
  /** The unscaled extremes of the worst-case curve's quoted values (0 when none), and the lowest VCE(sat) quoted (null when none): bounds the pair search reads. */
  worstGainMax: number;
  worstGainMin: number;
  leastSatVolts: number | null;
  /** The data-quality findings for the options named by qualityKey (staleness depends on the date). */
  qualityKey: string | null;
  quality: DataQuality | null;
}

/** Sorted, log-space gain and saturation curves and the package key of one part. */
export function preparePart<P extends PartSpec>(part: P): PreparedPart<P> {
  const gain = buildWorstGain(part.gainPoints);
  const saturation = buildPreparedSaturation(part.saturationPoints);
  const values = gain.worstCurve?.values ?? [];
  return {
    part,
    gain,
    saturation,
    packageKey: packageKeyOf(part.packageName),
    worstGainMax: values.length === 0 ? 0 : Math.max(...values),
    worstGainMin: values.length === 0 ? 0 : Math.min(...values),
    leastSatVolts: saturation === null ? null : Math.min(...saturation.curve.values),
    qualityKey: null,
    quality: null,
  };
}

/** Whether the sheet's package list rules the part out, whatever its polarity (pairs judge polarity as a pair). */
export function isOutsidePackages(prepared: PreparedPart, plan: SheetPlan): boolean {
  return outsidePackages(prepared.packageKey, plan.allowedPackages);
}

/** Whether the sheet's polarity or packages rule the part out before any check. */
export function isExcluded(prepared: PreparedPart, plan: SheetPlan): boolean {
  return outsidePolarity(prepared.part, plan.sheet) || outsidePackages(prepared.packageKey, plan.allowedPackages);
}

/** The data-quality findings of a prepared part under the plan's options, worked out once per date. */
export function qualityOf(prepared: PreparedPart, plan: SheetPlan): DataQuality {
  if (prepared.quality === null || prepared.qualityKey !== plan.qualityKey) {
    prepared.quality = assessDataQuality(prepared.part, plan.options);
    prepared.qualityKey = plan.qualityKey;
  }
  return prepared.quality;
}

/**
 * Every judgement of one part against a plan, with the inputs each read: numbers only, written
 * into reusable objects. A screen is overwritten by the next screenPart call that is given it.
 */
export interface PartScreen extends Screening {
  part: PartSpec;
  hfeAtOperatingPoint: number;
  vbe: VbeChoice;
  vceSatVolts: number | null;
  dissipationWatts: number;
  junctionC: number | null;
  dataQuality: DataQuality;
  saturationEstimate: SaturationEstimate;
  /** The part's own ratings: the one entry of devices. */
  device: DeviceRatings;
}

/** A screen sized for a plan, to be filled again and again by screenPart. */
export function newPartScreen(plan: SheetPlan): PartScreen {
  const device = newDeviceRatings(plan, undefined, plan.sheet.reverseVbeVolts);
  const core = newScreening(plan, undefined, [device], true);
  // Listed field by field: a spread here leaves an object that the ranking loop reads markedly slower.
  return {
    verdict: core.verdict,
    margin: core.margin,
    flags: core.flags,
    gains: core.gains,
    gainInput: core.gainInput,
    gain: core.gain,
    driveInput: core.driveInput,
    drive: core.drive,
    drivenIcAmps: core.drivenIcAmps,
    saturationInput: core.saturationInput,
    saturation: core.saturation,
    devices: core.devices,
    voltageGainInput: core.voltageGainInput,
    voltageGain: core.voltageGain,
    bandwidthInput: core.bandwidthInput,
    bandwidth: core.bandwidth,
    part: undefined as unknown as PartSpec,
    hfeAtOperatingPoint: 0,
    vbe: { volts: 0, assumed: false },
    vceSatVolts: null,
    dissipationWatts: 0,
    junctionC: null,
    dataQuality: { flags: [], score: 1 },
    saturationEstimate: newSaturationEstimate(),
    device,
  };
}

/** Fills the screen with one part's numbers and runs every judgement that applies, with no strings and no allocation. */
export function screenPart(prepared: PreparedPart, plan: SheetPlan, screen: PartScreen): PartScreen {
  const part = prepared.part;
  screen.part = part;
  const gains = screen.gains;
  for (let i = 0; i < gains.length; i += 1) {
    readWorstCaseGain(prepared.gain, gains[i].icAmps, plan.typToMinFactor, plan.windowDecades, gains[i].estimate);
  }
  const worstHfe = gains[plan.operatingIndex].estimate.hfe;
  screen.hfeAtOperatingPoint = worstHfe;

  const vbe = chooseVbeInto(part, plan.icAmps, plan.sheet.mode, screen.vbe);
  const driveInput = screen.driveInput;
  if (driveInput !== null) {
    driveInput.worstHfe = worstHfe;
    driveInput.vbeVolts = vbe.volts;
    driveInput.vbeAssumed = vbe.assumed;
  }
  const saturation = plan.switching ? readSaturation(prepared.saturation, plan.icAmps, screen.saturationEstimate) : null;
  if (plan.switching) {
    screen.saturationInput.worstHfe = worstHfe;
    screen.saturationInput.saturation = saturation;
  }
  screen.vceSatVolts = saturation?.volts ?? null;
  const vceVolts = plan.switching ? saturationDropVolts(saturation, plan.sheet) : plan.operatingVceVolts;
  setDeviceRatings(screen.device, part, plan.icAmps, plan.peakIcAmps, vceVolts, plan.switching && saturation == null);
  const voltageGainInput = screen.voltageGainInput;
  if (plan.checksVoltageGain && voltageGainInput !== null) {
    voltageGainInput.earlyVolts = part.earlyVolts;
    voltageGainInput.hfe = worstHfe;
  }
  screen.bandwidthInput.ftHz = part.ftHz;

  const quality = qualityOf(prepared, plan);
  screen.dataQuality = quality;
  judgeScreening(screen, plan, quality.flags.includes("stale-datasheet"));
  const thermal = screen.device.thermal;
  screen.dissipationWatts = thermal.powerWatts;
  screen.junctionC = thermal.path === "none" ? null : thermal.tjC;
  return screen;
}

/** The explanations of a screen: every check's formula, inputs and summary, in the order the pages show them. */
export function explainScreen(screen: PartScreen, plan: SheetPlan): PartEvaluation {
  const part = screen.part;
  const checks: CheckResult[] = [];
  const gains = screen.gains.map((g) => ({ icAmps: g.icAmps, estimate: explainGainReading(g.estimate) }));
  checks.push(explainGain({ requiredHfe: plan.requiredHfe, gains }, screen.gain));
  const [voltage, current, thermal] = explainDeviceRatings(screen.device);
  checks.push(voltage, current);
  let suggestedBaseOhms: number | null = null;
  if (screen.driveInput !== null) {
    const drive = explainDrive(screen.driveInput, screen.drive);
    checks.push(drive);
    suggestedBaseOhms = drive.suggestedBaseOhms;
  }
  if (plan.switching) checks.push(explainSaturation(screen.saturationInput, screen.saturation));
  checks.push(thermal);
  if (plan.checksVoltageGain && screen.voltageGainInput !== null) checks.push(explainVoltageGain(screen.voltageGainInput, screen.voltageGain));
  if (plan.checksBandwidth) checks.push(explainBandwidth(screen.bandwidthInput, screen.bandwidth));
  const dataQuality = assessDataQuality(part, plan.options);
  const staleFlags: FlagName[] = dataQuality.flags.includes("stale-datasheet") ? ["stale-datasheet"] : [];
  return {
    verdict: screen.verdict,
    checks,
    flags: mergeFlags(...checks.map((check) => check.flags), staleFlags),
    hfeAtOperatingPoint: screen.hfeAtOperatingPoint,
    gainAtOperatingPoint: gains[plan.operatingIndex].estimate,
    vbeVolts: screen.vbe.volts,
    vbeAssumed: screen.vbe.assumed,
    vceSatVolts: screen.vceSatVolts,
    dissipationWatts: screen.dissipationWatts,
    junctionC: screen.junctionC,
    suggestedBaseOhms,
    excludedBy: findExclusions(part, plan.sheet),
    dataQuality,
  };
}

/** Every check that applies to the sheet, the worst verdict, and the numbers the pages show. */
export function evaluatePart(part: PartSpec, sheet: RequirementSheet, options: EvaluateOptions = {}): PartEvaluation {
  const plan = planSheet(sheet, options);
  return explainScreen(screenPart(preparePart(part), plan, newPartScreen(plan)), plan);
}
