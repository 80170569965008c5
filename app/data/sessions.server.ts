// Server-side sessions: the browser holds a random id, the database holds its SHA-256 hash and the data.
import { QueryTypes } from "sequelize";
import { db } from "#app/lib/db.server.ts";
import { hashRandomId, newRandomId } from "./random-ids.server.ts";
import { PERSON_COLUMNS, sqlToPerson, type Person, type PersonSql } from "./person-row.server.ts";

export type SessionRecord = Record<string, unknown>;

function userIdIn(data: SessionRecord): string | null {
  return typeof data.userId === "string" ? data.userId : null;
}

export async function createSessionRow(data: SessionRecord, expiresAt: Date): Promise<string> {
  const id = newRandomId();
  await db().sequelize.query(
    `INSERT INTO sessions (id_hash, user_id, data, created_at, last_seen_at, expires_at) VALUES (:hash, :userId, :data, now(), now(), :expiresAt)`,
    { replacements: { hash: hashRandomId(id), userId: userIdIn(data), data: JSON.stringify(data), expiresAt } },
  );
  return id;
}

export async function readSessionRow(id: string): Promise<SessionRecord | null> {
  const [row] = await db().sequelize.query<{ data: SessionRecord }>(`SELECT data FROM sessions WHERE id_hash = :hash AND expires_at > now()`, {
    replacements: { hash: hashRandomId(id) },
    type: QueryTypes.SELECT,
  });
  return row?.data ?? null;
}

/** Updates a live session only: an ended session is never brought back by a late write. */
export async function updateSessionRow(id: string, data: SessionRecord, expiresAt: Date): Promise<void> {
  await db().sequelize.query(`UPDATE sessions SET data = :data, user_id = :userId, expires_at = :expiresAt WHERE id_hash = :hash`, {
    replacements: { hash: hashRandomId(id), userId: userIdIn(data), data: JSON.stringify(data), expiresAt },
  });
}

export async function deleteSessionRow(id: string): Promise<void> {
  await db().sequelize.query(`DELETE FROM sessions WHERE id_hash = :hash`, { replacements: { hash: hashRandomId(id) } });
}

/** Ends every session of one person ("sign out everywhere", deactivation); returns how many ended. */
export async function deleteSessionsOf(userId: string): Promise<number> {
  const [, result] = await db().sequelize.query(`DELETE FROM sessions WHERE user_id = :userId`, { replacements: { userId } });
  return (result as { rowCount?: number } | undefined)?.rowCount ?? 0;
}

export async function countSessionsOf(userId: string): Promise<number> {
  const [row] = await db().sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM sessions WHERE user_id = :userId AND expires_at > now()`, {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
  return row?.n ?? 0;
}

/** The active person behind a live session id, in one statement: this runs on every signed-in request. */
export async function findSessionPerson(id: string): Promise<Person | null> {
  const [row] = await db().sequelize.query<PersonSql>(
    `SELECT ${PERSON_COLUMNS} FROM sessions s JOIN users u ON u.id = s.user_id LEFT JOIN teams t ON t.id = u.team_id
     WHERE s.id_hash = :hash AND s.expires_at > now() AND u.active`,
    { replacements: { hash: hashRandomId(id) }, type: QueryTypes.SELECT, raw: true },
  );
  return row ? sqlToPerson(row) : null;
}

export async function sweepExpiredSessions(): Promise<void> {
  await db().sequelize.query(`DELETE FROM sessions WHERE expires_at <= now()`);
}
