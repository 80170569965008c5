// Voltage gain check: output resistance from the Early voltage and the common-emitter gain into the load.
import type { CheckInput, CheckResult, FlagName, Verdict } from "../check-result";
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

/** Common-emitter gain against the gain required; an unknown Early voltage gives an upper bound only (marginal). */
export function checkVoltageGain(input: VoltageGainCheckInput): CheckResult {
  const vtVolts = thermalVoltage(input.tempC);
  const gmSiemens = input.icAmps / vtVolts;
  const inputs: CheckInput[] = [
    { symbol: "IC", label: "collector current", value: input.icAmps, unit: "A" },
    { symbol: "VT", label: "thermal voltage kT/q", value: vtVolts, unit: "V" },
    { symbol: "gm", label: "transconductance IC / VT", value: gmSiemens, unit: "S" },
    { symbol: "RC", label: "collector load", value: input.loadOhms, unit: "Ω" },
    { symbol: "Av(req)", label: "voltage gain required", value: input.requiredVoltageGain, unit: "" },
  ];
  const flags: FlagName[] = [];
  let gain: number;
  let sentence: string;
  if (input.earlyVolts == null) {
    flags.push("early-unknown");
    gain = gmSiemens * input.loadOhms;
    sentence = `No Early voltage is quoted; without ro the gain can reach at most gm × RC = ${formatValue(gain, "")}`;
  } else {
    const roOhms = (input.earlyVolts + input.vceVolts) / input.icAmps;
    const parallel = (input.loadOhms * roOhms) / (input.loadOhms + roOhms);
    gain = gmSiemens * parallel;
    inputs.push(
      { symbol: "VA", label: "Early voltage", value: input.earlyVolts, unit: "V" },
      { symbol: "VCE", label: "VCE at the operating point", value: input.vceVolts, unit: "V" },
      { symbol: "ro", label: "output resistance (VA + VCE) / IC", value: roOhms, unit: "Ω" },
      { symbol: "gm·ro", label: "intrinsic gain", value: gmSiemens * roOhms, unit: "" },
    );
    const highGain = input.hfe != null && input.hfe >= HIGH_GAIN_HFE;
    // ro costing more than a tenth of the gain is a visible loss whatever the part's hFE (common practice).
    if ((highGain && input.earlyVolts < LOW_EARLY_VOLTS) || roOhms < 10 * input.loadOhms) flags.push("low-early-voltage");
    sentence = `gm × (RC ∥ ro) = ${formatValue(gain, "")} with ro = ${formatValue(roOhms, "Ω")}`;
  }
  inputs.push({ symbol: "Av", label: "common-emitter voltage gain", value: gain, unit: "" });
  const margin = (gain - input.requiredVoltageGain) / gain;
  const verdict: Verdict = gain < input.requiredVoltageGain ? "fails" : input.earlyVolts == null ? "marginal" : "fits";
  return {
    check: "voltage-gain",
    subject: input.subject ?? "part",
    verdict,
    margin,
    flags,
    formula: "Av = gm × (RC ∥ ro), gm = IC / VT, ro = (VA + VCE) / IC, VT = kT/q",
    inputs,
    summary: `${sentence}, against ${formatValue(input.requiredVoltageGain, "")} required.`,
  };
}
