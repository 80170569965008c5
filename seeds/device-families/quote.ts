// Turns a family's simulated readings into the figures its datasheets print, by one set of rules:
//
// - hFE typ at each quoted current: the simulated typical device (a gain group's: its centre device), two significant
//   digits.
// - hFE min and max: at the main current, the gain group's boundaries; for an ungrouped part, the simulated typical
//   times the family's production spread (min = typ × low, max = typ × high). At every other current the same
//   min/typ and max/typ ratios as at the main current are applied to that current's simulated typical. Minimums are
//   rounded down and maximums up, to two significant digits, so the printed range holds the simulated device.
// - VCE(sat) typ: simulated at IC with IB = IC / forced gain, two significant digits; VCE(sat) max: the simulated
//   value times the family's spread factor, rounded up to two significant digits. VBE(sat): simulated, to 10 mV.
// - VBE(on): simulated at the family's stated IC and VCE, to 10 mV.
// - fT: |h21e| at the test frequency times that frequency; Cob at 1 MHz; Early voltage from the output slope; each
//   to two significant digits.
import type { GainPoint, PartSpec, SaturationPoint } from "#app/domain/part.ts";
import { buildDatasheetUrl } from "#seeds/data/part-builders.ts";
import type { DeviceFamily, FamilyPart, GainQuote } from "./family.ts";
import type { DeviceReadings, FamilyReadings } from "./simulate.ts";

function significantScale(value: number, digits: number): number {
  return 10 ** (Math.floor(Math.log10(Math.abs(value))) - (digits - 1));
}

/** Nearest, downward and upward rounding to `digits` significant digits, returned as the shortest exact decimal. */
export function roundSignificant(value: number, digits = 2): number {
  return Number(value.toPrecision(digits));
}

export function floorSignificant(value: number, digits = 2): number {
  const scale = significantScale(value, digits);
  return Number((Math.floor(value / scale + 1e-9) * scale).toPrecision(digits));
}

export function ceilSignificant(value: number, digits = 2): number {
  const scale = significantScale(value, digits);
  return Number((Math.ceil(value / scale - 1e-9) * scale).toPrecision(digits));
}

/** Volts to 10 mV, as datasheets print VBE. */
export const roundToCentivolts = (volts: number) => Number(volts.toFixed(2));

const has = (quote: string, figure: "min" | "typ" | "max" | "vbe") => quote.split("-").includes(figure);

/** The simulated hFE of the device a part is made of: the gain group's centre device, or the typical one. */
function simulatedGain(device: DeviceReadings, part: FamilyPart): number[] {
  if (!part.group) return device.gain;
  const group = device.groups[part.group];
  if (!group) throw new Error(`${part.partNumber}: no simulated device for gain group ${part.group}`);
  return group.gain;
}

/** min/typ and max/typ at the main current, which every quoted current shares. */
function spreadRatios(family: DeviceFamily, part: FamilyPart, mainTyp: number): { low: number; high: number } {
  if (!part.group) return family.hfeSpread;
  const [min, max] = family.gainGroups![part.group];
  if (mainTyp < min || mainTyp > max) {
    throw new Error(`${part.partNumber}: simulated hFE ${mainTyp.toFixed(1)} lies outside gain group ${part.group} (${min}-${max})`);
  }
  return { low: min / mainTyp, high: max / mainTyp };
}

function quoteGain(family: DeviceFamily, part: FamilyPart, device: DeviceReadings): GainPoint[] {
  const simulated = simulatedGain(device, part);
  const ratios = spreadRatios(family, part, simulated[family.mainGain]);
  const indices = part.gainPoints ?? family.gain.map((_, k) => k);
  return indices.map((k) => {
    const condition = family.gain[k];
    const quote: GainQuote = part.gainQuote ?? condition.quote;
    const typ = simulated[k];
    const isMainOfGroup = part.group !== undefined && k === family.mainGain;
    const [groupMin, groupMax] = isMainOfGroup ? family.gainGroups![part.group!] : [null, null];
    return {
      icAmps: condition.icAmps,
      vceVolts: condition.vceVolts,
      hfeMin: has(quote, "min") ? (groupMin ?? floorSignificant(typ * ratios.low)) : null,
      hfeTyp: has(quote, "typ") ? roundSignificant(typ) : null,
      hfeMax: has(quote, "max") ? (groupMax ?? ceilSignificant(typ * ratios.high)) : null,
      tempC: part.gainTemperatureUnstated ? null : 25,
    };
  });
}

function quoteSaturation(family: DeviceFamily, part: FamilyPart, device: DeviceReadings): SaturationPoint[] {
  const indices = part.saturationPoints ?? family.saturation.map((_, k) => k);
  return indices.map((k) => {
    const condition = family.saturation[k];
    const simulated = device.saturation[k];
    return {
      icAmps: condition.icAmps,
      ibAmps: roundSignificant(condition.icAmps / condition.forcedGain, 6),
      vceSatMaxVolts: ceilSignificant(simulated.vceSatVolts * family.vceSatMaxFactor),
      vceSatTypVolts: has(condition.quote, "typ") ? roundSignificant(simulated.vceSatVolts) : null,
      vbeSatVolts: has(condition.quote, "vbe") ? roundToCentivolts(simulated.vbeSatVolts) : null,
    };
  });
}

/** One catalogue row from a family's part and the family's simulated readings. */
export function quotePart(family: DeviceFamily, part: FamilyPart, readings: FamilyReadings): PartSpec {
  const device = readings[part.polarity];
  if (!device) throw new Error(`${part.partNumber}: family ${family.id} has no ${part.polarity.toUpperCase()} device`);
  return {
    manufacturer: family.manufacturer,
    partNumber: part.partNumber,
    polarity: part.polarity,
    packageName: part.packageName,
    configuration: part.configuration ?? "single",
    vceoVolts: part.vceoVolts,
    vcboVolts: part.vcboVolts,
    veboVolts: part.veboVolts,
    icMaxAmps: part.icMaxAmps,
    ...part.thermals,
    gainPoints: quoteGain(family, part, device),
    saturationPoints: quoteSaturation(family, part, device),
    vbeOnVolts: roundToCentivolts(device.vbeOnVolts),
    ftHz: roundSignificant(device.ftHz),
    cobFarads: part.omitsCob ? null : roundSignificant(device.cobFarads),
    earlyVolts: part.quotesEarlyVoltage ? roundSignificant(device.earlyVolts) : null,
    lifecycle: part.lifecycle ?? "active",
    datasheetUrl: buildDatasheetUrl(family.manufacturer, part.partNumber),
    datasheetRevisionDate: part.datasheetRevisionDate,
  };
}
