// The single-device checks, each a pure function of explicit numbers, reused per device inside a pair.
// Each check is a numeric judgement (judgeX) and an explanation of it (explainX); checkX is both.
export { checkBandwidth, type BandwidthCheckInput, type BandwidthJudgement, DEFAULT_BANDWIDTH_FACTOR, explainBandwidth, judgeBandwidth } from "./bandwidth";
export { checkCurrent, type CurrentCheckInput, type CurrentJudgement, explainCurrent, judgeCurrent } from "./current";
export { checkDrive, type DriveCheckInput, type DriveCheckResult, type DriveJudgement, DEFAULT_OVERDRIVE_LIMIT, explainDrive, judgeDrive } from "./drive";
export { checkGain, explainGain, type GainAtCurrent, type GainCheckInput, type GainJudgement, judgeGain } from "./gain";
export { checkSaturation, explainSaturation, judgeSaturation, type SaturationCheckInput, type SaturationJudgement } from "./saturation";
export {
  checkThermal,
  DEFAULT_TJ_MAX_C,
  deratedPtotWatts,
  dissipationWatts,
  explainThermal,
  judgeThermal,
  junctionTempC,
  type ThermalCheckInput,
  type ThermalJudgement,
} from "./thermal";
export { checkVoltage, explainVoltage, judgeVoltage, type VoltageCheckInput, type VoltageJudgement } from "./voltage";
export {
  checkVoltageGain,
  explainVoltageGain,
  HIGH_GAIN_HFE,
  intrinsicParameters,
  judgeVoltageGain,
  LOW_EARLY_VOLTS,
  type VoltageGainCheckInput,
  type VoltageGainJudgement,
} from "./voltage-gain";
