import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug, type MigrationFn } from "umzug";
import { seeds } from "#seeds/index.ts";
import { migrations } from "./migrations/index.ts";

interface Step {
  name: string;
  up: MigrationFn<QueryInterface>;
  down: MigrationFn<QueryInterface>;
}

function createUmzug(sequelize: Sequelize, steps: Step[], metaTable: string) {
  return new Umzug<QueryInterface>({
    migrations: steps.map((step) => ({ name: step.name, up: step.up, down: step.down })),
    context: sequelize.getQueryInterface(),
    // A distinct model name per table: umzug reuses an already-defined model of the same name.
    storage: new SequelizeStorage({ sequelize, tableName: metaTable, modelName: metaTable }),
    logger: undefined,
  });
}

/** Schema migrations (db/migrations), recorded in migration_meta. */
export function createMigrator(sequelize: Sequelize) {
  return createUmzug(sequelize, migrations, "migration_meta");
}

/** Demo seeds (seeds/), recorded in their own seeder_meta table. */
export function createSeeder(sequelize: Sequelize) {
  return createUmzug(sequelize, seeds, "seeder_meta");
}

/** After the schema went down to zero the demo data is gone with it; forget that it was seeded. */
export async function forgetSeeds(sequelize: Sequelize): Promise<void> {
  await sequelize.getQueryInterface().dropTable("seeder_meta");
}
