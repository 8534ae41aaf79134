import { readiness } from "@/lib/platform/health/readiness";

export const dynamic = "force-dynamic";

/**
 * Readiness for a load balancer: 200 when PostgreSQL and the job queue answer; 503 naming the
 * dependency that failed (`failed: ["database"]`), or `stopping` while the server shuts down.
 */
export async function GET() {
  const r = await readiness();
  const failed = (Object.keys(r.checks) as (keyof typeof r.checks)[]).filter((k) => r.checks[k].status !== "ok");
  const body = r.ready
    ? { status: "ready", checks: r.checks }
    : {
        status: "unavailable",
        failed,
        stopping: r.stopping,
        checks: r.checks,
        message: r.stopping
          ? "This server is shutting down."
          : `Not ready: ${failed.map((f) => (f === "database" ? "the database is not reachable" : "the job queue is not reachable")).join("; ")}.`,
      };
  return Response.json(body, { status: r.ready ? 200 : 503, headers: { "Cache-Control": "no-store" } });
}
