import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("password_resets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("id").inTable("users").onDelete("CASCADE");
    // Only a SHA-256 of the token is stored: a database leak does not hand out reset links.
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["user_id"]);
  });

  // Shared across app servers: the throttle lives in PostgreSQL, not in process memory.
  await knex.schema.createTable("sign_in_throttle", (t) => {
    t.text("key").primary();
    t.integer("failures").notNullable().defaultTo(0);
    t.timestamp("window_started_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("locked_until", { useTz: true }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("sign_in_throttle");
  await knex.schema.dropTable("password_resets");
}
