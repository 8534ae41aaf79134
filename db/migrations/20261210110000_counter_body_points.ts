import type { Knex } from "knex";
import { addJsonObjectColumn, dropJsonObjectColumn } from "../lib/columns";

/**
 * A saved counter vehicle's body points (lib/shop/customers/counterBodyPoints.ts: corner heights
 * and distances from the axles, the lowest point midway and the wheelbase in mm, the units they
 * were typed in), measured with its current tires, or null. A quote keeps the angles it computed
 * with its fitment summary, so a later change here never alters a quote.
 */
export async function up(knex: Knex): Promise<void> {
  await addJsonObjectColumn(knex, "customer_vehicles", "body_points");
}

export async function down(knex: Knex): Promise<void> {
  await dropJsonObjectColumn(knex, "customer_vehicles", "body_points");
}
