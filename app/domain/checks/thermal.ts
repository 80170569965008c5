// Thermal check: dissipation, junction temperature through the thermal path, and Ptot derated with temperature.
import { type CheckInput, type CheckResult, type FlagName, type Verdict, worstVerdict } from "../check-result";
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

interface ThermalPath {
  rthCPerW: number;
  formula: string;
  inputs: CheckInput[];
  note: string;
}

/** Chooses the path: Rth(j-c) + heatsink when both exist, else Rth(j-a); a missing Rth is derived from Ptot as (Tj max − 25 °C) / Ptot. */
function choosePath(input: ThermalCheckInput, tjMaxC: number): ThermalPath | null {
  const derive = (reference: PtotReference) =>
    input.ptotWatts != null && input.ptotWatts > 0 && input.ptotReference === reference ? (tjMaxC - PTOT_REFERENCE_C) / input.ptotWatts : null;
  if (input.heatsinkRthCPerW != null) {
    const rthJc = input.rthJcCPerW ?? derive("case");
    if (rthJc != null) {
      return {
        rthCPerW: rthJc + input.heatsinkRthCPerW,
        formula: "Tj = Ta + P × (Rth(j-c) + Rth(heatsink))",
        inputs: [
          { symbol: "Rth(j-c)", label: input.rthJcCPerW == null ? "junction to case, derived from Ptot" : "junction to case", value: rthJc, unit: "°C/W" },
          { symbol: "Rth(hs)", label: "case to ambient through the heatsink", value: input.heatsinkRthCPerW, unit: "°C/W" },
        ],
        note: "",
      };
    }
  }
  const rthJa = input.rthJaCPerW ?? derive("ambient");
  if (rthJa == null) return null;
  return {
    rthCPerW: rthJa,
    formula: "Tj = Ta + P × Rth(j-a)",
    inputs: [{ symbol: "Rth(j-a)", label: input.rthJaCPerW == null ? "junction to ambient, derived from Ptot" : "junction to ambient", value: rthJa, unit: "°C/W" }],
    note: input.heatsinkRthCPerW != null ? " The heatsink is ignored: no Rth(j-c) is known, so the free-air Rth(j-a) is used." : "",
  };
}

/** Tj against the derated Tj max and P against the derated Ptot; the worse of the two governs. */
export function checkThermal(input: ThermalCheckInput): CheckResult {
  const tjMaxC = input.tjMaxC ?? DEFAULT_TJ_MAX_C;
  const powerWatts = dissipationWatts(input.mode, input.vceVolts, input.icAmps, input.dutyCycle);
  const tjLimitC = deratedTjMaxC(input.derating, tjMaxC);
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
  const path = choosePath(input, tjMaxC);
  if (path == null) {
    return {
      check: "thermal",
      subject: input.subject ?? "part",
      verdict: "marginal",
      margin: null,
      flags: [],
      formula: "Tj = Ta + P × Rth",
      inputs,
      summary: `Dissipation is ${formatValue(powerWatts, "W")}, but neither Rth nor Ptot is quoted, so the junction temperature is unknown.`,
    };
  }
  inputs.push(...path.inputs);
  const tjC = junctionTempC(input.ambientC, powerWatts, path.rthCPerW);
  inputs.push({ symbol: "Tj", label: "junction temperature", value: tjC, unit: "°C" });
  const budget = tjLimitC - input.ambientC;
  let margin = budget > 0 ? (tjLimitC - tjC) / budget : -1;
  let verdict: Verdict = tjC > tjMaxC ? "fails" : tjC > tjLimitC ? "marginal" : "fits";
  const sentences = [`P ${formatValue(powerWatts, "W")} heats the junction to ${formatValue(tjC, "°C")} against ${formatValue(tjLimitC, "°C")} allowed (Tj max ${formatValue(tjMaxC, "°C")})`];
  const ptot = ptotCheck(input, tjMaxC, powerWatts);
  if (ptot) {
    inputs.push(...ptot.inputs);
    margin = Math.min(margin, ptot.margin);
    verdict = worstVerdict([verdict, ptot.verdict]);
    sentences.push(ptot.sentence);
  }
  const flags: FlagName[] = [];
  if (verdict !== "fits") flags.push("hot-junction");
  if (verdict === "marginal") flags.push("inside-derating");
  return {
    check: "thermal",
    subject: input.subject ?? "part",
    verdict,
    margin,
    flags,
    formula: `${path.formula}; P ≤ k(P) × Ptot(T), Ptot derated linearly from 25 °C to Tj max`,
    inputs,
    summary: `${sentences.join("; ")}.${path.note}`,
  };
}

/** Ptot derated to the ambient (ambient-rated parts) or to the case temperature on the heatsink (case-rated parts). */
function ptotCheck(input: ThermalCheckInput, tjMaxC: number, powerWatts: number) {
  if (input.ptotWatts == null || input.ptotReference == null) return null;
  let referenceC: number;
  if (input.ptotReference === "ambient") referenceC = input.ambientC;
  else if (input.heatsinkRthCPerW != null) referenceC = input.ambientC + powerWatts * input.heatsinkRthCPerW;
  // A case rating says nothing without a heatsink; Rth(j-a) governs alone.
  else return null;
  const ptotAtT = deratedPtotWatts(input.ptotWatts, tjMaxC, referenceC);
  const allowed = ptotAtT * input.derating.powerFraction;
  const margin = allowed > 0 ? (allowed - powerWatts) / allowed : -1;
  const verdict: Verdict = powerWatts > ptotAtT ? "fails" : powerWatts > allowed ? "marginal" : "fits";
  const where = input.ptotReference === "ambient" ? "ambient" : "case";
  return {
    margin,
    verdict,
    inputs: [
      { symbol: "Ptot", label: `Ptot at 25 °C ${where}`, value: input.ptotWatts, unit: "W" },
      { symbol: "Ptot(T)", label: `Ptot derated to ${formatValue(referenceC, "°C")} ${where}`, value: ptotAtT, unit: "W" },
      { symbol: "k(P)", label: "power derating fraction", value: input.derating.powerFraction, unit: "" },
    ] satisfies CheckInput[],
    sentence: `Ptot derates to ${formatValue(ptotAtT, "W")} at ${formatValue(referenceC, "°C")} ${where}, ${formatValue(allowed, "W")} after derating`,
  };
}
