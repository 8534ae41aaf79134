import { type IncomingMessage, type Server, type ServerResponse, createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { hasSessionCookie } from "@/lib/platform/auth/sessionCookie";
import { Microcache, clearSharedMicrocache, installSharedMicrocache, purgeSharedMicrocache, sMaxAgeSeconds } from "./microcache";

// A stand-in for Next behind the cache: answers as the test says, counting what reaches it.
// The rules checked here are HTTP caching's own (RFC 9111: s-maxage for shared caches, private /
// no-store not stored, one copy per content coding); the rest is this server's policy.
type Answer = { status?: number; headers?: Record<string, string | string[]>; body?: string; gzip?: boolean; chunks?: number };
let answer: Answer = {};
let reached = 0;
let clock = 1_000_000;
const cache = new Microcache(
  { paths: /^\/(?:s\/[A-Za-z0-9_-]+|workspace)$/, maxEntryBytes: 64 * 1024, personal: hasSessionCookie },
  () => clock,
);
let server: Server;
let base = "";

function app(_req: IncomingMessage, res: ServerResponse) {
  reached += 1;
  const {
    status = 200,
    headers = { "cache-control": "s-maxage=60, stale-while-revalidate=600", "content-type": "text/html" },
    body = "<p>shared page</p>",
    gzip = false,
    chunks = 1,
  } = answer;
  const bytes = gzip ? gzipSync(body) : Buffer.from(body);
  res.writeHead(status, { ...headers, ...(gzip ? { "content-encoding": "gzip" } : {}) });
  // Next streams its HTML: write in pieces, then end.
  const step = Math.ceil(bytes.length / chunks);
  for (let i = 0; i < bytes.length - step; i += step) res.write(bytes.subarray(i, i + step));
  res.end(bytes.subarray(Math.max(0, bytes.length - step)));
}

beforeAll(async () => {
  server = createServer((req, res) => {
    if (cache.serve(req, res)) return;
    cache.capture(req, res);
    app(req, res);
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((r) => server.close(() => r())));
beforeEach(() => {
  answer = {};
  reached = 0;
  cache.purge("/s/abc");
  cache.purge("/s/other");
  cache.purge("/workspace");
});

const get = (path: string, headers: Record<string, string | undefined> = {}, method = "GET") =>
  fetch(`${base}${path}`, {
    headers: Object.fromEntries(Object.entries(headers).filter((kv): kv is [string, string] => kv[1] !== undefined)),
    method,
  });

describe("the share pages' micro-cache", () => {
  it("reads s-maxage, and stores nothing marked private, no-store or no-cache (RFC 9111 §5.2.2)", () => {
    expect(sMaxAgeSeconds("s-maxage=60, stale-while-revalidate=31535940")).toBe(60);
    expect(sMaxAgeSeconds("public, max-age=0, s-maxage=5")).toBe(5);
    expect(sMaxAgeSeconds("private, s-maxage=60")).toBeNull();
    expect(sMaxAgeSeconds("no-store")).toBeNull();
    expect(sMaxAgeSeconds("max-age=60")).toBeNull();
    expect(sMaxAgeSeconds(undefined)).toBeNull();
  });

  it("answers the second request itself with the same body and headers, and says so", async () => {
    answer = { body: "<p>page of abc</p>".repeat(200), chunks: 5 };
    const first = await get("/s/abc");
    expect(first.headers.get("x-hubface-cache")).toBeNull();
    const firstBody = await first.text();
    clock += 2500;
    const second = await get("/s/abc");
    expect(await second.text()).toBe(firstBody);
    expect(second.headers.get("x-hubface-cache")).toBe("hit");
    expect(second.headers.get("age")).toBe("2");
    expect(second.headers.get("cache-control")).toBe("s-maxage=60, stale-while-revalidate=600");
    expect(second.headers.get("content-type")).toBe("text/html");
    expect(reached).toBe(1);
    const head = await get("/s/abc", {}, "HEAD");
    expect(head.headers.get("x-hubface-cache")).toBe("hit");
    expect(await head.text()).toBe("");
    expect(reached).toBe(1);
  });

  it("keeps an entry no longer than s-maxage", async () => {
    answer = { headers: { "cache-control": "s-maxage=10" } };
    await (await get("/s/abc")).text();
    clock += 9_999;
    await (await get("/s/abc")).text();
    expect(reached).toBe(1);
    clock += 1;
    await (await get("/s/abc")).text();
    expect(reached).toBe(2);
  });

  it("keeps one copy per content coding: gzip only for clients that accept it", async () => {
    answer = { gzip: true, body: "<p>compressed</p>" };
    await (await get("/s/abc", { "accept-encoding": "gzip, br" })).arrayBuffer();
    const plain = await get("/s/abc", { "accept-encoding": "identity" });
    expect(plain.headers.get("x-hubface-cache")).toBeNull();
    expect(reached).toBe(2);
    const zipped = await get("/s/abc", { "accept-encoding": "br, gzip" });
    expect(zipped.headers.get("x-hubface-cache")).toBe("hit");
    expect(await zipped.text()).toBe("<p>compressed</p>"); // fetch undoes the gzip
    expect((await get("/s/abc", { "accept-encoding": "gzip;q=0" })).headers.get("x-hubface-cache")).toBeNull();
  });

  it("passes client navigations, server actions, queries, other paths and other methods to the app", async () => {
    await (await get("/s/abc")).text();
    reached = 0;
    for (const h of [
      { rsc: "1" },
      { "next-router-prefetch": "1" },
      { "next-action": "x" },
      { authorization: "Bearer x" },
      { range: "bytes=0-5" },
    ]) {
      expect((await get("/s/abc", h)).headers.get("x-hubface-cache"), JSON.stringify(h)).toBeNull();
    }
    expect((await get("/s/abc?_rsc=1")).headers.get("x-hubface-cache")).toBeNull();
    expect((await get("/s/abc/opengraph-image")).headers.get("x-hubface-cache")).toBeNull();
    expect((await get("/workspaces")).headers.get("x-hubface-cache")).toBeNull();
    expect((await fetch(`${base}/s/abc`, { method: "POST", body: "x" })).headers.get("x-hubface-cache")).toBeNull();
    expect(reached).toBe(9);
  });

  it("serves a visitor's bare /workspace from the cache, never a request with a session cookie, nor keeps its answer", async () => {
    const member = { cookie: "theme=dark; __Secure-next-auth.session-token.0=abc" };
    answer = { body: "<p>the member's own workspace</p>" };
    expect(await (await get("/workspace", member)).text()).toBe("<p>the member's own workspace</p>");
    answer = { body: "<p>visitor workspace</p>" };
    await (await get("/workspace")).text();
    const hit = await get("/workspace", { cookie: "theme=dark" });
    expect(hit.headers.get("x-hubface-cache")).toBe("hit");
    expect(await hit.text()).toBe("<p>visitor workspace</p>");
    const again = await get("/workspace", { cookie: "next-auth.session-token=stale" });
    expect(again.headers.get("x-hubface-cache")).toBeNull();
    expect(reached).toBe(3);
  });

  it("never keeps an error, a page that sets a cookie, one not meant for shared caches, or one too large", async () => {
    const tries: Answer[] = [
      { status: 404, headers: { "cache-control": "s-maxage=60" } },
      { headers: { "cache-control": "s-maxage=60", "set-cookie": "a=b" } },
      { headers: { "cache-control": "private, no-cache, no-store, max-age=0, must-revalidate" } },
      { body: "x".repeat(65 * 1024), chunks: 7 },
    ];
    for (const a of tries) {
      answer = a;
      reached = 0;
      await (await get("/s/abc")).text();
      await (await get("/s/abc")).text();
      expect(reached, JSON.stringify(a.headers ?? a.body?.length)).toBe(2);
    }
  });

  it("drops a path when the app says it changed, including an answer begun before the purge", async () => {
    installSharedMicrocache(cache);
    try {
      await (await get("/s/abc")).text();
      await (await get("/s/other")).text();
      purgeSharedMicrocache("/s/abc");
      expect((await get("/s/abc")).headers.get("x-hubface-cache")).toBeNull();
      expect((await get("/s/other")).headers.get("x-hubface-cache")).toBe("hit");

      // A revoke lands while the app is still writing the old page: that page is not kept.
      cache.purge("/s/abc");
      const slow = createServer((req, out) => {
        cache.capture(req, out);
        out.writeHead(200, { "cache-control": "s-maxage=60" });
        out.write("<p>old</p>");
        cache.purge("/s/abc");
        out.end("<p>still old</p>");
      });
      await new Promise<void>((r) => slow.listen(0, "127.0.0.1", r));
      const port = (slow.address() as AddressInfo).port;
      await (await fetch(`http://127.0.0.1:${port}/s/abc`)).text();
      await new Promise<void>((r) => slow.close(() => r()));
      expect(cache.size).toBe(1); // only /s/other
    } finally {
      installSharedMicrocache(undefined);
    }
    // Without a server-installed cache (tests, next dev) purging does nothing and does not throw.
    expect(() => purgeSharedMicrocache("/s/abc")).not.toThrow();
  });

  it("drops every path at once after purges from other servers may have been missed", async () => {
    installSharedMicrocache(cache);
    try {
      await (await get("/s/abc")).text();
      await (await get("/s/other")).text();
      expect((await get("/s/other")).headers.get("x-hubface-cache")).toBe("hit");
      clearSharedMicrocache();
      expect(cache.size).toBe(0);
      expect((await get("/s/abc")).headers.get("x-hubface-cache")).toBeNull();
      expect((await get("/s/other")).headers.get("x-hubface-cache")).toBeNull();
    } finally {
      installSharedMicrocache(undefined);
    }
    expect(() => clearSharedMicrocache()).not.toThrow();
  });
});
