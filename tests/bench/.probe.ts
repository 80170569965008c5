import { searchCompounds } from "#app/domain/compound-search.ts";
import { presets } from "#app/domain/requirement.ts";
import { generateParts } from "#tests/bench/generate-parts.ts";
for (const n of [500, 1000, 2000]) {
  const cat = generateParts(n, 7);
  for (const id of ["linear-pass","motor-switch"]) {
    const sheet = {...presets.find(p=>p.id===id)!.sheet, compounds:true};
    const t=performance.now(); const r = searchCompounds(cat, sheet, {catalogueVersion:"x", k:20});
    const ms = performance.now()-t;
    const reasons = new Map<string, number>();
    console.log(n, id, ms.toFixed(0)+"ms", "considered", r.pairsConsidered, "evaluated", r.pairsEvaluated, "failed", r.pairsFailed, "found", r.ranked.length, r.ranked[0]?.score.toFixed(1), r.ranked.at(-1)?.score.toFixed(1), (ms/r.pairsEvaluated*1000).toFixed(0)+"us/eval");
  }
}
