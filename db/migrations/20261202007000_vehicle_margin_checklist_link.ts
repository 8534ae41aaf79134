import type { Knex } from "knex";

// The clearance margin belongs to the vehicle (the vehicle page, the workspace and the install
// checklist all class its points against it); checklists made from a saved comparison keep
// that link, and lose it (not the ticks) when the comparison is deleted.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("vehicles", (t) => {
    t.double("clearance_margin_mm").notNullable().defaultTo(12.7);
    t.check("clearance_margin_mm >= 0 and clearance_margin_mm <= 100", [], "vehicles_margin_range");
  });
  await knex("install_checklists")
    .whereNotNull("comparison_id")
    .whereNotIn("comparison_id", knex("comparisons").select("id"))
    .update({ comparison_id: null });
  await knex.schema.alterTable("install_checklists", (t) => {
    t.foreign("comparison_id", "checklists_comparison_fk").references("id").inTable("comparisons").onDelete("SET NULL");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("install_checklists", (t) => {
    t.dropForeign(["comparison_id"], "checklists_comparison_fk");
  });
  await knex.schema.alterTable("vehicles", (t) => {
    t.dropChecks(["vehicles_margin_range"]);
    t.dropColumn("clearance_margin_mm");
  });
}
