// Work that must outlive a request goes through a PostgreSQL-backed queue (pg-boss), never in-process timers.
import PgBoss from "pg-boss";
import { getIntakeReport } from "#app/data/intake-report.server.ts";
import { env } from "./env.server.ts";
import { intakeReportMail } from "./intake-report-mail.ts";
import { sendMail } from "./mail.server.ts";

export const INTAKE_REPORT_QUEUE = "intake-report";

export interface IntakeReportJob {
  intakeId: string;
  /** Origin the librarian used (for the link back); null falls back to the server's own address. */
  origin: string | null;
}

// One boss per process, started on first use; its schema lives in the app database.
let starting: Promise<PgBoss> | undefined;
let stopHooked = false;

function fallbackOrigin(): string {
  return `http://${process.env.HOST ?? "127.0.0.1"}:${process.env.PORT ?? "3000"}`;
}

async function sendIntakeReport(job: IntakeReportJob): Promise<void> {
  const report = await getIntakeReport(job.intakeId);
  if (!report) return;
  const link = `${job.origin ?? fallbackOrigin()}/intakes/${job.intakeId}`;
  await sendMail(intakeReportMail({ ...report, link }));
}

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: env().DATABASE_URL, schema: "pgboss", max: 3 });
  boss.on("error", (error: Error) => console.error(`job queue: ${error.message}`));
  await boss.start();
  await boss.createQueue(INTAKE_REPORT_QUEUE, { name: INTAKE_REPORT_QUEUE, retryLimit: 5, retryDelay: 30, retryBackoff: true });
  await boss.work<IntakeReportJob>(INTAKE_REPORT_QUEUE, { pollingIntervalSeconds: 1 }, async (jobs) => {
    for (const job of jobs) await sendIntakeReport(job.data);
  });
  if (!stopHooked) {
    stopHooked = true;
    // react-router-serve closes its HTTP server on SIGTERM; the boss must let go of its pool too, or the process lingers.
    process.once("SIGTERM", () => void stopJobs());
  }
  return boss;
}

/** The process's job queue, started (with its workers) on first use. */
export function jobs(): Promise<PgBoss> {
  starting ??= startBoss().catch((error: unknown) => {
    starting = undefined;
    throw error;
  });
  return starting;
}

/** Starts the queue's workers now, e.g. so jobs queued before a restart are picked up. */
export async function startJobs(): Promise<void> {
  await jobs();
}

export async function stopJobs(): Promise<void> {
  const current = starting;
  starting = undefined;
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
