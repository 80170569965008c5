// Shared by the integration and browser projects: a throwaway database, a mail catcher and the built app.
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startAppServer } from "./app-server.ts";
import { dropDatabase, ensureClusterUp, prepareDatabase, recreateDatabase } from "./databases.ts";
import { startMailCatcher } from "./mail-catcher.ts";

declare module "vitest" {
  export interface ProvidedContext {
    appUrl: string;
    mailDir: string;
    databaseUrl: string;
    smtpPort: number;
  }
}

const root = path.resolve(import.meta.dirname, "../..");

export async function startTestApp(project: TestProject, databaseName: string): Promise<() => Promise<void>> {
  ensureClusterUp();
  if (!existsSync(path.join(root, "build/server/index.js"))) {
    execFileSync(path.join(root, "node_modules/.bin/react-router"), ["build"], { cwd: root, stdio: "ignore" });
  }
  const databaseUrl = await recreateDatabase(databaseName);
  await prepareDatabase(databaseUrl, { seed: true });
  const mailDir = mkdtempSync(path.join(os.tmpdir(), "betasift-mail-"));
  const catcher = await startMailCatcher(mailDir);
  const app = await startAppServer({ DATABASE_URL: databaseUrl, SMTP_PORT: String(catcher.port) });
  project.provide("appUrl", app.url);
  project.provide("mailDir", mailDir);
  project.provide("databaseUrl", databaseUrl);
  project.provide("smtpPort", catcher.port);
  return async () => {
    await app.stop();
    await catcher.stop();
    rmSync(mailDir, { recursive: true, force: true });
    await dropDatabase(databaseName);
  };
}
