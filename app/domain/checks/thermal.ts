// Thermal check: dissipation, junction temperature through the thermal path, and Ptot derated with temperature.
import { type CheckInput, type CheckResult, FLAG_BITS, type FlagName, type Judgement, type Verdict, worseVerdict } from "../check-result";
import { type DeratingPolicy, deratedTjMaxC } from "../derating";
import type { PtotReference } from "../part";
import type { Mode } from "../requirement";
import { formatValue } from "./format";

/** Tj max assumed for silicon when the datasheet gives none (common practice). */
export const DEFAULT_TJ_MAX_C = 150;
/** Temperature at which datasheets quote Ptot. */
export const PTOT_REFERENCE_C = 25;

export interface ThermalCheckInput {
  subject?: string;
  mode: Mode;
  /** VCE at the operating point (linear) or VCE(sat) at the operating IC (switching); inside a Darlington the driver's VCE − VBE2. */
  vceVolts: number;
  /** True when vceVolts is a default rather than a quoted or simulated value. */
  vceAssumed?: boolean;
  icAmps: number;
  /** Conducting fraction of time; only used when switching. */
  dutyCycle: number;
  ambientC: number;
  rthJaCPerW: number | null;
  rthJcCPerW: number | null;
  /** Case-to-ambient resistance of the heatsink, interface included; null = no heatsink. */
  heatsinkRthCPerW: number | null;
  tjMaxC: number | null;
  ptotWatts: number | null;
  ptotReference: PtotReference | null;
  derating: DeratingPolicy;
}

/** Switching: P = VCE(sat) × IC × duty (switching losses neglected); linear: P = VCE × IC. */
export function dissipationWatts(mode: Mode, vceVolts: number, icAmps: number, dutyCycle: number): number {
  return mode === "switching" ? vceVolts * icAmps * dutyCycle : vceVolts * icAmps;
}

/** Ptot at a temperature, derated linearly from its 25 °C value to zero at Tj max. */
export function deratedPtotWatts(ptot25Watts: number, tjMaxC: number, tempC: number): number {
  if (tempC <= PTOT_REFERENCE_C) return ptot25Watts;
  return Math.max(0, (ptot25Watts * (tjMaxC - tempC)) / (tjMaxC - PTOT_REFERENCE_C));
}

/** Junction temperature from the JESD51 definition Rth = (Tj − Ta) / P. */
export function junctionTempC(ambientC: number, powerWatts: number, rthCPerW: number): number {
  return ambientC + powerWatts * rthCPerW;
}

/** How the heat leaves: through Rth(j-c) and the heatsink, through Rth(j-a) in free air, or unknown. */
export type ThermalPathKind = "heatsink" | "free-air" | "none";

export interface ThermalJudgement extends Judgement {
  tjMaxC: number;
  tjLimitC: number;
  powerWatts: number;
  path: ThermalPathKind;
  /** Rth(j-c) (heatsink path) or Rth(j-a) (free air), quoted or derived from Ptot; NaN when the path is unknown. */
  rthDeviceCPerW: number;
  /** The whole junction-to-ambient resistance the path gives. */
  rthCPerW: number;
  /** NaN when the path is unknown. */
  tjC: number;
  /** Whether the Ptot rating governs too; the ptot fields are meaningful only then. */
  ptotApplies: boolean;
  ptotReferenceC: number;
  ptotAtTWatts: number;
  ptotAllowedWatts: number;
  ptotMargin: number;
  ptotVerdict: Verdict;
}

export function newThermalJudgement(): ThermalJudgement {
  return {
    verdict: "fits",
    margin: null,
    flags: 0,
    tjMaxC: 0,
    tjLimitC: 0,
    powerWatts: 0,
    path: "none",
    rthDeviceCPerW: Number.NaN,
    rthCPerW: Number.NaN,
    tjC: Number.NaN,
    ptotApplies: false,
    ptotReferenceC: 0,
    ptotAtTWatts: 0,
    ptotAllowedWatts: 0,
    ptotMargin: 0,
    ptotVerdict: "fits",
  };
}

/** Rth derived from a Ptot rated at this reference: (Tj max − 25 °C) / Ptot; null when Ptot is not rated so. */
function derivedRth(input: ThermalCheckInput, tjMaxC: number, reference: PtotReference): number | null {
  return input.ptotWatts != null && input.ptotWatts > 0 && input.ptotReference === reference ? (tjMaxC - PTOT_REFERENCE_C) / input.ptotWatts : null;
}

