import type { Knex } from "knex";
import { createdAt, optionalRef, timestamps, uuidId } from "../lib/columns";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("shops", (t) => {
    uuidId(t, knex);
    t.text("name").notNullable();
    createdAt(t, knex);
  });

  await knex.schema.createTable("users", (t) => {
    uuidId(t, knex);
    t.text("email").notNullable();
    t.text("name").notNullable();
    t.text("password_hash").notNullable();
    t.text("role").notNullable().defaultTo("member");
    optionalRef(t, "shop_id", "shops");
    timestamps(t, knex);
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
