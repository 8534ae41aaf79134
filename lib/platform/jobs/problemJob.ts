/** The admin's view of a job, shared by the server query and the jobs page (no server code here). */
/** A job that failed at least once, as the admin sees it: never its data (a mail's body, a link with a token). */
export interface ProblemJob {
  id: string;
  queue: string;
  state: "retry" | "failed";
  /** The last error's message, cut to 300 characters. */
  lastError: string | null;
  /** Attempts made so far, and the most there will be. */
  attempts: number;
  maxAttempts: number;
  createdAt: string;
  /** When it failed for good (failed), or when its last attempt started (retry). */
  lastAttemptAt: string | null;
  /** When the next attempt may run (retry only). */
  nextAttemptAt: string | null;
}
