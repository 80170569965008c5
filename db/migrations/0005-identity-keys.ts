import { QueryTypes, type QueryInterface, type Transaction } from "sequelize";
import type { MigrationFn } from "umzug";
import { identityKey } from "#app/domain/intake/identity.ts";

// Parts and offers are found by keys the app computes (app/domain/intake/identity.ts: NFKC, invisible characters
// removed, spaces collapsed, case folded), stored beside the names. PostgreSQL's lower() follows the database's ctype
// and folds neither a final sigma nor "İ" the way the app does, so it must compare the app's keys, not fold itself.

async function backfill(qi: QueryInterface, transaction: Transaction, table: string, columns: ReadonlyArray<[source: string, key: string]>): Promise<void> {
  const rows = await qi.sequelize.query<Record<string, string>>(`SELECT id, ${columns.map(([source]) => source).join(", ")} FROM ${table}`, {
    type: QueryTypes.SELECT,
    transaction,
  });
  if (rows.length === 0) return;
  const sets = columns.map(([, key], i) => `${key} = k.c${i}`).join(", ");
  const arrays = columns.map((_, i) => `$${i + 2}::text[]`).join(", ");
  const names = columns.map((_, i) => `c${i}`).join(", ");
  await qi.sequelize.query(`UPDATE ${table} t SET ${sets} FROM unnest($1::uuid[], ${arrays}) AS k(id, ${names}) WHERE t.id = k.id`, {
    bind: [rows.map((r) => r.id), ...columns.map(([source]) => rows.map((r) => identityKey(r[source]!)))],
    transaction,
  });
}

// Two rows that were distinct by lower(trim()) may be one by the new keys: say which, rather than fail on the index.
async function refuseDuplicates(qi: QueryInterface, transaction: Transaction, sql: string, what: string): Promise<void> {
  const [duplicate] = await qi.sequelize.query<{ names: string }>(sql, { type: QueryTypes.SELECT, transaction });
  if (duplicate) throw new Error(`${what} differ only by look-alike characters (${duplicate.names}); merge or rename them, then migrate again`);
}

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`ALTER TABLE parts ADD COLUMN manufacturer_key text, ADD COLUMN part_number_key text`);
    await run(`ALTER TABLE offers ADD COLUMN supplier_key text`);
    await backfill(qi, transaction, "parts", [
      ["manufacturer", "manufacturer_key"],
      ["part_number", "part_number_key"],
    ]);
    await backfill(qi, transaction, "offers", [["supplier", "supplier_key"]]);
    await refuseDuplicates(
      qi,
      transaction,
      `SELECT string_agg(manufacturer || ' ' || part_number, ', ') AS names FROM parts GROUP BY manufacturer_key, part_number_key HAVING count(*) > 1 LIMIT 1`,
      "Parts",
    );
    await refuseDuplicates(qi, transaction, `SELECT string_agg(supplier, ', ') AS names FROM offers GROUP BY part_id, supplier_key HAVING count(*) > 1 LIMIT 1`, "Offers of one part");
    await run(`ALTER TABLE parts ALTER COLUMN manufacturer_key SET NOT NULL, ALTER COLUMN part_number_key SET NOT NULL`);
    await run(`ALTER TABLE offers ALTER COLUMN supplier_key SET NOT NULL`);
    await run(`DROP INDEX parts_identity`);
    await run(`CREATE UNIQUE INDEX parts_identity_key ON parts (manufacturer_key, part_number_key)`);
    await run(`DROP INDEX offers_part_supplier`);
    await run(`CREATE UNIQUE INDEX offers_part_supplier_key ON offers (part_id, supplier_key)`);
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`DROP INDEX IF EXISTS offers_part_supplier_key`);
    await run(`DROP INDEX IF EXISTS parts_identity_key`);
    await run(`ALTER TABLE offers DROP COLUMN supplier_key`);
    await run(`ALTER TABLE parts DROP COLUMN manufacturer_key, DROP COLUMN part_number_key`);
    await run(`CREATE UNIQUE INDEX offers_part_supplier ON offers (part_id, lower(trim(supplier)))`);
    await run(`CREATE UNIQUE INDEX parts_identity ON parts (lower(trim(manufacturer)), lower(trim(part_number)))`);
  });
};
