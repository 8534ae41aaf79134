import { log } from "@/lib/platform/log";
import { healthQueries } from "@/lib/platform/health/health";

export const dynamic = "force-dynamic";

/** 200 with the database round-trip, or 503 with a plain message when PostgreSQL is down. */
export async function GET() {
  const started = performance.now();
  try {
    await healthQueries.pingDatabase();
    const ms = Math.round((performance.now() - started) * 100) / 100;
    return Response.json({ status: "ok", database: { status: "ok", roundTripMs: ms } }, { headers: { "Cache-Control": "no-store" } });
  } catch (error) {
    log().error({ err: { message: (error as Error).message } }, "health: database check failed");
    return Response.json(
      {
        status: "unavailable",
        database: { status: "down" },
        message: "The database is not reachable. The app will recover by itself when it is back.",
      },
      { status: 503, headers: { "Cache-Control": "no-store" } },
    );
  }
}
