// A re-import that replaces a manufacturer's parts may leave some out: they are listed in the preview, never deleted.
import { QueryTypes, type Transaction } from "sequelize";
import { db } from "#app/lib/db.server.ts";

export interface MissingPart {
  id: string;
  manufacturer: string;
  partNumber: string;
}

/** Parts listed per intake; the count says how many there are in all. */
export const MISSING_LISTED = 500;

/**
 * Catalogue parts of the re-imported manufacturers (by identity key) that no row of the file names.
 * `namedKeys` are the part keys (`manufacturerKey\0partNumberKey`) of every row that named a part, rejected or not.
 */
export async function findMissingParts(
  manufacturerKeys: readonly string[],
  namedKeys: readonly string[],
  transaction?: Transaction,
): Promise<{ parts: MissingPart[]; total: number }> {
  if (manufacturerKeys.length === 0) return { parts: [], total: 0 };
  const named = namedKeys.map((key) => key.split("\u0000"));
  const rows = await db().sequelize.query<{ id: string; manufacturer: string; part_number: string; total: number }>(
    `SELECT p.id, p.manufacturer, p.part_number, count(*) OVER ()::int AS total
     FROM parts p
     WHERE p.manufacturer_key = ANY($1::text[])
       AND NOT EXISTS (SELECT 1 FROM unnest($2::text[], $3::text[]) AS k(m, n) WHERE k.m = p.manufacturer_key AND k.n = p.part_number_key)
     ORDER BY p.manufacturer_key, p.part_number_key
     LIMIT ${MISSING_LISTED}`,
    { bind: [manufacturerKeys, named.map((k) => k[0]), named.map((k) => k[1])], type: QueryTypes.SELECT, transaction },
  );
  return { parts: rows.map((r) => ({ id: r.id, manufacturer: r.manufacturer, partNumber: r.part_number })), total: rows[0]?.total ?? 0 };
}
