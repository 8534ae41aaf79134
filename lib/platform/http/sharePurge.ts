/**
 * Share-page purges across app servers. Each server keeps its own copies of a share page (the
 * micro-cache in front of Next, lib/platform/http/microcache.ts, and Next's own page cache), so a revoke
 * on one server must reach the others: the app sends `NOTIFY hubface_share_purge, '<slug>'`
 * (lib/comparisons/shareCache.ts) and every server listens on one dedicated PostgreSQL connection
 * ({@link startSharePurgeListener}, started by scripts/serve.ts) and drops its copies.
 *
 * A NOTIFY reaches only sessions listening at that moment, so a server whose connection was
 * down may have missed purges: on every (re)connect after the first the listener purges
 * everything it holds (`onReconnect`), which is cheap next to serving a revoked page.
 *
 * Plain Node (no Next imports): the server loads it outside Next's bundle.
 */
import { timingSafeEqual } from "node:crypto";
import pg from "pg";
import { log } from "@/lib/platform/log";
import { randomToken } from "@/lib/platform/tokens";

/** The NOTIFY channel (an identifier: lower case, no quoting needed). */
export const SHARE_PURGE_CHANNEL = "hubface_share_purge";

/** What a share slug looks like (lib/comparisons/queries.ts makes 24 URL-safe characters). */
const SLUG = /^[A-Za-z0-9_-]{16,64}$/;

export interface SharePurgeListenerOptions {
  connectionString: string;
  /** Drops this server's copies of /s/<slug>. */
  onPurge: (slug: string) => void | Promise<void>;
  /** Called after a reconnect (not the first connect): purges may have been missed meanwhile. */
  onReconnect?: () => void | Promise<void>;
  /** First wait before reconnecting; doubles on each failure up to `maxBackoffMs`. */
  minBackoffMs?: number;
  maxBackoffMs?: number;
}

export interface SharePurgeListener {
  /** Resolves once the first LISTEN is in place (or never, while the database is down). */
  readonly ready: Promise<void>;
  /** The listening connection's server process id (for tests and diagnostics), or null while down. */
  backendPid(): number | null;
  /** How many times a connection has been set up (1 after the first). */
  connections(): number;
  stop(): Promise<void>;
}

/**
 * Listens for share purges on a dedicated connection and reconnects with backoff when it drops.
 * @example
 * const listener = startSharePurgeListener({ connectionString: process.env.DATABASE_URL!, onPurge: (slug) => cache.purge(`/s/${slug}`) });
 */
export function startSharePurgeListener(options: SharePurgeListenerOptions): SharePurgeListener {
  const minBackoff = options.minBackoffMs ?? 250;
  const maxBackoff = options.maxBackoffMs ?? 10_000;
  let client: pg.Client | null = null;
  let stopped = false;
  let backoff = minBackoff;
  let connects = 0;
  let retry: NodeJS.Timeout | null = null;
  let markReady: () => void = () => {};
  const ready = new Promise<void>((resolve) => (markReady = resolve));

  const deliver = (payload: string | undefined) => {
    if (!payload || !SLUG.test(payload)) {
      log().warn({ channel: SHARE_PURGE_CHANNEL }, "share purge ignored: not a share slug");
      return;
    }
    Promise.resolve()
      .then(() => options.onPurge(payload))
      .catch((error: unknown) => log().error({ err: { message: (error as Error).message } }, "share purge failed on this server"));
  };

  const scheduleReconnect = (reason: string) => {
    if (stopped || retry) return;
    const wait = backoff;
    backoff = Math.min(backoff * 2, maxBackoff);
    log().warn(
      { channel: SHARE_PURGE_CHANNEL, reason, retryInMs: wait },
      "share purge listener lost its database connection; reconnecting",
    );
    retry = setTimeout(() => {
      retry = null;
      void connect();
    }, wait);
    retry.unref();
  };

  const connect = async (): Promise<void> => {
    if (stopped) return;
    const c = new pg.Client({ connectionString: options.connectionString, connectionTimeoutMillis: 5000, keepAlive: true });
    client = c;
    let dropped = false;
    const drop = (reason: string) => {
      if (dropped) return;
      dropped = true;
      if (client === c) client = null;
      c.removeAllListeners("notification");
      void c.end().catch(() => {});
      scheduleReconnect(reason);
    };
    // An 'error' event with no listener would crash the process: a lost connection is routine here.
    c.on("error", (error) => drop(error.message));
    c.on("end", () => drop("connection ended"));
    c.on("notification", (msg) => {
      if (msg.channel === SHARE_PURGE_CHANNEL) deliver(msg.payload);
    });
    try {
      await c.connect();
      await c.query(`LISTEN ${SHARE_PURGE_CHANNEL}`);
    } catch (error) {
      drop((error as Error).message);
      return;
    }
    if (stopped) {
      await c.end().catch(() => {});
      return;
    }
    connects += 1;
    backoff = minBackoff;
    log().info({ channel: SHARE_PURGE_CHANNEL, reconnect: connects > 1 }, "share purge listener is listening");
    markReady();
    if (connects > 1 && options.onReconnect) {
      await Promise.resolve()
        .then(options.onReconnect)
        .catch((error: unknown) => log().error({ err: { message: (error as Error).message } }, "purge after reconnect failed"));
    }
  };

  void connect();

  return {
    ready,
    backendPid: () => (client as unknown as { processID?: number } | null)?.processID ?? null,
    connections: () => connects,
    async stop() {
      stopped = true;
      if (retry) clearTimeout(retry);
      const c = client;
      client = null;
      if (c) {
        c.removeAllListeners();
        c.on("error", () => {});
        await c.end().catch(() => {});
      }
    },
  };
}

