import type { Knex } from "knex";
import { createdAt, instant, requiredRef, timestamps, uuidId } from "../lib/columns";

/**
 * Saved comparisons and their public share links.
 *
 * `input` is the comparison as validated by lib/comparisons/schema.ts; the key figure columns
 * beside it are computed on the server (lib/comparisons/compute.ts) every time the input is
 * written, so lists can search and sort without opening the JSON.
 *
 * `vehicle_id` has no foreign key yet: the garage's vehicles table arrives in its own
 * migration, which adds the constraint.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("comparisons", (t) => {
    uuidId(t, knex);
    requiredRef(t, "owner_id", "users");
    t.uuid("vehicle_id").nullable();
    t.text("name").notNullable();
    t.jsonb("input").notNullable();
    t.text("current_tire").notNullable();
    t.text("planned_tire").notNullable();
    t.double("diameter_change_mm").notNullable();
    t.double("ground_clearance_change_mm").notNullable();
    t.double("poke_change_mm").notNullable();
    t.double("scrub_change_mm").notNullable();
    t.double("speedometer_error_pct").notNullable();
    t.double("suggested_ratio").notNullable();
    t.integer("warning_count").notNullable();
    timestamps(t, knex);
    t.check("char_length(name) between 1 and 120", [], "comparisons_name_length");
    t.check("jsonb_typeof(input) = 'object'", [], "comparisons_input_object");
  });
  await knex.raw("create index comparisons_owner_updated on comparisons (owner_id, updated_at desc)");
  await knex.raw("create index comparisons_vehicle on comparisons (vehicle_id) where vehicle_id is not null");

  // One row per link ever made: a revoked slug stays here (revoked_at set) and can never be reused.
  await knex.schema.createTable("comparison_shares", (t) => {
    uuidId(t, knex);
    requiredRef(t, "comparison_id", "comparisons");
    t.text("slug").notNullable().unique();
    createdAt(t, knex);
    instant(t, "revoked_at").nullable();
    t.check("slug ~ '^[A-Za-z0-9_-]{22,64}$'", [], "comparison_shares_slug_urlsafe");
  });
  // At most one live link per comparison.
  await knex.raw("create unique index comparison_shares_one_live on comparison_shares (comparison_id) where revoked_at is null");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("comparison_shares");
  await knex.schema.dropTable("comparisons");
}
