import "server-only";
import type { Knex } from "knex";
import { type LimitSpec, hashKey, limiterFor, waitInWords } from "@/lib/platform/limits/rateLimit";

/**
 * Sign-in backoff, kept in PostgreSQL (lib/platform/limits/rateLimit.ts) so it holds across app servers.
 *
 * Lock-out must not be a weapon: five wrong passwords from anywhere used to lock the account for
 * everyone for 15 minutes. Now
 * - each (client address, account) pair gets FREE_PER_PAIR failures, then waits that double
 *   after every further failure (1, 2, 4, … minutes, at most MAX_WAIT) — only that address waits;
 * - each address gets FREE_PER_ADDRESS failures an hour over all accounts (password spraying),
 *   then the same doubling wait;
 * - each account counts failures from everywhere; past ACCOUNT_SLOW_AFTER an hour (only a
 *   distributed attack gets there) every attempt on it is answered ACCOUNT_DELAY_MS later:
 *   slowed, never locked, so the owner can still sign in.
 * The client address comes from lib/platform/auth/clientAddress.ts (never a client-written header).
 */
export const THROTTLE = {
  freePerPair: 5,
  freePerAddress: 50,
  firstWaitSec: 60,
  maxWaitSec: 60 * 60,
  accountSlowAfter: 200,
  accountDelayMs: 2000,
} as const;

const DAY = 24 * 60 * 60;
const HOUR = 60 * 60;
/** Failure counters (points far above any limit: they only count). */
const PAIR_FAILS: LimitSpec = { name: "signin_pair", points: 1_000_000, durationSec: DAY };
const ADDR_FAILS: LimitSpec = { name: "signin_addr", points: 1_000_000, durationSec: HOUR };
const ACCT_FAILS: LimitSpec = { name: "signin_acct", points: 1_000_000, durationSec: HOUR };
/** Waits: a blocked key in these means "not before msBeforeNext". */
const PAIR_WAIT: LimitSpec = { name: "signin_pair_wait", points: 1, durationSec: 1 };
const ADDR_WAIT: LimitSpec = { name: "signin_addr_wait", points: 1, durationSec: 1 };

export interface Attempt {
  email: string;
  address: string;
}

const keys = ({ email, address }: Attempt) => {
  const account = email.trim().toLowerCase();
  return { pair: hashKey(address, account), addr: hashKey(address), acct: hashKey(account) };
};

/**
 * The wait after the n-th failure past the free ones (n = 1, 2, …): FIRST_WAIT doubling, capped.
 * Common practice (exponential backoff, OWASP Authentication Cheat Sheet "account lockout"), no
 * source for the exact figures.
 *
 * @example backoffSec(1); // 60
 * @example backoffSec(3); // 240
 */
export function backoffSec(n: number): number {
  return Math.min(THROTTLE.maxWaitSec, THROTTLE.firstWaitSec * 2 ** Math.max(0, n - 1));
}

export interface Gate {
  /** Milliseconds this address must still wait for this account (0 = go ahead). */
  waitMs: number;
  /** The account is under a distributed attack: answer after this delay. */
  delayMs: number;
}

/** May this attempt go ahead? Reads only; counts nothing. */
export async function checkAttempt(db: Knex, attempt: Attempt): Promise<Gate> {
  const k = keys(attempt);
  const [pair, addr, acct] = await Promise.all([
    limiterFor(db, PAIR_WAIT).get(k.pair),
    limiterFor(db, ADDR_WAIT).get(k.addr),
    limiterFor(db, ACCT_FAILS).get(k.acct),
  ]);
  const blocked = (r: typeof pair) => (r && r.consumedPoints > PAIR_WAIT.points ? r.msBeforeNext : 0);
  return {
    waitMs: Math.max(blocked(pair), blocked(addr)),
    delayMs: acct && acct.consumedPoints >= THROTTLE.accountSlowAfter ? THROTTLE.accountDelayMs : 0,
  };
}

/** Counts one failed attempt; returns the wait it starts for this address (0 = none yet). */
export async function recordFailure(db: Knex, attempt: Attempt): Promise<number> {
  const k = keys(attempt);
  const [pair, addr] = await Promise.all([
    limiterFor(db, PAIR_FAILS).penalty(k.pair, 1),
    limiterFor(db, ADDR_FAILS).penalty(k.addr, 1),
    limiterFor(db, ACCT_FAILS).penalty(k.acct, 1),
  ]);
  let waitSec = 0;
  const overPair = pair.consumedPoints - THROTTLE.freePerPair + 1;
  if (overPair >= 1) {
    waitSec = backoffSec(overPair);
    await limiterFor(db, PAIR_WAIT).block(k.pair, waitSec);
  }
  const overAddr = addr.consumedPoints - THROTTLE.freePerAddress + 1;
  if (overAddr >= 1) {
    const s = backoffSec(overAddr);
    await limiterFor(db, ADDR_WAIT).block(k.addr, s);
    waitSec = Math.max(waitSec, s);
  }
  return waitSec * 1000;
}

/**
 * A successful sign-in (or a password reset from that address) clears this pair's failures and
 * wait. The address's and the account's counts stay: they measure attacks, not this person.
 */
export async function clearAttempts(db: Knex, attempt: Attempt): Promise<void> {
  const k = keys(attempt);
  await Promise.all([limiterFor(db, PAIR_FAILS).delete(k.pair), limiterFor(db, PAIR_WAIT).delete(k.pair)]);
}

/** What the sign-in form shows while this address waits. */
export const waitMessage = (ms: number) =>
  `Too many wrong passwords for this account from your network. Wait ${waitInWords(ms)} before trying again, or reset your password.`;
