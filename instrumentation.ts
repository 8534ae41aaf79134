import type { Instrumentation } from "next";

// The imports sit inside `NEXT_RUNTIME === "nodejs"` blocks (Next's documented pattern) so an edge
// build of this file never bundles the logger or the job queue.

/**
 * Runs once when a Next server starts. The production server (scripts/serve.ts) starts the job
 * workers itself; `next dev` has no such wrapper, so in development they start here and queued
 * mail reaches the development outbox within a second.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    if (process.env.NODE_ENV === "development" && process.env.HUBFACE_JOBS !== "off") {
      const { startWorkers } = await import("@/lib/platform/jobs/workers");
      await startWorkers().catch((error: unknown) => console.error("job workers did not start:", (error as Error).message));
    }
  }
}

/**
 * Errors Next caught while rendering a page or running a handler outside our route() wrapper:
 * one structured line with the request's id (set by scripts/serve.ts) and Next's digest, the
 * reference the error page shows, so the two can be matched.
 */
export const onRequestError: Instrumentation.onRequestError = async (error, request, context) => {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { log, redactUrl } = await import("@/lib/platform/log");
    const header = request.headers["x-request-id"];
    const err = error as Error & { digest?: string };
    log().error(
      {
        reqId: Array.isArray(header) ? header[0] : header,
        digest: err.digest,
        method: request.method,
        route: context.routePath,
        routeType: context.routeType,
        path: redactUrl(request.path),
        err,
      },
      "request error",
    );
  }
};
