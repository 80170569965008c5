// Voltage check: peak VCE against VCEO, and reverse VBE against VEBO or VCB against VCBO where the sheet needs them.
import { type CheckInput, type CheckResult, type FlagName, flagsOfMask, type Judgement, mergeFlags, type Verdict, worseVerdict } from "../check-result";
import { formatPercent, formatValue } from "./format";
import { newRatingReading, type RatingReading, readRating } from "./rating";

export interface VoltageCheckInput {
  /** "part", or "driver"/"output" inside a pair. */
  subject?: string;
  /** Peak collector-emitter voltage, inductive kick included. */
  peakVceVolts: number;
  vceoVolts: number;
  /** Reverse base-emitter voltage applied when off; null or absent when the circuit applies none. */
  reverseVbeVolts?: number | null;
  veboVolts?: number | null;
  /** Collector-base voltage the circuit applies; null or absent when not relevant. */
  peakVcbVolts?: number | null;
  vcboVolts?: number | null;
  /** Fraction of each rating the derating policy allows. */
  voltageFraction: number;
}

/** The worst demand governs; each applied and rated demand keeps its own reading for the explanation. */
export interface VoltageJudgement extends Judgement {
  vce: RatingReading;
  veb: RatingReading;
  vcb: RatingReading;
}

export function newVoltageJudgement(): VoltageJudgement {
  return { verdict: "fits", margin: null, flags: 0, vce: newRatingReading(), veb: newRatingReading(), vcb: newRatingReading() };
}

/** Folds one applied demand into the judgement: an unquoted rating the circuit needs is marginal. */
function judgeDemand(out: VoltageJudgement, demand: number, rating: number | null, fraction: number, reading: RatingReading): void {
  if (rating == null) {
    out.verdict = worseVerdict(out.verdict, "marginal");
    return;
  }
  readRating(demand, rating, fraction, reading);
  out.verdict = worseVerdict(out.verdict, reading.verdict);
  out.flags |= reading.flags;
  out.margin = out.margin == null ? reading.margin : Math.min(out.margin, reading.margin);
}

/** Every applied voltage against its rating; an unquoted rating the circuit needs is marginal. */
export function judgeVoltage(input: VoltageCheckInput, out: VoltageJudgement = newVoltageJudgement()): VoltageJudgement {
  out.verdict = "fits";
  out.margin = null;
  out.flags = 0;
  judgeDemand(out, input.peakVceVolts, input.vceoVolts, input.voltageFraction, out.vce);
  if (input.reverseVbeVolts != null) judgeDemand(out, input.reverseVbeVolts, input.veboVolts ?? null, input.voltageFraction, out.veb);
  if (input.peakVcbVolts != null) judgeDemand(out, input.peakVcbVolts, input.vcboVolts ?? null, input.voltageFraction, out.vcb);
  return out;
}

export function explainVoltage(input: VoltageCheckInput, judged: VoltageJudgement): CheckResult {
  const demands: { symbol: string; ratingSymbol: string; demand: number; rating: number | null; reading: RatingReading }[] = [
    { symbol: "VCE(peak)", ratingSymbol: "VCEO", demand: input.peakVceVolts, rating: input.vceoVolts, reading: judged.vce },
  ];
  if (input.reverseVbeVolts != null) {
    demands.push({ symbol: "VEB(reverse)", ratingSymbol: "VEBO", demand: input.reverseVbeVolts, rating: input.veboVolts ?? null, reading: judged.veb });
  }
  if (input.peakVcbVolts != null) {
    demands.push({ symbol: "VCB(peak)", ratingSymbol: "VCBO", demand: input.peakVcbVolts, rating: input.vcboVolts ?? null, reading: judged.vcb });
  }
  const inputs: CheckInput[] = [{ symbol: "k(V)", label: "voltage derating fraction", value: input.voltageFraction, unit: "" }];
  const flagLists: FlagName[][] = [];
  const sentences: string[] = [];
  for (const d of demands) {
    inputs.push({ symbol: d.symbol, label: `applied ${d.symbol}`, value: d.demand, unit: "V" });
    if (d.rating == null) {
      sentences.push(`${d.ratingSymbol} is not quoted, so ${formatValue(d.demand, "V")} ${d.symbol} cannot be confirmed`);
      continue;
    }
    inputs.push({ symbol: d.ratingSymbol, label: `${d.ratingSymbol} absolute maximum`, value: d.rating, unit: "V" });
    flagLists.push(flagsOfMask(d.reading.flags));
    sentences.push(
      `${d.symbol} ${formatValue(d.demand, "V")} against ${d.ratingSymbol} ${formatValue(d.rating, "V")} (derated to ${formatValue(d.reading.deratedLimit, "V")}): ${describe(d.reading.verdict)}`,
    );
  }
  return {
    check: "voltage",
    subject: input.subject ?? "part",
    verdict: judged.verdict,
    margin: judged.margin,
    flags: mergeFlags(...flagLists),
    formula: `V(applied) ≤ k(V) × V(rating), k(V) = ${formatPercent(input.voltageFraction)}`,
    inputs,
    summary: `${sentences.join("; ")}.`,
  };
}

export function checkVoltage(input: VoltageCheckInput): CheckResult {
  return explainVoltage(input, judgeVoltage(input));
}

function describe(verdict: Verdict): string {
  if (verdict === "fails") return "above the absolute maximum";
  if (verdict === "marginal") return "inside the derating";
  return "clears the derated rating";
}
