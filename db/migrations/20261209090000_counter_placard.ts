import type { Knex } from "knex";

/**
 * A saved counter vehicle's door placard and axle loads (lib/shop/customers/counterPlacard.ts:
 * the placard size, cold pressures in kPa, axle weights and ratings in kg, the units they were
 * typed in), kept whole as the counter checked it, or null. A quote keeps what it computed from
 * it with its fitment summary, so a later change here never alters a quote.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.jsonb("load_placard").nullable();
    t.check("load_placard is null or jsonb_typeof(load_placard) = 'object'", [], "customer_vehicles_load_placard_object");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.dropChecks(["customer_vehicles_load_placard_object"]);
    t.dropColumn("load_placard");
  });
}
