/**
 * The re-check e-mail's booking link: how long the short slot keeps the truck, how far ahead it
 * may be booked, how long the link works, and where it points. Pure; the queries keep only the
 * token's SHA-256 (lib/platform/tokens.ts), as the quote's customer link does.
 */
import type { BayKind } from "@/lib/platform/db/types";

/**
 * The re-check's bay time when the shop has set none: lug nuts and ring bolts torqued again on a
 * lift, 30 minutes (common practice, no source). The owner sets the shop's own length on the
 * re-checks page, within RECHECK_SLOT_LIMITS; the column default of shops.recheck_slot_minutes
 * (migration 20261210100000_recheck_length) holds the same 30.
 */
export const RECHECK_SLOT = { minutes: 30, bayKind: "lift_bay" as BayKind } as const;

/** The shortest and longest re-check slot the owner may set (common practice, no source); the column's check holds the same. */
export const RECHECK_SLOT_LIMITS = { min: 10, max: 120 } as const;

/** The customer picks among the free starts of the next 14 days. */
export const RECHECK_BOOKING_DAYS = 14;

/** Days the link works after the e-mail is queued: as long as the counter's "due for re-check" list shows the job. */
export const RECHECK_LINK_DAYS = 30;

const DAY_MS = 86_400_000;

/**
 * The re-check as a job of one stretch of `minutes` (the shop's length) on a lift, in the shape
 * the slot search takes.
 *
 * @example
 * recheckWork(); // { segments: [{ bayKind: "lift_bay", minutes: 30 }], minutes: 30 }
 * recheckWork(45); // { segments: [{ bayKind: "lift_bay", minutes: 45 }], minutes: 45 }
 */
export function recheckWork(minutes: number = RECHECK_SLOT.minutes): {
  segments: { bayKind: BayKind; minutes: number }[];
  minutes: number;
} {
  return { segments: [{ bayKind: RECHECK_SLOT.bayKind, minutes }], minutes };
}

/**
 * When a link made at `madeAt` stops working.
 *
 * @example
 * recheckLinkExpiry(new Date("2027-03-01T16:00:00Z")).toISOString(); // "2027-03-31T16:00:00.000Z"
 */
export const recheckLinkExpiry = (madeAt: Date): Date => new Date(madeAt.getTime() + RECHECK_LINK_DAYS * DAY_MS);

/**
 * Whether a link that expires at `expiresAt` still works at `now` (the expiry instant itself no longer does).
 *
 * @example
 * recheckLinkLive(new Date("2027-03-31T16:00:00Z"), new Date("2027-03-31T16:00:00Z")); // false
 */
export const recheckLinkLive = (expiresAt: Date | null, now: Date): boolean => expiresAt !== null && now.getTime() < expiresAt.getTime();

/**
 * The customer's page for a token.
 *
 * @example
 * recheckUrl("https://hubface.test", "abc"); // "https://hubface.test/recheck/abc"
 */
export const recheckUrl = (origin: string, token: string): string => `${origin.replace(/\/+$/, "")}/recheck/${token}`;
