import "server-only";
import type { Knex } from "knex";
import type { QuoteRow, WorkOrderRow } from "@/lib/platform/db/types";
import { appOrigin } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { hashToken, randomToken } from "@/lib/platform/tokens";
import { paymentsOf } from "@/lib/shop/payments/ledgerQueries";
import { quoteMailParties } from "@/lib/shop/quoteMailQueries";
import { completionMail } from "./completionMail";
import { getWorkOrder } from "./queries";

/**
 * Queues the completion mail (work summary and invoice) for a work order just marked done, in
 * the transaction that marks it. Only the hash of the customer's link is stored, so the mail
 * carries a fresh link and the quote's earlier link is replaced by it (as when a quote is sent
 * again). Nothing is queued, and the link is kept, when the customer has no e-mail address.
 * Returns whether a mail was queued.
 */
export async function queueCompletionMail(trx: Knex.Transaction, shopId: string, workOrderId: string): Promise<boolean> {
  const row = (await trx<WorkOrderRow>("work_orders").where({ id: workOrderId, shop_id: shopId }).first()) as WorkOrderRow;
  const quote = (await trx<QuoteRow>("quotes").where({ id: row.quote_id, shop_id: shopId }).first()) as QuoteRow;
  const parties = await quoteMailParties(trx, quote);
  if (!parties) return false;
  const token = randomToken();
  await trx("quotes")
    .where({ id: quote.id })
    .update({ public_token_hash: hashToken(token) });
  // One after another: the transaction is one connection.
  const order = await getWorkOrder(trx, shopId, workOrderId);
  const money = await paymentsOf(trx, quote);
  await queueMailIn(
    trx,
    completionMail({
      ...parties,
      order,
      doneAt: new Date(row.done_at!),
      recheckDueAt: new Date(row.recheck_due_at!),
      invoice: money.invoice,
      payUrl: `${appOrigin()}/q/${token}`,
    }),
  );
  return true;
}
