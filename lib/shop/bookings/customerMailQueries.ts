import "server-only";
import type { Knex } from "knex";
import type { BookingRow, QuoteRow } from "@/lib/platform/db/types";
import { appOrigin, mailFrom } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { quoteMailParties } from "@/lib/shop/quoteMailQueries";
import { type BookingMailKind, addressOf, bookingMail } from "./mail";

/** Queues the booking's e-mail with its calendar file in the same transaction; a customer without an address gets none. */
export async function mailCustomer(
  trx: Knex.Transaction,
  quote: QuoteRow,
  booking: BookingRow,
  kind: BookingMailKind,
  previousStart?: Date,
): Promise<boolean> {
  const parties = await quoteMailParties(trx, quote);
  if (!parties) return false;
  await queueMailIn(
    trx,
    bookingMail({
      ...parties,
      kind,
      job: booking.kind,
      bookingId: booking.id,
      sequence: booking.sequence,
      start: new Date(booking.starts_at),
      end: new Date(booking.ends_at),
      quoteNumber: quote.number,
      vehicle: quote.vehicle_description,
      origin: appOrigin(),
      organizerEmail: addressOf(mailFrom()),
      previousStart,
    }),
  );
  return true;
}
