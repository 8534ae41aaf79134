import type { Knex } from "knex";

/**
 * Quotes whose deposit was refunded in full before a full refund declined its quote (the
 * confirmation of the last refund does that now, lib/shop/payments/ledgerQueries.ts) are still
 * "deposit paid", still offer "Mark installed" and still hold their tires and wheels. They are
 * declined here the same way: held stock released (held falls, on hand stays), the status
 * written, and a history line by "system" saying why. Only refunds the provider confirmed count,
 * as on the invoice; installed quotes are left alone (the work was done; their invoice now counts
 * the refunds). Plain SQL rather than the app's modules, so the migration keeps meaning what it
 * meant when it ran.
 */
export async function up(knex: Knex): Promise<void> {
  // Knex runs each migration in its own transaction: all of these quotes move, or none.
  const { rows } = await knex.raw<{ rows: { id: string }[] }>(`
    select q.id from quotes q
    where q.status = 'deposit_paid'
      and (select coalesce(sum(p.amount_cents), 0) from payments p
           where p.quote_id = q.id and p.kind = 'deposit' and p.status = 'paid') > 0
      and (select coalesce(sum(r.amount_cents), 0) from payment_refunds r
           where r.quote_id = q.id and r.status = 'succeeded')
       >= (select coalesce(sum(p.amount_cents), 0) from payments p
           where p.quote_id = q.id and p.kind = 'deposit' and p.status = 'paid')
    order by q.id`);
  for (const { id } of rows) {
    const held = (await knex("stock_reservations")
      .where({ quote_id: id, status: "reserved" })
      .groupBy("catalog_item_id")
      .orderBy("catalog_item_id")
      .select("catalog_item_id", knex.raw("sum(quantity)::int as n"))) as { catalog_item_id: string; n: number }[];
    for (const h of held) {
      await knex("catalog_items")
        .where({ id: h.catalog_item_id })
        .update({ qty_reserved: knex.raw("qty_reserved - ?", [h.n]) });
    }
    await knex("stock_reservations").where({ quote_id: id, status: "reserved" }).update({ status: "released", closed_at: knex.fn.now() });
    await knex("quotes").where({ id }).update({ status: "declined", updated_at: knex.fn.now() });
    await knex("quote_events").insert({
      quote_id: id,
      from_status: "deposit_paid",
      to_status: "declined",
      actor_user_id: null,
      actor: "system",
      note: "deposit refunded in full (found when full refunds began to decline their quote)",
    });
  }
}

/** A correction of data: the quotes it declined stay declined (putting the stock hold back could oversell). */
export async function down(): Promise<void> {}