/** Chooses the path: Rth(j-c) + heatsink when both exist, else Rth(j-a); a missing Rth is derived from Ptot as (Tj max − 25 °C) / Ptot. */
function choosePath(input: ThermalCheckInput, tjMaxC: number, out: ThermalJudgement): void {
  if (input.heatsinkRthCPerW != null) {
    const rthJc = input.rthJcCPerW ?? derivedRth(input, tjMaxC, "case");
    if (rthJc != null) {
      out.path = "heatsink";
      out.rthDeviceCPerW = rthJc;
      out.rthCPerW = rthJc + input.heatsinkRthCPerW;
      return;
    }
  }
  const rthJa = input.rthJaCPerW ?? derivedRth(input, tjMaxC, "ambient");
  out.path = rthJa == null ? "none" : "free-air";
  out.rthDeviceCPerW = rthJa ?? Number.NaN;
  out.rthCPerW = rthJa ?? Number.NaN;
}

/** Tj against the derated Tj max and P against the derated Ptot; the worse of the two governs. */
export function judgeThermal(input: ThermalCheckInput, out: ThermalJudgement = newThermalJudgement()): ThermalJudgement {
  const tjMaxC = input.tjMaxC ?? DEFAULT_TJ_MAX_C;
  const powerWatts = dissipationWatts(input.mode, input.vceVolts, input.icAmps, input.dutyCycle);
  const tjLimitC = deratedTjMaxC(input.derating, tjMaxC);
  out.tjMaxC = tjMaxC;
  out.tjLimitC = tjLimitC;
  out.powerWatts = powerWatts;
  out.ptotApplies = false;
  out.flags = 0;
  choosePath(input, tjMaxC, out);
  if (out.path === "none") {
    out.tjC = Number.NaN;
    out.verdict = "marginal";
    out.margin = null;
    return out;
  }
  const tjC = junctionTempC(input.ambientC, powerWatts, out.rthCPerW);
  out.tjC = tjC;
  const budget = tjLimitC - input.ambientC;
  let margin = budget > 0 ? (tjLimitC - tjC) / budget : -1;
  let verdict: Verdict = tjC > tjMaxC ? "fails" : tjC > tjLimitC ? "marginal" : "fits";
  if (judgePtot(input, tjMaxC, powerWatts, out)) {
    margin = Math.min(margin, out.ptotMargin);
    verdict = worseVerdict(verdict, out.ptotVerdict);
  }
  out.margin = margin;
  out.verdict = verdict;
  if (verdict !== "fits") out.flags |= FLAG_BITS["hot-junction"];
  if (verdict === "marginal") out.flags |= FLAG_BITS["inside-derating"];
  return out;
}

/** Ptot derated to the ambient (ambient-rated parts) or to the case temperature on the heatsink (case-rated parts); false when it does not apply. */
function judgePtot(input: ThermalCheckInput, tjMaxC: number, powerWatts: number, out: ThermalJudgement): boolean {
  if (input.ptotWatts == null || input.ptotReference == null) return false;
  let referenceC: number;
  if (input.ptotReference === "ambient") referenceC = input.ambientC;
  else if (input.heatsinkRthCPerW != null) referenceC = input.ambientC + powerWatts * input.heatsinkRthCPerW;
  // A case rating says nothing without a heatsink; Rth(j-a) governs alone.
  else return false;
  const ptotAtT = deratedPtotWatts(input.ptotWatts, tjMaxC, referenceC);
  const allowed = ptotAtT * input.derating.powerFraction;
  out.ptotApplies = true;
  out.ptotReferenceC = referenceC;
  out.ptotAtTWatts = ptotAtT;
  out.ptotAllowedWatts = allowed;
  out.ptotMargin = allowed > 0 ? (allowed - powerWatts) / allowed : -1;
  out.ptotVerdict = powerWatts > ptotAtT ? "fails" : powerWatts > allowed ? "marginal" : "fits";
  return true;
}

