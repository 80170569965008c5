// Judges a Darlington or Sziklai pair in numbers only: its currents solved, then the shared screening skeleton run on both devices.
import { mergeFlags } from "./check-result";
import { assessDataQuality, type DataQuality } from "./data-quality";
import {
  canPair,
  compoundPolarity,
  type CompoundTopology,
  compoundVbe,
  compoundVceSat,
  type PairCurrents,
  solvePairCurrents,
  worstGainModel,
} from "./compound-currents";
import { chooseVbe, findExclusions } from "./evaluate-part";
import { type GainReading, newGainReading, type PreparedGain, prepareGain, readWorstCaseGain, type SaturationEstimate, vceSatAt } from "./gain-curve";
import type { PartSpec } from "./part";
import type { RequirementSheet } from "./requirement";
import {
  type DeviceRatings,
  type EvaluateOptions,
  judgeScreening,
  newDeviceRatings,
  newScreening,
  planSheet,
  saturationDropVolts,
  type Screening,
  setDeviceRatings,
  type SheetPlan,
} from "./screening";

export interface CompoundOptions extends EvaluateOptions {
  /** Base-emitter bleed resistor across the output; null or absent when none is fitted. */
  bleedOhms?: number | null;
}

export type PairRole = "driver" | "output";

/** The pair's gain at one of the circuit's currents: the solved currents, each device's reading there, and the pair's. */
export interface PairGainAt {
  icAmps: number;
  currents: PairCurrents;
  driver: GainReading;
  output: GainReading;
  /** The pair's own reading, which the gain check judges. */
  estimate: GainReading;
}

/** One device of a pair: where it runs, and its own rating judgements. */
export interface DeviceScreen<P extends PartSpec = PartSpec> {
  role: PairRole;
  part: P;
  icAmps: number;
  peakIcAmps: number;
  gain: GainReading;
  vbe: { volts: number; assumed: boolean };
  vceVolts: number;
  ratings: DeviceRatings;
}

/** Every judgement of a pair with the inputs each read: numbers only, for the search to score pairs without explaining them. */
export interface CompoundScreen<P extends PartSpec = PartSpec> extends Screening {
  topology: CompoundTopology;
  plan: SheetPlan;
  gains: PairGainAt[];
  /** The lower data-quality score of the two devices. */
  dataQualityScore: number;
  bleedOhms: number | null;
  operating: PairCurrents;
  /** The pair's currents at the operating IC without the bleed resistor, solved when the explanation asks. */
  solveWithoutBleed: () => PairCurrents;
  pairVbeVolts: number;
  pairSat: SaturationEstimate | null;
  driver: DeviceScreen<P>;
  output: DeviceScreen<P>;
  quality: [DataQuality, DataQuality];
}

/** The pair's gain as one reading, so the single-device gain judgement can judge it. */
function pairGainReading(currents: PairCurrents, driverGain: GainReading, outputGain: GainReading): GainReading {
  const anyNone = !currents.feasible || driverGain.source === "none" || outputGain.source === "none";
  const source = anyNone ? "none" : driverGain.source !== "min" ? driverGain.source : outputGain.source;
  return {
    hfe: currents.feasible ? currents.pairHfe : 0,
    source,
    typToMinFactor: driverGain.typToMinFactor ?? outputGain.typToMinFactor,
    flags: mergeFlags([...driverGain.flags], [...outputGain.flags]),
    decadesOffPoint: Math.max(driverGain.decadesOffPoint, outputGain.decadesOffPoint),
  };
}

/** Why a pair lies outside the sheet: the pair's polarity, and each device's package. */
export function findCompoundExclusions(driver: PartSpec, output: PartSpec, sheet: RequirementSheet): string[] {
  const reasons: string[] = [];
  const polarity = compoundPolarity(driver);
  if (sheet.polarity !== "any" && polarity !== sheet.polarity) {
    reasons.push(`the pair acts as ${polarity.toUpperCase()}, the sheet asks for ${sheet.polarity.toUpperCase()}`);
  }
  const anyPolarity: RequirementSheet = { ...sheet, polarity: "any" };
  for (const [role, part] of [["driver", driver], ["output", output]] as const) {
    for (const reason of findExclusions(part, anyPolarity)) reasons.push(`${role}: ${reason}`);
  }
  return reasons;
}

/**
 * Judges a Darlington or Sziklai pair against the sheet. Each device runs at its own current
 * (solved by solvePairCurrents) and gets its own voltage, current and thermal judgements; the pair's
 * gain, drive, saturation and bandwidth are judged on the pair's own numbers. No explanation is built.
 */
