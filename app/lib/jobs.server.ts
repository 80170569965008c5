// Work that must outlive a request goes through a PostgreSQL-backed queue (pg-boss), never in-process timers.
// Requests only queue; the workers start once, when a server process boots (startJobWorkers).
import PgBoss from "pg-boss";
import { getIntakeReport } from "#app/data/intake-report.server.ts";
import { findPersonByEmail } from "#app/data/users.server.ts";
import { env } from "./env.server.ts";
import { intakeReportMail } from "./intake-report-mail.ts";
import { sendMail } from "./mail.server.ts";
import { publicUrl } from "./public-url.server.ts";
import { seal, unseal } from "./seal.server.ts";
import { signInCodeMail } from "./sign-in-mail.ts";

export const INTAKE_REPORT_QUEUE = "intake-report";
export const SIGN_IN_MAIL_QUEUE = "sign-in-mail";

export interface IntakeReportJob {
  intakeId: string;
}

/** The code and link travel sealed: the job table never holds a usable sign-in code. */
interface SignInMailJob {
  sealed: string;
}

interface SignInMailContent {
  email: string;
  code: string;
  magicLink: string;
}

// One boss per process, started on first use; its schema lives in the app database.
let starting: Promise<PgBoss> | undefined;
let workersStarted = false;

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: env().DATABASE_URL, schema: "pgboss", max: 3 });
  boss.on("error", (error: Error) => console.error(`job queue: ${error.message}`));
  await boss.start();
  await boss.createQueue(INTAKE_REPORT_QUEUE, { name: INTAKE_REPORT_QUEUE, retryLimit: 5, retryDelay: 30, retryBackoff: true });
  // A sign-in code is worth nothing after its period, so its e-mail stops being retried then.
  await boss.createQueue(SIGN_IN_MAIL_QUEUE, {
    name: SIGN_IN_MAIL_QUEUE,
    retryLimit: 8,
    retryDelay: 5,
    retryBackoff: true,
    expireInSeconds: 60,
    retentionSeconds: Math.max(env().TOTP_PERIOD_SECONDS, 300),
  });
  return boss;
}

/** The process's job queue, started on first use. */
export function jobs(): Promise<PgBoss> {
  starting ??= startBoss().catch((error: unknown) => {
    starting = undefined;
    throw error;
  });
  return starting;
}

async function sendIntakeReport(job: IntakeReportJob): Promise<void> {
  const report = await getIntakeReport(job.intakeId);
  if (!report) return;
  await sendMail(intakeReportMail({ ...report, link: publicUrl(`/intakes/${job.intakeId}`) }));
}

// Unknown and deactivated addresses were queued like known ones (same work, same time for the asker); they end here.
async function sendSignInMail(job: SignInMailJob): Promise<void> {
  const content = unseal(job.sealed) as SignInMailContent | null;
  if (!content) return;
  const person = await findPersonByEmail(content.email);
  if (!person || !person.active) return;
  await sendMail(
    signInCodeMail({ to: person.email, displayName: person.displayName, code: content.code, magicLink: content.magicLink, minutes: env().TOTP_PERIOD_SECONDS / 60 }),
  );
}

/**
 * Works a queue in batches (pg-boss waits a polling interval between fetches, so one job per fetch would
 * trickle), failing only the jobs that failed: the others in the batch are completed and never sent twice.
 */
async function workEach<T extends object>(boss: PgBoss, queue: string, pollingIntervalSeconds: number, handle: (data: T) => Promise<void>) {
  await boss.work<T>(queue, { pollingIntervalSeconds, batchSize: 10 }, async (batch) => {
    for (const job of batch) {
      try {
        await handle(job.data);
      } catch (error) {
        await boss.fail(queue, job.id, { message: error instanceof Error ? error.message : String(error) });
      }
    }
  });
}

/** Starts this process's workers; called once when a server process boots. */
export async function startJobWorkers(): Promise<void> {
  if (workersStarted) return;
  workersStarted = true;
  const boss = await jobs();
  await workEach<IntakeReportJob>(boss, INTAKE_REPORT_QUEUE, 1, sendIntakeReport);
  await workEach<SignInMailJob>(boss, SIGN_IN_MAIL_QUEUE, 0.5, sendSignInMail);
}

export async function stopJobs(): Promise<void> {
  const current = starting;
  starting = undefined;
  workersStarted = false;
  if (!current) return;
  const boss = await current.catch(() => null);
  await boss?.stop({ graceful: true, timeout: 5_000, close: true });
}

/** Queues the intake report e-mail to the librarian who uploaded the file. */
export async function queueIntakeReport(job: IntakeReportJob): Promise<void> {
  try {
    const boss = await jobs();
    await boss.send(INTAKE_REPORT_QUEUE, job, { singletonKey: job.intakeId });
  } catch (error) {
    // The commit itself stands; a report that cannot be queued is logged, not turned into a failed commit.
    console.error(`intake report for ${job.intakeId} not queued: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** Queues a sign-in code e-mail; throws when the queue cannot take it, so the person is told. */
export async function queueSignInMail(content: SignInMailContent): Promise<void> {
  const boss = await jobs();
  await boss.send(SIGN_IN_MAIL_QUEUE, { sealed: seal(content) } satisfies SignInMailJob);
}
