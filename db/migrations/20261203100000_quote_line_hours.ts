import type { Knex } from "knex";

/**
 * Labour sold by the hour can be quoted in hundredths of an hour (1.5 h, 0.25 h); everything
 * else stays whole. `unit` says which: "hour" lines may be fractional, "each" lines may not.
 * numeric(8,2) keeps the quantity exact (no binary fractions in the database).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("quote_lines", (t) => {
    t.text("unit").notNullable().defaultTo("each");
  });
  await knex.raw("alter table quote_lines alter column quantity type numeric(8,2) using quantity::numeric(8,2)");
  await knex.schema.alterTable("quote_lines", (t) => {
    t.check("unit in ('each','hour')", [], "quote_lines_unit_known");
    t.check("unit = 'hour' or quantity = trunc(quantity)", [], "quote_lines_whole_unless_hours");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("quote_lines", (t) => {
    t.dropChecks(["quote_lines_unit_known", "quote_lines_whole_unless_hours"]);
  });
  // Back to whole numbers: a part hour counts as a whole one (never below the check's 1).
  await knex.raw("alter table quote_lines alter column quantity type integer using ceil(quantity)::integer");
  await knex.schema.alterTable("quote_lines", (t) => t.dropColumn("unit"));
}
