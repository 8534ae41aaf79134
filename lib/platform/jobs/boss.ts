/**
 * The job queue: pg-boss in its own schema (`pgboss`) of the app's PostgreSQL, so a job is
 * stored in the same database as the rows it is about and survives restarts.
 *
 * One PgBoss per process, kept on `globalThis`: the production server (scripts/serve.ts) loads
 * this file outside Next's bundle to run the workers, and the app's own copy (route handlers
 * queueing mail) must reach the same instance rather than open a second pool.
 *
 * Plain Node (no "server-only"): scripts and the worker process import it directly.
 */
import PgBoss from "pg-boss";
import { databaseUrl } from "@/lib/platform/db/config";
import { log } from "@/lib/platform/log";

export const JOB_SCHEMA = "pgboss";

/** Every queue the app uses, with its retry policy. */
export const QUEUES = {
  /** One e-mail. 8 retries with exponential backoff from 30 s: roughly 30 s, 1, 2, 4 … 64 min (plus jitter), about 4 h in all. */
  mail: { name: "mail.send", retryLimit: 8, retryDelay: 30, retryBackoff: true, expireInMinutes: 5 },
  /** Marks sent/accepted quotes past their validity as expired; scheduled, retried a few times. */
  quoteExpiry: { name: "quotes.expire", retryLimit: 3, retryDelay: 60, retryBackoff: true, expireInMinutes: 5 },
  /** Deletes photo objects left without a row by a crash (lib/garage/photos/sweep.ts); the next run retries anyway. */
  photoSweep: { name: "photos.sweep", retryLimit: 1, retryDelay: 60, retryBackoff: false, expireInMinutes: 10 },
  /** Queues the day-before install reminders (lib/shop/bookings/queries.ts); each booking is marked as it is queued, so a retry reminds no one twice. */
  bookingReminders: { name: "bookings.remind", retryLimit: 3, retryDelay: 60, retryBackoff: true, expireInMinutes: 5 },
  /** Queues the re-check mails after the first miles (lib/shop/workOrders/queries.ts); each work order is marked as it is queued. */
  recheckReminders: { name: "workorders.recheck", retryLimit: 3, retryDelay: 60, retryBackoff: true, expireInMinutes: 5 },
  /** Deletes Idempotency-Key records past their 24 hours. */
  idempotencyPurge: { name: "idempotency.purge", retryLimit: 1, retryDelay: 60, retryBackoff: false, expireInMinutes: 5 },
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES]["name"];

const KNOWN: ReadonlySet<string> = new Set(Object.values(QUEUES).map((q) => q.name));
export const isKnownQueue = (name: string): name is QueueName => KNOWN.has(name);

export interface BossOptions {
  /** Run maintenance (expiring stuck jobs, archiving) and the cron clock. Off for a send-only process. */
  supervise?: boolean;
  /** How often workers look for jobs. Queued mail must leave within a second or two in development and tests. */
  pollingIntervalSeconds?: number;
}

const g = globalThis as unknown as { hubfaceBoss?: Promise<PgBoss> };

/**
 * How often the workers poll, in seconds: HUBFACE_JOB_POLL_SECONDS, else 1 s outside
 * production (mail in the development outbox and in browser tests shows up at once) and 2 s in
 * production (pg-boss's own default).
 */
export function pollSeconds(): number {
  const set = Number(process.env.HUBFACE_JOB_POLL_SECONDS);
  if (Number.isFinite(set) && set >= 0.5) return set;
  return process.env.NODE_ENV === "production" ? 2 : 1;
}

function create(opts: BossOptions): PgBoss {
  const supervise = opts.supervise ?? true;
  return new PgBoss({
    connectionString: databaseUrl(),
    schema: JOB_SCHEMA,
    application_name: "hubface-jobs",
    max: Number(process.env.JOB_POOL_MAX ?? 4),
    supervise,
    schedule: supervise,
    migrate: true,
    // A mail job holds its links (an invitation, a quote's public link) in clear, where the app
    // otherwise stores only token hashes: a delivered mail is archived after an hour and deleted
    // an hour later. Failed jobs stay in the live table, where the admin page lists and retries
    // them, for two weeks.
    archiveCompletedAfterSeconds: 3600,
    archiveFailedAfterSeconds: 14 * 24 * 3600,
    deleteAfterSeconds: 3600,
  });
}

/**
 * The process's PgBoss, started (schema created or migrated, queues created) on first use.
 * The first caller's options win; the server calls {@link startWorkers} before any request.
 */
export function getBoss(opts: BossOptions = {}): Promise<PgBoss> {
  g.hubfaceBoss ??= (async () => {
    const boss = create(opts);
    // Without a listener an error event would crash the process; a lost connection is retried by pg-boss.
    boss.on("error", (error) =>
      log().error({ err: { message: error.message, code: (error as { code?: string }).code } }, "job queue error"),
    );
    await boss.start();
    for (const q of Object.values(QUEUES)) {
      const { name, ...policy } = q;
      if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, ...policy });
      else await boss.updateQueue(name, { name, ...policy });
    }
    return boss;
  })().catch((error: unknown) => {
    g.hubfaceBoss = undefined; // the next call tries again (e.g. the database was briefly away)
    throw error;
  });
  return g.hubfaceBoss;
}

/** True when this process has a boss (started or starting). */
export const hasBoss = () => g.hubfaceBoss !== undefined;

/** Stops the workers, waiting up to `timeoutMs` for jobs in progress, and closes its pool. */
export async function stopBoss(timeoutMs = 10_000): Promise<void> {
  const pending = g.hubfaceBoss;
  g.hubfaceBoss = undefined;
  (globalThis as unknown as { hubfaceWorkers?: unknown }).hubfaceWorkers = undefined;
  if (!pending) return;
  const boss = await pending.catch(() => null);
  await boss?.stop({ graceful: true, wait: true, timeout: timeoutMs });
}
