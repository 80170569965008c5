// Derating policies: the fraction of each absolute maximum a design may use.
import { z } from "zod";

export interface DeratingPolicy {
  id: string;
  name: string;
  /** Where the figures come from, with "from memory" or "common practice" when no document was at hand. */
  source: string;
  /** Fraction of VCEO (and VCBO, VEBO) the peak voltage may reach. */
  voltageFraction: number;
  /** Fraction of IC max the peak current may reach. */
  currentFraction: number;
  /** Fraction of the (temperature-derated) Ptot the dissipation may reach. */
  powerFraction: number;
  /** An absolute junction temperature ceiling, when the policy sets one. */
  tjMaxC?: number | null;
  /** Fraction of the datasheet Tj max (in °C) the junction may reach, when the policy sets one. */
  tjFraction?: number | null;
  /** Kelvin below the datasheet Tj max the junction must stay, when the policy sets one. */
  tjMarginC?: number | null;
}

export const DeratingPolicySchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
  source: z.string(),
  voltageFraction: z.number().gt(0).max(1),
  currentFraction: z.number().gt(0).max(1),
  powerFraction: z.number().gt(0).max(1),
  tjMaxC: z.number().nullable().optional(),
  tjFraction: z.number().gt(0).max(1).nullable().optional(),
  tjMarginC: z.number().min(0).nullable().optional(),
});

export const DERATING_POLICIES: readonly DeratingPolicy[] = [
  {
    id: "half",
    name: "50% (conservative)",
    source: "common practice",
    voltageFraction: 0.5,
    currentFraction: 0.5,
    powerFraction: 0.5,
  },
  {
    id: "industrial",
    name: "Industrial 80% voltage, 75% current and power",
    source: "common practice",
    voltageFraction: 0.8,
    currentFraction: 0.75,
    powerFraction: 0.75,
    tjFraction: 0.8,
  },
  {
    // Figures recalled from NASA EEE-INST-002 (2003), table 3 transistors, bipolar, level 2; document not read here.
    id: "eee-inst-002-level-2",
    name: "NASA EEE-INST-002 level 2 (bipolar transistors)",
    source:
      "NASA EEE-INST-002, transistors, bipolar, level 2: 75% VCEO, 75% IC, 50% power, Tj ≤ 125 °C or Tj max − 40 °C, whichever is lower (from memory)",
    voltageFraction: 0.75,
    currentFraction: 0.75,
    powerFraction: 0.5,
    tjMaxC: 125,
    tjMarginC: 40,
  },
  {
    id: "none",
    name: "None (absolute maximum ratings)",
    source: "datasheet absolute maximum ratings",
    voltageFraction: 1,
    currentFraction: 1,
    powerFraction: 1,
  },
];

export const DEFAULT_DERATING: DeratingPolicy = DERATING_POLICIES[1];

/** Finds a named policy; undefined for an unknown id. */
export function findDerating(id: string): DeratingPolicy | undefined {
  return DERATING_POLICIES.find((policy) => policy.id === id);
}

/** A policy of the engineer's own, validated so that every fraction lies in (0, 1]. */
export function customDerating(fractions: {
  voltageFraction: number;
  currentFraction: number;
  powerFraction: number;
  tjMaxC?: number | null;
  tjFraction?: number | null;
  tjMarginC?: number | null;
  name?: string;
}): DeratingPolicy {
  return DeratingPolicySchema.parse({
    id: "custom",
    name: fractions.name ?? "Custom",
    source: "set by the engineer",
    ...fractions,
  });
}

/** The junction temperature a policy allows, from the datasheet Tj max: the lowest of its limits. */
export function deratedTjMaxC(policy: DeratingPolicy, tjMaxC: number): number {
  // Plain comparisons rather than a list: this runs once per part in every ranking.
  let limit = tjMaxC;
  if (policy.tjFraction != null) limit = Math.min(limit, tjMaxC * policy.tjFraction);
  if (policy.tjMarginC != null) limit = Math.min(limit, tjMaxC - policy.tjMarginC);
  if (policy.tjMaxC != null) limit = Math.min(limit, policy.tjMaxC);
  return limit;
}
