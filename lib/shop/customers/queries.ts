import "server-only";
import type { Knex } from "knex";
import type { CustomerRow, CustomerVehicleRow } from "@/lib/platform/db/types";
import { type Customer, type CustomerVehicle, customerDto, customerVehicleDto } from "@/lib/shop/customers/api";
import { containsPattern, searchKey } from "@/lib/platform/search/normalize";
import type { CustomerInput } from "@/lib/shop/quotes/schema";
import type { CounterVehicleForEngine } from "@/lib/shop/customers/schema";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, NotFoundError } from "@/lib/platform/errors";

export const phoneDigits = (phone: string) => phone.replace(/\D/g, "");

/**
 * The shop's customers matching a phone number (by digits), a name or the part of an e-mail
 * address before the @ (through the stored search key: accents and Ł, Ø, ß … folded, so
 * "lukasz" finds Łukasz), or a whole e-mail address when the search has an @. A domain alone
 * finds nobody: every customer may share it.
 */
export async function searchCustomers(db: Knex, shopId: string, q: string): Promise<Customer[]> {
  const text = q.trim();
  const digits = phoneDigits(text);
  const key = searchKey(text);
  // Nothing left to look for (only accents, say): an empty condition would list everyone.
  if (!key && digits.length < 4 && !text.includes("@")) return [];
  const rows = await db<CustomerRow>("customers")
    .where({ shop_id: shopId })
    .andWhere((w) => {
      if (digits.length >= 4) w.orWhereLike("phone_digits", containsPattern(digits));
      if (key) w.orWhereLike("search_key", containsPattern(key));
      if (text.includes("@")) w.orWhereRaw("lower(email) like ?", [containsPattern(text.toLowerCase())]);
    })
    .orderBy("name")
    .limit(20);
  return rows.map(customerDto);
}

/** An existing customer of this shop with the same phone digits or e-mail. */
async function findDuplicateCustomer(db: Knex, shopId: string, c: CustomerInput): Promise<Customer | undefined> {
  const digits = phoneDigits(c.phone);
  const row = await db<CustomerRow>("customers")
    .where({ shop_id: shopId })
    .andWhere((w) => {
      if (digits.length >= 7) w.orWhere("phone_digits", digits);
      if (c.email) w.orWhereRaw("lower(email) = lower(?)", [c.email]);
    })
    .first();
  return row && customerDto(row);
}

/**
 * A new customer of the shop. One with the same phone digits or e-mail is a ConflictError that
 * carries the existing customer (`existing`), so the counter can pick them instead.
 */
export async function createCustomer(db: Knex, shopId: string, c: CustomerInput): Promise<Customer> {
  const existing = await findDuplicateCustomer(db, shopId, c);
  if (existing)
    throw new ConflictError(`${existing.name} already has this phone number or e-mail. Pick the existing customer.`, { existing });
  if (!c.phone && !c.email) throw new InvalidError("Enter a phone number or an e-mail address.");
  const [row] = await db<CustomerRow>("customers")
    .insert({ shop_id: shopId, name: c.name, phone: c.phone, phone_digits: phoneDigits(c.phone), email: c.email })
    .returning("*");
  return customerDto(row!);
}

/** The shop's customer; NotFoundError when it is not this shop's. */
export async function getCustomer(db: Knex, shopId: string, id: string): Promise<Customer> {
  const row = await db<CustomerRow>("customers").where({ id, shop_id: shopId }).first();
  if (!row) throw new NotFoundError("That customer");
  return customerDto(row);
}

export async function listVehicles(db: Knex, shopId: string, customerId: string): Promise<CustomerVehicle[]> {
  return (
    await db<CustomerVehicleRow>("customer_vehicles").where({ shop_id: shopId, customer_id: customerId }).orderBy("created_at", "desc")
  ).map(customerVehicleDto);
}

/** The stored columns of a counter vehicle, as the engine reads it (schema.ts counterVehicleForEngine). */
const vehicleColumns = (v: CounterVehicleForEngine) => ({
  description: v.description,
  bolt_pattern: v.boltPattern,
  current_setup: JSON.stringify(v.currentSetup),
  axle_ratio: v.axleRatio,
  hub_bore_mm: v.hubBoreMm,
  load_placard: v.placard ? JSON.stringify(v.placard) : null,
  body_points: v.bodyPoints ? JSON.stringify(v.bodyPoints) : null,
});

/** A customer's vehicle saved at the counter (inside the caller's transaction, so a refused quote saves nothing). */
export async function insertVehicle(db: Knex, shopId: string, customerId: string, v: CounterVehicleForEngine): Promise<string> {
  const [row] = await db("customer_vehicles")
    .insert({ shop_id: shopId, customer_id: customerId, ...vehicleColumns(v) })
    .returning(["id"]);
  return (row as { id: string }).id;
}

/**
 * A saved vehicle the counter picked and changed (its placard re-typed, say), written over whole;
 * NotFoundError when it is not this customer's.
 */
export async function updateVehicle(db: Knex, shopId: string, customerId: string, id: string, v: CounterVehicleForEngine): Promise<void> {
  const n = await db("customer_vehicles").where({ id, shop_id: shopId, customer_id: customerId }).update(vehicleColumns(v));
  if (n === 0) throw new NotFoundError("That vehicle");
}

/** These queries on the app's database handle, for pages and route handlers. */
export const customerQueries = bindAppDb({ createCustomer, getCustomer, listVehicles, searchCustomers });
