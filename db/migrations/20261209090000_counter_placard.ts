import type { Knex } from "knex";
import { addJsonObjectColumn, dropJsonObjectColumn } from "../lib/columns";

/**
 * A saved counter vehicle's door placard and axle loads (lib/shop/customers/counterPlacard.ts:
 * the placard size, cold pressures in kPa, axle weights and ratings in kg, the units they were
 * typed in), kept whole as the counter checked it, or null. A quote keeps what it computed from
 * it with its fitment summary, so a later change here never alters a quote.
 */
export async function up(knex: Knex): Promise<void> {
  await addJsonObjectColumn(knex, "customer_vehicles", "load_placard");
}

export async function down(knex: Knex): Promise<void> {
  await dropJsonObjectColumn(knex, "customer_vehicles", "load_placard");
}
