import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("shops", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable();
    t.text("name").notNullable();
    t.text("password_hash").notNullable();
    t.text("role").notNullable().defaultTo("member");
    t.uuid("shop_id").nullable().references("id").inTable("shops").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("role in ('member','shop_staff','shop_owner','admin')", [], "users_role_known");
    t.check("(role in ('shop_staff','shop_owner')) = (shop_id is not null)", [], "users_shop_role_has_shop");
  });
  // E-mail addresses compare case-insensitively; the column keeps what the user typed.
  await knex.raw("create unique index users_email_lower_unique on users (lower(email))");
  await knex.raw("create index users_shop_id on users (shop_id)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("users");
  await knex.schema.dropTable("shops");
}
