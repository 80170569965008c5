import { spawn, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { createServer } from "node:net";
import path from "node:path";
import { SERVER_BUILD } from "./build.ts";

const root = path.resolve(import.meta.dirname, "../..");

export const TEST_SECRETS = {
  SESSION_SECRET: "test-session-secret-0123456789abcdef",
  TOTP_SECRET: "a1".repeat(32),
};

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

export function assertBuilt(): void {
  if (!existsSync(SERVER_BUILD)) {
    throw new Error("No production build: run `npx react-router build` (npm test does it first).");
  }
}

export interface RunningApp {
  url: string;
  stop: () => Promise<void>;
}

/**
 * Starts the production build the way npm start serves it, on a free loopback port. `workers` > 1 serves through
 * app/ops/serve.server.ts (node:cluster), the way npm start does; tests use one process. Sign-in code limits are
 * lifted unless `env` sets them, because the whole suite asks for codes from one loopback address.
 */
export async function startAppServer(env: Record<string, string>, options: { waitForHealthy?: boolean; workers?: number } = {}): Promise<RunningApp> {
  const waitForHealthy = options.waitForHealthy ?? true;
  const clustered = (options.workers ?? 1) > 1;
  assertBuilt();
  const port = await freePort();
  const script = clustered ? "app/ops/serve.server.ts" : "app/ops/http-worker.server.ts";
  const url = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn(path.join(root, "node_modules/.bin/tsx"), [script, SERVER_BUILD], {
    cwd: root,
    env: {
      ...process.env,
      ...TEST_SECRETS,
      NODE_ENV: "production",
      COOKIE_SECURE: "false",
      PUBLIC_ORIGIN: url,
      SIGN_IN_CODES_PER_ADDRESS: "100000",
      SIGN_IN_CODES_PER_CLIENT: "100000",
      HOST: "127.0.0.1",
      PORT: String(port),
      WEB_CONCURRENCY: String(options.workers ?? 1),
      ...env,
    },
    stdio: ["ignore", "ignore", "pipe"],
  });
  let stderr = "";
  child.stderr?.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app server exited: ${stderr}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.status === 200 || (!waitForHealthy && response.status > 0)) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the app server did not answer: ${stderr}`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  return {
    url,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", () => resolve());
        child.kill("SIGTERM");
      }),
  };
}
