// Evaluates one part against a requirement sheet: every check that applies, at the circuit's own currents.
import { type CheckResult, type FlagName, mergeFlags, type Verdict, worstVerdict } from "./check-result";
import { checkBandwidth } from "./checks/bandwidth";
import { checkCurrent } from "./checks/current";
import { checkDrive } from "./checks/drive";
import { checkGain } from "./checks/gain";
import { checkSaturation } from "./checks/saturation";
import { checkThermal, dissipationWatts } from "./checks/thermal";
import { checkVoltage } from "./checks/voltage";
import { checkVoltageGain } from "./checks/voltage-gain";
import { assessDataQuality, type DataQuality, type DataQualityOptions } from "./data-quality";
import type { ESeriesName } from "./e-series";
import { type GainEstimate, type SaturationEstimate, vceSatAt, type WorstCaseGainOptions, worstCaseGain } from "./gain-curve";
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

/** VBE to use: quoted VBE(sat) when switching, else VBE(on), else a default by configuration and current. */
export function chooseVbe(part: PartSpec, icAmps: number, mode: RequirementSheet["mode"]): { volts: number; assumed: boolean } {
  if (mode === "switching") {
    const nearest = nearestSaturationPoint(part, icAmps);
    if (nearest?.vbeSatVolts != null) return { volts: nearest.vbeSatVolts, assumed: false };
  }
  if (part.vbeOnVolts != null) return { volts: part.vbeOnVolts, assumed: false };
  if (part.configuration === "darlington") return { volts: DEFAULT_VBE_DARLINGTON_VOLTS, assumed: true };
  return { volts: icAmps >= 1 ? DEFAULT_VBE_POWER_VOLTS : DEFAULT_VBE_SMALL_SIGNAL_VOLTS, assumed: true };
}

function nearestSaturationPoint(part: PartSpec, icAmps: number) {
  let best = null;
  for (const point of part.saturationPoints) {
    if (!(point.icAmps > 0)) continue;
    if (best == null || Math.abs(Math.log(point.icAmps / icAmps)) < Math.abs(Math.log(best.icAmps / icAmps))) best = point;
  }
  return best;
}

/** Reasons the part is outside the sheet's polarity or allowed packages. */
export function findExclusions(part: PartSpec, sheet: RequirementSheet): string[] {
  const reasons: string[] = [];
  if (sheet.polarity !== "any" && part.polarity !== sheet.polarity) reasons.push(`${part.polarity.toUpperCase()}, the sheet asks for ${sheet.polarity.toUpperCase()}`);
  const allowed = sheet.packages.map((name) => name.trim().toLowerCase());
  if (allowed.length > 0 && !allowed.includes(part.packageName.trim().toLowerCase())) reasons.push(`package ${part.packageName} is not among ${sheet.packages.join(", ")}`);
  return reasons;
}

/** Every check that applies to the sheet, the worst verdict, and the numbers the pages show. */
export function evaluatePart(part: PartSpec, sheet: RequirementSheet, options: EvaluateOptions = {}): PartEvaluation {
  const icAmps = sheet.operatingIcAmps;
  const currents = [...new Set([minIcOf(sheet), icAmps, peakIcOf(sheet)])];
  const gains = currents.map((current) => ({ icAmps: current, estimate: worstCaseGain(part.gainPoints, current, options) }));
  const atOperating = gains.find((g) => g.icAmps === icAmps)?.estimate ?? worstCaseGain(part.gainPoints, icAmps, options);
  const switching = sheet.mode === "switching";
  const vbe = chooseVbe(part, icAmps, sheet.mode);
  const checks: CheckResult[] = [];

  checks.push(checkGain({ requiredHfe: sheet.requiredHfe ?? (switching ? sheet.forcedGain : null), gains }));
  checks.push(
    checkVoltage({
      peakVceVolts: peakVceOf(sheet),
      vceoVolts: part.vceoVolts,
      reverseVbeVolts: sheet.reverseVbeVolts,
      veboVolts: part.veboVolts,
      voltageFraction: sheet.derating.voltageFraction,
    }),
  );
  checks.push(checkCurrent({ peakIcAmps: peakIcOf(sheet), icMaxAmps: part.icMaxAmps, currentFraction: sheet.derating.currentFraction }));

  let suggestedBaseOhms: number | null = null;
  let drivenForcedGain = sheet.forcedGain;
  if (sheet.drive != null) {
    const drive = checkDrive({
      mode: sheet.mode,
      icAmps,
      worstHfe: atOperating.hfe,
      forcedGain: sheet.forcedGain,
      vbeVolts: vbe.volts,
      vbeAssumed: vbe.assumed,
      drive: sheet.drive,
      series: options.series,
    });
    checks.push(drive);
    suggestedBaseOhms = drive.suggestedBaseOhms;
    if (drive.ibAvailableAmps > 0) drivenForcedGain = icAmps / drive.ibAvailableAmps;
    else drivenForcedGain = Number.POSITIVE_INFINITY;
  }

  let saturation: SaturationEstimate | null = null;
  if (switching) {
    saturation = vceSatAt(part.saturationPoints, icAmps);
    checks.push(
      checkSaturation({
        icAmps,
        drivenForcedGain,
        worstHfe: atOperating.hfe,
        saturation,
        allowedSatDropVolts: sheet.allowedSatDropVolts,
      }),
    );
  }

  const thermalVce = switching ? (saturation?.volts ?? sheet.allowedSatDropVolts ?? DEFAULT_VCE_SAT_VOLTS) : operatingVceOf(sheet);
  const thermal = checkThermal({
    mode: sheet.mode,
    vceVolts: thermalVce,
    vceAssumed: switching && saturation == null,
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
  checks.push(thermal);

  if (!switching && sheet.requiredVoltageGain != null && sheet.loadOhms != null) {
    checks.push(
      checkVoltageGain({
        icAmps,
        vceVolts: operatingVceOf(sheet),
        earlyVolts: part.earlyVolts,
        loadOhms: sheet.loadOhms,
        requiredVoltageGain: sheet.requiredVoltageGain,
        tempC: sheet.ambientC,
        hfe: atOperating.hfe,
      }),
    );
  }

  const gainNeeded = sheet.requiredVoltageGain ?? sheet.requiredHfe;
  if (sheet.bandwidthHz != null && gainNeeded != null) {
    checks.push(checkBandwidth({ ftHz: part.ftHz, bandwidthHz: sheet.bandwidthHz, gainNeeded }));
  }

  const dataQuality = assessDataQuality(part, options);
  const staleFlags: FlagName[] = dataQuality.flags.includes("stale-datasheet") ? ["stale-datasheet"] : [];
  return {
    verdict: worstVerdict(checks.map((check) => check.verdict)),
    checks,
    flags: mergeFlags(...checks.map((check) => check.flags), staleFlags),
    hfeAtOperatingPoint: atOperating.hfe,
    gainAtOperatingPoint: atOperating,
    vbeVolts: vbe.volts,
    vbeAssumed: vbe.assumed,
    vceSatVolts: saturation?.volts ?? null,
    dissipationWatts: dissipationWatts(sheet.mode, thermalVce, icAmps, switching ? sheet.dutyCycle : 1),
    junctionC: thermal.inputs.find((input) => input.symbol === "Tj")?.value ?? null,
    suggestedBaseOhms,
    excludedBy: findExclusions(part, sheet),
    dataQuality,
  };
}
