import type { Knex } from "knex";
import { createdAt, instant, optionalRef, requiredRef, statusColumn, timestamps, uuidId } from "../lib/columns";

/** Customers and their vehicles, quotes with lines and a status history, deposits and webhook receipts. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("customers", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.text("name").notNullable();
    t.text("phone").notNullable().defaultTo("");
    // Digits only, so "555-0142" and "(555) 0142" find the same customer.
    t.text("phone_digits").notNullable().defaultTo("");
    t.text("email").notNullable().defaultTo("");
    timestamps(t, knex);
    t.index(["shop_id", "phone_digits"]);
  });
  await knex.raw("create index customers_shop_email on customers (shop_id, lower(email))");

  await knex.schema.createTable("customer_vehicles", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    requiredRef(t, "customer_id", "customers");
    t.text("description").notNullable();
    t.text("bolt_pattern").notNullable();
    t.text("tire_size").notNullable();
    t.double("wheel_diameter_in").notNullable();
    t.double("wheel_width_in").notNullable();
    t.double("wheel_offset_mm").notNullable();
    t.double("axle_ratio").nullable();
    createdAt(t, knex);
    t.index(["customer_id"]);
  });

  await knex.schema.createTable("quotes", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.integer("number").notNullable();
    requiredRef(t, "customer_id", "customers", "RESTRICT");
    optionalRef(t, "vehicle_id", "customer_vehicles");
    optionalRef(t, "created_by", "users");
    statusColumn(t, "quotes", ["draft", "sent", "accepted", "deposit_paid", "installed", "declined", "expired"], "draft");
    // The vehicle as quoted (kept even if the saved vehicle changes later).
    t.text("vehicle_description").notNullable();
    t.text("bolt_pattern").notNullable();
    t.text("current_tire").notNullable();
    t.double("current_wheel_diameter_in").notNullable();
    t.double("current_wheel_width_in").notNullable();
    t.double("current_wheel_offset_mm").notNullable();
    t.double("axle_ratio").nullable();
    optionalRef(t, "tire_item_id", "catalog_items");
    optionalRef(t, "wheel_item_id", "catalog_items");
    t.integer("wheel_qty").notNullable();
    t.jsonb("fitment").notNullable();
    t.integer("discount_cents").notNullable().defaultTo(0);
    t.integer("tax_rate_bp").notNullable();
    t.integer("deposit_pct").notNullable();
    t.integer("subtotal_cents").notNullable().defaultTo(0);
    t.integer("taxable_cents").notNullable().defaultTo(0);
    t.integer("tax_cents").notNullable().defaultTo(0);
    t.integer("total_cents").notNullable().defaultTo(0);
    t.integer("deposit_cents").notNullable().defaultTo(0);
    t.text("notes").notNullable().defaultTo("");
    t.text("public_token_hash").nullable().unique();
    instant(t, "valid_until").nullable();
    timestamps(t, knex);
    t.unique(["shop_id", "number"]);
    t.index(["shop_id", "status"]);
    t.check("wheel_qty in (4, 5)", [], "quotes_wheel_qty");
    t.check(
      "discount_cents >= 0 and subtotal_cents >= 0 and tax_cents >= 0 and total_cents >= 0 and deposit_cents >= 0",
      [],
      "quotes_money_non_negative",
    );
  });

  await knex.schema.createTable("quote_lines", (t) => {
    uuidId(t, knex);
    requiredRef(t, "quote_id", "quotes");
    t.integer("position").notNullable();
    t.text("kind").notNullable();
    optionalRef(t, "catalog_item_id", "catalog_items");
    t.text("sku").notNullable().defaultTo("");
    t.text("description").notNullable();
    t.integer("quantity").notNullable();
    t.integer("unit_price_cents").notNullable();
    t.integer("discount_cents").notNullable().defaultTo(0);
    t.boolean("taxable").notNullable().defaultTo(true);
    t.integer("line_total_cents").notNullable();
    t.index(["quote_id"]);
    t.check("kind in ('tire','wheel','service','custom')", [], "quote_lines_kind_known");
    t.check("quantity > 0 and unit_price_cents >= 0 and discount_cents >= 0 and line_total_cents >= 0", [], "quote_lines_amounts");
  });

  await knex.schema.createTable("quote_events", (t) => {
    t.bigIncrements("id").primary();
    requiredRef(t, "quote_id", "quotes");
    t.text("from_status").nullable();
    t.text("to_status").notNullable();
    optionalRef(t, "actor_user_id", "users");
    // Who, in words: a staff member's name, "customer", "payment provider" or "system".
    t.text("actor").notNullable();
    t.text("note").notNullable().defaultTo("");
    instant(t, "at").notNullable().defaultTo(knex.fn.now());
    t.index(["quote_id"]);
  });

  await knex.schema.createTable("payments", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    requiredRef(t, "quote_id", "quotes");
    t.text("provider_session_id").notNullable().unique();
    t.integer("amount_cents").notNullable();
    t.text("currency").notNullable().defaultTo("usd");
    statusColumn(t, "payments", ["open", "paid"], "open");
    createdAt(t, knex);
    instant(t, "paid_at").nullable();
    t.index(["quote_id"]);
  });

  // Every verified webhook event handled once: a replay finds its id here and changes nothing.
  await knex.schema.createTable("payment_webhook_events", (t) => {
    t.text("event_id").primary();
    t.text("type").notNullable();
    t.uuid("quote_id").nullable();
    t.text("outcome").notNullable();
    instant(t, "received_at").notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ["payment_webhook_events", "payments", "quote_events", "quote_lines", "quotes", "customer_vehicles", "customers"])
    await knex.schema.dropTable(t);
}
