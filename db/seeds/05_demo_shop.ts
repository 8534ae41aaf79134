import type { Knex } from "knex";
import { DEMO_SHOP } from "./01_demo_accounts";

/**
 * Counter settings of the invented demo shop. Only fills what is still at its defaults, so an
 * owner's later changes survive restarts.
 */
export async function seed(knex: Knex): Promise<void> {
  await knex("shops")
    .where({ id: DEMO_SHOP.id, address: "" })
    .update({
      address: "1180 Slate Wash Road, Quarry Flats",
      phone: "555-0142",
      tax_rate_bp: 825,
      labour_rate_cents: 12500,
      fabrication_rate_cents: 14500,
      quote_validity_days: 14,
      deposit_pct: 25,
      currency: "USD",
    });
}
