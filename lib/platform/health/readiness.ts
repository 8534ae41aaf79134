import "server-only";
import { db } from "@/lib/platform/db";
import { JOB_SCHEMA, getBoss } from "@/lib/platform/jobs/boss";

export type CheckName = "database" | "queue";
export interface CheckResult {
  status: "ok" | "down";
  ms: number;
  /** Why it is down, in words (no connection strings). */
  message?: string;
}
export interface Readiness {
  ready: boolean;
  stopping: boolean;
  checks: Record<CheckName, CheckResult>;
}

const TIMEOUT_MS = 3000;

async function timed(what: string, fn: () => Promise<unknown>): Promise<CheckResult> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([
      fn(),
      new Promise(
        (_, reject) => (timer = setTimeout(() => reject(new Error(`${what} did not answer within ${TIMEOUT_MS / 1000} s`)), TIMEOUT_MS)),
      ),
    ]);
    return { status: "ok", ms: Math.round((performance.now() - started) * 100) / 100 };
  } catch (error) {
    return { status: "down", ms: Math.round(performance.now() - started), message: (error as Error).message.split("\n")[0]!.slice(0, 200) };
  } finally {
    clearTimeout(timer);
  }
}

/**
 * Whether this server should get traffic: PostgreSQL answers, and the job queue is started in
 * this process and its schema answers (queued mail would fail otherwise). The mail server and the
 * photo store are not checked: their outages affect one action each, are retried (mail) or
 * reported as such, and must not take every server out of a load balancer.
 */
export async function readiness(): Promise<Readiness> {
  const stopping = (globalThis as unknown as { hubfaceStopping?: boolean }).hubfaceStopping === true;
  const [database, queue] = await Promise.all([
    timed("PostgreSQL", () => db.raw("select 1")),
    // Through the queue's own pool: it can fail on its own (exhausted, or its schema missing).
    timed("The job queue", async () => (await getBoss()).getDb().executeSql(`select 1 from ${JOB_SCHEMA}.version limit 1`, [])),
  ]);
  return { ready: !stopping && database.status === "ok" && queue.status === "ok", stopping, checks: { database, queue } };
}
