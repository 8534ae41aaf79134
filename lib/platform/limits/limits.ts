import type { LimitSpec } from "./rateLimit";

const MIN = 60;
const HOUR = 60 * MIN;
const DAY = 24 * HOUR;

/**
 * Every request rate limit in one place (the figures are common practice, no source: generous
 * enough for a shop behind one shared address, small enough to stop floods and bulk probing).
 * Sign-in backoff lives in lib/platform/auth/throttle.ts.
 */
export const RATE_LIMITS = {
  /** Sign-ups per client address. */
  signUp: { name: "signup_addr", points: 20, durationSec: HOUR },
  /** Sign-up confirmations per client address (each checks a password against a pending sign-up). */
  signUpConfirm: { name: "signup_confirm_addr", points: 20, durationSec: HOUR },
  /** Reset requests per client address (any account, existing or not): over it → 429. */
  forgotPerAddress: { name: "forgot_addr", points: 20, durationSec: HOUR },
  /** Reset mails per account: over either → the same answer, no mail (nothing to discover). */
  forgotMailSpacing: { name: "forgot_acct_2min", points: 1, durationSec: 2 * MIN },
  forgotMailPerDay: { name: "forgot_acct_day", points: 5, durationSec: DAY },
  /**
   * Sign-up mails (a confirmation link, or the notice to an address that has an account) per
   * address: the same rule with their own count, so a sign-up does not hold back a reset mail.
   */
  signUpMailSpacing: { name: "signup_mail_2min", points: 1, durationSec: 2 * MIN },
  signUpMailPerDay: { name: "signup_mail_day", points: 5, durationSec: DAY },
  /** Staff invitations (each sends a mail) per shop. */
  staffInvites: { name: "invite_shop", points: 20, durationSec: HOUR },
  /** Public quote actions per link and per client address (paying opens a checkout session). */
  quoteActionsPerLink: { name: "quote_token", points: 20, durationSec: HOUR },
  quoteActionsPerAddress: { name: "quote_addr", points: 60, durationSec: HOUR },
  /** New share links per user. */
  shareLinks: { name: "share_user", points: 30, durationSec: HOUR },
} satisfies Record<string, LimitSpec>;
