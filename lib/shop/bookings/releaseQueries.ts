import "server-only";
import type { Knex } from "knex";
import type { BookingRow, QuoteRow } from "@/lib/platform/db/types";
import { mailCustomer } from "./customerMailQueries";

/**
 * Gives back the install's bay time still ahead of `at`, the moment the work was done (the work
 * order marked done, or the quote marked installed without one), so the calendar, the slot search
 * and the day-before reminder stop counting a job that is finished. What happened stays on record:
 * a booking under way ends at `at` (its bays trimmed to it, still "booked", so the calendar shows
 * the time the truck had); a booking not started yet is cancelled as of `at` (its bays freed, as
 * a cancel at the counter frees them) and the customer's calendar entry withdrawn by e-mail,
 * saying the work is done. The re-check after the work is never touched. In the caller's
 * transaction, with the quote locked. Returns how many bookings it changed.
 */
export async function releaseInstallTime(trx: Knex.Transaction, quote: QuoteRow, at: Date): Promise<number> {
  const live = (await trx<BookingRow>("bookings")
    .where({ quote_id: quote.id, kind: "install", status: "booked" })
    .andWhere("ends_at", ">", at)
    .forUpdate()) as BookingRow[];
  for (const b of live) {
    if (new Date(b.starts_at).getTime() >= at.getTime()) {
      await trx("bay_reservations").where({ booking_id: b.id }).delete();
      const [row] = (await trx("bookings")
        .where({ id: b.id })
        .update({ status: "cancelled", cancelled_at: at, sequence: b.sequence + 1, updated_at: trx.fn.now() })
        .returning("*")) as BookingRow[];
      await mailCustomer(trx, quote, row!, "released");
    } else {
      const when = at.toISOString();
      await trx("bay_reservations").where({ booking_id: b.id }).andWhereRaw("lower(during) >= ?::timestamptz", [when]).delete();
      await trx("bay_reservations")
        .where({ booking_id: b.id })
        .andWhereRaw("upper(during) > ?::timestamptz", [when])
        .update({ during: trx.raw("tstzrange(lower(during), ?::timestamptz, '[)')", [when]) });
      await trx("bookings").where({ id: b.id }).update({ ends_at: at, updated_at: trx.fn.now() });
    }
  }
  return live.length;
}
