// Drive check: the base current the device needs against what the source supplies, and a base resistor to fit.
import { type CheckInput, type CheckResult, FLAG_BITS, flagsOfMask, type Judgement } from "../check-result";
import { type ESeriesName, roundToSeries } from "../e-series";
import type { Drive } from "../requirement";
import { formatValue } from "./format";

/** Base current above the need that a rounded resistor may give before the summary warns of slower turn-off (common practice). */
export const DEFAULT_OVERDRIVE_LIMIT = 1.25;

export interface DriveCheckInput {
  subject?: string;
  mode: "linear" | "switching";
  icAmps: number;
  /** Worst-case hFE at IC (used in linear mode). */
  worstHfe: number;
  /** IC / IB wanted for hard saturation (used when switching). */
  forcedGain: number;
  vbeVolts: number;
  /** True when VBE is a default, not a quoted value. */
  vbeAssumed: boolean;
  drive: NonNullable<Drive>;
  series?: ESeriesName;
  /** Highest ratio of the rounded resistor's base current to the need before the summary says so. */
  overdriveLimit?: number;
}

export interface DriveCheckResult extends CheckResult {
  ibNeededAmps: number;
  ibAvailableAmps: number;
  /** Total series base resistance to aim for, rounded DOWN onto the series so the base current stays enough; null for a current drive. */
  suggestedBaseOhms: number | null;
}

export interface DriveJudgement extends Judgement {
  ibNeededAmps: number;
  ibAvailableAmps: number;
  /** Vdrive − VBE for a source drive (may be 0 or below); NaN for a current drive. */
  headroomVolts: number;
}

export function newDriveJudgement(): DriveJudgement {
  return { verdict: "fits", margin: null, flags: 0, ibNeededAmps: 0, ibAvailableAmps: 0, headroomVolts: Number.NaN };
}

/** IB needed = IC / hFE(worst) (linear) or IC / βforced (switching), against (Vdrive − VBE) / Rsource or the stated IB. */
export function judgeDrive(input: DriveCheckInput, out: DriveJudgement = newDriveJudgement()): DriveJudgement {
  const divisor = input.mode === "switching" ? input.forcedGain : input.worstHfe;
  const ibNeededAmps = divisor > 0 ? input.icAmps / divisor : Number.POSITIVE_INFINITY;
  let ibAvailableAmps: number;
  if (input.drive.kind === "source") {
    out.headroomVolts = input.drive.volts - input.vbeVolts;
    ibAvailableAmps = Math.max(0, out.headroomVolts) / input.drive.sourceOhms;
  } else {
    out.headroomVolts = Number.NaN;
    ibAvailableAmps = input.drive.ibAmps;
  }
  const margin = ibAvailableAmps > 0 ? (ibAvailableAmps - ibNeededAmps) / ibAvailableAmps : Number.NEGATIVE_INFINITY;
  out.ibNeededAmps = ibNeededAmps;
  out.ibAvailableAmps = ibAvailableAmps;
  out.verdict = ibAvailableAmps >= ibNeededAmps ? "fits" : "fails";
  out.flags = out.verdict === "fails" ? FLAG_BITS["drive-short"] : 0;
  out.margin = Number.isFinite(margin) ? margin : -1;
  return out;
}

export function explainDrive(input: DriveCheckInput, judged: DriveJudgement): DriveCheckResult {
  const series = input.series ?? "E12";
  const { ibNeededAmps, ibAvailableAmps, verdict } = judged;
  const inputs: CheckInput[] = [
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    input.mode === "switching"
      ? { symbol: "βforced", label: "forced gain for saturation", value: input.forcedGain, unit: "" }
      : { symbol: "hFE(worst)", label: "worst-case hFE at IC", value: input.worstHfe, unit: "" },
    { symbol: "IB(need)", label: "base current needed", value: ibNeededAmps, unit: "A" },
  ];
  let suggestedBaseOhms: number | null = null;
  let formula: string;
  let extra = "";
  if (input.drive.kind === "source") {
    const headroom = judged.headroomVolts;
    formula = "IB = (Vdrive − VBE) / Rsource ≥ IC / " + (input.mode === "switching" ? "βforced" : "hFE(worst)");
    inputs.push(
      { symbol: "Vdrive", label: "drive voltage", value: input.drive.volts, unit: "V" },
      { symbol: "VBE", label: input.vbeAssumed ? "VBE, assumed (not quoted)" : "VBE", value: input.vbeVolts, unit: "V" },
      { symbol: "Rsource", label: "series resistance in the base path", value: input.drive.sourceOhms, unit: "Ω" },
    );
    if (headroom > 0 && Number.isFinite(ibNeededAmps)) {
      suggestedBaseOhms = roundToSeries(headroom / ibNeededAmps, series, "down");
      const ibWithSuggested = headroom / suggestedBaseOhms;
      inputs.push({ symbol: "Rb", label: `base resistor, ${series}, rounded down`, value: suggestedBaseOhms, unit: "Ω" });
      extra = ` A total base resistance of ${formatValue(suggestedBaseOhms, "Ω")} (${series}, rounded down so the base current stays enough) gives ${formatValue(ibWithSuggested, "A")}.`;
      if (ibWithSuggested > ibNeededAmps * (input.overdriveLimit ?? DEFAULT_OVERDRIVE_LIMIT)) {
        extra += ` That is ${formatValue(ibWithSuggested / ibNeededAmps, "")} times the need, which lengthens the turn-off.`;
      }
    }
  } else {
    formula = "IB(available) ≥ IC / " + (input.mode === "switching" ? "βforced" : "hFE(worst)");
  }
  inputs.push({ symbol: "IB(avail)", label: "base current the drive supplies", value: ibAvailableAmps, unit: "A" });
  const verb = verdict === "fits" ? "covers" : "falls short of";
  return {
    check: "drive",
    subject: input.subject ?? "part",
    verdict,
    margin: judged.margin,
    flags: flagsOfMask(judged.flags),
    formula,
    inputs,
    summary: `The drive supplies ${formatValue(ibAvailableAmps, "A")} and ${verb} the ${formatValue(ibNeededAmps, "A")} base current needed.${extra}`,
    ibNeededAmps,
    ibAvailableAmps,
    suggestedBaseOhms,
  };
}

export function checkDrive(input: DriveCheckInput): DriveCheckResult {
  return explainDrive(input, judgeDrive(input));
}
