// Saturation check (switching): VCE(sat) at the operating IC, at the forced gain the drive gives, against the allowed drop.
import { type CheckInput, type CheckResult, FLAG_BITS, flagsOfMask, type Judgement } from "../check-result";
import type { SaturationEstimate } from "../gain-curve";
import { formatValue } from "./format";

export interface SaturationCheckInput {
  subject?: string;
  icAmps: number;
  /** IC / IB the drive actually forces (or the sheet's forced gain when no drive is given). */
  drivenForcedGain: number;
  /** Worst-case hFE at IC: a forced gain at or above it does not saturate the device. */
  worstHfe: number;
  /** From vceSatAt at IC; null when no saturation point is quoted. */
  saturation: SaturationEstimate | null;
  /** null when the sheet sets no limit on the drop. */
  allowedSatDropVolts: number | null;
}

/** Which of the check's cases applied, so the explanation says the matching sentence. */
export type SaturationOutcome = "not-saturated" | "no-data" | "no-limit" | "exceeds" | "within";

export interface SaturationJudgement extends Judgement {
  outcome: SaturationOutcome;
  /** The drive forces less base current than the datasheet's VCE(sat) point assumes. */
  lessDrive: boolean;
  /** Any caveat applies (less drive, extrapolated, typical only): a pass is then marginal. */
  caveated: boolean;
}

export function newSaturationJudgement(): SaturationJudgement {
  return { verdict: "fits", margin: null, flags: 0, outcome: "within", lessDrive: false, caveated: false };
}

/** Fails when the drive cannot saturate the device or the drop exceeds the allowance; unconfirmed data is marginal. */
export function judgeSaturation(input: SaturationCheckInput, out: SaturationJudgement = newSaturationJudgement()): SaturationJudgement {
  out.lessDrive = false;
  out.caveated = false;
  out.margin = null;
  out.flags = 0;
  if (input.drivenForcedGain >= input.worstHfe) {
    out.outcome = "not-saturated";
    out.verdict = "fails";
    out.flags = FLAG_BITS["sat-too-high"];
    return out;
  }
  const sat = input.saturation;
  if (sat == null) {
    out.outcome = "no-data";
    out.verdict = "marginal";
    return out;
  }
  out.lessDrive = sat.forcedGain != null && input.drivenForcedGain > sat.forcedGain * 1.001;
  out.caveated = out.lessDrive || sat.extrapolated || sat.source === "typ";
  if (input.allowedSatDropVolts == null) {
    out.outcome = "no-limit";
    out.verdict = out.caveated ? "marginal" : "fits";
    return out;
  }
  out.margin = (input.allowedSatDropVolts - sat.volts) / input.allowedSatDropVolts;
  if (sat.volts > input.allowedSatDropVolts) {
    out.outcome = "exceeds";
    out.verdict = "fails";
    out.flags = FLAG_BITS["sat-too-high"];
    return out;
  }
  out.outcome = "within";
  out.verdict = out.caveated ? "marginal" : "fits";
  return out;
}

export function explainSaturation(input: SaturationCheckInput, judged: SaturationJudgement): CheckResult {
  const inputs: CheckInput[] = [
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    { symbol: "βforced", label: "forced gain IC / IB the drive gives", value: input.drivenForcedGain, unit: "" },
    { symbol: "hFE(worst)", label: "worst-case hFE at IC", value: input.worstHfe, unit: "" },
  ];
  if (input.allowedSatDropVolts != null) inputs.push({ symbol: "VCE(allowed)", label: "allowed saturation drop", value: input.allowedSatDropVolts, unit: "V" });
  const build = (summary: string): CheckResult => ({
    check: "saturation",
    subject: input.subject ?? "part",
    verdict: judged.verdict,
    margin: judged.margin,
    flags: flagsOfMask(judged.flags),
    formula: "VCE(sat) at IC and βforced ≤ VCE(allowed); βforced < hFE(worst)",
    inputs,
    summary,
  });
  if (judged.outcome === "not-saturated") {
    return build(
      `The drive forces IC / IB = ${formatValue(input.drivenForcedGain, "")}, at or above the worst-case hFE ${formatValue(input.worstHfe, "")}: the transistor does not saturate.`,
    );
  }
  const sat = input.saturation;
  if (sat == null || judged.outcome === "no-data") return build("No VCE(sat) is quoted, so the saturation drop cannot be confirmed.");
  inputs.push({ symbol: "VCE(sat)", label: `VCE(sat) ${sat.source} at IC${sat.extrapolated ? ", scaled beyond the quoted currents" : ""}`, value: sat.volts, unit: "V" });
  if (sat.forcedGain != null) inputs.push({ symbol: "βforced(sheet)", label: "forced gain of the quoted VCE(sat)", value: sat.forcedGain, unit: "" });
  const caveats = [
    judged.lessDrive ? `the datasheet quotes it at IC / IB = ${formatValue(sat.forcedGain ?? 0, "")}, with more base current than this drive gives` : "",
    sat.extrapolated ? "the current lies above the quoted points" : "",
    sat.source === "typ" ? "only a typical value is quoted" : "",
  ].filter((text) => text.length > 0);
  const said = `VCE(sat) ${formatValue(sat.volts, "V")} at ${formatValue(input.icAmps, "A")}`;
  const caveatText = caveats.length > 0 ? ` (${caveats.join("; ")})` : "";
  if (judged.outcome === "no-limit") return build(`${said}${caveatText}; the sheet sets no limit on the drop.`);
  const allowed = formatValue(input.allowedSatDropVolts ?? 0, "V");
  if (judged.outcome === "exceeds") return build(`${said} exceeds the ${allowed} allowed${caveatText}.`);
  return build(`${said} against ${allowed} allowed${caveatText}.`);
}

export function checkSaturation(input: SaturationCheckInput): CheckResult {
  return explainSaturation(input, judgeSaturation(input));
}
