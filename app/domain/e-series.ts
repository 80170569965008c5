// The E12 and E24 preferred-number series of IEC 60063, and rounding a resistance onto them.

/** IEC 60063 E12 series, one decade. */
export const E12: readonly number[] = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
/** IEC 60063 E24 series, one decade. */
export const E24: readonly number[] = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
];

export type ESeriesName = "E12" | "E24";
export type RoundDirection = "down" | "up" | "nearest";

const SERIES: Record<ESeriesName, readonly number[]> = { E12, E24 };

/** Rounds a positive resistance onto a series: down, up, or nearest in log (ratio) terms. */
export function roundToSeries(ohms: number, series: ESeriesName, direction: RoundDirection): number {
  if (!(ohms > 0) || !Number.isFinite(ohms)) throw new RangeError(`Cannot round ${ohms} Ω onto ${series}`);
  const values = SERIES[series];
  const decade = Math.floor(Math.log10(ohms));
  const tolerance = ohms * 1e-9;
  // Candidates from the decade below to the decade above, so values near a decade edge round correctly; plain loops, as the pair search rounds often.
  let down = Number.NEGATIVE_INFINITY;
  let up = Number.POSITIVE_INFINITY;
  let nearest = Number.NaN;
  for (let power = decade - 1; power <= decade + 1; power += 1) {
    for (let i = 0; i < values.length; i += 1) {
      const candidate = toOhms(values[i], power);
      if (candidate <= ohms + tolerance && candidate > down) down = candidate;
      if (candidate >= ohms - tolerance && candidate < up) up = candidate;
      if (direction === "nearest" && (Number.isNaN(nearest) || Math.abs(Math.log(candidate / ohms)) < Math.abs(Math.log(nearest / ohms)))) nearest = candidate;
    }
  }
  if (direction === "down") return down;
  if (direction === "up") return up;
  return nearest;
}

/** A series mantissa times a power of ten, rounded so that 4.7 × 10³ is exactly 4700. */
function toOhms(mantissa: number, power: number): number {
  const value = mantissa * 10 ** power;
  // A mantissa times 10⁰ is already exact; only negative powers need the rounding through text.
  if (power === 0) return value;
  return power >= 1 ? Math.round(value) : Number(value.toPrecision(3));
}
