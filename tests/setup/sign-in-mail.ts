// Sign-in e-mails go out through the job queue, after the request has been answered. A test that asks for a
// code first waits for the queue to be idle, so the next e-mail to the address is the one its request caused.
import pg from "pg";
import { readMails, type CaughtMail } from "./mail-catcher.ts";

const POLL_MS = 100;
const WAIT_MS = 30_000;

async function pendingSignInMails(databaseUrl: string): Promise<number> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const result = await client.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'sign-in-mail' AND state IN ('created', 'retry', 'active')`,
    );
    return result.rows[0]?.n ?? 0;
  } catch (error) {
    // Before the first server has started its queue there is no pgboss schema, and so nothing pending.
    if ((error as { code?: string }).code === "42P01" || (error as { code?: string }).code === "3F000") return 0;
    throw error;
  } finally {
    await client.end();
  }
}

export async function waitForSignInQueueIdle(databaseUrl: string): Promise<void> {
  const deadline = Date.now() + WAIT_MS;
  while ((await pendingSignInMails(databaseUrl)) > 0) {
    if (Date.now() > deadline) throw new Error(`sign-in e-mails still queued after ${WAIT_MS} ms`);
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
}

/** Runs `cause` (a request that asks for a code) and returns its result with the sign-in e-mail it caused. */
export async function mailCausedBy<T>(input: { mailDir: string; databaseUrl: string; to: string }, cause: () => Promise<T>): Promise<{ result: T; mail: CaughtMail }> {
  await waitForSignInQueueIdle(input.databaseUrl);
  const to = input.to.toLowerCase();
  // Other e-mails to the same person (intake reports) arrive on their own schedule; only sign-in codes count.
  const mailsTo = () => readMails(input.mailDir).filter((mail) => mail.to.includes(to) && mail.subject.startsWith("Betasift sign-in code"));
  const before = mailsTo().length;
  const result = await cause();
  const deadline = Date.now() + WAIT_MS;
  for (;;) {
    const mails = mailsTo();
    if (mails.length > before) return { result, mail: mails[before]! };
    if (Date.now() > deadline) throw new Error(`no e-mail to ${to} within ${WAIT_MS} ms`);
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
}
