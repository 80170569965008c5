// Bandwidth check: fT against the signal bandwidth times the gain needed there.
import type { CheckInput, CheckResult, Judgement } from "../check-result";
import { formatValue } from "./format";

/** fT should exceed the gain-bandwidth demand this many times to keep the gain flat at the band edge (common practice). */
export const DEFAULT_BANDWIDTH_FACTOR = 2;

export interface BandwidthCheckInput {
  subject?: string;
  /** Transition frequency; null when not quoted. */
  ftHz: number | null;
  bandwidthHz: number;
  /** Current or voltage gain the stage must still give at the band edge. */
  gainNeeded: number;
  /** Headroom factor above the demand for "fits"; default 2. */
  factor?: number;
}

export interface BandwidthJudgement extends Judgement {
  factor: number;
  demandHz: number;
}

export function newBandwidthJudgement(): BandwidthJudgement {
  return { verdict: "fits", margin: null, flags: 0, factor: DEFAULT_BANDWIDTH_FACTOR, demandHz: 0 };
}

/** fT below f × gain fails; below factor × f × gain is marginal; margin = (fT − f × gain) / fT. */
export function judgeBandwidth(input: BandwidthCheckInput, out: BandwidthJudgement = newBandwidthJudgement()): BandwidthJudgement {
  const factor = input.factor ?? DEFAULT_BANDWIDTH_FACTOR;
  const demandHz = input.bandwidthHz * input.gainNeeded;
  out.factor = factor;
  out.demandHz = demandHz;
  out.flags = 0;
  if (input.ftHz == null) {
    out.verdict = "marginal";
    out.margin = null;
    return out;
  }
  out.verdict = input.ftHz < demandHz ? "fails" : input.ftHz < factor * demandHz ? "marginal" : "fits";
  out.margin = (input.ftHz - demandHz) / input.ftHz;
  return out;
}

export function explainBandwidth(input: BandwidthCheckInput, judged: BandwidthJudgement): CheckResult {
  const { factor, demandHz, verdict } = judged;
  const inputs: CheckInput[] = [
    { symbol: "f", label: "signal bandwidth", value: input.bandwidthHz, unit: "Hz" },
    { symbol: "G", label: "gain needed at the band edge", value: input.gainNeeded, unit: "" },
    { symbol: "f × G", label: "gain-bandwidth demand", value: demandHz, unit: "Hz" },
    { symbol: "k(f)", label: "headroom factor", value: factor, unit: "" },
  ];
  const formula = `fT ≥ k(f) × f × G, k(f) = ${factor}`;
  const base = { check: "bandwidth" as const, subject: input.subject ?? "part", verdict, margin: judged.margin, flags: [], formula, inputs };
  if (input.ftHz == null) {
    return { ...base, summary: `No fT is quoted, so the ${formatValue(demandHz, "Hz")} gain-bandwidth demand cannot be confirmed.` };
  }
  inputs.push({ symbol: "fT", label: "transition frequency", value: input.ftHz, unit: "Hz" });
  return {
    ...base,
    summary: `fT ${formatValue(input.ftHz, "Hz")} against ${formatValue(demandHz, "Hz")} (${formatValue(input.bandwidthHz, "Hz")} × gain ${formatValue(input.gainNeeded, "")})${verdict === "marginal" ? `, less than ${factor} times the demand` : ""}.`,
  };
}

export function checkBandwidth(input: BandwidthCheckInput): CheckResult {
  return explainBandwidth(input, judgeBandwidth(input));
}
