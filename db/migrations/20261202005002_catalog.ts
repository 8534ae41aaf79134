import type { Knex } from "knex";
import { createdAt, instant, optionalRef, requiredRef, statusColumn, timestamps, uuidId } from "../lib/columns";

/** A shop's catalog (tires, wheels, services) and staged CSV imports awaiting confirmation. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("catalog_items", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.text("kind").notNullable();
    t.text("sku").notNullable();
    t.text("description").notNullable();
    t.integer("price_cents").notNullable();
    t.integer("qty_on_hand").nullable();
    // Tires: the size as the engine normalized it, and what the counter filters and sorts by.
    t.text("tire_size").nullable();
    t.double("tire_rim_in").nullable();
    t.double("tire_diameter_mm").nullable();
    // Wheels. The offset is always stored; backspacing is kept as entered, with its reference.
    t.double("wheel_diameter_in").nullable();
    t.double("wheel_width_in").nullable();
    t.double("wheel_offset_mm").nullable();
    t.double("wheel_backspacing_in").nullable();
    t.text("wheel_backspacing_ref").nullable();
    t.text("bolt_pattern").nullable();
    t.double("center_bore_mm").nullable();
    t.boolean("beadlock").notNullable().defaultTo(false);
    // Services.
    t.text("service_type").nullable();
    t.text("service_unit").nullable();
    timestamps(t, knex);
    t.unique(["shop_id", "sku"]);
    t.index(["shop_id", "kind"]);
    t.check("kind in ('tire','wheel','service')", [], "catalog_kind_known");
    t.check("price_cents >= 0 and (qty_on_hand is null or qty_on_hand >= 0)", [], "catalog_amounts_non_negative");
    t.check(
      "kind <> 'tire' or (tire_size is not null and tire_rim_in is not null and tire_diameter_mm is not null)",
      [],
      "catalog_tire_has_size",
    );
    t.check(
      "kind <> 'wheel' or (wheel_diameter_in is not null and wheel_width_in is not null and wheel_offset_mm is not null and bolt_pattern is not null)",
      [],
      "catalog_wheel_has_geometry",
    );
    t.check("wheel_backspacing_ref is null or wheel_backspacing_ref in ('bead-seat','flange')", [], "catalog_backspacing_ref_known");
    t.check(
      "kind <> 'service' or (service_type in ('mount_balance','beadlock_assembly','valve_stem','tpms','alignment','fender_trim','disposal','other') and service_unit in ('per_wheel','per_vehicle','per_hour'))",
      [],
      "catalog_service_known",
    );
  });

  await knex.schema.createTable("catalog_imports", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    optionalRef(t, "created_by", "users");
    t.text("filename").notNullable().defaultTo("");
    t.jsonb("rows").notNullable();
    t.integer("row_count").notNullable();
    t.integer("error_count").notNullable();
    statusColumn(t, "catalog_imports", ["staged", "committed"], "staged");
    createdAt(t, knex);
    instant(t, "committed_at").nullable();
    t.index(["shop_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("catalog_imports");
  await knex.schema.dropTable("catalog_items");
}
