import type { Knex } from "knex";

/**
 * What was sent, as sent: each time a quote is sent its whole document (shop name, address and
 * phone, customer, vehicle, lines, totals, cautions) is stored here. The PDF and the customer's
 * page of a quote that is not a draft are rendered from the latest row, so renaming the shop or
 * repricing the catalog later does not change a document the customer already has.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("quote_documents", (t) => {
    t.bigIncrements("id").primary();
    t.uuid("quote_id").notNullable().references("id").inTable("quotes").onDelete("CASCADE");
    t.timestamp("sent_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("sent_by").nullable().references("id").inTable("users").onDelete("SET NULL");
    t.jsonb("document").notNullable();
    t.index(["quote_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("quote_documents");
}
