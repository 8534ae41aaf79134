import "server-only";
import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { bindAppDb } from "@/lib/platform/db/bind";

/** Whose key on which route: a key is the caller's own, and means one request on one route. */
export interface KeyScope {
  userId: string;
  route: string;
  key: string;
}

/**
 * How long a reservation may stay pending before another request may take it over: a create
 * that has not finished in this time is taken to have died with its server (kill -9, OOM).
 */
export const STALE_RESERVATION = "1 minute";

export type Claim =
  | { kind: "run"; attempt: string }
  | { kind: "replay"; status: number; type: string; body: string }
  | { kind: "mismatch" }
  | { kind: "busy" };

interface KeyRow {
  request_hash: string;
  state: "pending" | "complete";
  attempt: string;
  response_status: number | null;
  response_type: string | null;
  response_body: string | null;
  expired: boolean;
  stale: boolean;
}

/**
 * Reserves `scope` for a request whose body hashes to `hash`, or says what to answer instead:
 * the stored response (same body, completed), a mismatch (another body), busy (still running).
 * An expired record (24 h) or a reservation left pending longer than {@link STALE_RESERVATION}
 * is taken over; every change is a compare-and-set on `attempt`, so two requests racing for the
 * same key get one "run" between them.
 */
export async function claimKey(db: Knex, scope: KeyScope, hash: string): Promise<Claim> {
  const where = { user_id: scope.userId, route: scope.route, key: scope.key };
  for (let round = 0; round < 3; round++) {
    const attempt = randomUUID();
    const inserted = await db.raw<{ rows: unknown[] }>(
      "insert into idempotency_keys (user_id, route, key, request_hash, attempt) values (?, ?, ?, ?, ?) on conflict do nothing returning attempt",
      [scope.userId, scope.route, scope.key, hash, attempt],
    );
    if (inserted.rows.length) return { kind: "run", attempt };
    const row = (await db("idempotency_keys")
      .where(where)
      .first(
        "request_hash",
        "state",
        "attempt",
        "response_status",
        "response_type",
        "response_body",
        db.raw("expires_at <= now() as expired"),
        db.raw(`state = 'pending' and locked_at <= now() - interval '${STALE_RESERVATION}' as stale`),
      )) as KeyRow | undefined;
    if (!row) continue; // deleted between the two statements (released or purged): insert again
    if (!row.expired) {
      if (row.request_hash !== hash) return { kind: "mismatch" };
      if (row.state === "complete")
        return {
          kind: "replay",
          status: row.response_status!,
          type: row.response_type ?? "application/json",
          body: row.response_body ?? "",
        };
      if (!row.stale) return { kind: "busy" };
    }
    const taken = await db("idempotency_keys")
      .where({ ...where, attempt: row.attempt })
      .update({
        request_hash: hash,
        state: "pending",
        attempt,
        response_status: null,
        response_type: null,
        response_body: null,
        created_at: db.fn.now(),
        locked_at: db.fn.now(),
        expires_at: db.raw("now() + interval '24 hours'"),
      });
    if (taken) return { kind: "run", attempt };
    // Someone else changed it first: look again.
  }
  return { kind: "busy" };
}

/** Stores the response of a finished create; a no-op when the reservation was taken over meanwhile. */
export async function completeKey(
  db: Knex,
  scope: KeyScope,
  attempt: string,
  response: { status: number; type: string; body: string },
): Promise<boolean> {
  const n = await db("idempotency_keys")
    .where({ user_id: scope.userId, route: scope.route, key: scope.key, attempt, state: "pending" })
    .update({ state: "complete", response_status: response.status, response_type: response.type, response_body: response.body });
  return n > 0;
}

/** Frees a reservation whose request created nothing (refused, or failed), so the key can be used again. */
export async function releaseKey(db: Knex, scope: KeyScope, attempt: string): Promise<void> {
  await db("idempotency_keys").where({ user_id: scope.userId, route: scope.route, key: scope.key, attempt, state: "pending" }).del();
}

/** Deletes records past their 24 hours (the claim takes an expired one over anyway; this keeps the table small). */
export async function purgeExpiredKeys(db: Knex): Promise<number> {
  return db("idempotency_keys").where("expires_at", "<=", db.fn.now()).del();
}

export const idempotencyQueries = bindAppDb({ claimKey, completeKey, releaseKey });
