import "server-only";
import type { Knex } from "knex";
import type { BookingRow, QuoteRow } from "@/lib/platform/db/types";
import { appOrigin, mailFrom } from "@/lib/platform/mail";
import { queueQuoteMail } from "@/lib/shop/quoteMailQueries";
import { type BookingMailKind, addressOf, bookingMail } from "./mail";

/** Queues the booking's e-mail with its calendar file in the same transaction; a customer without an address gets none. */
export async function mailCustomer(
  trx: Knex.Transaction,
  quote: QuoteRow,
  booking: BookingRow,
  kind: BookingMailKind,
  previousStart?: Date,
): Promise<boolean> {
  return queueQuoteMail(trx, quote, (head) =>
    bookingMail({
      ...head,
      kind,
      job: booking.kind,
      bookingId: booking.id,
      sequence: booking.sequence,
      start: new Date(booking.starts_at),
      end: new Date(booking.ends_at),
      origin: appOrigin(),
      organizerEmail: addressOf(mailFrom()),
      previousStart,
    }),
  );
}
