import type { Knex } from "knex";

/**
 * The address the shop's notices go to (a customer accepted, paid, booked; an install moved or
 * cancelled). Empty: the shop's owners are written to instead (lib/shop/notices/noticeQueries.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.text("notice_email").notNullable().defaultTo("");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.dropColumn("notice_email");
  });
}
