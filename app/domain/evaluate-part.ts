// Evaluates one part against a requirement sheet: every check that applies, at the circuit's own currents.
// The work is split in two: screenPart runs only the numeric judgements (what ranking needs for every
// part), and explainScreen turns one screen into the explanations the pages show.
import { type CheckResult, FLAG_BITS, type FlagName, mergeFlags, type Verdict, worseVerdict } from "./check-result";
import { type BandwidthCheckInput, type BandwidthJudgement, explainBandwidth, judgeBandwidth, newBandwidthJudgement } from "./checks/bandwidth";
import { type CurrentCheckInput, type CurrentJudgement, explainCurrent, judgeCurrent } from "./checks/current";
import { type DriveCheckInput, type DriveJudgement, explainDrive, judgeDrive, newDriveJudgement } from "./checks/drive";
import { explainGain, type GainJudgement, judgeGain, newGainJudgement } from "./checks/gain";
import { newRatingReading } from "./checks/rating";
import { explainSaturation, judgeSaturation, newSaturationJudgement, type SaturationCheckInput, type SaturationJudgement } from "./checks/saturation";
import { explainThermal, judgeThermal, newThermalJudgement, type ThermalCheckInput, type ThermalJudgement } from "./checks/thermal";
import { explainVoltage, judgeVoltage, newVoltageJudgement, type VoltageCheckInput, type VoltageJudgement } from "./checks/voltage";
import { explainVoltageGain, judgeVoltageGain, newVoltageGainJudgement, type VoltageGainCheckInput, type VoltageGainJudgement } from "./checks/voltage-gain";
import type { DeratingPolicy } from "./derating";
import { assessDataQuality, type DataQuality, type DataQualityOptions } from "./data-quality";
import type { ESeriesName } from "./e-series";
import {
  DEFAULT_GAIN_WINDOW_DECADES,
  DEFAULT_TYP_TO_MIN_FACTOR,
  explainGainReading,
  type GainEstimate,
  type GainReading,
  newGainReading,
  newSaturationEstimate,
  buildPreparedSaturation,
  buildWorstGain,
  type PreparedSaturation,
  ratioDistance,
  readSaturation,
  readWorstCaseGain,
  type SaturationEstimate,
  type WorstCaseGainOptions,
  type WorstGain,
} from "./gain-curve";
import type { PartSpec } from "./part";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";

/** VBE(on) when none is quoted: 0.7 V for a small-signal silicon junction (common practice). */
export const DEFAULT_VBE_SMALL_SIGNAL_VOLTS = 0.7;
/** VBE(on) at an ampere or more, where base spreading resistance adds to the junction (common practice). */
export const DEFAULT_VBE_POWER_VOLTS = 1.0;
/** VBE(on) of a one-package Darlington: two diode drops (common practice). */
export const DEFAULT_VBE_DARLINGTON_VOLTS = 1.4;
/** VCE(sat) assumed for the heat estimate when none is quoted (common practice, pessimistic for small parts). */
export const DEFAULT_VCE_SAT_VOLTS = 1.0;

export interface EvaluateOptions extends WorstCaseGainOptions, DataQualityOptions {
  series?: ESeriesName;
}

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

/** The package name as the sheet's package list is compared: trimmed, lower case. */
export function packageKeyOf(name: string): string {
  return name.trim().toLowerCase();
}

