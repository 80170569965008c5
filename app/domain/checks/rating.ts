// The shared rule for demands against absolute maximum ratings and their derated limits.
import { FLAG_BITS, type FlagName, flagsOfMask, type Verdict } from "../check-result";

export interface RatingJudgement {
  verdict: Verdict;
  /** Headroom against the derated limit: (rating × fraction − demand) / (rating × fraction). */
  margin: number;
  flags: FlagName[];
  deratedLimit: number;
}

/** judgeAgainstRating's numbers, written into a reusable object; flags as a mask of FLAG_BITS. */
export interface RatingReading {
  verdict: Verdict;
  margin: number;
  flags: number;
  deratedLimit: number;
}

export function newRatingReading(): RatingReading {
  return { verdict: "fits", margin: 0, flags: 0, deratedLimit: 0 };
}

/** Above the absolute maximum fails (rating-below-supply names any exceeded maximum); above the derated limit is marginal (inside-derating); else fits. */
export function readRating(demand: number, rating: number, fraction: number, out: RatingReading): RatingReading {
  const deratedLimit = rating * fraction;
  out.deratedLimit = deratedLimit;
  out.margin = (deratedLimit - demand) / deratedLimit;
  if (demand > rating) {
    out.verdict = "fails";
    out.flags = FLAG_BITS["rating-below-supply"];
  } else if (demand > deratedLimit) {
    out.verdict = "marginal";
    out.flags = FLAG_BITS["inside-derating"];
  } else {
    out.verdict = "fits";
    out.flags = 0;
  }
  return out;
}

/** readRating with its flags as names, in a fresh object. */
export function judgeAgainstRating(demand: number, rating: number, fraction: number): RatingJudgement {
  const read = readRating(demand, rating, fraction, newRatingReading());
  return { verdict: read.verdict, margin: read.margin, flags: flagsOfMask(read.flags), deratedLimit: read.deratedLimit };
}
