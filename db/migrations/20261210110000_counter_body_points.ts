import type { Knex } from "knex";

/**
 * A saved counter vehicle's body points (lib/shop/customers/counterBodyPoints.ts: corner heights
 * and distances from the axles, the lowest point midway and the wheelbase in mm, the units they
 * were typed in), measured with its current tires, or null. A quote keeps the angles it computed
 * with its fitment summary, so a later change here never alters a quote.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.jsonb("body_points").nullable();
    t.check("body_points is null or jsonb_typeof(body_points) = 'object'", [], "customer_vehicles_body_points_object");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.dropChecks(["customer_vehicles_body_points_object"]);
    t.dropColumn("body_points");
  });
}
