/**
 * The owner's overview: what the API answers (camelCase, ISO instants, money in integer cents)
 * and the pure arithmetic behind it — the shop's week, its open hours, and the takings per day
 * filled out to every day of the window. Dates are "YYYY-MM-DD" on the shop's own clock.
 */
import type { BayKind, PaymentKind } from "@/lib/platform/db/types";
import type { Schedule } from "@/lib/shop/bookings/slots";
import { addDays, formatDay, weekdayOf } from "@/lib/shop/bookings/zoned";

/** One bay over the week: its live bookings, the time they hold it, and the time it is open. */
export interface BayWeek {
  bayId: string;
  bayName: string;
  bayKind: BayKind;
  bookings: number;
  bookedMinutes: number;
  openMinutes: number;
}

/** A paid deposit the shop still holds: the quote is not installed yet, and what was refunded is taken off. */
export interface DepositHeld {
  quoteId: string;
  quoteNumber: number;
  customerName: string;
  vehicle: string;
  heldCents: number;
  paidAt: string;
  /** The live booking's start, or null when the install is not booked. */
  installAt: string | null;
}

/** Money taken and given back on one day of the shop's clock. */
export interface TakingsDay {
  date: string;
  depositsCents: number;
  balancesCents: number;
  refundsCents: number;
  /** Deposits + balances − refunds. */
  netCents: number;
}

export interface ShopOverview {
  timeZone: string;
  week: { from: string; to: string; bays: BayWeek[] };
  deposits: { items: DepositHeld[]; totalCents: number };
  takings: { from: string; to: string; days: TakingsDay[]; totalCents: number };
}

/** How many days of takings the overview shows, today included. */
export const TAKINGS_DAYS = 14;

/**
 * The Monday-to-Sunday week (ISO 8601 weeks start on Monday) that holds `date`.
 *
 * @example
 * weekOf("2026-12-16"); // { from: "2026-12-14", days: ["2026-12-14", …, "2026-12-20"] } (a Wednesday)
 */
export function weekOf(date: string): { from: string; days: string[] } {
  const from = addDays(date, 1 - weekdayOf(date));
  return { from, days: Array.from({ length: 7 }, (_, i) => addDays(from, i)) };
}

/**
 * Minutes the shop is open over `days`: each weekday's hours, none on its closed dates. Every
 * bay works the shop's hours, so this is each bay's open time.
 *
 * @example
 * // Mon–Fri 8:00–17:00, closed Wednesday 16th: 4 × 540 = 2160
 * openMinutes({ hours: { 1: { opens: 480, closes: 1020 }, ... }, closedDays: new Map([["2026-12-16", ""]]) }, weekOf("2026-12-16").days);
 */
export function openMinutes(schedule: Pick<Schedule, "hours" | "closedDays">, days: readonly string[]): number {
  return days.reduce((sum, d) => {
    const h = schedule.closedDays.has(d) ? undefined : schedule.hours[weekdayOf(d)];
    return sum + (h ? h.closes - h.opens : 0);
  }, 0);
}

/** A sum of payments of one kind, or of refunds, on one day. */
export interface DayAmount {
  date: string;
  what: PaymentKind | "refund";
  cents: number;
}

/**
 * Every day from `from` to `to` (inclusive) with its deposits, balances and refunds; days with
 * nothing are zeros, so the chart has no gaps.
 *
 * @example
 * takingsByDay("2026-12-15", "2026-12-16", [{ date: "2026-12-16", what: "deposit", cents: 107696 }])[1].netCents; // 107696
 */
export function takingsByDay(from: string, to: string, amounts: readonly DayAmount[]): TakingsDay[] {
  const days: TakingsDay[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) days.push({ date: d, depositsCents: 0, balancesCents: 0, refundsCents: 0, netCents: 0 });
  const byDate = new Map(days.map((d) => [d.date, d]));
  for (const a of amounts) {
    const day = byDate.get(a.date);
    if (!day) continue;
    if (a.what === "deposit") day.depositsCents += a.cents;
    else if (a.what === "balance") day.balancesCents += a.cents;
    else day.refundsCents += a.cents;
    day.netCents = day.depositsCents + day.balancesCents - day.refundsCents;
  }
  return days;
}

/**
 * A calendar date as a chart's axis reads it.
 *
 * @example
 * shortDay("2026-12-15"); // "Tue, Dec 15"
 */
export function shortDay(date: string): string {
  return formatDay(date, "short");
}

/**
 * Minutes as hours with at most one decimal.
 *
 * @example
 * hoursLabel(210); // "3.5 h"
 * hoursLabel(2400); // "40 h"
 */
export function hoursLabel(minutes: number): string {
  return `${Math.round(minutes / 6) / 10} h`;
}

/**
 * The share of open time booked, in whole percent; "—" when the bay is not open at all.
 *
 * @example
 * bookedShare(210, 2400); // "9 %"
 */
export function bookedShare(bookedMinutes: number, openMinutes: number): string {
  return openMinutes > 0 ? `${Math.round((100 * bookedMinutes) / openMinutes)} %` : "—";
}
