// Catalogue API bench: the built server against a seeded bench database (the demo plus 10,000 generated parts
// committed through an intake), signed in, then autocannon with 50 loopback connections for 10 s on GET /api/parts.
// Prints p99 and errors and writes tests/bench/results/catalogue-api-bench.json; asserts nothing.
// Run: npx react-router build && npx tsx tests/bench/catalogue-api-bench.ts
// BENCH_PROBE=1 also loads an auth-only API answer and /api/health, to show what the guard and framework cost alone.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { availableParallelism, cpus, loadavg, tmpdir } from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import { createMigrator, createSeeder } from "#db/migrator.ts";
import { demoParts } from "#seeds/data/parts.ts";
import { startAppServer } from "#tests/setup/app-server.ts";
import { connect, dropDatabase, ensureClusterUp, recreateDatabase } from "#tests/setup/databases.ts";
import { generateCompactPartsCsv, LIBRARIAN } from "#tests/setup/intake-helpers.ts";
import { signInCodeFrom, startMailCatcher, waitForMail } from "#tests/setup/mail-catcher.ts";

const DATABASE = "betasift_bench_catalogue";
const EXTRA_PARTS = 10_000;
const CONNECTIONS = 50;
const DURATION_S = 10;
const P99_GOAL_MS = 100;
const QUERY = "/api/parts?polarity=npn&hfeAt=10mA&hfeMin=50&sort=hfe&dir=desc&size=50&page=2";
const root = path.resolve(import.meta.dirname, "../..");

/** Just enough of a cookie jar for the two sign-in steps. */
class Cookies {
  private values = new Map<string, string>();
  take(response: Response) {
    for (const cookie of response.headers.getSetCookie()) {
      const [pair] = cookie.split(";");
      const at = pair!.indexOf("=");
      this.values.set(pair!.slice(0, at), pair!.slice(at + 1));
    }
  }
  header(): string {
    return [...this.values].map(([k, v]) => `${k}=${v}`).join("; ");
  }
}

/** CPU seconds used so far by this process's child processes (the app server), from /proc; null elsewhere. */
/** CPU seconds used so far by every process below this one (the server and, when clustered, its workers). */
function childCpuSeconds(): number | null {
  try {
    const parentOf = new Map<number, number>();
    const ticksOf = new Map<number, number>();
    for (const pid of readdirSync("/proc").filter((name) => /^\d+$/.test(name))) {
      let stat: string;
      try {
        stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      } catch {
        continue;
      }
      // Fields after the parenthesised command: state, ppid, ... utime is the 12th, stime the 13th.
      const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      parentOf.set(Number(pid), Number(fields[1]));
      ticksOf.set(Number(pid), Number(fields[11]) + Number(fields[12]));
    }
    const below = (pid: number): boolean => {
      for (let parent = parentOf.get(pid); parent !== undefined && parent > 1; parent = parentOf.get(parent)) {
        if (parent === process.pid) return true;
      }
      return false;
    };
    let ticks = 0;
    for (const [pid, t] of ticksOf) if (below(pid)) ticks += t;
    return ticks / 100;
  } catch {
    return null;
  }
}

async function measureCpu<T>(run: () => Promise<T>): Promise<{ result: T; clientCores: number; serverCores: number | null }> {
  const started = performance.now();
  const client = process.cpuUsage();
  const server = childCpuSeconds();
  const result = await run();
  const seconds = (performance.now() - started) / 1000;
  const used = process.cpuUsage(client);
  const serverAfter = childCpuSeconds();
  const clientCores = (used.user + used.system) / 1e6 / seconds;
  const serverCores = server === null || serverAfter === null ? null : (serverAfter - server) / seconds;
  return { result, clientCores: Number(clientCores.toFixed(2)), serverCores: serverCores === null ? null : Number(serverCores.toFixed(2)) };
}

async function signIn(url: string, mailDir: string, email: string): Promise<string> {
  const cookies = new Cookies();
  const since = Date.now();
  const asked = await fetch(`${url}/sign-in`, { method: "POST", body: new URLSearchParams({ email }), headers: { origin: url }, redirect: "manual" });
  cookies.take(asked);
  const code = signInCodeFrom(await waitForMail(mailDir, email, since));
  const verified = await fetch(`${url}/sign-in/verify`, {
    method: "POST",
    body: new URLSearchParams({ intent: "verify", code }),
    headers: { cookie: cookies.header(), origin: url },
    redirect: "manual",
  });
  cookies.take(verified);
  if (verified.status !== 302 || verified.headers.get("location") !== "/") throw new Error(`sign-in answered ${verified.status}`);
  return cookies.header();
}

