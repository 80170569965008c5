// The shared rule for demands against absolute maximum ratings and their derated limits.
import type { FlagName, Verdict } from "../check-result";

export interface RatingJudgement {
  verdict: Verdict;
  /** Headroom against the derated limit: (rating × fraction − demand) / (rating × fraction). */
  margin: number;
  flags: FlagName[];
  deratedLimit: number;
}

/** Above the absolute maximum fails (rating-below-supply names any exceeded maximum); above the derated limit is marginal (inside-derating); else fits. */
export function judgeAgainstRating(demand: number, rating: number, fraction: number): RatingJudgement {
  const deratedLimit = rating * fraction;
  const margin = (deratedLimit - demand) / deratedLimit;
  if (demand > rating) return { verdict: "fails", margin, flags: ["rating-below-supply"], deratedLimit };
  if (demand > deratedLimit) return { verdict: "marginal", margin, flags: ["inside-derating"], deratedLimit };
  return { verdict: "fits", margin, flags: [], deratedLimit };
}
