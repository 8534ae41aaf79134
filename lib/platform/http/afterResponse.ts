import "server-only";

/**
 * Work a route does after it has answered (the answer must not wait for it, or its timing
 * would tell what the work found). Runs in this long-lived Node process (scripts/serve.ts);
 * errors are logged, never thrown at the caller, who already has the answer.
 */
const pending = new Set<Promise<void>>();

export function afterResponse(label: string, task: () => Promise<void>): void {
  const p: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
    .then(task)
    .catch((e: unknown) => console.error(`${label} failed after the response:`, (e as Error).message))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Resolves when every task started so far has finished (tests, and a graceful shutdown). */
export async function settleAfterResponse(): Promise<void> {
  while (pending.size) await Promise.all([...pending]);
}
