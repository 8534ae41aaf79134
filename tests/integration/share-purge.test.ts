import { createServer, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeEach, describe, expect, it, vi } from "vitest";
import { req } from "./support/requests";
import { testDb } from "./support/db";

// No Next server here: revalidatePath is recorded.
const revalidated = vi.hoisted(() => [] as string[]);
vi.mock("next/cache", () => ({ revalidatePath: (p: string, type?: string) => void revalidated.push(type ? `${p} ${type}` : p) }));

const { SHARE_PURGE_CHANNEL, LOCAL_PURGE_HEADER, localPurgeToken, ownServerPurge, selfUrl, startSharePurgeListener } =
  await import("@/lib/platform/http/sharePurge");
const { dropCachedShare } = await import("@/lib/comparisons/shareCache");
const purgeRoute = (await import("@/app/api/internal/share-purge/route")).POST;
const { Microcache, installSharedMicrocache } = await import("@/lib/platform/http/microcache");

const db = testDb();
const url = process.env.DATABASE_URL!;
const SLUG = "AbCdEfGhIjKlMnOpQrStUv_-";
const OTHER = "ZyXwVuTsRqPoNmLkJiHgFeDc";
const listeners: { stop(): Promise<void> }[] = [];

afterAll(async () => {
  await Promise.all(listeners.map((l) => l.stop()));
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});
beforeEach(() => {
  revalidated.length = 0;
});

function listen(extra: Partial<Parameters<typeof startSharePurgeListener>[0]> = {}) {
  const purged: string[] = [];
  let reconnects = 0;
  const l = startSharePurgeListener({
    connectionString: url,
    onPurge: (slug) => void purged.push(slug),
    onReconnect: () => void (reconnects += 1),
    minBackoffMs: 50,
    ...extra,
  });
  listeners.push(l);
  return { l, purged, reconnects: () => reconnects };
}

describe("share purge listener (PostgreSQL LISTEN/NOTIFY)", () => {
  it("hands a notified slug to onPurge and ignores payloads that are not slugs", async () => {
    const { l, purged } = listen();
    await l.ready;
    await db.raw("select pg_notify(?, ?)", [SHARE_PURGE_CHANNEL, "'; drop table users; --"]);
    await db.raw("select pg_notify(?, ?)", [SHARE_PURGE_CHANNEL, SLUG]);
    await expect.poll(() => purged, { timeout: 2000, interval: 20 }).toEqual([SLUG]);
  });

  it("reconnects after its connection is terminated, purges everything it may have missed, and hears the next notification", async () => {
    const { l, purged, reconnects } = listen();
    await l.ready;
    const first = l.backendPid();
    expect(first).toEqual(expect.any(Number));
    const { rows } = (await db.raw("select pg_terminate_backend(?) as terminated", [first])) as { rows: { terminated: boolean }[] };
    expect(rows[0]?.terminated).toBe(true);
    await expect.poll(() => l.connections(), { timeout: 5000, interval: 20 }).toBe(2);
    expect(l.backendPid()).not.toBe(first);
    await expect.poll(() => reconnects(), { timeout: 2000, interval: 20 }).toBe(1);
    await db.raw("select pg_notify(?, ?)", [SHARE_PURGE_CHANNEL, OTHER]);
    await expect.poll(() => purged, { timeout: 2000, interval: 20 }).toEqual([OTHER]);
  });

  it("keeps trying while the database cannot be reached, without throwing", async () => {
    const broken = new URL(url);
    broken.port = "1"; // nothing listens on port 1
    const { l } = listen({ connectionString: broken.toString(), maxBackoffMs: 100 });
    await new Promise((r) => setTimeout(r, 400));
    expect(l.connections()).toBe(0);
    expect(l.backendPid()).toBeNull();
  });
});

