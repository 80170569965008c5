// The production build the integration and browser tests run against, rebuilt whenever any source is newer,
// so no test ever runs against a stale build. Callers that may run side by side hold a file lock around it.
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, statSync } from "node:fs";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "../..");
export const SERVER_BUILD = path.join(root, "build/server/index.js");

const SOURCE_DIRS = ["app", "db", "seeds", "public"];
const SOURCE_FILES = ["package-lock.json", "vite.config.ts", "react-router.config.ts", "tsconfig.json"];

function newestIn(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestIn(full));
    else if (entry.isFile()) newest = Math.max(newest, statSync(full).mtimeMs);
  }
  return newest;
}

/** The newest modification time of anything the build is made from. */
export function newestSourceMs(): number {
  let newest = 0;
  for (const dir of SOURCE_DIRS) if (existsSync(path.join(root, dir))) newest = Math.max(newest, newestIn(path.join(root, dir)));
  for (const file of SOURCE_FILES) if (existsSync(path.join(root, file))) newest = Math.max(newest, statSync(path.join(root, file)).mtimeMs);
  return newest;
}

export function buildIsStale(): boolean {
  return !existsSync(SERVER_BUILD) || statSync(SERVER_BUILD).mtimeMs < newestSourceMs();
}

// Under Vitest the config leaves the React Router plugin out (it keys on VITEST), so the build must not inherit it.
function buildEnv(): NodeJS.ProcessEnv {
  return Object.fromEntries(Object.entries(process.env).filter(([name]) => !name.startsWith("VITEST")));
}

/** Builds when the build is missing or older than a source; says which it did. */
export function ensureFreshBuild(): "fresh" | "rebuilt" {
  if (!buildIsStale()) return "fresh";
  try {
    execFileSync(path.join(root, "node_modules/.bin/react-router"), ["build"], { cwd: root, stdio: "pipe", env: buildEnv() });
  } catch (error) {
    const { stdout, stderr } = error as { stdout?: Buffer; stderr?: Buffer };
    throw new Error(`the app build failed:\n${stdout?.toString() ?? ""}${stderr?.toString() ?? ""}`);
  }
  return "rebuilt";
}

/**
 * The same, under a lock on .cache/build.lock, so that test runs side by side in one checkout never build at
 * once or replace a build another run is serving from (a fresh build is left alone).
 */
export function ensureFreshBuildLocked(): void {
  mkdirSync(path.join(root, ".cache"), { recursive: true });
  execFileSync("flock", [path.join(root, ".cache/build.lock"), path.join(root, "node_modules/.bin/tsx"), import.meta.filename], {
    cwd: root,
    env: buildEnv(),
    stdio: ["ignore", "inherit", "inherit"],
  });
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(import.meta.filename)) {
  console.log(`betasift test: the app build is ${ensureFreshBuild() === "fresh" ? "up to date" : "rebuilt"}`);
}
