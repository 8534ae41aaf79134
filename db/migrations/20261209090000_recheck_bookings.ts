import type { Knex } from "knex";
import { instant } from "../lib/columns";

/**
 * The re-check booked on the customer's link from the re-check e-mail. It is a booking of the
 * same quote, of kind "recheck": it holds bay time through the same bay_reservations (so the
 * exclusion constraint keeps it off every install) and shows on the same calendar. One live
 * booking per quote and kind; the link's token is kept only as its SHA-256, with an expiry.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("bookings", (t) => {
    t.text("kind").notNullable().defaultTo("install");
    t.check("kind in ('install','recheck')", [], "bookings_kind_known");
  });
  await knex.raw("drop index bookings_one_live_per_quote");
  await knex.raw("create unique index bookings_one_live_per_quote on bookings (quote_id, kind) where status <> 'cancelled'");
  await knex.schema.alterTable("work_orders", (t) => {
    t.text("recheck_link_hash").nullable().unique();
    instant(t, "recheck_link_expires_at").nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("work_orders", (t) => {
    t.dropColumn("recheck_link_hash");
    t.dropColumn("recheck_link_expires_at");
  });
  await knex("bay_reservations")
    .whereIn("booking_id", knex("bookings").where({ kind: "recheck" }).select("id"))
    .delete();
  await knex("bookings").where({ kind: "recheck" }).delete();
  await knex.raw("drop index bookings_one_live_per_quote");
  await knex.raw("create unique index bookings_one_live_per_quote on bookings (quote_id) where status <> 'cancelled'");
  await knex.schema.alterTable("bookings", (t) => {
    t.dropChecks(["bookings_kind_known"]);
    t.dropColumn("kind");
  });
}
