import "server-only";
import type { Knex } from "knex";
import type { QuoteRow } from "@/lib/platform/db/types";
import { ConflictError } from "@/lib/platform/errors";
import { DEPOSIT_REFUNDED, REFUND_ASKED_STATUSES, depositGivenBack } from "./depositBack";

/**
 * Whether the quote's paid deposit has been given back in full (depositBack.ts), summed from the
 * ledger in one read. Read from the ledger rather than from the quote's status, because refunds
 * may come in parts and only the sum says "all of it".
 */
export async function depositRefundedInFull(db: Knex | Knex.Transaction, quoteId: string): Promise<boolean> {
  const row = (await db
    .select(
      db("payments").where({ quote_id: quoteId, kind: "deposit", status: "paid" }).sum("amount_cents").as("paid"),
      db("payment_refunds").where({ quote_id: quoteId }).whereIn("status", REFUND_ASKED_STATUSES).sum("amount_cents").as("refunded"),
    )
    .first()) as { paid: string | null; refunded: string | null };
  return depositGivenBack(Number(row.paid ?? 0), Number(row.refunded ?? 0));
}

/**
 * Booking stands on the deposit the shop holds: once it is refunded in full, the quote cannot be
 * booked again by the counter or on the customer's link (ConflictError, nothing written).
 */
export async function assertDepositHeld(db: Knex | Knex.Transaction, quote: Pick<QuoteRow, "id">): Promise<void> {
  if (await depositRefundedInFull(db, quote.id)) throw new ConflictError(DEPOSIT_REFUNDED);
}
