/**
 * A small shared cache in front of Next for pages that say they may be cached by a shared
 * cache (`Cache-Control: s-maxage=N`): the job a CDN or a reverse proxy's micro-cache does,
 * inside the app's own server (scripts/serve.ts). Next serves a cached share page in about 2 ms
 * of CPU (routing, headers, its render cache); a hit here is a buffer write, so a link posted
 * where many people click it at once does not queue requests.
 *
 * Only paths the server names are eligible (the share pages, a visitor's bare /workspace), only
 * plain GET/HEAD page requests (no query, no RSC or server-action headers, no session cookie when
 * the server says so), and only 200 answers with `s-maxage` and no
 * `Set-Cookie`; an entry lives at most `s-maxage` (capped by `maxTtlMs`). One copy is kept per
 * content encoding. The app drops a path on its own changes ({@link purgeSharedMicrocache}), so a
 * revoked link answers 404 on the next request, as it does without this cache.
 *
 * Plain Node (no Next imports): the server loads it outside Next's bundle, and the app reaches
 * the same instance through `globalThis`.
 */
import type { IncomingMessage, OutgoingHttpHeaders, ServerResponse } from "node:http";
import { LRUCache } from "lru-cache";

export interface MicrocacheOptions {
  /** Which request paths may be cached, e.g. /^\/s\/[\w-]+$/. */
  paths: RegExp;
  /** Total bytes of bodies kept (least recently used dropped first). */
  maxBytes?: number;
  /** One body larger than this is not kept. */
  maxEntryBytes?: number;
  /** Upper bound on an entry's life whatever `s-maxage` says. */
  maxTtlMs?: number;
  /**
   * A request whose Cookie header says true here goes to the app, neither served nor kept: a page
   * for a signed-in reader may be their own (the members' /workspace), e.g. `hasSessionCookie`.
   */
  personal?: (cookieHeader: string | undefined) => boolean;
}

interface Entry {
  status: number;
  headers: OutgoingHttpHeaders;
  body: Buffer;
  storedAt: number;
  expiresAt: number;
}

// Hop-by-hop and per-response headers are not replayed.
const DROPPED = new Set(["date", "connection", "keep-alive", "transfer-encoding", "content-length", "age"]);
// Requests a page's HTML is not the answer to: client navigations (RSC), prefetches, actions.
const BYPASS_HEADERS = [
  "rsc",
  "next-router-state-tree",
  "next-router-prefetch",
  "next-router-segment-prefetch",
  "next-action",
  "authorization",
  "range",
];

/** The `s-maxage` of a Cache-Control value, in seconds, or null. */
export function sMaxAgeSeconds(cacheControl: string | number | string[] | undefined): number | null {
  if (typeof cacheControl !== "string") return null;
  if (/\b(private|no-store|no-cache)\b/i.test(cacheControl)) return null;
  const m = /\bs-maxage=(\d+)/i.exec(cacheControl);
  return m ? Number(m[1]) : null;
}

function acceptsGzip(req: IncomingMessage): boolean {
  const ae = req.headers["accept-encoding"];
  return typeof ae === "string" && /\bgzip\b(?!\s*;\s*q=0(\.0*)?\b)/i.test(ae);
}

/** writeHead's headers (an object, or a flat [name, value, …] list) with lower-case names. */
function headersFrom(given: unknown): OutgoingHttpHeaders {
  const out: OutgoingHttpHeaders = {};
  if (Array.isArray(given)) {
    for (let i = 0; i + 1 < given.length; i += 2) out[String(given[i]).toLowerCase()] = given[i + 1] as string;
  } else if (given && typeof given === "object") {
    for (const [k, v] of Object.entries(given)) out[k.toLowerCase()] = v as string;
  }
  return out;
}

export class Microcache {
  private readonly entries: LRUCache<string, Entry>;
  private readonly opts: Required<MicrocacheOptions>;
  // An answer begun before a purge may carry what the purge was for (a revoked link's page): it
  // is not kept.
  private purges = 0;

  constructor(
    options: MicrocacheOptions,
    private readonly now: () => number = Date.now,
  ) {
    this.opts = { maxBytes: 32 * 1024 * 1024, maxEntryBytes: 1024 * 1024, maxTtlMs: 60_000, personal: () => false, ...options };
    this.entries = new LRUCache<string, Entry>({ maxSize: this.opts.maxBytes, sizeCalculation: (e) => Math.max(1, e.body.length) });
  }

  /** The path a request may be cached under, or null when it must go to the app. */
  private pathOf(req: IncomingMessage): string | null {
    if (req.method !== "GET" && req.method !== "HEAD") return null;
    const url = req.url ?? "";
    if (url.includes("?") || !this.opts.paths.test(url)) return null;
    if (BYPASS_HEADERS.some((h) => req.headers[h] !== undefined)) return null;
    if (this.opts.personal(req.headers.cookie)) return null;
    return url;
  }

  private fresh(key: string): Entry | null {
    const e = this.entries.get(key);
    if (!e) return null;
    if (this.now() >= e.expiresAt) {
      this.entries.delete(key);
      return null;
    }
    return e;
  }

