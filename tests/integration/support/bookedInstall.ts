import { createHash, randomBytes } from "node:crypto";
import type { Knex } from "knex";
import { expect } from "vitest";
import { ctx, req } from "./requests";
import { SHOP_A, U, VEHICLE, quoteRequest } from "./shopFixture";

/**
 * A new customer of shop A (with a made-up phone number and e-mail address) and a draft quote of
 * theirs for the set of four (shopFixture's quoteRequest, on `wheelSku` if told), made through the
 * counter's own routes. The caller's mocked session must be staff A's.
 */
export async function counterQuote(db: Knex, name: string, wheelSku?: string): Promise<{ quoteId: string; email: string }> {
  const customers = await import("@/app/api/shop/customers/route");
  const quotes = await import("@/app/api/shop/quotes/route");
  const email = `i${randomBytes(4).toString("hex")}@example.test`;
  const phone = `555 ${Math.floor(1000000 + Math.random() * 8999999)}`;
  const customerId = (await (await customers.POST(req("POST", "/api/shop/customers", { name, phone, email }), ctx())).json()).customer.id;
  const created = await quotes.POST(
    req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: VEHICLE }, wheelSku)),
    ctx(),
  );
  expect(created.status).toBe(201);
  return { quoteId: (await created.json()).id as string, email };
}

/**
 * A counterQuote with its deposit paid (the payment itself is tested in shop-payments.test.ts)
 * and, unless told, its install booked at the first free start, made through the counter's own
 * routes and queries. The caller's mocked session must be staff A's.
 */
export async function bookedInstallOfShopA(db: Knex, name: string, { book = true } = {}): Promise<{ quoteId: string; email: string }> {
  const { bookInstall, slotsForQuote } = await import("@/lib/shop/bookings/queries");
  const { quoteId, email } = await counterQuote(db, name);
  const linkHash = createHash("sha256").update(randomBytes(32).toString("base64url")).digest("hex");
  await db("quotes")
    .where({ id: quoteId })
    .update({ status: "deposit_paid", public_token_hash: linkHash, valid_until: db.raw("now() + interval '30 days'") });
  if (book) {
    const quote = await db("quotes").where({ id: quoteId }).first();
    const start = (await slotsForQuote(db, quote, { days: 14 })).days.flatMap((d) => d.slots)[0]!.start;
    await bookInstall(db, { by: "staff", scope: { shopId: SHOP_A }, quoteId }, { start }, { userId: U.staffA.id, label: "Sam Staff" });
  }
  return { quoteId, email };
}
