// The screening skeleton single parts and pairs share: the sheet's plan, the judgement slots, and the one order of the checks.
// A screen fills its subject's numbers into the slots (one device for a part, two for a pair), then judgeScreening runs
// every check the plan asks for and folds each into one verdict, tightest margin and flag mask.
import { type CheckResult, FLAG_BITS, type Verdict, worseVerdict } from "./check-result";
import { type BandwidthCheckInput, type BandwidthJudgement, judgeBandwidth, newBandwidthJudgement } from "./checks/bandwidth";
import { type CurrentCheckInput, type CurrentJudgement, explainCurrent, judgeCurrent } from "./checks/current";
import { type DriveCheckInput, type DriveJudgement, judgeDrive, newDriveJudgement } from "./checks/drive";
import { type GainJudgement, judgeGain, newGainJudgement } from "./checks/gain";
import { newRatingReading } from "./checks/rating";
import { judgeSaturation, newSaturationJudgement, type SaturationCheckInput, type SaturationJudgement } from "./checks/saturation";
import { explainThermal, judgeThermal, newThermalJudgement, type ThermalCheckInput, type ThermalJudgement } from "./checks/thermal";
import { explainVoltage, judgeVoltage, newVoltageJudgement, type VoltageCheckInput, type VoltageJudgement } from "./checks/voltage";
import { judgeVoltageGain, newVoltageGainJudgement, type VoltageGainCheckInput, type VoltageGainJudgement } from "./checks/voltage-gain";
import type { DataQualityOptions } from "./data-quality";
import type { DeratingPolicy } from "./derating";
import type { ESeriesName } from "./e-series";
import { DEFAULT_GAIN_WINDOW_DECADES, DEFAULT_TYP_TO_MIN_FACTOR, type GainReading, newGainReading, type SaturationEstimate, type WorstCaseGainOptions } from "./gain-curve";
import type { PartSpec } from "./part";
import { minIcOf, operatingVceOf, peakIcOf, peakVceOf, type RequirementSheet } from "./requirement";

/** VCE(sat) assumed for the heat estimate when none is quoted (common practice, pessimistic for small parts). */
export const DEFAULT_VCE_SAT_VOLTS = 1.0;

export interface EvaluateOptions extends WorstCaseGainOptions, DataQualityOptions {
  series?: ESeriesName;
}

/** What a sheet and the options fix for every part or pair: currents, which checks apply, packages, factors. */
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

/** The package name as the sheet's package list is compared: trimmed, lower case. */
export function packageKeyOf(name: string): string {
  return name.trim().toLowerCase();
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
    allowedPackages: sheet.packages.map(packageKeyOf),
    typToMinFactor: options.typToMinFactor ?? DEFAULT_TYP_TO_MIN_FACTOR,
    windowDecades: options.windowDecades ?? DEFAULT_GAIN_WINDOW_DECADES,
    qualityKey: `${options.todayIso ?? ""}|${options.staleAfterYears ?? ""}`,
  };
}

/** The VCE a saturated device dissipates at: its quoted VCE(sat), else the sheet's allowed drop, else the default. */
export function saturationDropVolts(saturation: SaturationEstimate | null, sheet: RequirementSheet): number {
  return saturation?.volts ?? sheet.allowedSatDropVolts ?? DEFAULT_VCE_SAT_VOLTS;
}