  /**
   * Answers the request from the cache when it can; true when it did.
   * @example if (!cache.serve(req, res)) { cache.capture(req, res); handle(req, res); }
   */
  serve(req: IncomingMessage, res: ServerResponse): boolean {
    const path = this.pathOf(req);
    if (!path) return false;
    const e = (acceptsGzip(req) ? this.fresh(`${path} gzip`) : null) ?? this.fresh(`${path} identity`);
    if (!e) return false;
    const age = Math.floor((this.now() - e.storedAt) / 1000);
    res.writeHead(e.status, { ...e.headers, "content-length": e.body.length, age: String(age), "x-hubface-cache": "hit" });
    res.end(req.method === "HEAD" ? undefined : e.body);
    return true;
  }

  /**
   * Watches the app's answer to a request the cache could not serve and keeps it if it may.
   * @example cache.capture(req, res); handle(req, res);
   */
  capture(req: IncomingMessage, res: ServerResponse): void {
    const path = this.pathOf(req);
    if (!path || req.method !== "GET") return;
    const purgesBefore = this.purges;
    const chunks: Buffer[] = [];
    let bytes = 0;
    let overflow = false;
    const keep = (chunk: unknown, encoding?: unknown) => {
      if (overflow || chunk === undefined || chunk === null || typeof chunk === "function") return;
      const b = Buffer.isBuffer(chunk)
        ? chunk
        : chunk instanceof Uint8Array
          ? Buffer.from(chunk)
          : Buffer.from(String(chunk), typeof encoding === "string" ? (encoding as BufferEncoding) : "utf8");
      bytes += b.length;
      if (bytes > this.opts.maxEntryBytes) overflow = true;
      else chunks.push(b);
    };
    // Headers given to writeHead directly are not in getHeaders(): note them as they go out.
    let sent: OutgoingHttpHeaders = {};
    const writeHead = res.writeHead.bind(res) as (...a: unknown[]) => ServerResponse;
    res.writeHead = ((...args: unknown[]) => {
      sent = { ...res.getHeaders(), ...headersFrom(args.find((a) => typeof a === "object" && a !== null)) };
      return writeHead(...args);
    }) as ServerResponse["writeHead"];
    const write = res.write.bind(res) as (...a: unknown[]) => boolean;
    const end = res.end.bind(res) as (...a: unknown[]) => ServerResponse;
    res.write = ((chunk: unknown, ...rest: unknown[]) => {
      keep(chunk, rest[0]);
      return write(chunk, ...rest);
    }) as ServerResponse["write"];
    res.end = ((chunk?: unknown, ...rest: unknown[]) => {
      keep(chunk, rest[0]);
      return end(chunk, ...rest);
    }) as ServerResponse["end"];
    res.once("finish", () => {
      if (overflow || res.statusCode !== 200 || this.purges !== purgesBefore) return;
      const headers = { ...sent, ...res.getHeaders() };
      const sMaxAge = sMaxAgeSeconds(headers["cache-control"] as string);
      if (headers["set-cookie"] !== undefined || sMaxAge === null) return;
      const kept: OutgoingHttpHeaders = {};
      for (const [k, v] of Object.entries(headers)) if (!DROPPED.has(k) && v !== undefined) kept[k] = v;
      const encoding = String(headers["content-encoding"] ?? "identity").toLowerCase();
      if (encoding !== "identity" && encoding !== "gzip") return;
      const storedAt = this.now();
      const expiresAt = storedAt + Math.min(sMaxAge * 1000, this.opts.maxTtlMs);
      this.entries.set(`${path} ${encoding}`, { status: 200, headers: kept, body: Buffer.concat(chunks), storedAt, expiresAt });
    });
  }

  /**
   * Drops every copy of a path.
   * @example cache.purge("/s/AbC123");
   */
  purge(path: string): void {
    this.purges += 1;
    this.entries.delete(`${path} gzip`);
    this.entries.delete(`${path} identity`);
  }

  /**
   * Drops every copy (after purges may have been missed, lib/platform/http/sharePurge.ts).
   * @example cache.clear();
   */
  clear(): void {
    this.purges += 1;
    this.entries.clear();
  }

  /** How many copies are kept (for tests and diagnostics). */
  get size(): number {
    return this.entries.size;
  }
}

const KEY = Symbol.for("hubface.microcache");
type WithCache = typeof globalThis & { [KEY]?: Microcache };

/**
 * Makes `cache` the process's shared micro-cache (the server does this at start).
 * @example installSharedMicrocache(new Microcache({ paths: /^\/s\/[\w-]+$/ }));
 */
export function installSharedMicrocache(cache: Microcache | undefined): void {
  (globalThis as WithCache)[KEY] = cache;
}

/**
 * Drops a path from the process's micro-cache, if the server runs one (tests and `next dev` do not).
 * @example purgeSharedMicrocache("/s/AbC123");
 */
export function purgeSharedMicrocache(path: string): void {
  (globalThis as WithCache)[KEY]?.purge(path);
}

/**
 * Drops every path from the process's micro-cache, if the server runs one.
 * @example clearSharedMicrocache();
 */
export function clearSharedMicrocache(): void {
  (globalThis as WithCache)[KEY]?.clear();
}
