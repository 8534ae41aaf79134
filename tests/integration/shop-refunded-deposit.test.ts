import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support/db";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";
import { STAFF_A, depositPaidQuote, firstFreeStart, openAllDay } from "./support/quoteJourney";
import { SHOP_A, U } from "./support/shopFixture";

/*
 * A deposit given back in full ends the booking: once the owner has refunded the whole deposit
 * (after cancelling the install), neither the counter nor the customer's link can book the quote
 * again, and the answer says why. A part refund (the shop keeping the rest) leaves it bookable.
 */

const db = testDb();
const { bookInstall, cancelInstall, slotsByToken, slotsForStaff } = await import("@/lib/shop/bookings/queries");

const staff = (quoteId: string) => ({ by: "staff" as const, scope: { shopId: SHOP_A }, quoteId });
const REFUSED = "The deposit on this quote has been refunded in full, so it can no longer be booked. A new quote is needed to book again.";

/** Books, cancels, then records the owner's refund of `amountCents` as its confirming webhook leaves it (succeeded). */
async function bookedCancelledRefunded(id: string, amountCents: (deposit: number) => number, status = "succeeded") {
  await bookInstall(db, staff(id), { start: await firstFreeStart(db, id) }, STAFF_A);
  await cancelInstall(db, { shopId: SHOP_A }, id, STAFF_A);
  const deposit = await db("payments").where({ quote_id: id, kind: "deposit", status: "paid" }).first();
  await db("payment_refunds").insert({
    shop_id: SHOP_A,
    quote_id: id,
    payment_id: deposit.id,
    amount_cents: amountCents(deposit.amount_cents),
    status,
    requested_by_user_id: U.ownerA.id,
    requested_by: U.ownerA.name,
    ...(status === "succeeded" ? { succeeded_at: new Date() } : {}),
  });
}

const bookings = async (id: string) => (await db("bookings").where({ quote_id: id }).select("status")).map((b) => b.status);

beforeAll(() => setUpBookableShops(db, openAllDay));
afterAll(() => tearDownBookableShops(db));

describe("a quote whose deposit was refunded in full", () => {
  it("cannot be booked again from the counter: refused with the reason, nothing written", async () => {
    const q = await depositPaidQuote(db);
    await bookedCancelledRefunded(q.id, (d) => d);
    const start = await firstFreeStart(db, q.id);
    await expect(bookInstall(db, staff(q.id), { start }, STAFF_A)).rejects.toMatchObject({ name: "ConflictError", message: REFUSED });
    await expect(slotsForStaff(db, { shopId: SHOP_A }, q.id)).rejects.toMatchObject({ name: "ConflictError", message: REFUSED });
    expect(await bookings(q.id)).toEqual(["cancelled"]);
  });

  it("cannot be booked on the customer's link: no free starts offered and a booking refused, nothing written", async () => {
    const q = await depositPaidQuote(db);
    await bookedCancelledRefunded(q.id, (d) => d);
    await expect(slotsByToken(db, q.token)).rejects.toMatchObject({ name: "ConflictError", message: REFUSED });
    const start = new Date(Date.now() + 86_400_000).toISOString();
    await expect(bookInstall(db, { by: "customer", token: q.token }, { start }, { userId: null, label: "customer" })).rejects.toMatchObject(
      {
        name: "ConflictError",
        message: REFUSED,
      },
    );
    expect(await bookings(q.id)).toEqual(["cancelled"]);
  });

  it("a full refund asked of the provider and not confirmed yet already stops a new booking", async () => {
    const q = await depositPaidQuote(db);
    await bookedCancelledRefunded(q.id, (d) => d, "pending");
    await expect(slotsForStaff(db, { shopId: SHOP_A }, q.id)).rejects.toMatchObject({ name: "ConflictError", message: REFUSED });
  });

  it("a part refund leaves the quote bookable (the shop kept the rest of the deposit)", async () => {
    const q = await depositPaidQuote(db);
    await bookedCancelledRefunded(q.id, (d) => d - 5000);
    const booking = await bookInstall(db, staff(q.id), { start: await firstFreeStart(db, q.id) }, STAFF_A);
    expect(booking.status).toBe("booked");
    expect(await bookings(q.id)).toEqual(expect.arrayContaining(["cancelled", "booked"]));
  });
});

describe("quotes refunded in full before a full refund declined them (migration 20261211090000)", () => {
  // Runs last in this file: the quotes above were refunded by writing the rows directly, as
  // before the rule, so they are in the state the migration corrects.
  it("are declined with their held stock released and a history line; part refunds and pending refunds are left alone", async () => {
    const { up } = await import("@/db/migrations/20261211090000_decline_refunded_deposits");
    const full = await depositPaidQuote(db);
    await bookedCancelledRefunded(full.id, (d) => d);
    const part = await depositPaidQuote(db);
    await bookedCancelledRefunded(part.id, (d) => d - 5000);
    const pending = await depositPaidQuote(db);
    await bookedCancelledRefunded(pending.id, (d) => d, "pending");
    const held = await db("stock_reservations").where({ quote_id: full.id, status: "reserved" }).select("catalog_item_id", "quantity");
    expect(held.length).toBeGreaterThan(0);
    const reserved = async () =>
      new Map(
        (
          await db("catalog_items")
            .whereIn(
              "id",
              held.map((h) => h.catalog_item_id),
            )
            .select("id", "qty_reserved")
        ).map((r) => [r.id, r.qty_reserved as number]),
      );
    const before = await reserved();

    await up(db);

    const status = async (id: string) => (await db("quotes").where({ id }).first()).status;
    expect(await status(full.id)).toBe("declined");
    expect(await status(part.id)).toBe("deposit_paid");
    expect(await status(pending.id)).toBe("deposit_paid");
    expect(await db("stock_reservations").where({ quote_id: full.id }).pluck("status")).toEqual(held.map(() => "released"));
    const after = await reserved();
    const released = new Map<string, number>();
    for (const h of held) released.set(h.catalog_item_id, (released.get(h.catalog_item_id) ?? 0) + h.quantity);
    // Other quotes of this file were refunded in full the same way and are released too: at least this one's units.
    for (const [item, n] of released) expect(before.get(item)! - after.get(item)!).toBeGreaterThanOrEqual(n);
    expect(await db("quote_events").where({ quote_id: full.id }).orderBy("id", "desc").first()).toMatchObject({
      from_status: "deposit_paid",
      to_status: "declined",
      actor: "system",
      actor_user_id: null,
    });
    // Run again, nothing more moves.
    const events = await db("quote_events").count({ n: "*" });
    await up(db);
    expect(await db("quote_events").count({ n: "*" })).toEqual(events);
  });
});
