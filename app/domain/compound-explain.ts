// Explains a screened pair for the pages: every check's formula, inputs and sentence, each device's own numbers, the pair's figures.
import { type CheckResult, type FlagName, mergeFlags, type Verdict } from "./check-result";
import { explainBandwidth } from "./checks/bandwidth";
import { explainDrive } from "./checks/drive";
import { formatValue } from "./checks/format";
import { explainGain, type GainAtCurrent } from "./checks/gain";
import { explainSaturation } from "./checks/saturation";
import { compoundPolarity, type CompoundTopology, type PairCurrents } from "./compound-currents";
import {
  type CompoundOptions,
  type CompoundScreen,
  type DeviceScreen,
  findCompoundExclusions,
  type PairGainAt,
  type PairRole,
  screenCompound,
} from "./compound-screen";
import { explainGainReading, type GainEstimate } from "./gain-curve";
import type { PartSpec, Polarity } from "./part";
import type { RequirementSheet } from "./requirement";
import { explainDeviceRatings } from "./screening";

export interface DeviceInPair<P extends PartSpec = PartSpec> {
  role: PairRole;
  part: P;
  /** The device's own collector current at the pair's operating and peak IC. */
  icAmps: number;
  peakIcAmps: number;
  /** Worst-case hFE at its own operating current, with its flags. */
  gain: GainEstimate;
  vbeVolts: number;
  vbeAssumed: boolean;
  /** The VCE its dissipation uses: the driver's is one VBE2 below the pair's. */
  vceVolts: number;
  dissipationWatts: number;
  junctionC: number | null;
  checks: CheckResult[];
}

/** A derived number of the pair, with the formula that gave it. */
export interface CompoundFigure {
  symbol: string;
  label: string;
  value: number;
  unit: string;
  formula: string;
}

export interface CompoundEvaluation<P extends PartSpec = PartSpec> {
  topology: CompoundTopology;
  polarity: Polarity;
  verdict: Verdict;
  /** Every check: the devices' own (voltage, current, thermal) and the pair's (gain, drive, saturation, bandwidth). */
  checks: CheckResult[];
  flags: FlagName[];
  devices: { driver: DeviceInPair<P>; output: DeviceInPair<P> };
  /** Worst-case effective β of the pair at the operating IC, bleed included. */
  hfeAtOperatingPoint: number;
  hfeWithoutBleed: number;
  vbeVolts: number;
  vceSatVolts: number | null;
  /** The pair's ratings: the lower VCEO of the two, the output's IC max. */
  vceoVolts: number;
  icMaxAmps: number;
  bleedOhms: number | null;
  bleedAmps: number;
  bleedShare: number;
  currents: PairCurrents;
  figures: CompoundFigure[];
  /** Why the pair lies outside the sheet's polarity or packages; empty when eligible. */
  excludedBy: string[];
  dataQuality: { score: number; flags: string[] };
}

const TOPOLOGY_BETA_FORMULA: Record<CompoundTopology, string> = {
  darlington: "β = β1 β2 + β1 + β2 without bleed; with bleed β = IC / IB, IE1 = IC2 / β2 + VBE2 / Rbleed",
  sziklai: "β = β1 (β2 + 1) without bleed; with bleed β = IC / IB, IC1 = IB2 + VBE2 / Rbleed",
};

/** The pair's gain reading with its note, naming each device's own current and gain. */
function explainPairGain(at: PairGainAt): GainEstimate {
  const driverGain = explainGainReading(at.driver);
  const outputGain = explainGainReading(at.output);
  return {
    ...at.estimate,
    flags: [...at.estimate.flags],
    note:
      `pair β from β1 ${formatValue(at.currents.driverHfe, "")} at IC1 ${formatValue(at.currents.driverIcAmps, "A")} (${driverGain.note}) ` +
      `and β2 ${formatValue(at.currents.outputHfe, "")} at IC2 ${formatValue(at.currents.outputIcAmps, "A")} (${outputGain.note})`,
  };
}

/** One device of a pair explained: where it runs and its own rating checks. */
function explainDevice<P extends PartSpec>(device: DeviceScreen<P>): DeviceInPair<P> {
  const thermal = device.ratings.thermal;
  return {
    role: device.role,
    part: device.part,
    icAmps: device.icAmps,
    peakIcAmps: device.peakIcAmps,
    gain: explainGainReading(device.gain),
    vbeVolts: device.vbe.volts,
    vbeAssumed: device.vbe.assumed,
    vceVolts: device.vceVolts,
    dissipationWatts: thermal.powerWatts,
    junctionC: thermal.path === "none" ? null : thermal.tjC,
    checks: explainDeviceRatings(device.ratings),
  };
}

