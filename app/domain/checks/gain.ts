// Gain check: worst-case hFE over the circuit's currents against the hFE it needs.
import { type CheckInput, type CheckResult, FLAG_BITS, type Judgement, maskOfFlags, mergeFlags } from "../check-result";
import type { GainEstimate, GainReading } from "../gain-curve";
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

/** What the judgement reads: the same gains without their notes. */
export interface GainJudgeInput {
  requiredHfe: number | null;
  gains: readonly { icAmps: number; estimate: GainReading }[];
}

export type GainOutcome = "no-gain" | "no-requirement" | "judged";

export interface GainJudgement extends Judgement {
  outcome: GainOutcome;
  /** Index in gains of the lowest gain (the first of equals), and that gain. */
  lowest: number;
  hfe: number;
}

export function newGainJudgement(): GainJudgement {
  return { verdict: "fits", margin: null, flags: 0, outcome: "judged", lowest: 0, hfe: 0 };
}

/** Below the required hFE fails; meeting it only with gain quoted far from the operating point is marginal. */
export function judgeGain(input: GainJudgeInput, out: GainJudgement = newGainJudgement()): GainJudgement {
  if (input.gains.length === 0) throw new RangeError("checkGain needs the gain at one current at least");
  let lowest = 0;
  let flags = 0;
  for (let i = 0; i < input.gains.length; i += 1) {
    const estimate = input.gains[i].estimate;
    if (estimate.hfe < input.gains[lowest].estimate.hfe) lowest = i;
    flags |= maskOfFlags(estimate.flags);
  }
  const estimate = input.gains[lowest].estimate;
  out.lowest = lowest;
  out.hfe = estimate.hfe;
  out.flags = flags;
  out.margin = null;
  if (estimate.source === "none") {
    out.outcome = "no-gain";
    out.verdict = "fails";
  } else if (input.requiredHfe == null) {
    out.outcome = "no-requirement";
    out.verdict = "fits";
  } else {
    out.outcome = "judged";
    out.margin = (estimate.hfe - input.requiredHfe) / estimate.hfe;
    out.verdict = estimate.hfe < input.requiredHfe ? "fails" : flags & FLAG_BITS["gain-off-point"] ? "marginal" : "fits";
  }
  return out;
}

export function explainGain(input: GainCheckInput, judged: GainJudgement): CheckResult {
  const lowest = input.gains[judged.lowest];
  const flags = mergeFlags(...input.gains.map((g) => g.estimate.flags));
  const hfe = judged.hfe;
  const inputs: CheckInput[] = input.gains.map((g) => ({
    symbol: `hFE(${formatValue(g.icAmps, "A")})`,
    label: `worst-case hFE at IC = ${formatValue(g.icAmps, "A")}: ${g.estimate.note}`,
    value: g.estimate.hfe,
    unit: "",
  }));
  if (input.requiredHfe != null) inputs.push({ symbol: "hFE(req)", label: "hFE the circuit needs", value: input.requiredHfe, unit: "" });
  const at = `at IC = ${formatValue(lowest.icAmps, "A")}`;
  const build = (summary: string): CheckResult => ({
    check: "gain",
    subject: input.subject ?? "part",
    verdict: judged.verdict,
    margin: judged.margin,
    flags,
    formula: "hFE(worst) ≥ hFE(required), log-log interpolation in IC",
    inputs,
    summary,
  });
  if (judged.outcome === "no-gain") return build("No gain is quoted, so the part cannot be checked for gain.");
  if (judged.outcome === "no-requirement" || input.requiredHfe == null) {
    return build(`Worst-case hFE ${formatValue(hfe, "")} ${at} (${lowest.estimate.note}); the sheet asks for no gain.`);
  }
  const tail = judged.verdict === "marginal" ? ", but the gain is quoted far from this current" : "";
  return build(`Worst-case hFE ${formatValue(hfe, "")} ${at} (${lowest.estimate.note}) against ${formatValue(input.requiredHfe, "")} needed${tail}.`);
}

export function checkGain(input: GainCheckInput): CheckResult {
  return explainGain(input, judgeGain(input));
}
