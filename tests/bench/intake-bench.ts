// Intake bench: a generated 100k-row parts file end to end (parse, validate, compare, commit) against
// PostgreSQL COPY of the same normalised rows into an identical scratch table, in the same run.
// Prints figures and writes tests/bench/results/intake-bench.json; asserts nothing.
// Run: npx tsx tests/bench/intake-bench.ts   (PostgreSQL from docker-free-pg.sh must be up)
import { randomUUID } from "node:crypto";
import { mkdirSync, writeFileSync } from "node:fs";
import { cpus } from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { pipeline } from "node:stream/promises";
import { Readable } from "node:stream";
import pg from "pg";
import { from as copyFrom } from "pg-copy-streams";
import { parsePartsFile } from "#app/domain/intake/parse-parts.ts";
import { PART_FIELD_COLUMNS, normaliseSpec } from "#app/data/catalogue-store.server.ts";
import { identityKey } from "#app/domain/intake/identity.ts";
import { createMigrator, createSeeder } from "#db/migrator.ts";
import { connect, databaseUrl, dropDatabase, ensureClusterUp, recreateDatabase } from "#tests/setup/databases.ts";
import { generateCompactPartsCsv } from "#tests/setup/intake-helpers.ts";

const ROWS = 100_000;
const RATIO_GOAL = 4;
const RSS_GOAL_MB = 300;
const DATABASE = "betasift_bench_intake";
const root = path.resolve(import.meta.dirname, "../..");

let peakRss = 0;
const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 20);
const mb = (bytes: number) => bytes / (1024 * 1024);

function copyText(value: unknown, type: string): string {
  if (value === null || value === undefined) return "\\N";
  const text = type === "jsonb" ? JSON.stringify(value) : String(value);
  return text.replace(/\\/g, "\\\\").replace(/\t/g, "\\t").replace(/\n/g, "\\n").replace(/\r/g, "\\r");
}

async function main() {
  ensureClusterUp();
  const url = await recreateDatabase(DATABASE);
  const setup = connect(url);
  await createMigrator(setup).up();
  process.env.DATABASE_URL = url;
  await createSeeder(setup).up();
  const [[librarian]] = (await setup.query(`SELECT id FROM users WHERE email = 'librarian@larkfield.example.com'`)) as [Array<{ id: string }>, unknown];
  await setup.close();

  const { previewIntake, commitIntake } = await import("#app/data/intakes.server.ts");
  const { closeSequelize } = await import("#db/sequelize.ts");
  const bytes = new Uint8Array(Buffer.from(generateCompactPartsCsv(ROWS, "Benchmere Devices", "BMD")));
  console.log(`Betasift intake bench (${process.version}, ${cpus()[0]?.model ?? "unknown CPU"}): ${ROWS} rows, ${mb(bytes.length).toFixed(1)} MB file`);

  // One warm-up intake of 1,000 rows first, so the JIT has settled (as the engine bench does), then the measured one.
  const warmUp = await previewIntake({ kind: "parts", fileName: "warm-up.csv", bytes: new Uint8Array(Buffer.from(generateCompactPartsCsv(1_000, "Warmup Devices", "WUD"))), uploadedBy: librarian!.id });
  await commitIntake(warmUp.id, librarian!.id, { sendReport: false });

  // Intake end to end, as POST /api/intakes and POST /commit run it (HTTP transport aside).
  const started = performance.now();
  peakRss = process.memoryUsage().rss;
  const preview = await previewIntake({ kind: "parts", fileName: "bench-100k.csv", bytes, uploadedBy: librarian!.id });
  const previewed = performance.now();
  const previewPeakRss = peakRss;
  peakRss = process.memoryUsage().rss;
  const committed = await commitIntake(preview.id, librarian!.id, { sendReport: false });
  const finished = performance.now();
  if (!committed.ok) throw new Error(committed.message);
  const intakeMs = finished - started;
  const commitPeakRss = peakRss;

  // The baseline: the same rows, parsed and normalised, written by COPY into a table shaped like parts.
  const rows = parsePartsFile(bytes).rows.map((r) => normaliseSpec(r.value));
  const client = new pg.Client({ connectionString: databaseUrl(DATABASE) });
  await client.connect();
  await client.query(`CREATE TABLE bench_parts_copy (LIKE parts INCLUDING ALL)`);
  // The same columns a commit writes, identity keys included.
  const columns = ["id", "manufacturer_key", "part_number_key", ...PART_FIELD_COLUMNS.map(([, column]) => column)];
  const lines = function* () {
    for (const spec of rows) {
      const cells = [randomUUID(), identityKey(spec.manufacturer), identityKey(spec.partNumber), ...PART_FIELD_COLUMNS.map(([field, , type]) => copyText(spec[field], type))];
      yield `${cells.join("\t")}\n`;
    }
  };
  const copyStarted = performance.now();
  await pipeline(Readable.from(lines()), client.query(copyFrom(`COPY bench_parts_copy (${columns.join(", ")}) FROM STDIN`)));
  const copyMs = performance.now() - copyStarted;
  await client.end();
  await closeSequelize();
  clearInterval(sampler);

  // The goal is about the intake; the process maximum also covers the baseline's own second parse.
  const maxRssMb = mb(Math.max(previewPeakRss, commitPeakRss));
  const processMaxRssMb = Math.max(mb(peakRss), process.resourceUsage().maxRSS / 1024);
  const ratio = intakeMs / copyMs;
  const results = {
    node: process.version,
    cpu: cpus()[0]?.model ?? "unknown",
    rows: ROWS,
    fileMb: Number(mb(bytes.length).toFixed(2)),
    previewMs: Math.round(previewed - started),
    commitMs: Math.round(finished - previewed),
    intakeMs: Math.round(intakeMs),
    copyMs: Math.round(copyMs),
    ratio: Number(ratio.toFixed(2)),
    ratioGoal: RATIO_GOAL,
    peakRssMb: Math.round(maxRssMb),
    previewPeakRssMb: Math.round(mb(previewPeakRss)),
    commitPeakRssMb: Math.round(mb(commitPeakRss)),
    processMaxRssMb: Math.round(processMaxRssMb),
    rssGoalMb: RSS_GOAL_MB,
  };
  console.log(`  intake end to end: ${results.intakeMs} ms (preview ${results.previewMs} ms, commit ${results.commitMs} ms)`);
  console.log(`  COPY of the same normalised rows: ${results.copyMs} ms`);
  console.log(`  ratio: ${results.ratio}× (goal ≤ ${RATIO_GOAL}×: ${ratio <= RATIO_GOAL ? "met" : "MISSED"})`);
  console.log(`  peak RSS during preview ${results.previewPeakRssMb} MB, during commit ${results.commitPeakRssMb} MB (process maximum ${results.processMaxRssMb} MB)`);
  console.log(`  intake peak RSS: ${results.peakRssMb} MB (goal ≤ ${RSS_GOAL_MB} MB: ${maxRssMb <= RSS_GOAL_MB ? "met" : "MISSED"})`);
  mkdirSync(path.join(root, "tests/bench/results"), { recursive: true });
  writeFileSync(path.join(root, "tests/bench/results/intake-bench.json"), `${JSON.stringify(results, null, 2)}\n`);
  await dropDatabase(DATABASE);
}

main().catch((error: unknown) => {
  clearInterval(sampler);
  console.error(error);
  process.exitCode = 1;
});
