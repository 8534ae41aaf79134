/**
 * The fitment search as a message-passing job: the browser runs it in a Web Worker
 * (app/(garage)/garage/[id]/finder/finder.worker.ts) and the benchmark in a Node worker thread
 * (bench/finder-worker.thread.ts) — the same function, plain data in and out.
 */
import { type FinderResult, type FitmentConstraints, findFitments } from "@/lib/fitment";

export interface FinderJob {
  id: number;
  /** With the vehicle's measured points (`clearancePoints`): every one is predicted per combination. */
  constraints: FitmentConstraints;
  wheelWidthsIn?: number[];
  limit?: number;
  /** Most exclusions to return with their deciding limit (default 50). */
  excludedLimit?: number;
}

export type FinderReply =
  | { type: "progress"; id: number; done: number; total: number }
  | { type: "done"; id: number; result: FinderResult; ms: number }
  | { type: "error"; id: number; message: string };

/** Runs one search, posting progress (about every 1 %) and then the result or the error. */
export function runFinderJob(job: FinderJob, post: (reply: FinderReply) => void, now: () => number = () => performance.now()): void {
  const t0 = now();
  try {
    const result = findFitments(job.constraints, {
      wheelWidthsIn: job.wheelWidthsIn,
      limit: job.limit ?? 200,
      excludedLimit: job.excludedLimit ?? 50,
      onProgress: (done, total) => post({ type: "progress", id: job.id, done, total }),
    });
    post({ type: "done", id: job.id, result, ms: now() - t0 });
  } catch (e) {
    post({ type: "error", id: job.id, message: e instanceof Error ? e.message : "The search failed." });
  }
}
