import { ConnectionAcquireTimeoutError, ConnectionError } from "sequelize";
import { initModels } from "#db/models/index.ts";

/** The app's models, initialised once per process. Only app/data imports this. */
export function db() {
  return initModels();
}

export async function databaseAnswers(): Promise<boolean> {
  try {
    await db().sequelize.query("SELECT 1");
    return true;
  } catch {
    return false;
  }
}

// Connection failures, and the server telling us it is shutting down or starting (SQLSTATE classes 08 and 57P).
const UNAVAILABLE_SQLSTATES = new Set(["57P01", "57P02", "57P03", "08000", "08001", "08003", "08004", "08006"]);
const UNAVAILABLE_NODE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "ENOTFOUND", "EAI_AGAIN"]);

/** Whether an error means the database cannot be reached just now (as opposed to a bug or bad data). */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (let current: unknown = error, depth = 0; current && depth < 4; depth += 1) {
    if (current instanceof ConnectionError || current instanceof ConnectionAcquireTimeoutError) return true;
    const { code, message } = current as { code?: unknown; message?: unknown };
    if (typeof code === "string" && (UNAVAILABLE_SQLSTATES.has(code) || UNAVAILABLE_NODE_CODES.has(code))) return true;
    if (typeof message === "string" && /Connection terminated|connection is closed|Client has encountered a connection error/i.test(message)) return true;
    current = (current as { original?: unknown; parent?: unknown; cause?: unknown }).original ?? (current as { parent?: unknown }).parent ?? (current as { cause?: unknown }).cause;
  }
  return false;
}

export const DATABASE_UNAVAILABLE_MESSAGE = "Betasift cannot reach its database just now. Nothing was changed; try again in a minute.";
