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
