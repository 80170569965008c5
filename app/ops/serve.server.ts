// Serves the production build with one worker per core (WEB_CONCURRENCY overrides); the workers share the port.
// The app keeps no state of its own between requests (design 10), so any worker can answer any request.
import cluster from "node:cluster";
import { availableParallelism } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const workerScript = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "http-worker.server.ts");
const workers = Number(process.env.WEB_CONCURRENCY ?? availableParallelism());
let stopping = false;

cluster.setupPrimary({ exec: workerScript, args: process.argv.slice(2) });
for (let i = 0; i < workers; i += 1) cluster.fork();

cluster.on("exit", (worker, code) => {
  if (stopping) return;
  console.error(`betasift: server worker ${worker.process.pid} exited (${code}); starting another`);
  cluster.fork();
});

function stop() {
  stopping = true;
  for (const worker of Object.values(cluster.workers ?? {})) worker?.kill("SIGTERM");
  setTimeout(() => process.exit(0), 5000).unref();
  cluster.on("exit", () => {
    if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
  });
}

process.on("SIGTERM", stop);
process.on("SIGINT", stop);
