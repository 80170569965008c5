import { describe, expect, it } from "vitest";
import { flagWords, FLAG_WORDS } from "./flag-words";

// The flags the design names (design section 3) and the data-quality flags the catalogue sets.
const DESIGN_FLAGS = [
  "gain-off-point",
  "rating-below-supply",
  "inside-derating",
  "no-min-gain",
  "early-unknown",
  "hot-junction",
  "drive-short",
  "sat-too-high",
  "low-early-voltage",
  "stale-datasheet",
  "outside-soa",
  "slow-turn-off",
  "noise-over-budget",
  "single-gain-point",
];

describe("flag words", () => {
  it("give every flag a phrase in words, never its identifier, and an explanation", () => {
    for (const flag of DESIGN_FLAGS) {
      const words = FLAG_WORDS[flag];
      expect(words, flag).toBeDefined();
      expect(words.label).not.toContain("-");
      expect(words.label).not.toBe(flag);
      expect(words.explanation.length).toBeGreaterThan(30);
    }
  });

  it("read an unknown identifier as words", () => {
    expect(flagWords("some-new-finding").label).toBe("some new finding");
  });
});
