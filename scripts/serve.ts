/**
 * The production server: Next's request handler behind the share pages' micro-cache
 * (lib/http/microcache.ts). `npm start` and the browser tests run it:
 *
 *   tsx scripts/serve.ts [--hostname 127.0.0.1] [--port 3000]
 *
 * Needs a `next build` first. HUBFACE_MICROCACHE=off serves through Next alone (for comparing).
 */
import { createServer } from "node:http";
import { parseArgs } from "node:util";
import next from "next";
import { CLIENT_ADDRESS_HEADER, resolveClientAddress, trustClientAddressHeader, trustedProxies } from "@/lib/auth/clientAddress";
import { Microcache, installSharedMicrocache } from "@/lib/http/microcache";

const { values } = parseArgs({ options: { hostname: { type: "string", default: "127.0.0.1" }, port: { type: "string", default: process.env.PORT ?? "3000" } } });
const hostname = values.hostname!;
const port = Number(values.port);

(process.env as Record<string, string>).NODE_ENV = "production";
const app = next({ dev: false, hostname, port, dir: process.cwd() });
const handle = app.getRequestHandler();
await app.prepare();

// Share pages only: /s/<slug>. Their Open Graph images and every other page go to Next.
const cache = process.env.HUBFACE_MICROCACHE === "off" ? undefined : new Microcache({ paths: /^\/s\/[A-Za-z0-9_-]{16,64}$/ });
installSharedMicrocache(cache);

// Rate limits and sign-in backoff key on the client's address. Route handlers cannot see the
// socket, so this server writes it into CLIENT_ADDRESS_HEADER (any copy the client sent is
// dropped) from the socket peer, reading X-Forwarded-For only when that peer is one of
// TRUSTED_PROXIES (addresses or CIDRs; unset = trust none, e.g. no load balancer in front).
const proxies = trustedProxies();
trustClientAddressHeader();

const server = createServer((req, res) => {
  const forwarded = req.headers["x-forwarded-for"];
  req.headers[CLIENT_ADDRESS_HEADER] = resolveClientAddress(req.socket.remoteAddress, Array.isArray(forwarded) ? forwarded.join(",") : forwarded, proxies);
  if (cache?.serve(req, res)) return;
  cache?.capture(req, res);
  handle(req, res).catch((error: unknown) => {
    console.error("request failed:", error);
    if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain" });
    res.end("Something went wrong on our side.");
  });
});
server.keepAliveTimeout = 65_000;
server.listen(port, hostname, () => console.log(`Hubface listening on http://${hostname}:${port}${cache ? " (share-page micro-cache on)" : ""}`));

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 5000).unref();
  });
}
