import "server-only";
import { createHash } from "node:crypto";
import type { Knex } from "knex";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { bindAppDb } from "@/lib/platform/db/bind";
import { HttpError } from "@/lib/platform/http/errors";

/**
 * Rate limits in PostgreSQL (rate-limiter-flexible's PostgreSQL store on the app's Knex pool,
 * table `rate_limits`), so they hold across several app servers. Keys are hashed: an e-mail
 * address plus a client address may pass the table's 255 characters, and the table then holds
 * no addresses in clear.
 */

export interface LimitSpec {
  /** Key prefix and name in logs, e.g. "signup_addr". */
  name: string;
  /** Requests allowed per window. */
  points: number;
  /** Window length, seconds. */
  durationSec: number;
}

const TABLE = "rate_limits";
const perDb = new WeakMap<Knex, Map<string, RateLimiterPostgres>>();

/** One limiter per (database, spec); the table comes from the migrations. */
export function limiterFor(db: Knex, spec: LimitSpec): RateLimiterPostgres {
  let map = perDb.get(db);
  if (!map) perDb.set(db, (map = new Map()));
  const id = `${spec.name}/${spec.points}/${spec.durationSec}`;
  let limiter = map.get(id);
  if (!limiter) {
    limiter = new RateLimiterPostgres({
      storeClient: db,
      storeType: "knex",
      tableName: TABLE,
      tableCreated: true,
      keyPrefix: spec.name,
      points: spec.points,
      duration: spec.durationSec,
    });
    map.set(id, limiter);
  }
  return limiter;
}

/** A stable, short, opaque key for one identity (address, e-mail, user id, token …). */
export const hashKey = (...parts: string[]) => createHash("sha256").update(parts.join("\u0001")).digest("base64url");

/** "45 seconds", "1 minute", "3 hours": a wait as a person reads it (rounded up). */
export function waitInWords(ms: number): string {
  const s = Math.max(1, Math.ceil(ms / 1000));
  if (s < 60) return `${s} second${s === 1 ? "" : "s"}`;
  const m = Math.ceil(s / 60);
  if (m < 120) return `${m} minute${m === 1 ? "" : "s"}`;
  const h = Math.ceil(m / 60);
  return `${h} hours`;
}

/** 429 with Retry-After (whole seconds, RFC 9110 §10.2.3) and a message that says how long. */
export function tooManyRequests(msBeforeNext: number, what: string): HttpError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  return new HttpError(429, `${what} Try again in ${waitInWords(msBeforeNext)}.`, undefined, { "Retry-After": String(seconds) });
}

/**
 * Counts one request against each (spec, identity) pair; when any is over its limit, throws a
 * 429 naming `what` ("Too many sign-ups from this network.") with the longest wait.
 */
export async function consumeOrRefuse(db: Knex, checks: { spec: LimitSpec; key: string }[], what: string): Promise<void> {
  const results = await Promise.allSettled(checks.map(({ spec, key }) => limiterFor(db, spec).consume(hashKey(key))));
  let wait = 0;
  for (const r of results) {
    if (r.status === "fulfilled") continue;
    if (r.reason instanceof RateLimiterRes) wait = Math.max(wait, r.reason.msBeforeNext);
    else throw r.reason; // the store failed (database down): the route answers 503
  }
  if (wait > 0) throw tooManyRequests(wait, what);
}

/** Counts one request; true when still within the limit. For limits that must not show (forgot-password per account). */
export async function consumeQuietly(db: Knex, spec: LimitSpec, key: string): Promise<boolean> {
  try {
    await limiterFor(db, spec).consume(hashKey(key));
    return true;
  } catch (e) {
    if (e instanceof RateLimiterRes) return false;
    throw e;
  }
}

/** The limits for route handlers, on the app's handle (handlers never hold it). */
export const rateLimitQueries = bindAppDb({ consumeOrRefuse, consumeQuietly });
