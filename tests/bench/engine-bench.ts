// Engine bench: single-ranking throughput and the compound search, with their goals. Prints figures; asserts nothing.
import { mkdirSync, writeFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
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

/** Median and fastest of several timed runs after one warm-up, so the JIT has settled. */
function timeRunsMs(runs: number, task: () => void): { medianMs: number; bestMs: number } {
  task();
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    task();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { medianMs: times[Math.floor(times.length / 2)], bestMs: times[0] };
}

function timeMedianMs(runs: number, task: () => void): number {
  return timeRunsMs(runs, task).medianMs;
}

function verdictOf(met: boolean): string {
  return met ? "met" : "MISSED";
}

const rankingSheets = ["audio-preamp", "low-side-switch", "linear-pass"];
const searchSheets = ["linear-pass", "motor-switch"];
const ranking = generateParts(RANKING_PARTS, SEED);
const searchCatalogue = generateParts(SEARCH_PARTS, SEED + 1);
const results: Record<string, unknown> = { node: process.version, cpu: cpus()[0]?.model ?? "unknown", loadAverage: loadavg(), seed: SEED, ranking: [], search: [] };

console.log(`Betasift engine bench (${process.version}, ${cpus()[0]?.model ?? "unknown CPU"}, one thread, load average ${loadavg().map((l) => l.toFixed(2)).join(" ")})`);
// Rows a page shows at once: their explanations are built when read, so the bench times that too.
const VISIBLE_ROWS = 25;

for (const id of rankingSheets) {
  const sheet = sheetNamed(id);
  // A fresh copy has nothing prepared: the first ranking of a newly loaded catalogue, preparation included.
  const fresh = structuredClone(ranking);
  const coldStart = performance.now();
  rankParts(fresh, sheet, { catalogueVersion: "bench" });
  const coldMs = performance.now() - coldStart;
  let ranked = 0;
  const { medianMs: ms, bestMs } = timeRunsMs(5, () => {
    ranked = rankParts(ranking, sheet, { catalogueVersion: "bench" }).ranked.length;
  });
  const result = rankParts(ranking, sheet, { catalogueVersion: "bench" });
  const rows = [...result.ranked.slice(0, VISIBLE_ROWS), ...result.failing.slice(0, VISIBLE_ROWS)];
  const explainStart = performance.now();
  for (const row of rows) void row.evaluation.checks.length;
  const explainMs = performance.now() - explainStart;
  const partsPerS = RANKING_PARTS / (ms / 1000);
  const met = partsPerS >= RANKING_GOAL_PARTS_PER_S;
  console.log(
    `single ranking, ${id}, N = ${RANKING_PARTS}: ${ms.toFixed(1)} ms median of 5 (fastest ${bestMs.toFixed(1)} ms), ${Math.round(partsPerS).toLocaleString("en")} parts/s ` +
      `(goal ≥ ${RANKING_GOAL_PARTS_PER_S.toLocaleString("en")} parts/s: ${verdictOf(met)}); first ranking of a fresh catalogue, preparation included, ${coldMs.toFixed(1)} ms; ` +
      `${ranked} fit or marginal; explaining ${rows.length} shown rows ${explainMs.toFixed(1)} ms`,
  );
  (results.ranking as unknown[]).push({
    sheet: id,
    parts: RANKING_PARTS,
    ms,
    bestMs,
    partsPerS,
    coldMs,
    explainedRows: rows.length,
    explainMs,
    goalPartsPerS: RANKING_GOAL_PARTS_PER_S,
    met,
  });
}

for (const id of searchSheets) {
  const sheet = { ...sheetNamed(id), compounds: true };
  const singleMs = timeMedianMs(5, () => rankParts(searchCatalogue, sheet, { catalogueVersion: "bench" }));
  // A fresh copy has no gain models cached yet: the first search of a newly loaded catalogue.
  const fresh = structuredClone(searchCatalogue);
  const coldStart = performance.now();
  searchCompounds(fresh, sheet, { catalogueVersion: "bench", k: TOP_K });
  const coldMs = performance.now() - coldStart;
  let summary = { ranked: 0, evaluated: 0, considered: 0, failed: 0, best: 0 };
  const searchMs = timeMedianMs(5, () => {
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
