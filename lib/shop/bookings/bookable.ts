import type { QuoteRow } from "@/lib/platform/db/types";

/**
 * An install can be booked once the deposit is paid, or once an accepted quote that asks no
 * deposit. Pages use it to show the booking panels; the queries refuse everything else.
 *
 * @example
 * canBook({ status: "deposit_paid", deposit_cents: 25000 }); // true
 * canBook({ status: "accepted", deposit_cents: 25000 }); // false
 */
export function canBook(quote: Pick<QuoteRow, "status" | "deposit_cents">): boolean {
  return quote.status === "deposit_paid" || (quote.status === "accepted" && quote.deposit_cents === 0);
}
