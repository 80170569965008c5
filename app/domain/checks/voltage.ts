// Voltage check: peak VCE against VCEO, and reverse VBE against VEBO or VCB against VCBO where the sheet needs them.
import { type CheckInput, type CheckResult, type FlagName, mergeFlags, type Verdict, worstVerdict } from "../check-result";
import { formatPercent, formatValue } from "./format";
import { judgeAgainstRating } from "./rating";

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

interface Demand {
  symbol: string;
  ratingSymbol: string;
  demand: number;
  rating: number | null;
}

/** Every applied voltage against its rating; an unquoted rating the circuit needs is marginal. */
export function checkVoltage(input: VoltageCheckInput): CheckResult {
  const demands: Demand[] = [{ symbol: "VCE(peak)", ratingSymbol: "VCEO", demand: input.peakVceVolts, rating: input.vceoVolts }];
  if (input.reverseVbeVolts != null) {
    demands.push({ symbol: "VEB(reverse)", ratingSymbol: "VEBO", demand: input.reverseVbeVolts, rating: input.veboVolts ?? null });
  }
  if (input.peakVcbVolts != null) {
    demands.push({ symbol: "VCB(peak)", ratingSymbol: "VCBO", demand: input.peakVcbVolts, rating: input.vcboVolts ?? null });
  }
  const inputs: CheckInput[] = [{ symbol: "k(V)", label: "voltage derating fraction", value: input.voltageFraction, unit: "" }];
  const verdicts: Verdict[] = [];
  const flagLists: FlagName[][] = [];
  const sentences: string[] = [];
  let margin: number | null = null;
  for (const d of demands) {
    inputs.push({ symbol: d.symbol, label: `applied ${d.symbol}`, value: d.demand, unit: "V" });
    if (d.rating == null) {
      verdicts.push("marginal" as const);
      sentences.push(`${d.ratingSymbol} is not quoted, so ${formatValue(d.demand, "V")} ${d.symbol} cannot be confirmed`);
      continue;
    }
    inputs.push({ symbol: d.ratingSymbol, label: `${d.ratingSymbol} absolute maximum`, value: d.rating, unit: "V" });
    const judged = judgeAgainstRating(d.demand, d.rating, input.voltageFraction);
    verdicts.push(judged.verdict);
    flagLists.push(judged.flags);
    margin = margin == null ? judged.margin : Math.min(margin, judged.margin);
    sentences.push(
      `${d.symbol} ${formatValue(d.demand, "V")} against ${d.ratingSymbol} ${formatValue(d.rating, "V")} (derated to ${formatValue(judged.deratedLimit, "V")}): ${describe(judged.verdict)}`,
    );
  }
  return {
    check: "voltage",
    subject: input.subject ?? "part",
    verdict: worstVerdict(verdicts),
    margin,
    flags: mergeFlags(...flagLists),
    formula: `V(applied) ≤ k(V) × V(rating), k(V) = ${formatPercent(input.voltageFraction)}`,
    inputs,
    summary: `${sentences.join("; ")}.`,
  };
}

function describe(verdict: string): string {
  if (verdict === "fails") return "above the absolute maximum";
  if (verdict === "marginal") return "inside the derating";
  return "clears the derated rating";
}
