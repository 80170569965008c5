// The browser tests' login fixture: a session is written straight into the database and its signed cookie put
// in the browser, the way the server would after a sign-in, without the e-mail round trip. One browser test
// (tests/e2e/sign-in.test.ts) still signs in through the real e-mail.
import { createHash, randomBytes } from "node:crypto";
import pg from "pg";
import type { BrowserContext, Page } from "playwright-core";
import { createCookie } from "react-router";
import { inject } from "vitest";
import { TEST_SECRETS } from "./app-server.ts";

const SESSION_DAYS = 14;

export async function loginAs(target: Page | BrowserContext, email: string): Promise<void> {
  const id = randomBytes(32).toString("base64url");
  const client = new pg.Client({ connectionString: inject("databaseUrl") });
  await client.connect();
  try {
    const person = await client.query<{ id: string }>(`SELECT id FROM users WHERE email = $1 AND active`, [email.toLowerCase()]);
    const userId = person.rows[0]?.id;
    if (!userId) throw new Error(`no active person ${email} to sign in`);
    await client.query(
      `INSERT INTO sessions (id_hash, user_id, data, created_at, last_seen_at, expires_at)
       VALUES ($1, $2, $3, now(), now(), now() + make_interval(days => $4))`,
      [createHash("sha256").update(id).digest("hex"), userId, JSON.stringify({ userId }), SESSION_DAYS],
    );
  } finally {
    await client.end();
  }
  const cookie = createCookie("__betasift", { secrets: [TEST_SECRETS.SESSION_SECRET], path: "/", httpOnly: true, sameSite: "lax" });
  const value = (await cookie.serialize(id)).split(";")[0]!.slice("__betasift=".length);
  const context = "context" in target ? target.context() : target;
  await context.addCookies([{ name: "__betasift", value, url: inject("appUrl"), httpOnly: true, sameSite: "Lax" }]);
}
