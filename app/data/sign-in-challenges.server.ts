// One e-mailed code in flight. The browser holds only a random id; the address, the strategy's sealed state,
// the tries left and whether it was used live here, so no cookie edit can change who signs in.
import { QueryTypes } from "sequelize";
import { db } from "#app/lib/db.server.ts";
import { hashRandomId, newRandomId } from "./random-ids.server.ts";

export const CHALLENGE_ERRORS = ["invalid-code", "expired", "too-many-attempts", "used", "no-account"] as const;
export type ChallengeError = (typeof CHALLENGE_ERRORS)[number];

export interface SignInChallenge {
  email: string;
  sealedCode: string;
  redirectTo: string | null;
  attempts: number;
  lastError: ChallengeError | null;
  expired: boolean;
  consumed: boolean;
}

interface ChallengeSql {
  email: string;
  sealed_code: string;
  redirect_to: string | null;
  attempts: number;
  last_error: ChallengeError | null;
  expired: boolean;
  consumed: boolean;
}

/** Stores a new challenge and returns the random id for the browser; day-old challenges are swept on the way. */
export async function createChallenge(input: { email: string; sealedCode: string; redirectTo: string | null; lifetimeSeconds: number }): Promise<string> {
  const id = newRandomId();
  const { sequelize } = db();
  await sequelize.query(`DELETE FROM sign_in_challenges WHERE created_at < now() - interval '1 day'`);
  await sequelize.query(
    `INSERT INTO sign_in_challenges (id_hash, email, sealed_code, redirect_to, attempts, created_at, expires_at)
     VALUES (:hash, :email, :sealedCode, :redirectTo, 0, now(), now() + make_interval(secs => :lifetime))`,
    { replacements: { hash: hashRandomId(id), email: input.email, sealedCode: input.sealedCode, redirectTo: input.redirectTo, lifetime: input.lifetimeSeconds } },
  );
  return id;
}

export async function findChallenge(id: string): Promise<SignInChallenge | null> {
  const [row] = await db().sequelize.query<ChallengeSql>(
    `SELECT email, sealed_code, redirect_to, attempts, last_error, expires_at <= now() AS expired, consumed_at IS NOT NULL AS consumed
     FROM sign_in_challenges WHERE id_hash = :hash`,
    { replacements: { hash: hashRandomId(id) }, type: QueryTypes.SELECT },
  );
  if (!row) return null;
  return {
    email: row.email,
    sealedCode: row.sealed_code,
    redirectTo: row.redirect_to,
    attempts: row.attempts,
    lastError: row.last_error,
    expired: row.expired,
    consumed: row.consumed,
  };
}

/**
 * Takes one try before the code is checked, in one statement, so parallel guesses cannot share a try.
 * Returns false when no try is left (used, expired or out of tries).
 */
export async function takeAttempt(id: string, maxAttempts: number): Promise<boolean> {
  const rows = await db().sequelize.query<{ attempts: number }>(
    `UPDATE sign_in_challenges SET attempts = attempts + 1
     WHERE id_hash = :hash AND consumed_at IS NULL AND expires_at > now() AND attempts < :maxAttempts
     RETURNING attempts`,
    { replacements: { hash: hashRandomId(id), maxAttempts }, type: QueryTypes.SELECT },
  );
  return rows.length === 1;
}

/** Marks the challenge used; only the first of two racing successes gets true. */
export async function consumeChallenge(id: string): Promise<boolean> {
  const rows = await db().sequelize.query<{ email: string }>(
    `UPDATE sign_in_challenges SET consumed_at = now(), last_error = NULL
     WHERE id_hash = :hash AND consumed_at IS NULL AND expires_at > now() RETURNING email`,
    { replacements: { hash: hashRandomId(id) }, type: QueryTypes.SELECT },
  );
  return rows.length === 1;
}

export async function recordChallengeError(id: string, error: ChallengeError): Promise<void> {
  await db().sequelize.query(`UPDATE sign_in_challenges SET last_error = :error WHERE id_hash = :hash`, {
    replacements: { hash: hashRandomId(id), error },
  });
}
