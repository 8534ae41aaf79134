import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { startTestBoss, stopBoss } from "./support/jobs";
import { depositPaidQuote } from "./support/quoteJourney";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, seedShops } from "./support/shopFixture";

/*
 * The owner's overview from a fixture with known numbers, on the shop's clock (America/Denver,
 * UTC−7 in December: IANA tz database). "Now" is Wednesday 2026-12-16 12:00 MST.
 *
 * Hours: Mon–Fri 8:00–17:00 (540 min), Sat 9:00–13:00 (240 min), Sunday closed, and Wednesday the
 * 16th closed for a stock take: open 4 × 540 + 240 = 2,400 min a bay this week (by hand).
 * Every deposit is the quote of shop-balance.test.ts: 25 % of 4,307.82 = 1,076.96.
 */

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const as = (u: (typeof U)[keyof typeof U]) => void (session.current = sessionOf(u));

const db = testDb();
const { shopOverview } = await import("@/lib/shop/overviewQueries");
const overviewRoute = (await import("@/app/api/shop/overview/route")).GET;

const NOW = new Date("2026-12-16T19:00:00Z");
const DEPOSIT = 107696;
let lift: string, rack: string;
const q: Record<"q1" | "q2" | "q3" | "q4" | "q5", { id: string; number: number }> = {} as never;

async function book(quoteId: string, status: "booked" | "cancelled", holds: [bay: string, from: string, to: string][]) {
  const [b] = (await db("bookings")
    .insert({
      shop_id: SHOP_A,
      quote_id: quoteId,
      status,
      starts_at: holds[0]![1],
      ends_at: holds.at(-1)![2],
      booked_by: "fixture",
    })
    .returning("id")) as { id: string }[];
  if (status === "booked") {
    await db("bay_reservations").insert(
      holds.map(([bay, from, to]) => ({
        booking_id: b!.id,
        shop_id: SHOP_A,
        bay_id: bay,
        during: db.raw("tstzrange(?, ?, '[)')", [from, to]),
      })),
    );
  }
}

const depositOf = (quoteId: string) => db("payments").where({ quote_id: quoteId, kind: "deposit", status: "paid" }).first();
const paidAt = (quoteId: string, at: string) => db("payments").where({ quote_id: quoteId, kind: "deposit" }).update({ paid_at: at });
async function refunded(quoteId: string, cents: number, at: string) {
  await db("payment_refunds").insert({
    shop_id: SHOP_A,
    quote_id: quoteId,
    payment_id: (await depositOf(quoteId)).id,
    amount_cents: cents,
    status: "succeeded",
    succeeded_at: at,
    requested_by: "fixture",
  });
}

beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  await startTestBoss();
  await db("shop_schedules").insert({ shop_id: SHOP_A, time_zone: "America/Denver" });
  await db("shop_opening_hours").insert([
    ...[1, 2, 3, 4, 5].map((weekday) => ({ shop_id: SHOP_A, weekday, opens_minute: 480, closes_minute: 1020 })),
    { shop_id: SHOP_A, weekday: 6, opens_minute: 540, closes_minute: 780 },
  ]);
  await db("shop_closed_days").insert({ shop_id: SHOP_A, day: "2026-12-16", note: "Stock take" });
  [{ id: lift }, { id: rack }] = (await db("bays")
    .insert([
      { shop_id: SHOP_A, name: "Lift 1", kind: "lift_bay", position: 0 },
      { shop_id: SHOP_A, name: "Rack", kind: "alignment_rack", position: 1 },
    ])
    .returning("id")) as [{ id: string }, { id: string }];
  // An archived bay is not on the overview.
  await db("bays").insert({ shop_id: SHOP_A, name: "Old lift", kind: "lift_bay", position: 2, archived_at: new Date() });

  for (const key of ["q1", "q2", "q3", "q4", "q5"] as const) {
    const { id } = await depositPaidQuote(db, `Customer ${key.toUpperCase()}`);
    q[key] = { id, number: (await db("quotes").where({ id }).first()).number };
  }
  // Q1: booked Monday 9:00–10:30 MST in the lift, then 10:30–11:00 on the rack; deposit paid Thu 3rd 9:00 MST.
  await book(q.q1.id, "booked", [
    [lift, "2026-12-14T16:00:00Z", "2026-12-14T17:30:00Z"],
    [rack, "2026-12-14T17:30:00Z", "2026-12-14T18:00:00Z"],
  ]);
  await paidAt(q.q1.id, "2026-12-03T16:00:00Z");
  // Q2: booked Thursday 8:00–10:00 MST in the lift; deposit paid Wed 2nd, before the takings window (still held).
  await book(q.q2.id, "booked", [[lift, "2026-12-17T15:00:00Z", "2026-12-17T17:00:00Z"]]);
  await paidAt(q.q2.id, "2026-12-02T20:00:00Z");
  // Q3: installed last week; its balance paid in cash at 23:30 MST on Tuesday the 15th (06:30 UTC the 16th).
  await book(q.q3.id, "booked", [[lift, "2026-12-11T16:00:00Z", "2026-12-11T18:00:00Z"]]);
  await paidAt(q.q3.id, "2026-12-10T17:00:00Z");
  await db("quotes").where({ id: q.q3.id }).update({ status: "installed" });
  await db("payments").insert({
    shop_id: SHOP_A,
    quote_id: q.q3.id,
    kind: "balance",
    method: "cash",
    amount_cents: 323086,
    status: "paid",
    paid_at: "2026-12-16T06:30:00Z",
    recorded_by: "fixture",
  });
  // Q4: booking cancelled, deposit refunded in full on Tuesday the 15th: not held.
  await book(q.q4.id, "cancelled", [[lift, "2026-12-15T16:00:00Z", "2026-12-15T17:00:00Z"]]);
  await paidAt(q.q4.id, "2026-12-10T18:00:00Z");
  await refunded(q.q4.id, DEPOSIT, "2026-12-15T18:00:00Z");
  // Q5: deposit paid 00:30 MST on the 16th (07:30 UTC), 100.00 of it refunded the same day: 976.96 held.
  await paidAt(q.q5.id, "2026-12-16T07:30:00Z");
  await refunded(q.q5.id, 10000, "2026-12-16T17:00:00Z");
});
afterAll(async () => {
  await stopBoss();
  await closeDatabases(db);
});

