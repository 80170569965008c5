// Saturation check (switching): VCE(sat) at the operating IC, at the forced gain the drive gives, against the allowed drop.
import type { CheckInput, CheckResult, FlagName, Verdict } from "../check-result";
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

/** Fails when the drive cannot saturate the device or the drop exceeds the allowance; unconfirmed data is marginal. */
export function checkSaturation(input: SaturationCheckInput): CheckResult {
  const inputs: CheckInput[] = [
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    { symbol: "βforced", label: "forced gain IC / IB the drive gives", value: input.drivenForcedGain, unit: "" },
    { symbol: "hFE(worst)", label: "worst-case hFE at IC", value: input.worstHfe, unit: "" },
  ];
  if (input.allowedSatDropVolts != null) inputs.push({ symbol: "VCE(allowed)", label: "allowed saturation drop", value: input.allowedSatDropVolts, unit: "V" });
  const build = (verdict: Verdict, margin: number | null, flags: FlagName[], summary: string): CheckResult => ({
    check: "saturation",
    subject: input.subject ?? "part",
    verdict,
    margin,
    flags,
    formula: "VCE(sat) at IC and βforced ≤ VCE(allowed); βforced < hFE(worst)",
    inputs,
    summary,
  });
  if (input.drivenForcedGain >= input.worstHfe) {
    return build(
      "fails",
      null,
      ["sat-too-high"],
      `The drive forces IC / IB = ${formatValue(input.drivenForcedGain, "")}, at or above the worst-case hFE ${formatValue(input.worstHfe, "")}: the transistor does not saturate.`,
    );
  }
  const sat = input.saturation;
  if (sat == null) return build("marginal", null, [], "No VCE(sat) is quoted, so the saturation drop cannot be confirmed.");
  inputs.push({ symbol: "VCE(sat)", label: `VCE(sat) ${sat.source} at IC${sat.extrapolated ? ", scaled beyond the quoted currents" : ""}`, value: sat.volts, unit: "V" });
  if (sat.forcedGain != null) inputs.push({ symbol: "βforced(sheet)", label: "forced gain of the quoted VCE(sat)", value: sat.forcedGain, unit: "" });
  const lessDrive = sat.forcedGain != null && input.drivenForcedGain > sat.forcedGain * 1.001;
  const caveats = [
    lessDrive ? `the datasheet quotes it at IC / IB = ${formatValue(sat.forcedGain ?? 0, "")}, with more base current than this drive gives` : "",
    sat.extrapolated ? "the current lies above the quoted points" : "",
    sat.source === "typ" ? "only a typical value is quoted" : "",
  ].filter((text) => text.length > 0);
  const said = `VCE(sat) ${formatValue(sat.volts, "V")} at ${formatValue(input.icAmps, "A")}`;
  const caveatText = caveats.length > 0 ? ` (${caveats.join("; ")})` : "";
  if (input.allowedSatDropVolts == null) {
    return build(caveats.length > 0 ? "marginal" : "fits", null, [], `${said}${caveatText}; the sheet sets no limit on the drop.`);
  }
  const margin = (input.allowedSatDropVolts - sat.volts) / input.allowedSatDropVolts;
  if (sat.volts > input.allowedSatDropVolts) {
    return build("fails", margin, ["sat-too-high"], `${said} exceeds the ${formatValue(input.allowedSatDropVolts, "V")} allowed${caveatText}.`);
  }
  return build(caveats.length > 0 ? "marginal" : "fits", margin, [], `${said} against ${formatValue(input.allowedSatDropVolts, "V")} allowed${caveatText}.`);
}
