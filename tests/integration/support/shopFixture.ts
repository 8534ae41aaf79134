import type { Knex } from "knex";
import { CSV_TEMPLATE, parseCatalogCsv } from "@/lib/shop/catalog/csv";

export const SHOP_A = "0a000000-0000-4000-8000-00000000000a";
export const SHOP_B = "0b000000-0000-4000-8000-00000000000b";
export const U = {
  ownerA: {
    id: "0a000000-0000-4000-8000-000000000001",
    role: "shop_owner",
    shop_id: SHOP_A,
    email: "owner-a@example.test",
    name: "Olive Owner",
  },
  staffA: {
    id: "0a000000-0000-4000-8000-000000000002",
    role: "shop_staff",
    shop_id: SHOP_A,
    email: "staff-a@example.test",
    name: "Sam Staff",
  },
  staffA2: {
    id: "0a000000-0000-4000-8000-000000000003",
    role: "shop_staff",
    shop_id: SHOP_A,
    email: "staff-a2@example.test",
    name: "Second Staff",
  },
  ownerB: {
    id: "0b000000-0000-4000-8000-000000000001",
    role: "shop_owner",
    shop_id: SHOP_B,
    email: "owner-b@example.test",
    name: "Other Owner",
  },
  staffB: {
    id: "0b000000-0000-4000-8000-000000000002",
    role: "shop_staff",
    shop_id: SHOP_B,
    email: "staff-b@example.test",
    name: "Other Staff",
  },
} as const;

const SERVICES = [
  "service,SV-MB,Mount and balance,30.00,,,,,,,,,,,mount_balance,per_wheel",
  "service,SV-BL,Beadlock ring assembly,45.00,,,,,,,,,,,beadlock_assembly,per_wheel",
  "service,SV-VS,Valve stem,5.00,,,,,,,,,,,valve_stem,per_wheel",
  "service,SV-AL,Four-wheel alignment,129.00,,,,,,,,,,,alignment,per_vehicle",
  "service,SV-FT,Fender trimming,145.00,,,,,,,,,,,fender_trim,per_hour",
  "service,SV-DP,Tire disposal,4.00,,,,,,,,,,,disposal,per_wheel",
];

/** Two shops with people; shop A gets settings (8.25 % tax, 25 % deposit) and the template catalog plus services. */
export async function seedShops(db: Knex) {
  await db("shops").insert([
    { id: SHOP_A, name: "Shop A", tax_rate_bp: 825, deposit_pct: 25, quote_validity_days: 14, address: "1 Test Lane", phone: "555-0100" },
    { id: SHOP_B, name: "Shop B" },
  ]);
  await db("users").insert(Object.values(U).map((u) => ({ ...u, password_hash: "x" })));
  const csv = CSV_TEMPLATE.replace(/\r\nservice,SV-MOUNT[^\r]*/, "") + SERVICES.join("\r\n");
  const r = parseCatalogCsv(csv);
  if (r.errors.length || r.fileErrors.length) throw new Error(JSON.stringify(r.errors.concat(r.fileErrors as never)));
  // Plenty on the shelf: accepting a quote holds its tires and wheels, and the tests accept many
  // quotes of the same items (shop-stock.test.ts sets the counts it checks).
  await db("catalog_items").insert(
    r.items.map(({ row: _r, ...i }) => ({ ...i, qty_on_hand: i.qty_on_hand === null ? null : 1000, shop_id: SHOP_A })),
  );
  // Shop B has a catalog of its own, never offered to shop A.
  await db("catalog_items").insert(r.items.slice(0, 3).map(({ row: _r, ...i }) => ({ ...i, shop_id: SHOP_B })));
}

export const item = (db: Knex, shop: string, sku: string) => db("catalog_items").where({ shop_id: shop, sku }).first();

/**
 * The body of a POST /api/shop/quotes for a set of four from shop A's catalog: the tire and wheel
 * looked up by SKU (the 35-inch template tire on the beadlock template wheel unless told), then
 * `fields` (customerId and the vehicle at least; a field there wins, e.g. `quantity: 5`).
 */
export async function quoteRequest(db: Knex, fields: { customerId: string } & Record<string, unknown>, wheelSku = "WH-EXAMPLE-BL") {
  const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
  const wheel = await item(db, SHOP_A, wheelSku);
  return { tireItemId: tire.id as string, wheelItemId: wheel.id as string, quantity: 4, ...fields };
}

export const VEHICLE = {
  description: "Test pickup",
  boltPattern: "6x5.5",
  tireSize: "265/70R17",
  wheelDiameterIn: 17,
  wheelWidthIn: 8,
  offsetMode: "offset",
  offsetMm: 25,
};
