import bcrypt from "bcryptjs";
import type { Knex } from "knex";

/**
 * Demo data for the start command: an invented shop and one account per role.
 * Runs on every start but only adds what is missing, so demo data survives restarts.
 */
export const DEMO_PASSWORD = "hubface-demo-1";
export const DEMO_SHOP = { id: "6f1d0c52-3a1e-4b7a-9c55-1d2e3f405060", name: "Quarry Flats Tire & Fab" };
export const DEMO_USERS = [
  { id: "a1000000-0000-4000-8000-000000000001", email: "juno@demo.hubface.test", name: "Juno Achterberg", role: "member", shop_id: null },
  {
    id: "a1000000-0000-4000-8000-000000000002",
    email: "teo@demo.hubface.test",
    name: "Teo Marrow",
    role: "shop_staff",
    shop_id: DEMO_SHOP.id,
  },
  {
    id: "a1000000-0000-4000-8000-000000000003",
    email: "mara@demo.hubface.test",
    name: "Mara Velkin",
    role: "shop_owner",
    shop_id: DEMO_SHOP.id,
  },
  { id: "a1000000-0000-4000-8000-000000000004", email: "admin@demo.hubface.test", name: "Ansel Pruitt", role: "admin", shop_id: null },
] as const;

export async function seed(knex: Knex): Promise<void> {
  await knex("shops").insert(DEMO_SHOP).onConflict("id").ignore();
  const hash = await bcrypt.hash(DEMO_PASSWORD, 11);
  for (const u of DEMO_USERS) {
    const exists = await knex("users").where({ id: u.id }).orWhereRaw("lower(email) = ?", [u.email]).first("id");
    if (!exists) await knex("users").insert({ ...u, password_hash: hash });
  }
}
