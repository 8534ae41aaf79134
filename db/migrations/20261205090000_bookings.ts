import type { Knex } from "knex";
import { createdAt, instant, optionalRef, requiredRef, statusColumn, timestamps, uuidId } from "../lib/columns";

/**
 * Install bookings: the shop's week (time zone, opening hours per weekday, closed dates), its
 * bays, how long each catalog service keeps a truck in which kind of bay, and the bookings with
 * the bay time each one holds.
 *
 * Two bookings never hold one bay at the same time: `bay_reservations` carries an exclusion
 * constraint on (bay, time range), so PostgreSQL refuses the second of two transactions that
 * take the last slot at the same moment, whatever the application checked before. The
 * constraint needs btree_gist for the `=` on the bay's uuid inside a GiST index.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists btree_gist");

  await knex.schema.createTable("shop_schedules", (t) => {
    t.uuid("shop_id").primary().references("id").inTable("shops").onDelete("CASCADE");
    // An IANA zone name; opening hours and closed dates are wall-clock times in it.
    t.text("time_zone").notNullable().defaultTo("America/Denver");
    // Offered start times fall on this grid from the opening time.
    t.integer("slot_step_minutes").notNullable().defaultTo(30);
    instant(t, "updated_at").notNullable().defaultTo(knex.fn.now());
    t.check("slot_step_minutes in (15, 30, 60)", [], "shop_schedules_step_known");
  });

  await knex.schema.createTable("shop_opening_hours", (t) => {
    requiredRef(t, "shop_id", "shops");
    // ISO 8601 weekday: 1 = Monday … 7 = Sunday. A weekday without a row is closed.
    t.smallint("weekday").notNullable();
    // Minutes after local midnight.
    t.integer("opens_minute").notNullable();
    t.integer("closes_minute").notNullable();
    t.primary(["shop_id", "weekday"]);
    t.check("weekday between 1 and 7", [], "shop_opening_hours_weekday");
    t.check("opens_minute >= 0 and closes_minute <= 1440 and opens_minute < closes_minute", [], "shop_opening_hours_order");
  });

  await knex.schema.createTable("shop_closed_days", (t) => {
    requiredRef(t, "shop_id", "shops");
    t.date("day").notNullable();
    t.text("note").notNullable().defaultTo("");
    t.primary(["shop_id", "day"]);
  });

  await knex.schema.createTable("bays", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.text("name").notNullable();
    t.text("kind").notNullable();
    t.integer("position").notNullable().defaultTo(0);
    // Removed bays stay so past bookings keep their bay; they take no new work.
    instant(t, "archived_at").nullable();
    createdAt(t, knex);
    // The target of the reservations' (bay, shop) key: a reservation can only name a bay of its own shop.
    t.unique(["id", "shop_id"]);
    t.check("kind in ('lift_bay','alignment_rack','fabrication_bay')", [], "bays_kind_known");
  });
  await knex.raw("create unique index bays_shop_name_active on bays (shop_id, lower(name)) where archived_at is null");

  await knex.schema.createTable("service_times", (t) => {
    requiredRef(t, "shop_id", "shops");
    requiredRef(t, "catalog_item_id", "catalog_items");
    // Per unit the catalog sells the service in (a wheel, the vehicle, a quoted hour).
    t.integer("minutes_per_unit").notNullable();
    t.text("bay_kind").notNullable();
    t.primary(["shop_id", "catalog_item_id"]);
    t.check("minutes_per_unit between 0 and 600", [], "service_times_minutes_range");
    t.check("bay_kind in ('lift_bay','alignment_rack','fabrication_bay')", [], "service_times_bay_kind_known");
  });

  await knex.schema.createTable("bookings", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    requiredRef(t, "quote_id", "quotes");
    statusColumn(t, "bookings", ["booked", "cancelled"], "booked");
    instant(t, "starts_at").notNullable();
    instant(t, "ends_at").notNullable();
    // The calendar entry's SEQUENCE (RFC 5545 §3.8.7.4): raised on every move and on cancelling.
    t.integer("sequence").notNullable().defaultTo(0);
    optionalRef(t, "booked_by_user_id", "users");
    // Who, in words: a staff member's name or "customer".
    t.text("booked_by").notNullable();
    instant(t, "reminder_queued_at").nullable();
    instant(t, "cancelled_at").nullable();
    timestamps(t, knex);
    t.index(["shop_id", "starts_at"]);
    t.check("starts_at < ends_at", [], "bookings_order");
  });
  // One live booking per quote; cancelled ones stay as history.
  await knex.raw("create unique index bookings_one_live_per_quote on bookings (quote_id) where status <> 'cancelled'");

  await knex.schema.createTable("bay_reservations", (t) => {
    uuidId(t, knex);
    requiredRef(t, "booking_id", "bookings");
    t.uuid("shop_id").notNullable();
    t.uuid("bay_id").notNullable();
    t.foreign(["bay_id", "shop_id"], "bay_reservations_bay_of_shop").references(["id", "shop_id"]).inTable("bays");
    t.index(["booking_id"]);
  });
  await knex.raw("alter table bay_reservations add column during tstzrange not null");
  await knex.raw(
    "alter table bay_reservations add constraint bay_reservations_during_bounded check (not isempty(during) and not lower_inf(during) and not upper_inf(during))",
  );
  await knex.raw(
    "alter table bay_reservations add constraint bay_reservations_no_overlap exclude using gist (bay_id with =, during with &&)",
  );
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ["bay_reservations", "bookings", "service_times", "bays", "shop_closed_days", "shop_opening_hours", "shop_schedules"])
    await knex.schema.dropTable(t);
  await knex.raw("drop extension if exists btree_gist");
}
