/**
 * What each queue does, and the workers that do it. The production server starts them
 * (scripts/serve.ts); so does the development server (instrumentation.ts) and the test helper
 * (tests/integration/support/jobs.ts, which runs the same handlers on demand).
 */
import type PgBoss from "pg-boss";
import { db } from "@/lib/platform/db";
import { log } from "@/lib/platform/log";
import { type QueuedMail, fromQueued, sendMail } from "@/lib/platform/mail";
import { photoStore } from "@/lib/garage/photos/s3";
import { sweepOrphanPhotos } from "@/lib/garage/photos/sweep";
import { purgeExpiredKeys } from "@/lib/platform/http/idempotencyQueries";
import { expireDue } from "@/lib/shop/quotes/queries";
import { queueDueReminders } from "@/lib/shop/bookings/queries";
import { queueDueRechecks } from "@/lib/shop/workOrders/queries";
import { type BossOptions, type QueueName, QUEUES, getBoss, pollSeconds } from "./boss";

/** Every 15 minutes. The read paths already show a quote past its date as expired; this writes it down. */
export const QUOTE_EXPIRY_CRON = "*/15 * * * *";

/** Every 10 minutes: an object a crash left without its row lives at most grace + 10 minutes. */
export const PHOTO_SWEEP_CRON = "*/10 * * * *";
/** Hourly, off the hour. */
export const IDEMPOTENCY_PURGE_CRON = "17 * * * *";
/** Hourly: each shop's reminders go out in the first run after 9:00 on its own clock the day before. */
export const BOOKING_REMINDER_CRON = "7 * * * *";
/** Hourly: a re-check mail leaves within the hour its date comes. */
export const RECHECK_REMINDER_CRON = "37 * * * *";

type Handler = (job: PgBoss.Job<object>) => Promise<unknown>;

export const handlers: Record<QueueName, Handler> = {
  [QUEUES.mail.name]: async (job) => {
    const mail = job.data as QueuedMail;
    await sendMail(fromQueued(mail));
    log().info({ job: { id: job.id, queue: job.name } }, "mail sent");
  },
  [QUEUES.quoteExpiry.name]: async (job) => {
    const expired = await expireDue(db);
    if (expired) log().info({ job: { id: job.id, queue: job.name }, expired }, "quotes expired");
    return { expired };
  },
  [QUEUES.photoSweep.name]: async (job) => {
    const { scanned, deleted } = await sweepOrphanPhotos(db, photoStore());
    if (deleted.length)
      log().info({ job: { id: job.id, queue: job.name }, scanned, deleted: deleted.length }, "orphan photo objects deleted");
    return { scanned, deleted: deleted.length };
  },
  [QUEUES.idempotencyPurge.name]: async () => ({ purged: await purgeExpiredKeys(db) }),
  [QUEUES.bookingReminders.name]: async (job) => {
    const queued = await queueDueReminders(db);
    if (queued) log().info({ job: { id: job.id, queue: job.name }, queued }, "install reminders queued");
    return { queued };
  },
  [QUEUES.recheckReminders.name]: async (job) => {
    const queued = await queueDueRechecks(db);
    if (queued) log().info({ job: { id: job.id, queue: job.name }, queued }, "re-check reminders queued");
    return { queued };
  },
};

/** Runs one job's handler, logging a failure (message only: job data may hold a mail's body). */
export async function runJob(job: PgBoss.Job<object>): Promise<unknown> {
  try {
    return await handlers[job.name as QueueName](job);
  } catch (error) {
    log().warn(
      { job: { id: job.id, queue: job.name }, err: { message: (error as Error).message, code: (error as { code?: string }).code } },
      "job failed; pg-boss retries it while attempts remain",
    );
    throw error;
  }
}

/**
 * Starts the boss with maintenance and the cron clock, a worker per queue polling every
 * {@link pollSeconds}, and the schedules (quote expiry, photo sweep, idempotency purge, install and re-check reminders). Idempotent within a process.
 */
export async function startWorkers(opts: BossOptions = {}): Promise<PgBoss> {
  const g = globalThis as unknown as { hubfaceWorkers?: Promise<PgBoss> };
  g.hubfaceWorkers ??= (async () => {
    const boss = await getBoss({ supervise: true, ...opts });
    const pollingIntervalSeconds = opts.pollingIntervalSeconds ?? pollSeconds();
    for (const name of Object.keys(handlers)) {
      await boss.work<object>(name, { pollingIntervalSeconds, batchSize: 1 }, async ([job]) => (job ? runJob(job) : undefined));
    }
    await boss.schedule(QUEUES.quoteExpiry.name, QUOTE_EXPIRY_CRON, {}, { tz: "UTC" });
    await boss.schedule(QUEUES.photoSweep.name, PHOTO_SWEEP_CRON, {}, { tz: "UTC" });
    await boss.schedule(QUEUES.idempotencyPurge.name, IDEMPOTENCY_PURGE_CRON, {}, { tz: "UTC" });
    await boss.schedule(QUEUES.bookingReminders.name, BOOKING_REMINDER_CRON, {}, { tz: "UTC" });
    await boss.schedule(QUEUES.recheckReminders.name, RECHECK_REMINDER_CRON, {}, { tz: "UTC" });
    log().info({ queues: Object.keys(handlers), pollingIntervalSeconds }, "job workers started");
    return boss;
  })().catch((error: unknown) => {
    g.hubfaceWorkers = undefined;
    throw error;
  });
  return g.hubfaceWorkers;
}
