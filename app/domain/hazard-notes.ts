// Caution texts for sheets that describe hazardous voltage or large power (design section 9).
import type { RequirementSheet } from "./requirement";
import { operatingVceOf, peakIcOf, peakVceOf } from "./requirement";

/** Above about 50 V a circuit counts as hazardous to touch (common practice, in line with extra-low-voltage limits). */
export const HAZARDOUS_VOLTS = 50;
/** Dissipation above which the heat itself is a burn and fire concern (a product decision). */
export const LARGE_POWER_WATTS = 10;

const SCREENING =
  "The ranking is a screening aid: the manufacturer's datasheet and safe operating area govern, and local electrical codes and licensed practice come first.";

/** Rough dissipation the sheet implies: linear VCE × IC, switching a crude 1 V drop × IC × duty. */
export function estimateDissipationWatts(sheet: RequirementSheet): number {
  if (sheet.mode === "linear") return operatingVceOf(sheet) * peakIcOf(sheet);
  return 1 * peakIcOf(sheet) * sheet.dutyCycle;
}

/** Caution sentences the pages show above a ranking; empty when the sheet is neither high voltage nor high power. */
export function hazardNotes(sheet: RequirementSheet): string[] {
  const notes: string[] = [];
  const volts = Math.max(sheet.supplyVolts, peakVceOf(sheet));
  if (volts > HAZARDOUS_VOLTS) {
    notes.push(`This sheet describes hazardous voltage (above ${HAZARDOUS_VOLTS} V, here up to ${round(volts)} V). ${SCREENING}`);
  }
  const watts = estimateDissipationWatts(sheet);
  if (watts > LARGE_POWER_WATTS) {
    notes.push(
      `This sheet describes large power (about ${round(watts)} W in the transistor): check the heatsink, its mounting and the safe operating area. ${SCREENING}`,
    );
  }
  return notes;
}

function round(value: number): string {
  return String(Math.round(value * 10) / 10);
}
