import path from "node:path";
import { fileURLToPath } from "node:url";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));

function createUmzug(sequelize: Sequelize, folder: string, metaTable: string) {
  return new Umzug<QueryInterface>({
    migrations: { glob: ["[0-9]*.ts", { cwd: path.join(root, folder), ignore: ["*.test.ts"] }] },
    context: sequelize.getQueryInterface(),
    // A distinct model name per table: umzug reuses an already-defined model of the same name.
    storage: new SequelizeStorage({ sequelize, tableName: metaTable, modelName: metaTable }),
    logger: undefined,
  });
}

/** Schema migrations in db/migrations, recorded in migration_meta. */
export function createMigrator(sequelize: Sequelize) {
  return createUmzug(sequelize, "db/migrations", "migration_meta");
}

/** Demo seeds in seeds/, recorded in their own seeder_meta table. */
export function createSeeder(sequelize: Sequelize) {
  return createUmzug(sequelize, "seeds", "seeder_meta");
}

/** After the schema went down to zero the demo data is gone with it; forget that it was seeded. */
export async function forgetSeeds(sequelize: Sequelize): Promise<void> {
  await sequelize.getQueryInterface().dropTable("seeder_meta");
}
