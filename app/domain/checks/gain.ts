// Gain check: worst-case hFE over the circuit's currents against the hFE it needs.
import { type CheckInput, type CheckResult, type Verdict, mergeFlags } from "../check-result";
import type { GainEstimate } from "../gain-curve";
import { formatValue } from "./format";

export interface GainAtCurrent {
  icAmps: number;
  /** From worstCaseGain at this IC. */
  estimate: GainEstimate;
}

export interface GainCheckInput {
  subject?: string;
  /** The hFE the circuit needs (switching: at least the forced gain); null when the sheet sets none. */
  requiredHfe: number | null;
  /** Worst-case gain at each current the circuit runs at (lowest, operating, peak); the lowest governs. */
  gains: GainAtCurrent[];
}

/** Below the required hFE fails; meeting it only with gain quoted far from the operating point is marginal. */
export function checkGain(input: GainCheckInput): CheckResult {
  if (input.gains.length === 0) throw new RangeError("checkGain needs the gain at one current at least");
  const lowest = input.gains.reduce((low, g) => (g.estimate.hfe < low.estimate.hfe ? g : low));
  const flags = mergeFlags(...input.gains.map((g) => g.estimate.flags));
  const hfe = lowest.estimate.hfe;
  const inputs: CheckInput[] = input.gains.map((g) => ({
    symbol: `hFE(${formatValue(g.icAmps, "A")})`,
    label: `worst-case hFE at IC = ${formatValue(g.icAmps, "A")}: ${g.estimate.note}`,
    value: g.estimate.hfe,
    unit: "",
  }));
  if (input.requiredHfe != null) inputs.push({ symbol: "hFE(req)", label: "hFE the circuit needs", value: input.requiredHfe, unit: "" });
  const at = `at IC = ${formatValue(lowest.icAmps, "A")}`;
  if (lowest.estimate.source === "none") {
    return result(input, "fails", null, flags, inputs, "No gain is quoted, so the part cannot be checked for gain.");
  }
  if (input.requiredHfe == null) {
    return result(input, "fits", null, flags, inputs, `Worst-case hFE ${formatValue(hfe, "")} ${at} (${lowest.estimate.note}); the sheet asks for no gain.`);
  }
  const margin = (hfe - input.requiredHfe) / hfe;
  const offPoint = flags.includes("gain-off-point");
  const verdict: Verdict = hfe < input.requiredHfe ? "fails" : offPoint ? "marginal" : "fits";
  const tail = verdict === "marginal" ? ", but the gain is quoted far from this current" : "";
  return result(
    input,
    verdict,
    margin,
    flags,
    inputs,
    `Worst-case hFE ${formatValue(hfe, "")} ${at} (${lowest.estimate.note}) against ${formatValue(input.requiredHfe, "")} needed${tail}.`,
  );
}

function result(input: GainCheckInput, verdict: Verdict, margin: number | null, flags: CheckResult["flags"], inputs: CheckInput[], summary: string): CheckResult {
  return { check: "gain", subject: input.subject ?? "part", verdict, margin, flags, formula: "hFE(worst) ≥ hFE(required), log-log interpolation in IC", inputs, summary };
}
