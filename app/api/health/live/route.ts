export const dynamic = "force-dynamic";

/**
 * Liveness: 200 while the process can answer at all. Checks nothing outside the process, so a
 * database or mail outage never makes an orchestrator restart healthy servers.
 */
export function GET() {
  return Response.json({ status: "live", uptimeSeconds: Math.round(process.uptime()) }, { headers: { "Cache-Control": "no-store" } });
}