describe("the owner's overview", () => {
  it("this week's bookings per bay against its open hours (cancelled bookings, last week and archived bays left out)", async () => {
    const o = await shopOverview(db, SHOP_A, NOW);
    expect(o.timeZone).toBe("America/Denver");
    expect(o.week).toEqual({
      from: "2026-12-14",
      to: "2026-12-20",
      bays: [
        // Lift 1: Q1 90 min + Q2 120 min = 210 min; Rack: Q1 30 min.
        { bayId: lift, bayName: "Lift 1", bayKind: "lift_bay", bookings: 2, bookedMinutes: 210, openMinutes: 2400 },
        { bayId: rack, bayName: "Rack", bayKind: "alignment_rack", bookings: 1, bookedMinutes: 30, openMinutes: 2400 },
      ],
    });
  });

  it("deposits held: paid, not installed, less refunds; the total by hand 1,076.96 + 1,076.96 + 976.96 = 3,130.88", async () => {
    const o = await shopOverview(db, SHOP_A, NOW);
    expect(o.deposits.items.map((d) => [d.quoteNumber, d.heldCents, d.installAt])).toEqual([
      [q.q2.number, DEPOSIT, "2026-12-17T15:00:00.000Z"],
      [q.q1.number, DEPOSIT, "2026-12-14T16:00:00.000Z"],
      [q.q5.number, DEPOSIT - 10000, null],
    ]);
    expect(o.deposits.items[0]).toMatchObject({ customerName: "Customer Q2", vehicle: "Test pickup", paidAt: "2026-12-02T20:00:00.000Z" });
    expect(o.deposits.totalCents).toBe(313088);
  });

  it("takings by day for the last 14 days on the shop's clock, refunds netted off", async () => {
    const o = await shopOverview(db, SHOP_A, NOW);
    expect(o.takings.from).toBe("2026-12-03");
    expect(o.takings.to).toBe("2026-12-16");
    expect(o.takings.days).toHaveLength(14);
    const byDate = Object.fromEntries(o.takings.days.filter((d) => d.netCents || d.refundsCents).map((d) => [d.date, d]));
    expect(Object.keys(byDate)).toEqual(["2026-12-03", "2026-12-10", "2026-12-15", "2026-12-16"]);
    expect(byDate["2026-12-03"]).toMatchObject({ depositsCents: DEPOSIT, netCents: DEPOSIT });
    expect(byDate["2026-12-10"]).toMatchObject({ depositsCents: 2 * DEPOSIT, netCents: 215392 });
    // The cash balance at 23:30 MST is Tuesday's, though it is Wednesday in UTC: 3,230.86 − 1,076.96 = 2,153.90.
    expect(byDate["2026-12-15"]).toMatchObject({ balancesCents: 323086, refundsCents: DEPOSIT, netCents: 215390 });
    expect(byDate["2026-12-16"]).toMatchObject({ depositsCents: DEPOSIT, refundsCents: 10000, netCents: 97696 });
    // 1,076.96 + 2,153.92 + 2,153.90 + 976.96 = 6,361.74 (by hand)
    expect(o.takings.totalCents).toBe(636174);
  });

  it("GET /api/shop/overview: the owner gets it, staff are refused (403), another shop's owner sees none of shop A's figures", async () => {
    as(U.ownerA);
    const mine = await overviewRoute(req("GET", "/api/shop/overview"), ctx());
    expect(mine.status).toBe(200);
    const body = await mine.json();
    expect(body.week.bays.map((b: { bayName: string }) => b.bayName)).toEqual(["Lift 1", "Rack"]);
    expect(body.takings.days).toHaveLength(14);
    as(U.staffA);
    const staff = await overviewRoute(req("GET", "/api/shop/overview"), ctx());
    expect(staff.status).toBe(403);
    expect(await staff.json()).not.toHaveProperty("week");
    as(U.ownerB);
    const other = await (await overviewRoute(req("GET", "/api/shop/overview"), ctx())).json();
    expect(other.week.bays).toEqual([]);
    expect(other.deposits).toEqual({ items: [], totalCents: 0 });
    expect(other.takings.totalCents).toBe(0);
  });
});