export function screenCompound<P extends PartSpec>(
  topology: CompoundTopology,
  driver: P,
  output: P,
  sheet: RequirementSheet,
  options: CompoundOptions = {},
  /** The devices' data-quality findings when the caller already has them (the search does). */
  qualities?: [DataQuality, DataQuality],
): CompoundScreen<P> {
  if (!canPair(topology, driver, output)) {
    throw new RangeError(`a ${topology} pair needs ${topology === "darlington" ? "one polarity" : "opposite polarities"}`);
  }
  const plan = planSheet(sheet, options);
  const { icAmps, peakIcAmps, switching } = plan;
  const bleedOhms = options.bleedOhms ?? null;
  const driverGains = prepareGain(driver.gainPoints);
  const outputGains = prepareGain(output.gainPoints);
  const readGain = (gains: PreparedGain, current: number) => readWorstCaseGain(gains, current, plan.typToMinFactor, plan.windowDecades, newGainReading());
  // The output is never saturated in either pair, so its VBE is VBE(on) even when switching.
  const outputVbe = chooseVbe(output, icAmps, "linear");
  const driverHfeAt = worstGainModel(driver, options);
  const outputHfeAt = worstGainModel(output, options);
  const solve = (current: number, ohms: number | null) =>
    solvePairCurrents({ topology, pairIcAmps: current, bleedOhms: ohms, outputVbeVolts: outputVbe.volts, driverHfeAt, outputHfeAt });

  const operating = solve(icAmps, bleedOhms);
  const peak = peakIcAmps === icAmps ? operating : solve(peakIcAmps, bleedOhms);
  const gains: PairGainAt[] = plan.gainCurrents.map((current) => {
    const currents = current === icAmps ? operating : current === peakIcAmps ? peak : solve(current, bleedOhms);
    const driverAt = readGain(driverGains, currents.driverIcAmps);
    const outputAt = readGain(outputGains, currents.outputIcAmps);
    return { icAmps: current, currents, driver: driverAt, output: outputAt, estimate: pairGainReading(currents, driverAt, outputAt) };
  });
  const driverVbe = chooseVbe(driver, operating.driverIcAmps, sheet.mode);
  const pairVbeVolts = compoundVbe(topology, driverVbe.volts, outputVbe.volts);
  const driverSat = switching && operating.feasible ? vceSatAt(driver.saturationPoints, operating.driverIcAmps) : null;
  const pairSat = driverSat === null ? null : { ...driverSat, volts: compoundVceSat(driverSat.volts, outputVbe.volts) };

  const satVolts = saturationDropVolts(driverSat, sheet);
  const feasibleOr = (value: number, fallback: number) => (Number.isFinite(value) ? value : fallback);
  const deviceOf = (role: PairRole, part: P, gain: GainReading, vbe: { volts: number; assumed: boolean }, ownIc: number, ownPeakIc: number, vceVolts: number): DeviceScreen<P> => {
    // When the pair is off VBE2 collapses, so the driver too stands the full VCE; only the driver's base sees the reverse VBE.
    const ratings = setDeviceRatings(newDeviceRatings(plan, role, role === "driver" ? sheet.reverseVbeVolts : null), part, ownIc, ownPeakIc, vceVolts, false);
    return { role, part, icAmps: ownIc, peakIcAmps: ownPeakIc, gain, vbe, vceVolts, ratings };
  };
  const operatingGains = gains[plan.operatingIndex];
  // Linear, the driver stands one VBE2 less than the pair; saturated, the output stands one VBE2 above the driver's VCE(sat).
  const driverVce = switching ? satVolts : Math.max(0, plan.operatingVceVolts - outputVbe.volts);
  const outputVce = switching ? compoundVceSat(satVolts, outputVbe.volts) : plan.operatingVceVolts;
  const driverDevice = deviceOf("driver", driver, operatingGains.driver, driverVbe, feasibleOr(operating.driverIcAmps, 0), feasibleOr(peak.driverIcAmps, 0), driverVce);
  const outputDevice = deviceOf("output", output, operatingGains.output, outputVbe, feasibleOr(operating.outputIcAmps, icAmps), feasibleOr(peak.outputIcAmps, peakIcAmps), outputVce);

  const screening = newScreening(plan, "pair", [driverDevice.ratings, outputDevice.ratings], false);
  screening.gains = gains;
  screening.gainInput.gains = gains;
  const driveInput = screening.driveInput;
  if (driveInput !== null) {
    // Switching saturates the driver at the sheet's forced gain; the output takes what the driver's emitter gives.
    driveInput.forcedGain = operating.feasible ? (icAmps * sheet.forcedGain) / operating.driverIcAmps : sheet.forcedGain;
    driveInput.worstHfe = operating.feasible ? operating.pairHfe : 0;
    driveInput.vbeVolts = pairVbeVolts;
    driveInput.vbeAssumed = driverVbe.assumed || outputVbe.assumed;
  }
  screening.drivenIcAmps = operating.driverIcAmps;
  screening.saturationInput.worstHfe = operating.driverHfe;
  screening.saturationInput.saturation = pairSat;
  // The pair is no faster than its slower device.
  screening.bandwidthInput.ftHz = driver.ftHz === null || output.ftHz === null ? null : Math.min(driver.ftHz, output.ftHz);

  const quality: [DataQuality, DataQuality] = qualities ?? [assessDataQuality(driver, options), assessDataQuality(output, options)];
  judgeScreening(screening, plan, quality[0].flags.includes("stale-datasheet") || quality[1].flags.includes("stale-datasheet"));
  return {
    ...screening,
    topology,
    plan,
    gains,
    dataQualityScore: Math.min(quality[0].score, quality[1].score),
    bleedOhms,
    operating,
    solveWithoutBleed: () => (bleedOhms === null ? operating : solve(icAmps, null)),
    pairVbeVolts,
    pairSat,
    driver: driverDevice,
    output: outputDevice,
    quality,
  };
}
