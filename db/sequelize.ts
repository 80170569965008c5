import pg from "pg";
import { Sequelize } from "sequelize";
import { env } from "#app/lib/env.server.ts";

// NUMERIC and BIGINT arrive as strings by default; the data layer converts them at its boundary.
const globalForDb = globalThis as unknown as { betasiftSequelize?: Sequelize };

function createSequelize(url: string): Sequelize {
  return new Sequelize(url, {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000 },
    define: { underscored: true },
  });
}

/** One Sequelize instance per process, kept across dev-server reloads. */
export function getSequelize(): Sequelize {
  globalForDb.betasiftSequelize ??= createSequelize(env().DATABASE_URL);
  return globalForDb.betasiftSequelize;
}

export async function closeSequelize(): Promise<void> {
  const instance = globalForDb.betasiftSequelize;
  globalForDb.betasiftSequelize = undefined;
  await instance?.close();
}
