// The single-device checks, each a pure function of explicit numbers, reused per device inside a pair.
export { checkBandwidth, type BandwidthCheckInput, DEFAULT_BANDWIDTH_FACTOR } from "./bandwidth";
export { checkCurrent, type CurrentCheckInput } from "./current";
export { checkDrive, type DriveCheckInput, type DriveCheckResult, DEFAULT_OVERDRIVE_LIMIT } from "./drive";
export { checkGain, type GainAtCurrent, type GainCheckInput } from "./gain";
export { checkSaturation, type SaturationCheckInput } from "./saturation";
export {
  checkThermal,
  DEFAULT_TJ_MAX_C,
  deratedPtotWatts,
  dissipationWatts,
  junctionTempC,
  type ThermalCheckInput,
} from "./thermal";
export { checkVoltage, type VoltageCheckInput } from "./voltage";
export { checkVoltageGain, HIGH_GAIN_HFE, intrinsicParameters, LOW_EARLY_VOLTS, type VoltageGainCheckInput } from "./voltage-gain";
