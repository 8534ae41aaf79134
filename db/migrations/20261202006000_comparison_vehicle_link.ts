import type { Knex } from "knex";

// Saved comparisons came before the garage's vehicles table; now that both exist the link
// gets its constraint. Deleting a vehicle keeps its comparisons, unlinked.
export async function up(knex: Knex): Promise<void> {
  await knex("comparisons").whereNotNull("vehicle_id").whereNotIn("vehicle_id", knex("vehicles").select("id")).update({ vehicle_id: null });
  await knex.schema.alterTable("comparisons", (t) => {
    t.foreign("vehicle_id", "comparisons_vehicle_fk").references("id").inTable("vehicles").onDelete("SET NULL");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("comparisons", (t) => {
    t.dropForeign(["vehicle_id"], "comparisons_vehicle_fk");
  });
}
