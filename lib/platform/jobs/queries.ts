import "server-only";
import type { Knex } from "knex";
import { NotFoundError } from "@/lib/platform/errors";
import { bindAppDb } from "@/lib/platform/db/bind";
import { JOB_SCHEMA, getBoss, isKnownQueue } from "@/lib/platform/jobs/boss";
import type { ProblemJob } from "@/lib/platform/jobs/problemJob";

const ERROR_TEXT = "coalesce(output->>'message', output->'value'->>'message', output->>'value')";

/** Failed jobs and jobs waiting for a retry, newest first. */
export async function listProblemJobs(db: Knex, limit = 200): Promise<ProblemJob[]> {
  const rows = await db
    .withSchema(JOB_SCHEMA)
    .from("job")
    .whereIn("state", ["retry", "failed"])
    .orderBy("created_on", "desc")
    .limit(limit)
    .select(
      "id",
      "name",
      "state",
      "retry_count",
      "retry_limit",
      "created_on",
      "started_on",
      "completed_on",
      "start_after",
      db.raw(`left(${ERROR_TEXT}, 300) as last_error`),
    );
  return rows.map((r) => ({
    id: r.id,
    queue: r.name,
    state: r.state,
    lastError: r.last_error ?? null,
    // retry_count counts the retries begun; the first attempt is not a retry.
    attempts: r.started_on ? r.retry_count + 1 : 0,
    maxAttempts: r.retry_limit + 1,
    createdAt: new Date(r.created_on).toISOString(),
    lastAttemptAt:
      r.state === "failed" && r.completed_on
        ? new Date(r.completed_on).toISOString()
        : r.started_on
          ? new Date(r.started_on).toISOString()
          : null,
    nextAttemptAt: r.state === "retry" ? new Date(r.start_after).toISOString() : null,
  }));
}

/**
 * Runs the job again: a failed job gets one more attempt, now; a job waiting for its backoff
 * runs now instead of later. 404 for an unknown id, a queue the app does not know, or a job
 * that is neither failed nor waiting.
 */
export async function retryJob(db: Knex, id: string): Promise<void> {
  const row = await db.withSchema(JOB_SCHEMA).from("job").where({ id }).whereIn("state", ["retry", "failed"]).first("name", "state");
  if (!row || !isKnownQueue(row.name)) throw new NotFoundError("That job");
  if (row.state === "failed") {
    const boss = await getBoss();
    await boss.retry(row.name, id);
  }
  // pg-boss's retry leaves start_after as it was: bring it forward so the worker takes it at once.
  await db.withSchema(JOB_SCHEMA).from("job").where({ id, name: row.name }).update({ start_after: db.fn.now() });
}

/** These queries on the app's database handle, for the admin page and its routes. */
export const jobQueries = bindAppDb({ listProblemJobs, retryJob });
