import "server-only";
import type { Knex } from "knex";
import type { QuoteRow } from "@/lib/platform/db/types";
import type { OutgoingMail } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";

/** Who a mail about a quote goes to, who it comes from, and the zone its times are said in. */
export interface QuoteMailParties {
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  timeZone: string;
}

/**
 * The parties of a mail to the quote's customer (booking, receipt, completion), read in `trx`;
 * null when the customer has no e-mail address on file: then no mail is queued, and the shop is
 * not read.
 */
export async function quoteMailParties(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "customer_id" | "shop_id">,
): Promise<QuoteMailParties | null> {
  const customer = await trx("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("name", "email");
  if (!customer?.email) return null;
  // One after another: the transaction is one connection (pg deprecates queries overlapping on one client).
  const shop = await trx("shops").where({ id: quote.shop_id }).first("name", "address", "phone");
  const timeZone = await shopTimeZone(trx, quote.shop_id);
  return { customer: { name: customer.name, email: customer.email }, shop, timeZone };
}

/** What every mail about a quote starts from: its parties, the quote's number and the vehicle it is for. */
export type QuoteMailHead = QuoteMailParties & { quoteNumber: number; vehicle: string };

/**
 * Queues one mail to the quote's customer in `trx`, written by `write` from its head (parties,
 * number, vehicle). False, and nothing queued, when the customer has no e-mail address on file.
 */
export async function queueQuoteMail(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "customer_id" | "shop_id" | "number" | "vehicle_description">,
  write: (head: QuoteMailHead) => OutgoingMail,
): Promise<boolean> {
  const parties = await quoteMailParties(trx, quote);
  if (!parties) return false;
  await queueMailIn(trx, write({ ...parties, quoteNumber: quote.number, vehicle: quote.vehicle_description }));
  return true;
}
