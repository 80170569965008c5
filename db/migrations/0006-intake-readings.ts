import type { QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// What a preview understood and noticed, kept with the intake as it was at preview:
// readings of cells not taken literally (grouped by column and text), and catalogue parts a re-import leaves out.
const UP = [
  `ALTER TABLE intakes ADD COLUMN readings json NOT NULL DEFAULT '[]', ADD COLUMN readings_not_listed integer NOT NULL DEFAULT 0`,
  `ALTER TABLE intakes ADD COLUMN missing_parts json NOT NULL DEFAULT '[]', ADD COLUMN missing_count integer NOT NULL DEFAULT 0`,
  // The intakes list pages through every intake, newest first.
  `CREATE INDEX intakes_created_at_id ON intakes (created_at DESC, id DESC)`,
];

const DOWN = [
  `DROP INDEX IF EXISTS intakes_created_at_id`,
  `ALTER TABLE intakes DROP COLUMN missing_parts, DROP COLUMN missing_count`,
  `ALTER TABLE intakes DROP COLUMN readings, DROP COLUMN readings_not_listed`,
];

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    for (const sql of UP) await qi.sequelize.query(sql, { transaction });
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    for (const sql of DOWN) await qi.sequelize.query(sql, { transaction });
  });
};
