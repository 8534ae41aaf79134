import type { Knex } from "knex";
import { statusCheck, statusColumn } from "../lib/columns";

/**
 * The balance after the work and refunds of deposits.
 *
 * `payments` gains the kind of payment (the deposit, or the balance on the invoice once the work
 * is done) and how it was taken: through the provider's hosted page (a checkout session), or at
 * the counter in cash or by card (no session; who recorded it is kept). A provider session
 * replaced by a newer one, or by a counter payment, is expired at the provider and marked so.
 *
 * `payment_refunds`: one row per refund asked of the provider, written before the provider is
 * called (its id travels in the refund's metadata, so the "refund succeeded" webhook always finds
 * its row) and marked succeeded when that signed webhook arrives.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("payments", (t) => {
    t.text("kind").notNullable().defaultTo("deposit");
    t.text("method").notNullable().defaultTo("provider");
    t.text("provider_payment_intent").nullable().unique();
    t.uuid("recorded_by_user_id").nullable().references("id").inTable("users").onDelete("SET NULL");
    t.text("recorded_by").notNullable().defaultTo("");
    t.dropChecks(["payments_status_known"]);
  });
  await knex.raw("alter table payments alter column provider_session_id drop not null");
  await knex.schema.alterTable("payments", (t) => {
    statusCheck(t, "payments", ["open", "paid", "expired"]);
    t.check("kind in ('deposit','balance')", [], "payments_kind_known");
    t.check("method in ('provider','cash','card')", [], "payments_method_known");
    // A provider payment is matched to its webhook by the session; a counter payment has none.
    t.check("(method = 'provider') = (provider_session_id is not null)", [], "payments_session_iff_provider");
    t.check("amount_cents > 0", [], "payments_amount_positive");
  });

  await knex.schema.createTable("payment_refunds", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("shop_id").notNullable().references("id").inTable("shops").onDelete("CASCADE");
    t.uuid("quote_id").notNullable().references("id").inTable("quotes").onDelete("CASCADE");
    t.uuid("payment_id").notNullable().references("id").inTable("payments").onDelete("CASCADE");
    t.text("provider_refund_id").nullable().unique();
    t.integer("amount_cents").notNullable();
    statusColumn(t, "payment_refunds", ["pending", "succeeded"], "pending");
    t.uuid("requested_by_user_id").nullable().references("id").inTable("users").onDelete("SET NULL");
    t.text("requested_by").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("succeeded_at", { useTz: true }).nullable();
    t.index(["quote_id"]);
    t.index(["payment_id"]);
    t.check("amount_cents > 0", [], "payment_refunds_amount_positive");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("payment_refunds");
  await knex("payments").whereNot({ method: "provider" }).delete();
  await knex("payments").where({ status: "expired" }).update({ status: "open" });
  await knex.schema.alterTable("payments", (t) => {
    t.dropChecks([
      "payments_status_known",
      "payments_kind_known",
      "payments_method_known",
      "payments_session_iff_provider",
      "payments_amount_positive",
    ]);
  });
  await knex.raw("alter table payments alter column provider_session_id set not null");
  await knex.schema.alterTable("payments", (t) => {
    t.dropColumn("recorded_by");
    t.dropColumn("recorded_by_user_id");
    t.dropColumn("provider_payment_intent");
    t.dropColumn("method");
    t.dropColumn("kind");
    statusCheck(t, "payments", ["open", "paid"]);
  });
}
