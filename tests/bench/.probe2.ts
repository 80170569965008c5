import { searchCompounds } from "#app/domain/compound-search.ts";
import { presets } from "#app/domain/requirement.ts";
import { generateParts } from "#tests/bench/generate-parts.ts";
const cat = generateParts(500, 7);
for (const id of ["linear-pass","motor-switch"]) {
  const sheet = {...presets.find(p=>p.id===id)!.sheet, compounds:true};
  const r = searchCompounds(cat, sheet, {catalogueVersion:"x", k:20});
  for (const x of r.ranked.slice(0,3)) {
    console.log(id, x.topology, x.driver.partNumber, x.output.partNumber, x.score.toFixed(1), JSON.stringify(x.components), x.verdict);
    console.log(x.evaluation.checks.map(c=>`${c.subject}/${c.check}:${c.verdict}:${c.margin?.toFixed(2)}`).join(" "));
  }
}
