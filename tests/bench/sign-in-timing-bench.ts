// Sign-in timing bench: does asking for a code take the same time for an address with an account as for one
// without? Alternates 60 requests of each against the built server and prints median and p90 per kind.
// Asserts nothing. Run: npx react-router build && npx tsx tests/bench/sign-in-timing-bench.ts
import { mkdtempSync, rmSync } from "node:fs";
import { cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";
import { startAppServer } from "#tests/setup/app-server.ts";
import { dropDatabase, ensureClusterUp, prepareDatabase, recreateDatabase } from "#tests/setup/databases.ts";
import { startMailCatcher } from "#tests/setup/mail-catcher.ts";

const DATABASE = "betasift_bench_sign_in";
const ROUNDS = 60;
const KNOWN = "engineer@larkfield.example.com";

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

async function askOnce(url: string, email: string): Promise<number> {
  const started = performance.now();
  const answer = await fetch(`${url}/sign-in`, { method: "POST", body: new URLSearchParams({ email }), headers: { origin: url }, redirect: "manual" });
  await answer.arrayBuffer();
  if (answer.status !== 302) throw new Error(`sign-in answered ${answer.status}`);
  return performance.now() - started;
}

async function main() {
  ensureClusterUp();
  const url = await recreateDatabase(DATABASE);
  await prepareDatabase(url, { seed: true });
  const mailDir = mkdtempSync(path.join(tmpdir(), "betasift-bench-mail-"));
  const catcher = await startMailCatcher(mailDir);
  const app = await startAppServer({ DATABASE_URL: url, SMTP_PORT: String(catcher.port) });
  try {
    for (let i = 0; i < 10; i += 1) await askOnce(app.url, i % 2 === 0 ? KNOWN : `warm-${i}@larkfield.example.com`);
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < ROUNDS; i += 1) {
      known.push(await askOnce(app.url, KNOWN));
      unknown.push(await askOnce(app.url, `nobody-${i}@larkfield.example.com`));
    }
    known.sort((a, b) => a - b);
    unknown.sort((a, b) => a - b);
    const line = (name: string, values: number[]) =>
      `  ${name.padEnd(22)} median ${percentile(values, 50).toFixed(1)} ms, p90 ${percentile(values, 90).toFixed(1)} ms, max ${values.at(-1)!.toFixed(1)} ms`;
    console.log(`Betasift sign-in timing bench (${process.version}, ${cpus()[0]?.model ?? "unknown CPU"}, load ${loadavg().map((l) => l.toFixed(2)).join(" ")})`);
    console.log(line("address with account", known));
    console.log(line("address without", unknown));
    console.log(`  median difference: ${(percentile(known, 50) - percentile(unknown, 50)).toFixed(1)} ms over ${ROUNDS} requests each`);
  } finally {
    await app.stop();
    await catcher.stop();
    rmSync(mailDir, { recursive: true, force: true });
    await dropDatabase(DATABASE);
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
