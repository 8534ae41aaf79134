import type { Knex } from "knex";
import { createdAt, optionalRef, requiredRef, storedPhotoColumns, timestamps, uuidId } from "../lib/columns";

/**
 * The garage: a member's vehicles, the clearances measured on them, photos (objects in the
 * S3 bucket, rows here) and install checklists per vehicle + planned setup.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("vehicles", (t) => {
    uuidId(t, knex);
    requiredRef(t, "user_id", "users");
    t.text("name").notNullable();
    t.integer("year").nullable();
    t.text("make").nullable();
    t.text("model").nullable();
    t.text("trim").nullable();
    t.text("front_suspension").notNullable();
    /** Normalized text as the engine formats it (e.g. 5x4.5), with the PCD for searching. */
    t.text("bolt_pattern").notNullable();
    t.double("bolt_pcd_mm").notNullable();
    t.integer("bolt_count").notNullable();
    t.double("hub_bore_mm").nullable();
    /** Validated setups (lib/setup/schema.ts), JSONB. */
    t.jsonb("stock_setup").notNullable();
    t.jsonb("current_setup").notNullable();
    t.double("lift_height_mm").nullable();
    t.double("kingpin_inclination_deg").nullable();
    t.double("axle_ratio").nullable();
    t.double("transmission_ratio").nullable();
    t.text("notes").notNullable().defaultTo("");
    timestamps(t, knex);
    t.check("front_suspension in ('independent','solid-axle')", [], "vehicles_front_suspension_known");
    t.index(["user_id", "created_at"], "vehicles_user_created");
  });

  await knex.schema.createTable("vehicle_clearances", (t) => {
    uuidId(t, knex);
    requiredRef(t, "vehicle_id", "vehicles");
    t.text("label").notNullable();
    t.text("direction").notNullable();
    t.double("distance_mm").notNullable();
    /** What the user typed, e.g. "1-1/2 in", kept for display. */
    t.text("distance_text").notNullable();
    t.text("suspension_state").notNullable();
    t.jsonb("measured_setup").notNullable();
    createdAt(t, knex);
    t.check("direction in ('inboard','outboard','upward','fore-aft')", [], "clearances_direction_known");
    t.check("suspension_state in ('ride-height','full-stuff','full-lock')", [], "clearances_state_known");
    t.check("distance_mm >= 0", [], "clearances_distance_not_negative");
    t.index(["vehicle_id"], "clearances_vehicle");
  });

  await knex.schema.createTable("vehicle_photos", (t) => {
    uuidId(t, knex);
    requiredRef(t, "vehicle_id", "vehicles");
    optionalRef(t, "clearance_id", "vehicle_clearances", "CASCADE");
    storedPhotoColumns(t);
    createdAt(t, knex);
    t.check("content_type in ('image/jpeg','image/png','image/webp')", [], "photos_type_known");
    t.index(["vehicle_id"], "photos_vehicle");
  });

  await knex.schema.createTable("install_checklists", (t) => {
    uuidId(t, knex);
    requiredRef(t, "vehicle_id", "vehicles");
    /** Canonical text of the planned setup (the query-string form), one checklist per plan. */
    t.text("planned_key").notNullable();
    t.jsonb("planned_setup").notNullable();
    /** A saved comparison this checklist belongs to; attached once saved comparisons exist. */
    t.uuid("comparison_id").nullable();
    t.jsonb("ticked").notNullable().defaultTo("[]");
    timestamps(t, knex);
    t.unique(["vehicle_id", "planned_key"], { indexName: "checklists_vehicle_plan_unique" });
    t.index(["comparison_id"], "checklists_comparison");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("install_checklists");
  await knex.schema.dropTable("vehicle_photos");
  await knex.schema.dropTable("vehicle_clearances");
  await knex.schema.dropTable("vehicles");
}
