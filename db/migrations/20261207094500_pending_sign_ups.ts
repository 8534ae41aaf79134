import type { Knex } from "knex";

/**
 * Sign-ups waiting for their e-mail confirmation. The account is created only when the link in
 * the mail is used, so the sign-up form never has to say whether an address already has one.
 * One pending sign-up per address (a new one replaces it: new token, the old link stops working);
 * the token is kept as its SHA-256 only, like password resets, so a leaked table holds no link.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("pending_sign_ups", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable();
    t.text("name").notNullable();
    t.text("password_hash").notNullable();
    t.text("token_hash").notNullable().unique();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.index(["expires_at"], "pending_sign_ups_expires_at");
  });
  await knex.raw("create unique index pending_sign_ups_email_lower_unique on pending_sign_ups (lower(email))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("pending_sign_ups");
}
