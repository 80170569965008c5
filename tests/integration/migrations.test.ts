import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Sequelize } from "sequelize";
import { createMigrator } from "#db/migrator.ts";
import { connect, dropDatabase, perRunName, recreateDatabase } from "../setup/databases.ts";

const DATABASE = perRunName("betasift_test_migrations");

async function tables(sequelize: Sequelize): Promise<string[]> {
  const [rows] = await sequelize.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
  return (rows as { tablename: string }[]).map((r) => r.tablename).filter((t) => t !== "migration_meta");
}

describe("migrations", () => {
  let sequelize: Sequelize;

  beforeAll(async () => {
    sequelize = connect(await recreateDatabase(DATABASE));
  });

  afterAll(async () => {
    await sequelize.close();
    await dropDatabase(DATABASE);
  });

  it("go all the way up, down to zero, and up again", async () => {
    const migrator = createMigrator(sequelize);
    const all = await migrator.pending();
    expect(all.length).toBeGreaterThan(0);

    await migrator.up();
    const afterUp = await tables(sequelize);
    expect(afterUp).toEqual(expect.arrayContaining(["users", "user_roles", "teams", "sessions", "sign_in_challenges", "rate_limits"]));
    expect(afterUp).not.toContain("sign_in_failures");
    expect(await migrator.pending()).toEqual([]);

    await migrator.down({ to: 0 });
    expect(await tables(sequelize)).toEqual([]);
    expect((await migrator.executed()).length).toBe(0);

    await migrator.up();
    expect(await tables(sequelize)).toEqual(afterUp);
  });
});
