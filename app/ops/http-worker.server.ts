// One server process: loads the production build (whose HTTP app is app/ops/http-app.server.ts), listens,
// starts the job workers, and lets go of everything on SIGTERM.
import path from "node:path";
import { pathToFileURL } from "node:url";
import type { HttpAppOptions } from "./http-app.server.ts";
import type express from "express";

interface HttpBuild {
  createHttpApp: (options: HttpAppOptions) => express.Express;
  startBackgroundWork: () => Promise<void>;
  stopBackgroundWork: () => Promise<void>;
}

const buildPath = path.resolve(process.argv[2] ?? "build/server/index.js");
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? "127.0.0.1";
const BACKGROUND_RETRY_MS = 5_000;

const build = (await import(pathToFileURL(buildPath).href)) as HttpBuild;
const app = build.createHttpApp({
  clientDir: path.resolve(path.dirname(buildPath), "../client"),
  publicDir: path.resolve("public"),
});

const server = app.listen(port, host, () => console.log(`betasift: serving http://${host}:${port} (process ${process.pid})`));
// Slow clients may not hold a connection open forever.
server.headersTimeout = 30_000;
server.requestTimeout = 300_000;

// The database may still be starting: the workers keep trying without holding up the server.
let stopping = false;
async function startBackground(): Promise<void> {
  try {
    await build.startBackgroundWork();
  } catch (error) {
    if (stopping) return;
    console.error(`betasift: job workers not started yet (${error instanceof Error ? error.message : String(error)}); retrying`);
    setTimeout(() => void startBackground(), BACKGROUND_RETRY_MS).unref();
  }
}
void startBackground();

function stop() {
  if (stopping) return;
  stopping = true;
  server.close();
  server.closeIdleConnections();
  void build
    .stopBackgroundWork()
    .catch(() => undefined)
    .finally(() => process.exit(0));
  setTimeout(() => process.exit(0), 8_000).unref();
}

process.on("SIGTERM", stop);
process.on("SIGINT", stop);
