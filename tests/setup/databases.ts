import { execFileSync } from "node:child_process";
import path from "node:path";
import pg from "pg";
import { Sequelize } from "sequelize";
import { createMigrator, createSeeder } from "#db/migrator.ts";

const root = path.resolve(import.meta.dirname, "../..");

/** The cluster's URL for a database name (the cluster is started by the test command or by globalSetup). */
export function databaseUrl(name: string): string {
  const base = execFileSync("bash", [path.join(root, "docker-free-pg.sh"), "url", "test"], { encoding: "utf8" }).trim();
  return base.replace(/\/[^/]+$/, `/${name}`);
}

export function ensureClusterUp(): void {
  execFileSync("bash", [path.join(root, "docker-free-pg.sh"), "up"], { stdio: ["ignore", "ignore", "inherit"] });
}

async function withMaintenanceClient<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrl("postgres") });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Test runs side by side (in one checkout or several) each get databases of their own. */
export function perRunName(name: string): string {
  return `${name}_${(process.env.BETASIFT_TEST_RUN ?? String(process.pid)).replace(/[^a-z0-9_]/gi, "").toLowerCase()}`;
}

/** Drops and creates a throwaway database for one test project. */
export async function recreateDatabase(name: string): Promise<string> {
  await withMaintenanceClient(async (client) => {
    await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${name}"`);
  });
  return databaseUrl(name);
}

/** Drops a test database; retried because an autovacuum worker can briefly hold it even under FORCE. */
export async function dropDatabase(name: string): Promise<void> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      await withMaintenanceClient((client) => client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
      return;
    } catch (error) {
      if (attempt >= 5) throw error;
      await new Promise((resolve) => setTimeout(resolve, 500 * attempt));
    }
  }
}

export function connect(url: string): Sequelize {
  return new Sequelize(url, { dialect: "postgres", dialectModule: pg, logging: false, define: { underscored: true } });
}

/** Migrates, and optionally loads the demo, through the same umzug runners as the app. */
export async function prepareDatabase(url: string, options: { seed: boolean }): Promise<void> {
  const sequelize = connect(url);
  try {
    await createMigrator(sequelize).up();
    if (options.seed) {
      // Seeds use the app's own model setup, which reads DATABASE_URL once.
      process.env.DATABASE_URL = url;
      await createSeeder(sequelize).up();
      const { closeSequelize } = await import("#db/sequelize.ts");
      await closeSequelize();
    }
  } finally {
    await sequelize.close();
  }
}
