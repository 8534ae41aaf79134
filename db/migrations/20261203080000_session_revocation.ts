import type { Knex } from "knex";

// Sessions are signed tokens kept by the browser; these two let the server end them early.
// `session_version` ends every session of a user at once (password change or reset, role change,
// "sign out everywhere"); `revoked_sessions` ends one session (sign-out) until it would have
// expired anyway, after which its row may be deleted.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.integer("session_version").notNullable().defaultTo(0);
  });
  await knex.schema.createTable("revoked_sessions", (t) => {
    t.uuid("sid").primary();
    t.uuid("user_id").notNullable().references("id").inTable("users").onDelete("CASCADE");
    t.timestamp("revoked_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.index(["expires_at"], "revoked_sessions_expiry");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("revoked_sessions");
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("session_version");
  });
}
