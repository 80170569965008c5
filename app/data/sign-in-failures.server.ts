import { createHash } from "node:crypto";
import { QueryTypes } from "sequelize";
import { db } from "#app/lib/db.server.ts";

function hashOf(challenge: string): string {
  return createHash("sha256").update(challenge).digest("hex");
}

export async function countFailures(challenge: string): Promise<number> {
  const rows = await db().sequelize.query<{ failures: number }>(`SELECT failures FROM sign_in_failures WHERE challenge_hash = :hash`, {
    replacements: { hash: hashOf(challenge) },
    type: QueryTypes.SELECT,
  });
  return rows[0]?.failures ?? 0;
}

/** Records one wrong code for this challenge and returns the new count; day-old challenges are swept. */
export async function recordFailure(challenge: string): Promise<number> {
  const { sequelize } = db();
  await sequelize.query(`DELETE FROM sign_in_failures WHERE created_at < now() - interval '1 day'`);
  const rows = await sequelize.query<{ failures: number }>(
    `INSERT INTO sign_in_failures (challenge_hash, failures, created_at) VALUES (:hash, 1, now())
     ON CONFLICT (challenge_hash) DO UPDATE SET failures = sign_in_failures.failures + 1
     RETURNING failures`,
    { replacements: { hash: hashOf(challenge) }, type: QueryTypes.SELECT },
  );
  return rows[0]?.failures ?? 1;
}
