import type { Knex } from "knex";

/**
 * The vehicle's hub bore (the hub's pilot diameter) on the counter's vehicles and on each quote,
 * and, on a quote's wheel lines, the wheel's bolt pattern and centre bore as quoted, so the
 * wheel-on-hub check reads what was quoted even if the catalog changes later.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.double("hub_bore_mm").nullable();
    t.check("hub_bore_mm is null or hub_bore_mm between 30 and 250", [], "customer_vehicles_hub_bore_range");
  });
  await knex.schema.alterTable("quotes", (t) => {
    t.double("hub_bore_mm").nullable();
    t.check("hub_bore_mm is null or hub_bore_mm between 30 and 250", [], "quotes_hub_bore_range");
  });
  await knex.schema.alterTable("quote_lines", (t) => {
    t.text("wheel_bolt_pattern").nullable();
    t.double("wheel_center_bore_mm").nullable();
  });
  // Wheel lines written before this migration take the figures of their catalog item.
  await knex.raw(
    "update quote_lines ql set wheel_bolt_pattern = ci.bolt_pattern, wheel_center_bore_mm = ci.center_bore_mm from catalog_items ci where ql.catalog_item_id = ci.id and ql.kind = 'wheel'",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("quote_lines", (t) => t.dropColumns("wheel_bolt_pattern", "wheel_center_bore_mm"));
  await knex.schema.alterTable("quotes", (t) => {
    t.dropChecks(["quotes_hub_bore_range"]);
    t.dropColumn("hub_bore_mm");
  });
  await knex.schema.alterTable("customer_vehicles", (t) => {
    t.dropChecks(["customer_vehicles_hub_bore_range"]);
    t.dropColumn("hub_bore_mm");
  });
}
