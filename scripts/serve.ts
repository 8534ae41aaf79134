/**
 * The production server: Next's request handler behind the share pages' micro-cache
 * (lib/platform/http/microcache.ts), one JSON log line per request, and the background job workers
 * (lib/platform/jobs: queued mail, the quote expiry schedule). `npm start` and the browser tests run it:
 *
 *   tsx scripts/serve.ts [--hostname 127.0.0.1] [--port 3000]
 *
 * Needs a `next build` first. HUBFACE_MICROCACHE=off serves through Next alone (for comparing).
 * Every server listens for share-page purges from the others (PostgreSQL NOTIFY, lib/platform/http/sharePurge.ts).
 * HUBFACE_JOBS=off leaves the job workers to another process (see README "Beyond one machine").
 * SIGTERM/SIGINT: stop taking requests (readiness answers 503), finish those in flight, let
 * running jobs finish, then exit.
 */
import { createServer, type IncomingMessage } from "node:http";
import { register } from "node:module";
import { parseArgs } from "node:util";
import next from "next";
import { getToken } from "next-auth/jwt";
import { CLIENT_ADDRESS_HEADER, resolveClientAddress, trustClientAddressHeader, trustedProxies } from "@/lib/platform/auth/clientAddress";
import { hasSessionCookie } from "@/lib/platform/auth/sessionCookie";
import { Microcache, installSharedMicrocache } from "@/lib/platform/http/microcache";
import { ownServerPurge, selfUrl, startSharePurgeListener } from "@/lib/platform/http/sharePurge";
import { databaseUrl } from "@/lib/platform/db/config";
import { log } from "@/lib/platform/log";
import { withRequestLog } from "@/lib/platform/log/request";

// Before any app module that says `import "server-only"` is loaded (the job workers below).
register("./hooks/server-only.mjs", import.meta.url);

const { values } = parseArgs({
  options: { hostname: { type: "string", default: "127.0.0.1" }, port: { type: "string", default: process.env.PORT ?? "3000" } },
});
const hostname = values.hostname!;
const port = Number(values.port);

(process.env as Record<string, string>).NODE_ENV = "production";
const app = next({ dev: false, hostname, port, dir: process.cwd() });
const handle = app.getRequestHandler();
await app.prepare();

// Share pages (/s/<slug>) and a visitor's bare /workspace (prerendered, the same for everyone:
// proxy.ts): their Open Graph images and every other page go to Next. A request with a session
// cookie always goes to Next: a member's workspace is their own.
const cache =
  process.env.HUBFACE_MICROCACHE === "off"
    ? undefined
    : new Microcache({ paths: /^\/(?:s\/[A-Za-z0-9_-]{16,64}|workspace)$/, personal: hasSessionCookie });
installSharedMicrocache(cache);

const jobs = process.env.HUBFACE_JOBS === "off" ? undefined : await import("@/lib/platform/jobs/workers");
const boss = await import("@/lib/platform/jobs/boss");
if (jobs) {
  // A database that is down at start must not keep the web server from starting: retry in the background.
  const start = (): Promise<unknown> =>
    jobs.startWorkers().catch((error: unknown) => {
      log().error({ err: { message: (error as Error).message } }, "job workers did not start; trying again in 10 s");
      return new Promise((r) => setTimeout(r, 10_000).unref()).then(start);
    });
  void start();
}

/** The signed-in user of a page request, read from the session cookie after the answer left (only for the log line). */
async function userIdOf(req: IncomingMessage): Promise<string | undefined> {
  if (!process.env.NEXTAUTH_SECRET || !/next-auth\.session-token/.test(req.headers.cookie ?? "")) return undefined;
  try {
    const token = await getToken({ req: req as Parameters<typeof getToken>[0]["req"], secret: process.env.NEXTAUTH_SECRET });
    return typeof token?.uid === "string" ? token.uid : undefined;
  } catch {
    return undefined;
  }
}

// Rate limits and sign-in backoff key on the client's address. Route handlers cannot see the
// socket, so this server writes it into CLIENT_ADDRESS_HEADER (any copy the client sent is
// dropped) from the socket peer, reading X-Forwarded-For only when that peer is one of
// TRUSTED_PROXIES (addresses or CIDRs; unset = trust none, e.g. no load balancer in front).
const proxies = trustedProxies();
trustClientAddressHeader();

const server = createServer(
  withRequestLog(
    (req, res, ctx) => {
      const forwarded = req.headers["x-forwarded-for"];
      req.headers[CLIENT_ADDRESS_HEADER] = resolveClientAddress(
        req.socket.remoteAddress,
        Array.isArray(forwarded) ? forwarded.join(",") : forwarded,
        proxies,
      );
      if (cache?.serve(req, res)) return;
      cache?.capture(req, res);
      handle(req, res).catch((error: unknown) => {
        log().error({ err: error }, "request failed outside Next's error handling");
        if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain; charset=utf-8" });
        res.end(`Something went wrong on our side. Reference ${ctx.reqId}.`);
      });
    },
    { userIdOf },
  ),
);
server.keepAliveTimeout = 65_000;
server.listen(port, hostname, () =>
  log().info({ url: `http://${hostname}:${port}`, microcache: Boolean(cache), jobs: Boolean(jobs) }, "Hubface listening"),
);

// Revokes and edits on any app server reach this one's cached share pages through PostgreSQL
// NOTIFY (lib/platform/http/sharePurge.ts); the listener keeps reconnecting while the database is away.
// It asks this server's own Next to drop a page, so it starts once the server is listening.
const purges = startSharePurgeListener({ connectionString: databaseUrl(), ...ownServerPurge(selfUrl(hostname, port), cache) });

let stopping = false;
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, async () => {
    if (stopping) return;
    stopping = true;
    (globalThis as unknown as { hubfaceStopping?: boolean }).hubfaceStopping = true;
    log().info({ signal }, "stopping: finishing requests and jobs in progress");
    setTimeout(() => process.exit(1), 25_000).unref();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await purges.stop();
    await boss
      .stopBoss(15_000)
      .catch((error: unknown) => log().error({ err: { message: (error as Error).message } }, "job queue did not stop cleanly"));
    log().info("stopped");
    process.exit(0);
  });
}
