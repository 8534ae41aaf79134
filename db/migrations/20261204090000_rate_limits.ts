import type { Knex } from "knex";

/**
 * Rate limits and sign-in backoff, shared by every app server: the table rate-limiter-flexible's
 * PostgreSQL store uses (its own column layout; created here rather than by the library at run
 * time so the app's database user needs no CREATE right). Replaces sign_in_throttle, whose hard
 * per-account lock anyone could trigger with five wrong passwords.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limits", (t) => {
    t.string("key", 255).primary();
    t.integer("points").notNullable().defaultTo(0);
    // Milliseconds since 1970 when the window (or a block) ends; the library's own format.
    t.bigInteger("expire").nullable();
    t.index(["expire"]);
  });
  await knex.schema.dropTable("sign_in_throttle");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.createTable("sign_in_throttle", (t) => {
    t.text("key").primary();
    t.integer("failures").notNullable().defaultTo(0);
    t.timestamp("window_started_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("locked_until", { useTz: true }).nullable();
  });
  await knex.schema.dropTable("rate_limits");
}