export function explainThermal(input: ThermalCheckInput, judged: ThermalJudgement): CheckResult {
  const { tjMaxC, tjLimitC, powerWatts } = judged;
  const inputs: CheckInput[] = [
    { symbol: "P", label: input.mode === "switching" ? "dissipation VCE(sat) × IC × duty" : "dissipation VCE × IC", value: powerWatts, unit: "W" },
    {
      symbol: "VCE",
      label: `${input.mode === "switching" ? "VCE(sat)" : "VCE at the operating point"}${input.vceAssumed ? ", assumed (not quoted)" : ""}`,
      value: input.vceVolts,
      unit: "V",
    },
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    { symbol: "Ta", label: "ambient", value: input.ambientC, unit: "°C" },
    { symbol: "Tj(max)", label: input.tjMaxC == null ? "Tj max, assumed (not quoted)" : "Tj max", value: tjMaxC, unit: "°C" },
    { symbol: "Tj(limit)", label: `Tj allowed by ${input.derating.name}`, value: tjLimitC, unit: "°C" },
  ];
  if (input.mode === "switching") inputs.push({ symbol: "D", label: "duty cycle", value: input.dutyCycle, unit: "" });
  const base = { check: "thermal" as const, subject: input.subject ?? "part", verdict: judged.verdict, margin: judged.margin };
  if (judged.path === "none") {
    return {
      ...base,
      flags: [],
      formula: "Tj = Ta + P × Rth",
      inputs,
      summary: `Dissipation is ${formatValue(powerWatts, "W")}, but neither Rth nor Ptot is quoted, so the junction temperature is unknown.`,
    };
  }
  let pathFormula: string;
  let note = "";
  if (judged.path === "heatsink") {
    pathFormula = "Tj = Ta + P × (Rth(j-c) + Rth(heatsink))";
    inputs.push(
      { symbol: "Rth(j-c)", label: input.rthJcCPerW == null ? "junction to case, derived from Ptot" : "junction to case", value: judged.rthDeviceCPerW, unit: "°C/W" },
      { symbol: "Rth(hs)", label: "case to ambient through the heatsink", value: input.heatsinkRthCPerW ?? 0, unit: "°C/W" },
    );
  } else {
    pathFormula = "Tj = Ta + P × Rth(j-a)";
    inputs.push({ symbol: "Rth(j-a)", label: input.rthJaCPerW == null ? "junction to ambient, derived from Ptot" : "junction to ambient", value: judged.rthDeviceCPerW, unit: "°C/W" });
    if (input.heatsinkRthCPerW != null) note = " The heatsink is ignored: no Rth(j-c) is known, so the free-air Rth(j-a) is used.";
  }
  inputs.push({ symbol: "Tj", label: "junction temperature", value: judged.tjC, unit: "°C" });
  const sentences = [`P ${formatValue(powerWatts, "W")} heats the junction to ${formatValue(judged.tjC, "°C")} against ${formatValue(tjLimitC, "°C")} allowed (Tj max ${formatValue(tjMaxC, "°C")})`];
  if (judged.ptotApplies) {
    const where = input.ptotReference === "ambient" ? "ambient" : "case";
    inputs.push(
      { symbol: "Ptot", label: `Ptot at 25 °C ${where}`, value: input.ptotWatts ?? 0, unit: "W" },
      { symbol: "Ptot(T)", label: `Ptot derated to ${formatValue(judged.ptotReferenceC, "°C")} ${where}`, value: judged.ptotAtTWatts, unit: "W" },
      { symbol: "k(P)", label: "power derating fraction", value: input.derating.powerFraction, unit: "" },
    );
    sentences.push(
      `Ptot derates to ${formatValue(judged.ptotAtTWatts, "W")} at ${formatValue(judged.ptotReferenceC, "°C")} ${where}, ${formatValue(judged.ptotAllowedWatts, "W")} after derating`,
    );
  }
  const flags: FlagName[] = [];
  if (judged.flags & FLAG_BITS["hot-junction"]) flags.push("hot-junction");
  if (judged.flags & FLAG_BITS["inside-derating"]) flags.push("inside-derating");
  return {
    ...base,
    flags,
    formula: `${pathFormula}; P ≤ k(P) × Ptot(T), Ptot derated linearly from 25 °C to Tj max`,
    inputs,
    summary: `${sentences.join("; ")}.${note}`,
  };
}

export function checkThermal(input: ThermalCheckInput): CheckResult {
  return explainThermal(input, judgeThermal(input));
}