/** The explanations of a screened pair: every check's formula, inputs and summary, and the pair's figures. */
export function explainCompound<P extends PartSpec>(screen: CompoundScreen<P>): CompoundEvaluation<P> {
  const { topology, plan, operating, pairVbeVolts, bleedOhms, pairSat } = screen;
  const { sheet, switching } = plan;
  const withoutBleed = screen.solveWithoutBleed();
  const driver = screen.driver.part;
  const output = screen.output.part;
  const gains: GainAtCurrent[] = screen.gains.map((g) => ({ icAmps: g.icAmps, estimate: explainPairGain(g) }));
  const pairChecks: CheckResult[] = [
    { ...explainGain({ requiredHfe: plan.requiredHfe, gains }, screen.gain), subject: "pair" },
  ];
  if (screen.driveInput !== null) pairChecks.push(explainDrive(screen.driveInput, screen.drive));
  if (switching) pairChecks.push(explainSaturation(screen.saturationInput, screen.saturation));
  if (plan.checksVoltageGain) {
    pairChecks.push({
      check: "voltage-gain",
      subject: "pair",
      verdict: "marginal",
      margin: null,
      flags: [],
      formula: "not modelled for compound pairs",
      inputs: [{ symbol: "Av(req)", label: "voltage gain the circuit needs", value: sheet.requiredVoltageGain ?? 0, unit: "" }],
      summary: "The voltage gain of a compound pair is not modelled here; confirm it on the circuit.",
    });
  }
  if (plan.checksBandwidth) pairChecks.push(explainBandwidth(screen.bandwidthInput, screen.bandwidth));
  const driverDevice = explainDevice(screen.driver);
  const outputDevice = explainDevice(screen.output);

  const checks = [...pairChecks, ...driverDevice.checks, ...outputDevice.checks];
  const quality = screen.quality;
  const qualityFlags = [...new Set(quality.flatMap((q) => q.flags))];
  const staleFlags: FlagName[] = qualityFlags.includes("stale-datasheet") ? ["stale-datasheet"] : [];
  const vceoVolts = Math.min(driver.vceoVolts, output.vceoVolts);
  const figures: CompoundFigure[] = [
    { symbol: "β", label: "pair current gain, worst case, bleed included", value: operating.pairHfe, unit: "", formula: TOPOLOGY_BETA_FORMULA[topology] },
    { symbol: "β(no bleed)", label: "pair current gain without the bleed resistor", value: withoutBleed.pairHfe, unit: "", formula: topology === "darlington" ? "β1 β2 + β1 + β2" : "β1 (β2 + 1)" },
    { symbol: "β1", label: "driver hFE at its own current", value: operating.driverHfe, unit: "", formula: "worst-case hFE at IC1" },
    { symbol: "IC1", label: "driver collector current", value: operating.driverIcAmps, unit: "A", formula: topology === "darlington" ? "IC1 = α1 (IC2 / β2 + Ibleed)" : "IC1 = IB2 + Ibleed" },
    { symbol: "β2", label: "output hFE at its own current", value: operating.outputHfe, unit: "", formula: "worst-case hFE at IC2" },
    { symbol: "IC2", label: "output collector current", value: operating.outputIcAmps, unit: "A", formula: topology === "darlington" ? "IC2 = IC − IC1" : "IC2 = β2 (IC − Ibleed) / (β2 + 1)" },
    { symbol: "VBE", label: "pair base-emitter voltage", value: pairVbeVolts, unit: "V", formula: topology === "darlington" ? "VBE = VBE1 + VBE2" : "VBE = VBE1" },
    { symbol: "VCEO", label: "pair VCEO, the lower of the two", value: vceoVolts, unit: "V", formula: "min(VCEO1, VCEO2)" },
    { symbol: "IC(max)", label: "pair IC max, the output's", value: output.icMaxAmps, unit: "A", formula: "IC max of the output" },
    { symbol: "P1", label: "driver dissipation", value: driverDevice.dissipationWatts, unit: "W", formula: switching ? "P1 = VCE(sat)1 × IC1 × D" : "P1 = (VCE − VBE2) × IC1" },
    { symbol: "P2", label: "output dissipation", value: outputDevice.dissipationWatts, unit: "W", formula: switching ? "P2 = (VCE(sat)1 + VBE2) × IC2 × D" : "P2 = VCE × IC2" },
  ];
  if (pairSat !== null) figures.push({ symbol: "VCE(sat)", label: "pair saturation voltage", value: pairSat.volts, unit: "V", formula: "VCE(sat) = VCE(sat)1 + VBE2" });
  if (bleedOhms !== null) {
    figures.push(
      { symbol: "Rbleed", label: "bleed resistor across the output's base and emitter", value: bleedOhms, unit: "Ω", formula: "chosen" },
      { symbol: "Ibleed", label: "bleed current", value: operating.bleedAmps, unit: "A", formula: "Ibleed = VBE2 / Rbleed" },
      { symbol: "s", label: "share of the driver's current the bleed takes", value: operating.bleedShare, unit: "", formula: topology === "darlington" ? "s = Ibleed / IE1" : "s = Ibleed / IC1" },
    );
  }
  return {
    topology,
    polarity: compoundPolarity(driver),
    verdict: screen.verdict,
    checks,
    flags: mergeFlags(...checks.map((check) => check.flags), staleFlags),
    devices: { driver: driverDevice, output: outputDevice },
    hfeAtOperatingPoint: operating.feasible ? operating.pairHfe : 0,
    hfeWithoutBleed: withoutBleed.feasible ? withoutBleed.pairHfe : 0,
    vbeVolts: pairVbeVolts,
    vceSatVolts: pairSat?.volts ?? null,
    vceoVolts,
    icMaxAmps: output.icMaxAmps,
    bleedOhms,
    bleedAmps: operating.bleedAmps,
    bleedShare: operating.bleedShare,
    currents: operating,
    figures,
    excludedBy: findCompoundExclusions(driver, output, sheet),
    dataQuality: { score: Math.min(quality[0].score, quality[1].score), flags: qualityFlags },
  };
}

/**
 * Evaluates a Darlington or Sziklai pair against the sheet: screenCompound's judgements with
 * every check explained.
 */
export function evaluateCompound<P extends PartSpec>(
  topology: CompoundTopology,
  driver: P,
  output: P,
  sheet: RequirementSheet,
  options: CompoundOptions = {},
): CompoundEvaluation<P> {
  return explainCompound(screenCompound(topology, driver, output, sheet, options));
}