// A per-process token for the server's own request to its purge route (app/api/internal/share-purge):
// Next's page cache can only be revalidated inside a request, and nobody outside this process
// knows the token, so nobody else can make the server drop pages.
const TOKEN = Symbol.for("hubface.sharePurgeToken");
type WithToken = typeof globalThis & { [TOKEN]?: string };

/** The header the server's own purge request carries its token in. */
export const LOCAL_PURGE_HEADER = "x-hubface-purge-token";

/**
 * Makes (once) and returns this process's purge token.
 * @example fetch(url, { headers: { [LOCAL_PURGE_HEADER]: localPurgeToken() } });
 */
export function localPurgeToken(): string {
  return ((globalThis as WithToken)[TOKEN] ??= randomToken());
}

/**
 * True when `given` is this process's purge token; false when none was made (e.g. `next dev`).
 * @example if (!isLocalPurgeToken(req.headers.get(LOCAL_PURGE_HEADER))) return notFound();
 */
export function isLocalPurgeToken(given: string | null | undefined): boolean {
  const mine = (globalThis as WithToken)[TOKEN];
  if (!mine || !given) return false;
  const a = Buffer.from(mine);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** The cache in front of Next (lib/platform/http/microcache.ts), as far as a purge needs it. */
interface PurgeableCache {
  purge(path: string): void;
  clear(): void;
}

/**
 * What a server does on a purge from another server: drops its micro-cache copy, asks its own
 * Next (at `baseUrl`, the server's own address) to drop the cached page, then drops the
 * micro-cache copy once more — a request that read Next's old page in between must not stay.
 * @example startSharePurgeListener({ connectionString, ...ownServerPurge("http://127.0.0.1:3000", cache) });
 */
export function ownServerPurge(
  baseUrl: string,
  cache: PurgeableCache | undefined,
): Pick<SharePurgeListenerOptions, "onPurge" | "onReconnect"> {
  const ask = async (body: string) => {
    const res = await fetch(`${baseUrl}/api/internal/share-purge`, {
      method: "POST",
      headers: { [LOCAL_PURGE_HEADER]: localPurgeToken(), "content-type": "text/plain" },
      body,
      signal: AbortSignal.timeout(5000),
    });
    await res.body?.cancel();
    if (res.status !== 204) throw new Error(`the server's own purge route answered ${res.status}`);
  };
  return {
    onPurge: async (slug) => {
      cache?.purge(`/s/${slug}`);
      await ask(slug);
      cache?.purge(`/s/${slug}`);
    },
    onReconnect: async () => {
      cache?.clear();
      await ask("*");
      cache?.clear();
    },
  };
}

/**
 * The address a server reaches itself at, from the host it listens on (any-address → loopback).
 * @example selfUrl("0.0.0.0", 3000) // "http://127.0.0.1:3000"
 */
export function selfUrl(hostname: string, port: number): string {
  const host = hostname === "0.0.0.0" || hostname === "" ? "127.0.0.1" : hostname === "::" ? "::1" : hostname;
  return `http://${host.includes(":") ? `[${host}]` : host}:${port}`;
}

/** Whether a string is a share slug this module accepts. */
export function isShareSlug(s: string): boolean {
  return SLUG.test(s);
}
