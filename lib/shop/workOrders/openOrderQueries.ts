import "server-only";
import type { Knex } from "knex";
import type { WorkOrderRow, WorkOrderStatus } from "@/lib/platform/db/types";
import { ConflictError } from "@/lib/platform/errors";
import { WORK_ORDER_STATUS_LABEL } from "./vocabulary";

type Db = Knex | Knex.Transaction;

/** The quote's work order (id and status), if it has one in the shop. */
export async function findWorkOrderOfQuote(
  db: Db,
  shopId: string,
  quoteId: string,
): Promise<{ id: string; status: WorkOrderStatus } | undefined> {
  const row = (await db<WorkOrderRow>("work_orders").where({ quote_id: quoteId, shop_id: shopId }).first("id", "status")) as
    Pick<WorkOrderRow, "id" | "status"> | undefined;
  return row ? { id: row.id, status: row.status } : undefined;
}

/**
 * A quote with a work order is installed by that work order's "done" (every step signed, the
 * re-check date set, the completion mail sent), never from the quote page while the sheet is
 * open: a ConflictError saying what to do. Call it with the quote locked, as openWorkOrder
 * locks it, so no work order appears in between.
 */
export async function assertNoOpenWorkOrder(trx: Knex.Transaction, shopId: string, quoteId: string): Promise<void> {
  const order = await findWorkOrderOfQuote(trx, shopId, quoteId);
  if (!order || order.status === "done") return;
  throw new ConflictError(
    `This quote's work order is “${WORK_ORDER_STATUS_LABEL[order.status]}”: the quote becomes installed when the work order is done. Open the work order, sign every step off, then mark it done.`,
  );
}
