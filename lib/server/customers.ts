import "server-only";
import type { Knex } from "knex";
import type { CustomerRow, CustomerVehicleRow } from "@/lib/db/types";
import type { CustomerInput } from "@/lib/validation/quotes";

export const phoneDigits = (phone: string) => phone.replace(/\D/g, "");
const likeOf = (s: string) => `%${s.replace(/[%_\\]/g, (c) => "\\" + c)}%`;

/** The shop's customers matching a phone number (by digits), an e-mail or a name. */
export async function searchCustomers(db: Knex, shopId: string, q: string): Promise<CustomerRow[]> {
  const digits = phoneDigits(q);
  return db<CustomerRow>("customers")
    .where({ shop_id: shopId })
    .andWhere((w) => {
      if (digits.length >= 4) w.orWhereLike("phone_digits", likeOf(digits));
      w.orWhereRaw("lower(email) = lower(?)", [q.trim()]).orWhereILike("name", likeOf(q.trim()));
      if (q.includes("@")) w.orWhereILike("email", likeOf(q.trim()));
    })
    .orderBy("name")
    .limit(20);
}

/** An existing customer of this shop with the same phone digits or e-mail. */
export async function findDuplicateCustomer(db: Knex, shopId: string, c: CustomerInput): Promise<CustomerRow | undefined> {
  const digits = phoneDigits(c.phone);
  return db<CustomerRow>("customers")
    .where({ shop_id: shopId })
    .andWhere((w) => {
      if (digits.length >= 7) w.orWhere("phone_digits", digits);
      if (c.email) w.orWhereRaw("lower(email) = lower(?)", [c.email]);
    })
    .first();
}

export async function createCustomer(db: Knex, shopId: string, c: CustomerInput): Promise<CustomerRow> {
  const [row] = await db<CustomerRow>("customers")
    .insert({ shop_id: shopId, name: c.name, phone: c.phone, phone_digits: phoneDigits(c.phone), email: c.email })
    .returning("*");
  return row!;
}

export async function getCustomer(db: Knex, shopId: string, id: string): Promise<CustomerRow | undefined> {
  return db<CustomerRow>("customers").where({ id, shop_id: shopId }).first();
}

export async function listVehicles(db: Knex, shopId: string, customerId: string): Promise<CustomerVehicleRow[]> {
  return db<CustomerVehicleRow>("customer_vehicles").where({ shop_id: shopId, customer_id: customerId }).orderBy("created_at", "desc");
}
