import type PgBoss from "pg-boss";
import { type QueueName, getBoss, stopBoss } from "@/lib/platform/jobs/boss";
import { runJob } from "@/lib/platform/jobs/workers";

/**
 * The job queue on the test database (DATABASE_URL): started without background workers so a
 * test decides when jobs run. `rebuild()` drops only the app's tables; the pgboss schema is
 * emptied here so each file starts with no jobs.
 */
export async function startTestBoss(): Promise<PgBoss> {
  const boss = await getBoss({ supervise: false });
  await boss.clearStorage();
  return boss;
}

export { stopBoss };

export interface DrainResult {
  completed: string[];
  failed: { id: string; message: string }[];
}

/**
 * Runs every job of `queue` that is waiting, through the same handler the workers use, and
 * records the outcome the way a worker does (complete, or fail so pg-boss schedules the retry).
 * `ignoreStartAfter`: also run jobs whose backoff has not elapsed yet (a test does not wait minutes).
 */
export async function drainQueue(queue: QueueName, opts: { ignoreStartAfter?: boolean } = {}): Promise<DrainResult> {
  const boss = await getBoss();
  const out: DrainResult = { completed: [], failed: [] };
  for (;;) {
    const jobs = await boss.fetch<object>(queue, { batchSize: 20, ignoreStartAfter: opts.ignoreStartAfter ?? false });
    if (!jobs.length) return out;
    for (const job of jobs) {
      try {
        const output = await runJob(job);
        await boss.complete(queue, job.id, (output ?? {}) as object);
        out.completed.push(job.id);
      } catch (error) {
        await boss.fail(queue, job.id, { message: (error as Error).message });
        out.failed.push({ id: job.id, message: (error as Error).message });
      }
    }
    // A failed job goes back to "retry" and would be fetched again at once with ignoreStartAfter: one round each.
    if (opts.ignoreStartAfter) return out;
  }
}
