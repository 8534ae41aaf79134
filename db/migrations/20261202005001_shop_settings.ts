import type { Knex } from "knex";
import { createdAt, instant, optionalRef, requiredRef, uuidId } from "../lib/columns";

/** Shop settings the counter needs, and single-use staff invitations. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.text("address").notNullable().defaultTo("");
    t.text("phone").notNullable().defaultTo("");
    // Sales tax in basis points (8.25 % = 825): integers keep the arithmetic exact.
    t.integer("tax_rate_bp").notNullable().defaultTo(0);
    t.integer("labour_rate_cents").notNullable().defaultTo(0);
    t.integer("fabrication_rate_cents").notNullable().defaultTo(0);
    t.integer("quote_validity_days").notNullable().defaultTo(14);
    t.integer("deposit_pct").notNullable().defaultTo(25);
    t.text("currency").notNullable().defaultTo("USD");
    instant(t, "updated_at").notNullable().defaultTo(knex.fn.now());
    t.check("tax_rate_bp between 0 and 3000", [], "shops_tax_rate_range");
    t.check("labour_rate_cents between 0 and 10000000 and fabrication_rate_cents between 0 and 10000000", [], "shops_rates_range");
    t.check("quote_validity_days between 1 and 365", [], "shops_validity_range");
    t.check("deposit_pct between 0 and 100", [], "shops_deposit_range");
    t.check("currency = 'USD'", [], "shops_currency_usd");
  });

  await knex.schema.createTable("staff_invites", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.text("email").notNullable();
    // Only a SHA-256 of the token is stored.
    t.text("token_hash").notNullable().unique();
    optionalRef(t, "invited_by", "users");
    instant(t, "expires_at").notNullable();
    instant(t, "used_at").nullable();
    instant(t, "revoked_at").nullable();
    createdAt(t, knex);
    t.index(["shop_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("staff_invites");
  await knex.schema.alterTable("shops", (t) => {
    t.dropChecks(["shops_tax_rate_range", "shops_rates_range", "shops_validity_range", "shops_deposit_range", "shops_currency_usd"]);
    t.dropColumns(
      "address",
      "phone",
      "tax_rate_bp",
      "labour_rate_cents",
      "fabrication_rate_cents",
      "quote_validity_days",
      "deposit_pct",
      "currency",
      "updated_at",
    );
  });
}