async function main() {
  ensureClusterUp();
  const url = await recreateDatabase(DATABASE);
  const setup = connect(url);
  await createMigrator(setup).up();
  process.env.DATABASE_URL = url;
  await createSeeder(setup).up();
  const [[librarian]] = (await setup.query(`SELECT id FROM users WHERE email = $1`, { bind: [LIBRARIAN] })) as [Array<{ id: string }>, unknown];
  await setup.close();
  const { previewIntake, commitIntake } = await import("#app/data/intakes.server.ts");
  const { closeSequelize } = await import("#db/sequelize.ts");
  const bytes = new Uint8Array(Buffer.from(generateCompactPartsCsv(EXTRA_PARTS, "Benchmere Devices", "BMD")));
  const intake = await previewIntake({ kind: "parts", fileName: "bench-catalogue.csv", bytes, uploadedBy: librarian!.id });
  const committed = await commitIntake(intake.id, librarian!.id, { sendReport: false });
  if (!committed.ok) throw new Error(committed.message);
  await closeSequelize();

  const mailDir = mkdtempSync(path.join(tmpdir(), "betasift-bench-mail-"));
  const catcher = await startMailCatcher(mailDir);
  // Served the way npm start serves it: one worker per core unless BENCH_WORKERS says otherwise.
  const workers = Number(process.env.BENCH_WORKERS ?? availableParallelism());
  const app = await startAppServer({ DATABASE_URL: url, SMTP_PORT: String(catcher.port) }, { workers });
  try {
    const cookie = await signIn(app.url, mailDir, "engineer@larkfield.example.com");
    const probe = await fetch(`${app.url}${QUERY}`, { headers: { cookie } });
    const probeBody = (await probe.json()) as { total: number };
    console.log(`Betasift catalogue API bench (${process.version}, ${cpus()[0]?.model ?? "unknown CPU"})`);
    console.log(`  GET ${QUERY}: ${probe.status}, ${probeBody.total} matching of ${EXTRA_PARTS + demoParts.length} parts`);
    // Warm every worker (each loads its copy of the catalogue on first use) before measuring the steady state.
    await autocannon({ url: `${app.url}${QUERY}`, connections: 10, duration: 2, headers: { cookie } });
    const loadBefore = loadavg();
    const { result, clientCores, serverCores } = await measureCpu(() =>
      autocannon({ url: `${app.url}${QUERY}`, connections: CONNECTIONS, duration: DURATION_S, headers: { cookie } }),
    );
    const errors = result.errors + result.timeouts + result.non2xx;
    const results = {
      node: process.version,
      cpu: cpus()[0]?.model ?? "unknown",
      parts: EXTRA_PARTS + demoParts.length,
      query: QUERY,
      connections: CONNECTIONS,
      durationS: DURATION_S,
      serverWorkers: workers,
      requests: result.requests.total,
      requestsPerSecond: result.requests.average,
      latencyP50Ms: result.latency.p50,
      latencyP99Ms: result.latency.p99,
      latencyMaxMs: result.latency.max,
      errors,
      p99GoalMs: P99_GOAL_MS,
      cores: cpus().length,
      clientCpuCores: clientCores,
      serverCpuCores: serverCores,
      loadAverageBefore: loadBefore.map((l) => Number(l.toFixed(2))),
    };
    console.log(`  ${results.requests} requests, ${results.requestsPerSecond} req/s, p50 ${results.latencyP50Ms} ms, max ${results.latencyMaxMs} ms`);
    console.log(`  p99: ${results.latencyP99Ms} ms (goal ≤ ${P99_GOAL_MS} ms: ${results.latencyP99Ms <= P99_GOAL_MS ? "met" : "MISSED"})`);
    console.log(`  errors: ${errors} (goal 0: ${errors === 0 ? "met" : "MISSED"})`);
    console.log(`  CPU: load tool ${clientCores} cores, server (${workers} worker(s)) ${serverCores ?? "?"} cores of ${cpus().length}; load average before ${results.loadAverageBefore.join(" ")}`);
    if (process.env.BENCH_PROBE) {
      for (const probePath of ["/api/parts/not-a-uuid", "/api/health"]) {
        const { result: r, clientCores: c, serverCores: sc } = await measureCpu(() =>
          autocannon({ url: `${app.url}${probePath}`, connections: CONNECTIONS, duration: 5, headers: { cookie } }),
        );
        console.log(`  probe ${probePath}: ${r.requests.average} req/s, p99 ${r.latency.p99} ms (load tool ${c} cores, server ${sc ?? "?"} cores)`);
      }
    }
    mkdirSync(path.join(root, "tests/bench/results"), { recursive: true });
    writeFileSync(path.join(root, "tests/bench/results/catalogue-api-bench.json"), `${JSON.stringify(results, null, 2)}\n`);
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
