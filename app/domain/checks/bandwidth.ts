// Bandwidth check: fT against the signal bandwidth times the gain needed there.
import type { CheckInput, CheckResult, Verdict } from "../check-result";
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

/** fT below f × gain fails; below factor × f × gain is marginal; margin = (fT − f × gain) / fT. */
export function checkBandwidth(input: BandwidthCheckInput): CheckResult {
  const factor = input.factor ?? DEFAULT_BANDWIDTH_FACTOR;
  const demandHz = input.bandwidthHz * input.gainNeeded;
  const inputs: CheckInput[] = [
    { symbol: "f", label: "signal bandwidth", value: input.bandwidthHz, unit: "Hz" },
    { symbol: "G", label: "gain needed at the band edge", value: input.gainNeeded, unit: "" },
    { symbol: "f × G", label: "gain-bandwidth demand", value: demandHz, unit: "Hz" },
    { symbol: "k(f)", label: "headroom factor", value: factor, unit: "" },
  ];
  const formula = `fT ≥ k(f) × f × G, k(f) = ${factor}`;
  if (input.ftHz == null) {
    return {
      check: "bandwidth",
      subject: input.subject ?? "part",
      verdict: "marginal",
      margin: null,
      flags: [],
      formula,
      inputs,
      summary: `No fT is quoted, so the ${formatValue(demandHz, "Hz")} gain-bandwidth demand cannot be confirmed.`,
    };
  }
  inputs.push({ symbol: "fT", label: "transition frequency", value: input.ftHz, unit: "Hz" });
  const verdict: Verdict = input.ftHz < demandHz ? "fails" : input.ftHz < factor * demandHz ? "marginal" : "fits";
  return {
    check: "bandwidth",
    subject: input.subject ?? "part",
    verdict,
    margin: (input.ftHz - demandHz) / input.ftHz,
    flags: [],
    formula,
    inputs,
    summary: `fT ${formatValue(input.ftHz, "Hz")} against ${formatValue(demandHz, "Hz")} (${formatValue(input.bandwidthHz, "Hz")} × gain ${formatValue(input.gainNeeded, "")})${verdict === "marginal" ? `, less than ${factor} times the demand` : ""}.`,
  };
}
