// Shared by the integration and browser projects: a throwaway database, a mail catcher and the built app.
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startAppServer } from "./app-server.ts";
import { ensureFreshBuildLocked } from "./build.ts";
import { dropDatabase, ensureClusterUp, perRunName, prepareDatabase, recreateDatabase } from "./databases.ts";
import { startMailCatcher } from "./mail-catcher.ts";

declare module "vitest" {
  export interface ProvidedContext {
    appUrl: string;
    mailDir: string;
    databaseUrl: string;
    smtpPort: number;
  }
}

export async function startTestApp(project: TestProject, baseName: string): Promise<() => Promise<void>> {
  const databaseName = perRunName(baseName);
  ensureClusterUp();
  ensureFreshBuildLocked();
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
