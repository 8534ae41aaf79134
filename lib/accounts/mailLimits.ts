import "server-only";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";

/** Per kind of account mail: at most one every 2 minutes and 5 a day to one address (lib/platform/limits/limits.ts). */
const BUDGETS = {
  reset: [RATE_LIMITS.forgotMailSpacing, RATE_LIMITS.forgotMailPerDay],
  signUp: [RATE_LIMITS.signUpMailSpacing, RATE_LIMITS.signUpMailPerDay],
} as const;

/**
 * Counts one account mail of `kind` to `email` against that address's budget, so no route can
 * bury an inbox. False when over it: the caller sends nothing and answers as usual (the limit
 * must not show, or it would tell which addresses were asked about).
 */
export async function withinAccountMailLimits(kind: keyof typeof BUDGETS, email: string): Promise<boolean> {
  const key = email.trim().toLowerCase();
  const [spacing, perDay] = BUDGETS[kind];
  if (!(await rateLimitQueries.consumeQuietly(spacing, key))) return false;
  return rateLimitQueries.consumeQuietly(perDay, key);
}
