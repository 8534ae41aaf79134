import type { Knex } from "knex";

/**
 * How long the shop's re-check slot keeps the truck on a lift, in minutes: the public re-check
 * page offers starts of this length and the counter moves re-checks by it. The default 30 and
 * the 10–120 bounds are common practice, no source (torquing lug nuts and ring bolts again is a
 * short job); lib/shop/workOrders/recheckLink.ts holds the same numbers. No column helper of
 * db/lib/columns.ts fits a plain bounded integer, so it is written as the other settings on
 * `shops` are.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.integer("recheck_slot_minutes").notNullable().defaultTo(30);
    t.check("recheck_slot_minutes between 10 and 120", [], "shops_recheck_slot_minutes_range");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.dropChecks(["shops_recheck_slot_minutes_range"]);
    t.dropColumn("recheck_slot_minutes");
  });
}
