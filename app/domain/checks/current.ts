// Current check: peak IC against IC max, derated.
import { type CheckResult, flagsOfMask } from "../check-result";
import { formatPercent, formatValue } from "./format";
import { newRatingReading, type RatingReading, readRating } from "./rating";

export interface CurrentCheckInput {
  subject?: string;
  /** Highest collector current the circuit draws, start-up and stall included. */
  peakIcAmps: number;
  icMaxAmps: number;
  /** Fraction of IC max the derating policy allows. */
  currentFraction: number;
}

export type CurrentJudgement = RatingReading;

/** Peak IC against the derated IC max; above IC max itself fails. */
export function judgeCurrent(input: CurrentCheckInput, out: CurrentJudgement = newRatingReading()): CurrentJudgement {
  return readRating(input.peakIcAmps, input.icMaxAmps, input.currentFraction, out);
}

export function explainCurrent(input: CurrentCheckInput, judged: CurrentJudgement): CheckResult {
  const where =
    judged.verdict === "fails" ? "above the absolute maximum" : judged.verdict === "marginal" ? "inside the derating" : "within the derated rating";
  return {
    check: "current",
    subject: input.subject ?? "part",
    verdict: judged.verdict,
    margin: judged.margin,
    flags: flagsOfMask(judged.flags),
    formula: `IC(peak) ≤ k(I) × IC(max), k(I) = ${formatPercent(input.currentFraction)}`,
    inputs: [
      { symbol: "IC(peak)", label: "peak collector current", value: input.peakIcAmps, unit: "A" },
      { symbol: "IC(max)", label: "IC absolute maximum", value: input.icMaxAmps, unit: "A" },
      { symbol: "k(I)", label: "current derating fraction", value: input.currentFraction, unit: "" },
    ],
    summary: `Peak IC ${formatValue(input.peakIcAmps, "A")} against IC max ${formatValue(input.icMaxAmps, "A")} (derated to ${formatValue(judged.deratedLimit, "A")}): ${where}.`,
  };
}

export function checkCurrent(input: CurrentCheckInput): CheckResult {
  return explainCurrent(input, judgeCurrent(input));
}
