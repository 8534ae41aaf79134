import type { Knex } from "knex";
import { instant, statusCheck } from "../lib/columns";

/**
 * A refund the payment provider reports as failed (or canceled) gave nothing back: its row is
 * marked "failed" with the time, so it no longer counts as asked back, no longer blocks booking or
 * installing, and the deposit can be refunded again. Until now such a row stayed "pending".
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("payment_refunds", (t) => {
    t.dropChecks(["payment_refunds_status_known"]);
  });
  await knex.schema.alterTable("payment_refunds", (t) => {
    statusCheck(t, "payment_refunds", ["pending", "succeeded", "failed"]);
    instant(t, "failed_at").nullable();
  });
}

/** Failed refunds moved no money; the old schema has no word for them, so they go. */
export async function down(knex: Knex): Promise<void> {
  await knex("payment_refunds").where({ status: "failed" }).delete();
  await knex.schema.alterTable("payment_refunds", (t) => {
    t.dropChecks(["payment_refunds_status_known"]);
    t.dropColumn("failed_at");
  });
  await knex.schema.alterTable("payment_refunds", (t) => {
    statusCheck(t, "payment_refunds", ["pending", "succeeded"]);
  });
}
