// Voltage gain check: output resistance from the Early voltage and the common-emitter gain into the load.
import { type CheckInput, type CheckResult, FLAG_BITS, flagsOfMask, type Judgement } from "../check-result";
import { thermalVoltage } from "../constants";
import { formatValue } from "./format";

/** Below this Early voltage a high-gain part is flagged (common practice: high-beta processes trade away VA). */
export const LOW_EARLY_VOLTS = 50;
/** hFE from which a part counts as high-gain for the Early voltage flag (common practice). */
export const HIGH_GAIN_HFE = 200;

export interface VoltageGainCheckInput {
  subject?: string;
  icAmps: number;
  vceVolts: number;
  /** Early voltage VA; null when not quoted. */
  earlyVolts: number | null;
  /** Collector load RC. */
  loadOhms: number;
  requiredVoltageGain: number;
  /** Temperature for VT = kT/q (the ambient, the junction runs little warmer at small signal). */
  tempC: number;
  /** Worst-case hFE, for the low-early-voltage flag; null when unknown. */
  hfe: number | null;
}

/** ro = (VA + VCE) / IC; gm = IC / VT; |Av| = gm × (RC ∥ ro); intrinsic gain gm × ro. */
export function intrinsicParameters(icAmps: number, vceVolts: number, earlyVolts: number, tempC: number) {
  const vtVolts = thermalVoltage(tempC);
  const gmSiemens = icAmps / vtVolts;
  const roOhms = (earlyVolts + vceVolts) / icAmps;
  return { vtVolts, gmSiemens, roOhms, intrinsicGain: gmSiemens * roOhms };
}

export interface VoltageGainJudgement extends Judgement {
  vtVolts: number;
  gmSiemens: number;
  /** gm × (RC ∥ ro), or the upper bound gm × RC when VA is unknown. */
  gain: number;
  /** NaN when VA is unknown. */
  roOhms: number;
}

export function newVoltageGainJudgement(): VoltageGainJudgement {
  return { verdict: "fits", margin: null, flags: 0, vtVolts: 0, gmSiemens: 0, gain: 0, roOhms: Number.NaN };
}

/** Common-emitter gain against the gain required; an unknown Early voltage gives an upper bound only (marginal). */
export function judgeVoltageGain(input: VoltageGainCheckInput, out: VoltageGainJudgement = newVoltageGainJudgement()): VoltageGainJudgement {
  const vtVolts = thermalVoltage(input.tempC);
  const gmSiemens = input.icAmps / vtVolts;
  out.vtVolts = vtVolts;
  out.gmSiemens = gmSiemens;
  if (input.earlyVolts == null) {
    out.flags = FLAG_BITS["early-unknown"];
    out.roOhms = Number.NaN;
    out.gain = gmSiemens * input.loadOhms;
  } else {
    const roOhms = (input.earlyVolts + input.vceVolts) / input.icAmps;
    out.roOhms = roOhms;
    out.gain = gmSiemens * ((input.loadOhms * roOhms) / (input.loadOhms + roOhms));
    const highGain = input.hfe != null && input.hfe >= HIGH_GAIN_HFE;
    // ro costing more than a tenth of the gain is a visible loss whatever the part's hFE (common practice).
    out.flags = (highGain && input.earlyVolts < LOW_EARLY_VOLTS) || roOhms < 10 * input.loadOhms ? FLAG_BITS["low-early-voltage"] : 0;
  }
  out.margin = (out.gain - input.requiredVoltageGain) / out.gain;
  out.verdict = out.gain < input.requiredVoltageGain ? "fails" : input.earlyVolts == null ? "marginal" : "fits";
  return out;
}

export function explainVoltageGain(input: VoltageGainCheckInput, judged: VoltageGainJudgement): CheckResult {
  const { vtVolts, gmSiemens, gain, roOhms } = judged;
  const inputs: CheckInput[] = [
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    { symbol: "VT", label: "thermal voltage kT/q", value: vtVolts, unit: "V" },
    { symbol: "gm", label: "transconductance IC / VT", value: gmSiemens, unit: "S" },
    { symbol: "RC", label: "collector load", value: input.loadOhms, unit: "Ω" },
    { symbol: "Av(req)", label: "voltage gain required", value: input.requiredVoltageGain, unit: "" },
  ];
  let sentence: string;
  if (input.earlyVolts == null) {
    sentence = `No Early voltage is quoted; without ro the gain can reach at most gm × RC = ${formatValue(gain, "")}`;
  } else {
    inputs.push(
      { symbol: "VA", label: "Early voltage", value: input.earlyVolts, unit: "V" },
      { symbol: "VCE", label: "VCE at the operating point", value: input.vceVolts, unit: "V" },
      { symbol: "ro", label: "output resistance (VA + VCE) / IC", value: roOhms, unit: "Ω" },
      { symbol: "gm·ro", label: "intrinsic gain", value: gmSiemens * roOhms, unit: "" },
    );
    sentence = `gm × (RC ∥ ro) = ${formatValue(gain, "")} with ro = ${formatValue(roOhms, "Ω")}`;
  }
  inputs.push({ symbol: "Av", label: "common-emitter voltage gain", value: gain, unit: "" });
  return {
    check: "voltage-gain",
    subject: input.subject ?? "part",
    verdict: judged.verdict,
    margin: judged.margin,
    flags: flagsOfMask(judged.flags),
    formula: "Av = gm × (RC ∥ ro), gm = IC / VT, ro = (VA + VCE) / IC, VT = kT/q",
    inputs,
    summary: `${sentence}, against ${formatValue(input.requiredVoltageGain, "")} required.`,
  };
}

export function checkVoltageGain(input: VoltageGainCheckInput): CheckResult {
  return explainVoltageGain(input, judgeVoltageGain(input));
}
