// Engine bench: single-ranking throughput and the compound search, with their goals. Prints figures; asserts nothing.
import { mkdirSync, writeFileSync } from "node:fs";
import { cpus } from "node:os";
import { performance } from "node:perf_hooks";
import { searchCompounds } from "#app/domain/compound-search.ts";
import { rankParts } from "#app/domain/rank.ts";
import { presets, type RequirementSheet } from "#app/domain/requirement.ts";
import { generateParts } from "./generate-parts.ts";

const RANKING_PARTS = 50_000;
const SEARCH_PARTS = 10_000;
const TOP_K = 20;
const RANKING_GOAL_PARTS_PER_S = 500_000;
const SEARCH_GOAL_TIME_RATIO = 3;
const SEARCH_GOAL_PAIR_SHARE = 0.01;
const SEED = 20261202;

function sheetNamed(id: string): RequirementSheet {
  const preset = presets.find((p) => p.id === id);
  if (!preset) throw new Error(`no preset ${id}`);
  return preset.sheet;
}

/** Median of several timed runs after one warm-up, so the JIT has settled. */
function timeMedianMs(runs: number, task: () => void): number {
  task();
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    task();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

function verdictOf(met: boolean): string {
  return met ? "met" : "MISSED";
}

const rankingSheets = ["audio-preamp", "low-side-switch", "linear-pass"];
const searchSheets = ["linear-pass", "motor-switch"];
const ranking = generateParts(RANKING_PARTS, SEED);
const searchCatalogue = generateParts(SEARCH_PARTS, SEED + 1);
const results: Record<string, unknown> = { node: process.version, cpu: cpus()[0]?.model ?? "unknown", seed: SEED, ranking: [], search: [] };

console.log(`Betasift engine bench (${process.version}, ${cpus()[0]?.model ?? "unknown CPU"}, one thread)`);
for (const id of rankingSheets) {
  const sheet = sheetNamed(id);
  let ranked = 0;
  const ms = timeMedianMs(3, () => {
    ranked = rankParts(ranking, sheet, { catalogueVersion: "bench" }).ranked.length;
  });
  const partsPerS = RANKING_PARTS / (ms / 1000);
  const met = partsPerS >= RANKING_GOAL_PARTS_PER_S;
  console.log(
    `single ranking, ${id}, N = ${RANKING_PARTS}: ${ms.toFixed(1)} ms, ${Math.round(partsPerS).toLocaleString("en")} parts/s ` +
      `(goal ≥ ${RANKING_GOAL_PARTS_PER_S.toLocaleString("en")} parts/s: ${verdictOf(met)}); ${ranked} fit or marginal`,
  );
  (results.ranking as unknown[]).push({ sheet: id, parts: RANKING_PARTS, ms, partsPerS, goalPartsPerS: RANKING_GOAL_PARTS_PER_S, met });
}

for (const id of searchSheets) {
  const sheet = { ...sheetNamed(id), compounds: true };
  const singleMs = timeMedianMs(3, () => rankParts(searchCatalogue, sheet, { catalogueVersion: "bench" }));
  // A fresh copy has no gain models cached yet: the first search of a newly loaded catalogue.
  const fresh = structuredClone(searchCatalogue);
  const coldStart = performance.now();
  searchCompounds(fresh, sheet, { catalogueVersion: "bench", k: TOP_K });
  const coldMs = performance.now() - coldStart;
  let summary = { ranked: 0, evaluated: 0, considered: 0, failed: 0, best: 0 };
  const searchMs = timeMedianMs(3, () => {
    const result = searchCompounds(searchCatalogue, sheet, { catalogueVersion: "bench", k: TOP_K });
    summary = {
      ranked: result.ranked.length,
      evaluated: result.pairsEvaluated,
      considered: result.pairsConsidered,
      failed: result.pairsFailed,
      best: result.ranked[0]?.score ?? 0,
    };
  });
  const ratio = searchMs / singleMs;
  const share = summary.evaluated / (SEARCH_PARTS * SEARCH_PARTS);
  const ratioMet = ratio <= SEARCH_GOAL_TIME_RATIO;
  const shareMet = share <= SEARCH_GOAL_PAIR_SHARE;
  console.log(
    `compound search, ${id}, N = ${SEARCH_PARTS}, top-${TOP_K}: ${searchMs.toFixed(1)} ms against ${singleMs.toFixed(1)} ms for a single ranking, ` +
      `${ratio.toFixed(2)}× (goal ≤ ${SEARCH_GOAL_TIME_RATIO}×: ${verdictOf(ratioMet)}; first search of a fresh catalogue ${coldMs.toFixed(1)} ms, ` +
      `${(coldMs / singleMs).toFixed(2)}×); pairs evaluated ${summary.evaluated.toLocaleString("en")} = ` +
      `${(share * 100).toFixed(4)}% of N² (goal ≤ ${SEARCH_GOAL_PAIR_SHARE * 100}%: ${verdictOf(shareMet)}); considered ${summary.considered.toLocaleString("en")}, ` +
      `failed ${summary.failed.toLocaleString("en")}, found ${summary.ranked}, best score ${summary.best.toFixed(1)}`,
  );
  (results.search as unknown[]).push({
    sheet: id,
    parts: SEARCH_PARTS,
    k: TOP_K,
    searchMs,
    coldSearchMs: coldMs,
    singleRankingMs: singleMs,
    timeRatio: ratio,
    goalTimeRatio: SEARCH_GOAL_TIME_RATIO,
    timeRatioMet: ratioMet,
    pairsEvaluated: summary.evaluated,
    pairsConsidered: summary.considered,
    pairsFailed: summary.failed,
    shareOfNSquared: share,
    goalShare: SEARCH_GOAL_PAIR_SHARE,
    shareMet,
    found: summary.ranked,
  });
}

const outDir = new URL("./results/", import.meta.url);
mkdirSync(outDir, { recursive: true });
writeFileSync(new URL("engine.json", outDir), `${JSON.stringify(results, null, 2)}\n`);
console.log(`figures written to tests/bench/results/engine.json`);
