/**
 * An outside service the app needs for one action (the mail server, the photo store) did not
 * answer. Thrown at the edge where the service is called, so the answer a person gets names
 * that service: before, a refused SMTP or S3 connection looked like a database outage
 * (lib/platform/db isDatabaseUnavailable matches "connect ECONNREFUSED" whatever was refused).
 *
 * Plain Node: the photo store code runs in the seed script too.
 */
export type Dependency = "mail server" | "photo store";

const MESSAGE: Record<Dependency, string> = {
  "mail server": "The mail server is not reachable right now. Try again in a moment.",
  "photo store": "The photo store is not reachable right now; nothing was saved. Try again in a moment.",
};

export class DependencyUnavailableError extends Error {
  override readonly name = "DependencyUnavailableError";
  /** What the person is told. */
  readonly publicMessage: string;
  constructor(
    readonly dependency: Dependency,
    cause: unknown,
  ) {
    super(`${dependency} unavailable: ${(cause as Error | null)?.message ?? String(cause)}`, { cause });
    this.publicMessage = MESSAGE[dependency];
  }
}

/** By name rather than instanceof: the server and Next's bundle each load their own copy of this file. */
export function isDependencyUnavailable(error: unknown): error is DependencyUnavailableError {
  return (error as { name?: string } | null)?.name === "DependencyUnavailableError";
}

const NETWORK_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "ENOTFOUND",
  "EAI_AGAIN",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "EPIPE",
  "ECONNECTION",
  "ESOCKET",
  "EDNS",
]);

/** True for an error that means the service could not be reached (no answer), rather than an answer refusing the request. */
export function isNetworkFailure(error: unknown): boolean {
  const e = error as { code?: string; errno?: string; name?: string; message?: string; cause?: unknown } | null;
  if (!e) return false;
  if ((e.code && NETWORK_CODES.has(e.code)) || (e.errno && NETWORK_CODES.has(e.errno))) return true;
  if (
    e.name === "TimeoutError" ||
    /ECONNREFUSED|ECONNRESET|ETIMEDOUT|socket hang up|Greeting never received|Connection timeout/i.test(e.message ?? "")
  )
    return true;
  return e.cause !== undefined && e.cause !== error && isNetworkFailure(e.cause);
}