describe("dropCachedShare", () => {
  it("drops this server's copies and tells every listening server", async () => {
    const cache = new Microcache({ paths: /^\/s\/[\w-]+$/ });
    const purge = vi.spyOn(cache, "purge");
    installSharedMicrocache(cache);
    const { l, purged } = listen();
    await l.ready;
    try {
      await dropCachedShare(SLUG);
      expect(revalidated).toEqual([`/s/${SLUG}`, `/s/${SLUG} layout`]);
      expect(purge).toHaveBeenCalledWith(`/s/${SLUG}`);
      await expect.poll(() => purged, { timeout: 2000, interval: 20 }).toEqual([SLUG]);
    } finally {
      installSharedMicrocache(undefined);
    }
  });
});

describe("a server's own purge (the listener's side)", () => {
  it("drops the micro-cache copy, asks its own Next through the token-guarded route, then drops the copy again", async () => {
    const steps: string[] = [];
    const server = createServer((r: IncomingMessage, res) => {
      let body = "";
      r.on("data", (c) => (body += c));
      r.on("end", () => {
        steps.push(`${r.method} ${r.url} ${body} token:${r.headers[LOCAL_PURGE_HEADER] === localPurgeToken()}`);
        res.writeHead(204).end();
      });
    });
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    try {
      const base = selfUrl("0.0.0.0", (server.address() as AddressInfo).port);
      const cache = { purge: (p: string) => void steps.push(`purge ${p}`), clear: () => void steps.push("clear") };
      const own = ownServerPurge(base, cache);
      await own.onPurge(SLUG);
      expect(steps).toEqual([`purge /s/${SLUG}`, `POST /api/internal/share-purge ${SLUG} token:true`, `purge /s/${SLUG}`]);
      steps.length = 0;
      await own.onReconnect!();
      expect(steps).toEqual(["clear", "POST /api/internal/share-purge * token:true", "clear"]);
    } finally {
      await new Promise((r) => server.close(r));
    }
  });

  it("fails loudly when its own server does not take the purge", async () => {
    const server = createServer((_r, res) => res.writeHead(404).end());
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    try {
      const own = ownServerPurge(selfUrl("127.0.0.1", (server.address() as AddressInfo).port), undefined);
      await expect(own.onPurge(SLUG)).rejects.toThrow(/answered 404/);
    } finally {
      await new Promise((r) => server.close(r));
    }
  });

  it("the purge route revalidates the page only for this process's token", async () => {
    const token = localPurgeToken();
    expect((await purgeRoute(req("POST", "/api/internal/share-purge", SLUG))).status).toBe(404);
    expect(
      (await purgeRoute(req("POST", "/api/internal/share-purge", SLUG, { [LOCAL_PURGE_HEADER]: `${token.slice(0, -1)}x` }))).status,
    ).toBe(404);
    expect(revalidated).toEqual([]);
    expect((await purgeRoute(req("POST", "/api/internal/share-purge", "../etc", { [LOCAL_PURGE_HEADER]: token }))).status).toBe(400);
    // Even the token holder cannot make it buffer a large body: cut off at 256 bytes.
    expect((await purgeRoute(req("POST", "/api/internal/share-purge", "x".repeat(10_000), { [LOCAL_PURGE_HEADER]: token }))).status).toBe(
      413,
    );
    expect((await purgeRoute(req("POST", "/api/internal/share-purge", SLUG, { [LOCAL_PURGE_HEADER]: token }))).status).toBe(204);
    expect(revalidated).toEqual([`/s/${SLUG}`, `/s/${SLUG} layout`]);
    revalidated.length = 0;
    expect((await purgeRoute(req("POST", "/api/internal/share-purge", "*", { [LOCAL_PURGE_HEADER]: token }))).status).toBe(204);
    expect(revalidated).toEqual(["/s/[slug] page", "/s/[slug] layout"]);
  });

  it("reaches an IPv6 any-address server over loopback", () => {
    expect(selfUrl("::", 3000)).toBe("http://[::1]:3000");
    expect(selfUrl("127.0.0.1", 3000)).toBe("http://127.0.0.1:3000");
  });
});
