import "server-only";
import type { Knex } from "knex";
import type { SignInThrottleRow } from "@/lib/db/types";

/**
 * Sign-in throttle kept in PostgreSQL so it holds across several app servers.
 * Each key (one per account, one per client address) counts failures in a rolling window;
 * reaching the limit locks the key for LOCK_MINUTES.
 */
export const THROTTLE = {
  windowMinutes: 15,
  lockMinutes: 15,
  accountLimit: 5,
  addressLimit: 25,
} as const;

export const accountKey = (email: string) => `acct:${email.trim().toLowerCase()}`;
export const addressKey = (ip: string) => `addr:${ip}`;

export interface LockState {
  locked: boolean;
  /** Minutes until the lock lifts, rounded up; 0 when not locked. */
  minutesLeft: number;
}

/** Is any of these keys locked right now? */
export async function lockState(db: Knex, keys: string[]): Promise<LockState> {
  const rows: SignInThrottleRow[] = await db("sign_in_throttle")
    .whereIn("key", keys)
    .andWhere("locked_until", ">", db.fn.now());
  if (rows.length === 0) return { locked: false, minutesLeft: 0 };
  const until = Math.max(...rows.map((r) => new Date(r.locked_until!).getTime()));
  return { locked: true, minutesLeft: Math.max(1, Math.ceil((until - Date.now()) / 60000)) };
}

/** Count one failure against a key, locking it when the limit is reached. Atomic per key. */
export async function recordFailure(db: Knex, key: string, limit: number): Promise<SignInThrottleRow> {
  const result = await db.raw<{ rows: SignInThrottleRow[] }>(
    `insert into sign_in_throttle as t (key, failures, window_started_at, locked_until)
     values (:key, 1, now(), case when 1 >= :limit then now() + make_interval(mins => :lock) else null end)
     on conflict (key) do update set
       failures = case when t.window_started_at < now() - make_interval(mins => :window) then 1 else t.failures + 1 end,
       window_started_at = case when t.window_started_at < now() - make_interval(mins => :window) then now() else t.window_started_at end,
       locked_until = case
         when (case when t.window_started_at < now() - make_interval(mins => :window) then 1 else t.failures + 1 end) >= :limit
           then now() + make_interval(mins => :lock)
         else t.locked_until end
     returning *`,
    { key, limit, lock: THROTTLE.lockMinutes, window: THROTTLE.windowMinutes },
  );
  return result.rows[0]!;
}

/** A successful sign-in clears the account's failures (not the address's). */
export async function clearKey(db: Knex, key: string): Promise<void> {
  await db("sign_in_throttle").where({ key }).del();
}
