import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { generateParts } from "#tests/bench/generate-parts.ts";
import { compareRankedCompounds, rankCompoundsExhaustively, searchCompounds, type CompoundSearchResult, type RankedCompound } from "./compound-search";
import { parseRequirementSheet, presets, type RequirementSheet } from "./requirement";

function sheetNamed(id: string): RequirementSheet {
  const preset = presets.find((p) => p.id === id);
  if (!preset) throw new Error(`no preset ${id}`);
  return { ...preset.sheet, compounds: true };
}

function keysOf(result: CompoundSearchResult): string[] {
  return result.ranked.map((r) => `${r.topology}:${r.driver.partNumber}>${r.output.partNumber}@${r.score.toFixed(9)}`);
}

describe("searchCompounds", () => {
  const catalogue = generateParts(400, 11);

  it("finds pairs for a linear pass stage that needs more gain than one device gives, best first, and counts its work", () => {
    const sheet = sheetNamed("linear-pass");
    const result = searchCompounds(catalogue, sheet, { catalogueVersion: "cat-7", k: 10 });
    expect(result.catalogueVersion).toBe("cat-7");
    expect(result.ranked).toHaveLength(10);
    expect(result.pairSpace).toBe(400 * 400 * 2);
    expect(result.pairsEvaluated).toBeGreaterThan(0);
    expect(result.pairsEvaluated).toBeLessThan(result.pairSpace / 100);
    expect(result.pairsConsidered).toBeGreaterThanOrEqual(result.pairsEvaluated);
    for (const pair of result.ranked) {
      expect(pair.evaluation.verdict).not.toBe("fails");
      expect(pair.evaluation.hfeAtOperatingPoint).toBeGreaterThanOrEqual(1000);
      expect(pair.evaluation.polarity).toBe("npn");
      expect(pair.bleed?.shareAtMinIc).toBeLessThanOrEqual(0.1);
    }
    const sorted = [...result.ranked].sort(compareRankedCompounds);
    expect(result.ranked).toEqual(sorted);
  });

  it("is deterministic: the same catalogue in another order gives the same pairs", () => {
    const sheet = sheetNamed("motor-switch");
    const first = searchCompounds(catalogue, sheet, { catalogueVersion: "v", k: 8 });
    const second = searchCompounds([...catalogue].reverse(), sheet, { catalogueVersion: "v", k: 8 });
    expect(keysOf(second)).toEqual(keysOf(first));
  });

  it("returns nothing when no two devices can reach the gain asked for", () => {
    const sheet = parseRequirementSheet({ ...sheetNamed("linear-pass"), requiredHfe: 1e9 });
    const result = searchCompounds(catalogue, sheet, { catalogueVersion: "v" });
    expect(result.ranked).toEqual([]);
    expect(result.pairsEvaluated).toBe(0);
  });

  it("returns the same top-k as brute force on small random catalogues (property)", () => {
    const sheets = ["linear-pass", "motor-switch", "low-side-switch", "audio-preamp"];
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.integer({ min: 6, max: 14 }),
        fc.integer({ min: 1, max: 6 }),
        fc.constantFrom(...sheets),
        fc.constantFrom("npn", "pnp", "any") as fc.Arbitrary<"npn" | "pnp" | "any">,
        fc.constantFrom("suggested", "none") as fc.Arbitrary<"suggested" | "none">,
        fc.record({
          margin: fc.integer({ min: 0, max: 10 }),
          cost: fc.integer({ min: 0, max: 10 }),
          stock: fc.integer({ min: 0, max: 10 }),
          lifecycle: fc.integer({ min: 0, max: 10 }),
          dataQuality: fc.integer({ min: 1, max: 10 }),
        }),
        (seed, size, k, sheetId, polarity, bleed, weights) => {
          const parts = generateParts(size, seed);
          const sheet = { ...sheetNamed(sheetId), polarity };
          const options = { catalogueVersion: "prop", k, bleed, weights };
          const pruned = searchCompounds(parts, sheet, options);
          const brute = rankCompoundsExhaustively(parts, sheet, options);
          expect(keysOf(pruned)).toEqual(keysOf(brute));
          expect(pruned.pairsEvaluated).toBeLessThanOrEqual(brute.pairsEvaluated);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("rankCompoundsExhaustively", () => {
  it("evaluates every valid pair inside the sheet and keeps the best k in ranking order", () => {
    const parts = generateParts(10, 5);
    const result = rankCompoundsExhaustively(parts, sheetNamed("linear-pass"), { catalogueVersion: "v", k: 50 });
    const npn = parts.filter((e) => e.part.polarity === "npn" && e.part.packageName.length > 0).length;
    const pnp = parts.length - npn;
    // Darlington: NPN driver with NPN output; Sziklai: NPN driver with PNP output (the sheet asks for NPN).
    expect(result.pairsEvaluated).toBe(npn * npn + npn * pnp);
    const ranked: RankedCompound[] = result.ranked;
    expect(ranked).toEqual([...ranked].sort(compareRankedCompounds));
  });
});