function allowedPackagesOf(sheet: RequirementSheet): string[] {
  return sheet.packages.map(packageKeyOf);
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
  if (outsidePackages(packageKeyOf(part.packageName), allowedPackagesOf(sheet))) {
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

/** What a sheet and the options fix for every part: currents, which checks apply, packages, factors. */
export interface SheetPlan {
  sheet: RequirementSheet;
  options: EvaluateOptions;
  icAmps: number;
  peakIcAmps: number;
  peakVceVolts: number;
  operatingVceVolts: number;
  /** The distinct currents the gain is read at (lowest, operating, peak), and where the operating one sits. */
  gainCurrents: number[];
  operatingIndex: number;
  switching: boolean;
  requiredHfe: number | null;
  gainNeeded: number | null;
  checksVoltageGain: boolean;
  checksBandwidth: boolean;
  allowedPackages: string[];
  typToMinFactor: number;
  windowDecades: number;
  qualityKey: string;
}

export function planSheet(sheet: RequirementSheet, options: EvaluateOptions = {}): SheetPlan {
  const icAmps = sheet.operatingIcAmps;
  const gainCurrents = [...new Set([minIcOf(sheet), icAmps, peakIcOf(sheet)])];
  const switching = sheet.mode === "switching";
  const gainNeeded = sheet.requiredVoltageGain ?? sheet.requiredHfe;
  return {
    sheet,
    options,
    icAmps,
    peakIcAmps: peakIcOf(sheet),
    peakVceVolts: peakVceOf(sheet),
    operatingVceVolts: operatingVceOf(sheet),
    gainCurrents,
    operatingIndex: gainCurrents.indexOf(icAmps),
    switching,
    requiredHfe: sheet.requiredHfe ?? (switching ? sheet.forcedGain : null),
    gainNeeded,
    checksVoltageGain: !switching && sheet.requiredVoltageGain != null && sheet.loadOhms != null,
    checksBandwidth: sheet.bandwidthHz != null && gainNeeded != null,
    allowedPackages: allowedPackagesOf(sheet),
    typToMinFactor: options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR,
    windowDecades: options.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES,
    qualityKey: `${options.todayIso ?? ""}|${options.staleAfterYears ?? ""}`,
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
export interface PartScreen {
  part: PartSpec;
  verdict: Verdict;
  /** The tightest margin of any check; null when no check gives one. */
  margin: number | null;
  /** Every check's flags and stale-datasheet, as a mask of FLAG_BITS. */
  flags: number;
  hfeAtOperatingPoint: number;
  vbe: VbeChoice;
  vceSatVolts: number | null;
  dissipationWatts: number;
  junctionC: number | null;
  dataQuality: DataQuality;
  gains: { icAmps: number; estimate: GainReading }[];
  gainInput: { requiredHfe: number | null; gains: { icAmps: number; estimate: GainReading }[] };
  gain: GainJudgement;
  voltageInput: VoltageCheckInput;
  voltage: VoltageJudgement;
  currentInput: CurrentCheckInput;
  current: CurrentJudgement;
  hasDrive: boolean;
  driveInput: DriveCheckInput | null;
  drive: DriveJudgement;
  saturationEstimate: SaturationEstimate;
  saturationInput: SaturationCheckInput;
  saturation: SaturationJudgement;
  thermalInput: ThermalCheckInput;
  thermal: ThermalJudgement;
  voltageGainInput: VoltageGainCheckInput;
  voltageGain: VoltageGainJudgement;
  bandwidthInput: BandwidthCheckInput;
  bandwidth: BandwidthJudgement;
}

/** A field-by-field copy of a parsed policy: the hot loop reads it for every part, and plain literals read fastest. */
function plainPolicy(policy: DeratingPolicy): DeratingPolicy {
  return {
    id: policy.id,
    name: policy.name,
    source: policy.source,
    voltageFraction: policy.voltageFraction,
    currentFraction: policy.currentFraction,
    powerFraction: policy.powerFraction,
    tjMaxC: policy.tjMaxC ?? null,
    tjFraction: policy.tjFraction ?? null,
    tjMarginC: policy.tjMarginC ?? null,
  };
}

/** A screen sized for a plan, to be filled again and again by screenPart. */
export function newPartScreen(plan: SheetPlan): PartScreen {
  const sheet = plan.sheet;
  const gains = plan.gainCurrents.map((icAmps) => ({ icAmps, estimate: newGainReading() }));
  const quality: DataQuality = { flags: [], score: 1 };
  return {
    part: undefined as unknown as PartSpec,
    verdict: "fits",
    margin: null,
    flags: 0,
    hfeAtOperatingPoint: 0,
    vbe: { volts: 0, assumed: false },
    vceSatVolts: null,
    dissipationWatts: 0,
    junctionC: null,
    dataQuality: quality,
    gains,
    gainInput: { requiredHfe: plan.requiredHfe, gains },
    gain: newGainJudgement(),
    voltageInput: {
      peakVceVolts: plan.peakVceVolts,
      vceoVolts: 0,
      reverseVbeVolts: sheet.reverseVbeVolts,
      veboVolts: null,
      voltageFraction: sheet.derating.voltageFraction,
    },
    voltage: newVoltageJudgement(),
    currentInput: { peakIcAmps: plan.peakIcAmps, icMaxAmps: 0, currentFraction: sheet.derating.currentFraction },
    current: newRatingReading(),
    hasDrive: sheet.drive != null,
    driveInput:
      sheet.drive == null
        ? null
        : {
            mode: sheet.mode,
            icAmps: plan.icAmps,
            worstHfe: 0,
            forcedGain: sheet.forcedGain,
            vbeVolts: 0,
            vbeAssumed: false,
            drive: sheet.drive,
            series: plan.options.series,
          },
    drive: newDriveJudgement(),
    saturationEstimate: newSaturationEstimate(),
    saturationInput: {
      icAmps: plan.icAmps,
      drivenForcedGain: sheet.forcedGain,
      worstHfe: 0,
      saturation: null,
      allowedSatDropVolts: sheet.allowedSatDropVolts,
    },
    saturation: newSaturationJudgement(),
    thermalInput: {
      mode: sheet.mode,
      vceVolts: 0,
      vceAssumed: false,
      icAmps: plan.icAmps,
      dutyCycle: plan.switching ? sheet.dutyCycle : 1,
      ambientC: sheet.ambientC,
      rthJaCPerW: null,
      rthJcCPerW: null,
      heatsinkRthCPerW: sheet.heatsinkRthCPerW,
      tjMaxC: null,
      ptotWatts: null,
      ptotReference: null,
      derating: plainPolicy(sheet.derating),
    },
    thermal: newThermalJudgement(),
    voltageGainInput: {
      icAmps: plan.icAmps,
      vceVolts: plan.operatingVceVolts,
      earlyVolts: null,
      loadOhms: sheet.loadOhms ?? 0,
      requiredVoltageGain: sheet.requiredVoltageGain ?? 0,
      tempC: sheet.ambientC,
      hfe: null,
    },
    voltageGain: newVoltageGainJudgement(),
    bandwidthInput: { ftHz: null, bandwidthHz: sheet.bandwidthHz ?? 0, gainNeeded: plan.gainNeeded ?? 0 },
    bandwidth: newBandwidthJudgement(),
  };
}

/** Folds one judgement into the screen's verdict, tightest margin and flags. */
function fold(screen: PartScreen, verdict: Verdict, margin: number | null, flags: number): void {
  screen.verdict = worseVerdict(screen.verdict, verdict);
  if (margin !== null) screen.margin = screen.margin === null ? margin : Math.min(screen.margin, margin);
  screen.flags |= flags;
}

/** Runs every judgement that applies to the plan on one part, with no strings and no allocation. */
export function screenPart(prepared: PreparedPart, plan: SheetPlan, screen: PartScreen): PartScreen {
  const part = prepared.part;
  const sheet = plan.sheet;
  screen.part = part;
  screen.verdict = "fits";
  screen.margin = null;
  screen.flags = 0;

  const gains = screen.gains;
  for (let i = 0; i < gains.length; i += 1) {
    readWorstCaseGain(prepared.gain, gains[i].icAmps, plan.typToMinFactor, plan.windowDecades, gains[i].estimate);
  }
  const worstHfe = gains[plan.operatingIndex].estimate.hfe;
  screen.hfeAtOperatingPoint = worstHfe;
  const gain = judgeGain(screen.gainInput, screen.gain);
  fold(screen, gain.verdict, gain.margin, gain.flags);

  screen.voltageInput.vceoVolts = part.vceoVolts;
  screen.voltageInput.veboVolts = part.veboVolts;
  const voltage = judgeVoltage(screen.voltageInput, screen.voltage);
  fold(screen, voltage.verdict, voltage.margin, voltage.flags);

  screen.currentInput.icMaxAmps = part.icMaxAmps;
  const current = judgeCurrent(screen.currentInput, screen.current);
  fold(screen, current.verdict, current.margin, current.flags);

  const vbe = chooseVbeInto(part, plan.icAmps, sheet.mode, screen.vbe);
  let drivenForcedGain = sheet.forcedGain;
  const driveInput = screen.driveInput;
  if (driveInput !== null) {
    driveInput.worstHfe = worstHfe;
    driveInput.vbeVolts = vbe.volts;
    driveInput.vbeAssumed = vbe.assumed;
    const drive = judgeDrive(driveInput, screen.drive);
    fold(screen, drive.verdict, drive.margin, drive.flags);
    drivenForcedGain = drive.ibAvailableAmps > 0 ? plan.icAmps / drive.ibAvailableAmps : Number.POSITIVE_INFINITY;
  }

  let saturation: SaturationEstimate | null = null;
  if (plan.switching) {
    saturation = readSaturation(prepared.saturation, plan.icAmps, screen.saturationEstimate);
    const input = screen.saturationInput;
    input.drivenForcedGain = drivenForcedGain;
    input.worstHfe = worstHfe;
    input.saturation = saturation;
    const judged = judgeSaturation(input, screen.saturation);
    fold(screen, judged.verdict, judged.margin, judged.flags);
  }
  screen.vceSatVolts = saturation?.volts ?? null;

  const thermalInput = screen.thermalInput;
  thermalInput.vceVolts = plan.switching ? (saturation?.volts ?? sheet.allowedSatDropVolts ?? DEFAULT_VCE_SAT_VOLTS) : plan.operatingVceVolts;
  thermalInput.vceAssumed = plan.switching && saturation == null;
  thermalInput.rthJaCPerW = part.rthJaCPerW;
  thermalInput.rthJcCPerW = part.rthJcCPerW;
  thermalInput.tjMaxC = part.tjMaxC;
  thermalInput.ptotWatts = part.ptotWatts;
  thermalInput.ptotReference = part.ptotReference;
  const thermal = judgeThermal(thermalInput, screen.thermal);
  fold(screen, thermal.verdict, thermal.margin, thermal.flags);
  screen.dissipationWatts = thermal.powerWatts;
  screen.junctionC = thermal.path === "none" ? null : thermal.tjC;

  if (plan.checksVoltageGain) {
    screen.voltageGainInput.earlyVolts = part.earlyVolts;
    screen.voltageGainInput.hfe = worstHfe;
    const judged = judgeVoltageGain(screen.voltageGainInput, screen.voltageGain);
    fold(screen, judged.verdict, judged.margin, judged.flags);
  }
  if (plan.checksBandwidth) {
    screen.bandwidthInput.ftHz = part.ftHz;
    const judged = judgeBandwidth(screen.bandwidthInput, screen.bandwidth);
    fold(screen, judged.verdict, judged.margin, judged.flags);
  }

  const quality = qualityOf(prepared, plan);
  screen.dataQuality = quality;
  if (quality.flags.includes("stale-datasheet")) screen.flags |= FLAG_BITS["stale-datasheet"];
  return screen;
}

/** The explanations of a screen: every check's formula, inputs and summary, in the order the pages show them. */
export function explainScreen(screen: PartScreen, plan: SheetPlan): PartEvaluation {
  const part = screen.part;
  const checks: CheckResult[] = [];
  const gains = screen.gains.map((g) => ({ icAmps: g.icAmps, estimate: explainGainReading(g.estimate) }));
  checks.push(explainGain({ requiredHfe: plan.requiredHfe, gains }, screen.gain));
  checks.push(explainVoltage(screen.voltageInput, screen.voltage));
  checks.push(explainCurrent(screen.currentInput, screen.current));
  let suggestedBaseOhms: number | null = null;
  if (screen.driveInput !== null) {
    const drive = explainDrive(screen.driveInput, screen.drive);
    checks.push(drive);
    suggestedBaseOhms = drive.suggestedBaseOhms;
  }
  if (plan.switching) checks.push(explainSaturation(screen.saturationInput, screen.saturation));
  checks.push(explainThermal(screen.thermalInput, screen.thermal));
  if (plan.checksVoltageGain) checks.push(explainVoltageGain(screen.voltageGainInput, screen.voltageGain));
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