/** One device's own rating judgements (voltage, current, heat) with the inputs they read: a part has one, a pair two. */
export interface DeviceRatings {
  voltageInput: VoltageCheckInput;
  voltage: VoltageJudgement;
  currentInput: CurrentCheckInput;
  current: CurrentJudgement;
  thermalInput: ThermalCheckInput;
  thermal: ThermalJudgement;
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

/** A thermal input with the sheet's numbers in and the device's own left blank, for setThermalDevice to fill. */
function newThermalInput(sheet: RequirementSheet, subject: string | undefined, derating: DeratingPolicy): ThermalCheckInput {
  return {
    subject,
    mode: sheet.mode,
    vceVolts: 0,
    vceAssumed: false,
    icAmps: 0,
    dutyCycle: sheet.mode === "switching" ? sheet.dutyCycle : 1,
    ambientC: sheet.ambientC,
    rthJaCPerW: null,
    rthJcCPerW: null,
    heatsinkRthCPerW: sheet.heatsinkRthCPerW,
    tjMaxC: null,
    ptotWatts: null,
    ptotReference: null,
    derating,
  };
}

function setThermalDevice(input: ThermalCheckInput, part: PartSpec, vceVolts: number, vceAssumed: boolean, icAmps: number): ThermalCheckInput {
  input.vceVolts = vceVolts;
  input.vceAssumed = vceAssumed;
  input.icAmps = icAmps;
  input.rthJaCPerW = part.rthJaCPerW;
  input.rthJcCPerW = part.rthJcCPerW;
  input.tjMaxC = part.tjMaxC;
  input.ptotWatts = part.ptotWatts;
  input.ptotReference = part.ptotReference;
  return input;
}

/** The thermal check input of one device at its own VCE and current, in a fresh object (the pair search bounds heat with it). */
export function deviceThermalInput(part: PartSpec, subject: string | undefined, sheet: RequirementSheet, vceVolts: number, icAmps: number): ThermalCheckInput {
  return setThermalDevice(newThermalInput(sheet, subject, sheet.derating), part, vceVolts, false, icAmps);
}

/** Rating slots for one device; reverseVbeVolts is the sheet's for the device whose base the drive pulls, else null. */
export function newDeviceRatings(plan: SheetPlan, subject: string | undefined, reverseVbeVolts: number | null): DeviceRatings {
  const sheet = plan.sheet;
  return {
    voltageInput: { subject, peakVceVolts: plan.peakVceVolts, vceoVolts: 0, reverseVbeVolts, veboVolts: null, voltageFraction: sheet.derating.voltageFraction },
    voltage: newVoltageJudgement(),
    currentInput: { subject, peakIcAmps: plan.peakIcAmps, icMaxAmps: 0, currentFraction: sheet.derating.currentFraction },
    current: newRatingReading(),
    // Slots are filled again for every part, so they get the plain copy the hot loop reads fastest.
    thermalInput: newThermalInput(sheet, subject, plainPolicy(sheet.derating)),
    thermal: newThermalJudgement(),
  };
}

/** Writes one device's ratings and its own operating point into its slots. */
export function setDeviceRatings(
  ratings: DeviceRatings,
  part: PartSpec,
  icAmps: number,
  peakIcAmps: number,
  vceVolts: number,
  vceAssumed: boolean,
): DeviceRatings {
  ratings.voltageInput.vceoVolts = part.vceoVolts;
  ratings.voltageInput.veboVolts = part.veboVolts;
  ratings.currentInput.peakIcAmps = peakIcAmps;
  ratings.currentInput.icMaxAmps = part.icMaxAmps;
  setThermalDevice(ratings.thermalInput, part, vceVolts, vceAssumed, icAmps);
  return ratings;
}

/** A device's rating checks explained, in the order the pages show them. */
export function explainDeviceRatings(ratings: DeviceRatings): [voltage: CheckResult, current: CheckResult, thermal: CheckResult] {
  return [
    explainVoltage(ratings.voltageInput, ratings.voltage),
    explainCurrent(ratings.currentInput, ratings.current),
    explainThermal(ratings.thermalInput, ratings.thermal),
  ];
}

/**
 * Every judgement of a screen with the inputs each read, in objects reused from one screen to the next.
 * The subject (a part or a pair) writes its own numbers into the inputs; judgeScreening writes the rest.
 */
export interface Screening {
  verdict: Verdict;
  /** The tightest margin of any check; null when no check gives one. */
  margin: number | null;
  /** Every check's flags and stale-datasheet, as a mask of FLAG_BITS. */
  flags: number;
  /** Worst-case gain at each of plan.gainCurrents. */
  gains: { icAmps: number; estimate: GainReading }[];
  gainInput: { requiredHfe: number | null; gains: { icAmps: number; estimate: GainReading }[] };
  gain: GainJudgement;
  /** Null when the sheet gives no drive. */
  driveInput: DriveCheckInput | null;
  drive: DriveJudgement;
  /** The collector current the drive must saturate: the part's own, or a pair's driver's. */
  drivenIcAmps: number;
  /** Judged only when switching. */
  saturationInput: SaturationCheckInput;
  saturation: SaturationJudgement;
  /** Each device's own ratings: one for a part, driver and output for a pair. */
  devices: DeviceRatings[];
  /** Null where the voltage gain is not modelled (pairs): a sheet that asks for one makes the screen marginal. */
  voltageGainInput: VoltageGainCheckInput | null;
  voltageGain: VoltageGainJudgement;
  bandwidthInput: BandwidthCheckInput;
  bandwidth: BandwidthJudgement;
}

/** Screening slots sized for a plan; subject names the pair's checks ("pair"), undefined for a single part. */
export function newScreening(plan: SheetPlan, subject: string | undefined, devices: DeviceRatings[], modelsVoltageGain: boolean): Screening {
  const sheet = plan.sheet;
  const gains = plan.gainCurrents.map((icAmps) => ({ icAmps, estimate: newGainReading() }));
  return {
    verdict: "fits",
    margin: null,
    flags: 0,
    gains,
    gainInput: { requiredHfe: plan.requiredHfe, gains },
    gain: newGainJudgement(),
    driveInput:
      sheet.drive == null
        ? null
        : {
            subject,
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
    drivenIcAmps: plan.icAmps,
    saturationInput: { subject, icAmps: plan.icAmps, drivenForcedGain: sheet.forcedGain, worstHfe: 0, saturation: null, allowedSatDropVolts: sheet.allowedSatDropVolts },
    saturation: newSaturationJudgement(),
    devices,
    voltageGainInput: modelsVoltageGain
      ? {
          subject,
          icAmps: plan.icAmps,
          vceVolts: plan.operatingVceVolts,
          earlyVolts: null,
          loadOhms: sheet.loadOhms ?? 0,
          requiredVoltageGain: sheet.requiredVoltageGain ?? 0,
          tempC: sheet.ambientC,
          hfe: null,
        }
      : null,
    voltageGain: newVoltageGainJudgement(),
    bandwidthInput: { subject, ftHz: null, bandwidthHz: sheet.bandwidthHz ?? 0, gainNeeded: plan.gainNeeded ?? 0 },
    bandwidth: newBandwidthJudgement(),
  };
}

/** Folds one judgement into the screen's verdict, tightest margin and flags (scalars: each check's judgement has its own shape). */
function fold(screen: Screening, verdict: Verdict, margin: number | null, flags: number): void {
  screen.verdict = worseVerdict(screen.verdict, verdict);
  if (margin !== null) screen.margin = screen.margin === null ? margin : Math.min(screen.margin, margin);
  screen.flags |= flags;
}

/**
 * Runs every judgement the plan asks for on a filled screen: gain, drive (which sets the forced gain the
 * saturation check sees), saturation when switching, each device's ratings, voltage gain, bandwidth.
 * No strings and no allocation.
 */
export function judgeScreening(screen: Screening, plan: SheetPlan, staleDatasheet: boolean): Screening {
  screen.verdict = "fits";
  screen.margin = null;
  screen.flags = 0;
  const gain = judgeGain(screen.gainInput, screen.gain);
  fold(screen, gain.verdict, gain.margin, gain.flags);

  let drivenForcedGain = plan.sheet.forcedGain;
  if (screen.driveInput !== null) {
    const drive = judgeDrive(screen.driveInput, screen.drive);
    fold(screen, drive.verdict, drive.margin, drive.flags);
    drivenForcedGain = drive.ibAvailableAmps > 0 ? screen.drivenIcAmps / drive.ibAvailableAmps : Number.POSITIVE_INFINITY;
  }
  if (plan.switching) {
    screen.saturationInput.drivenForcedGain = drivenForcedGain;
    const saturation = judgeSaturation(screen.saturationInput, screen.saturation);
    fold(screen, saturation.verdict, saturation.margin, saturation.flags);
  }

  const devices = screen.devices;
  for (let i = 0; i < devices.length; i += 1) {
    const device = devices[i];
    const voltage = judgeVoltage(device.voltageInput, device.voltage);
    fold(screen, voltage.verdict, voltage.margin, voltage.flags);
    const current = judgeCurrent(device.currentInput, device.current);
    fold(screen, current.verdict, current.margin, current.flags);
    const thermal = judgeThermal(device.thermalInput, device.thermal);
    fold(screen, thermal.verdict, thermal.margin, thermal.flags);
  }

  if (plan.checksVoltageGain) {
    if (screen.voltageGainInput === null) screen.verdict = worseVerdict(screen.verdict, "marginal");
    else {
      const voltageGain = judgeVoltageGain(screen.voltageGainInput, screen.voltageGain);
      fold(screen, voltageGain.verdict, voltageGain.margin, voltageGain.flags);
    }
  }
  if (plan.checksBandwidth) {
    const bandwidth = judgeBandwidth(screen.bandwidthInput, screen.bandwidth);
    fold(screen, bandwidth.verdict, bandwidth.margin, bandwidth.flags);
  }
  if (staleDatasheet) screen.flags |= FLAG_BITS["stale-datasheet"];
  return screen;
}
