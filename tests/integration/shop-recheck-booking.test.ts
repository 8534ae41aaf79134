import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U } from "./support/shopFixture";
import { bookedInstallOfShopA } from "./support/bookedInstall";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const slotsRoute = await import("@/app/api/recheck/[token]/slots/route");
const bookRoute = await import("@/app/api/recheck/[token]/booking/route");
const workOrders = await import("@/app/api/shop/work-orders/route");
const { calendar, slotsForQuote } = await import("@/lib/shop/bookings/queries");
const { queueDueRechecks } = await import("@/lib/shop/workOrders/queries");
const { db: appDb } = await import("@/lib/platform/db");

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const HOUR = 3_600_000;

interface Mail {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string }[];
}
const mails = async (to: string) =>
  ((await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).select("data")) as { data: Mail }[])
    .map((r) => r.data)
    .filter((m) => m.to === to);

/**
 * A job of shop A done a week ago and an hour past its re-check date, its re-check e-mail queued by
 * the job's own query: returns the token read from that e-mail's link, as the customer follows it.
 */
async function mailedRecheck() {
  session.current = sessionOf(U.staffA);
  const { quoteId, email } = await bookedInstallOfShopA(db, "Check Customer");
  const { id } = await (await workOrders.POST(req("POST", "/api/shop/work-orders", { quoteId }), ctx())).json();
  // The sheet itself is covered in shop-work-orders.test.ts: here the job is simply done and due.
  await db("work_orders")
    .where({ id })
    .update({ status: "done", done_at: new Date(Date.now() - 8 * 24 * HOUR), recheck_due_at: new Date(Date.now() - HOUR) });
  await queueDueRechecks(appDb);
  const mail = (await mails(email)).find((m) => /re-check/.test(m.subject))!;
  const token = /\/recheck\/([A-Za-z0-9_-]{43})/.exec(mail.text)![1]!;
  return { id, quoteId, email, token, mail };
}

const getSlots = (token: string, query = "") => slotsRoute.GET(req("GET", `/api/recheck/${token}/slots${query}`), ctx({ token }));
const postBooking = (token: string, start: string) =>
  bookRoute.POST(req("POST", `/api/recheck/${token}/booking`, { start }), ctx({ token }));
const firstStart = async (token: string) =>
  ((await (await getSlots(token, "?days=14")).json()).days as { slots: { start: string }[] }[]).flatMap((d) => d.slots)[0]!.start;

/** Bookings, bay time and mails: what a refusal must leave as it was. */
const written = async () => ({
  bookings: Number((await db("bookings").count({ n: "*" }))[0]!.n),
  bayTime: Number((await db("bay_reservations").count({ n: "*" }))[0]!.n),
  mails: Number((await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).count({ n: "*" }))[0]!.n),
});

beforeAll(() => setUpBookableShops(db));
afterAll(() => tearDownBookableShops(db));

describe("the re-check e-mail's booking link", () => {
  it("carries a link whose token only the e-mail holds (the work order keeps its SHA-256, FIPS 180-4)", async () => {
    const { id, token, mail } = await mailedRecheck();
    expect(mail.text).toMatch(/Book a 30-minute slot in the next 14 days here/);
    expect(mail.text).toMatch(/Or call Shop A on 555-0100\./);
    const row = await db("work_orders").where({ id }).first();
    expect(row.recheck_link_hash).toBe(sha256(token));
    expect(new Date(row.recheck_link_expires_at).getTime() - new Date(row.recheck_queued_at).getTime()).toBe(30 * 24 * HOUR);
  });

  it("lists 30-minute lift-bay starts of the next 14 days, none beyond", async () => {
    const { token } = await mailedRecheck();
    const r = await getSlots(token, "?days=7");
    expect(r.status).toBe(200);
    const a = await r.json();
    expect(a).toMatchObject({ minutes: 30, segments: [{ bayKind: "lift_bay", minutes: 30 }], booking: null, unavailable: null });
    const first = a.days.flatMap((d: { slots: { start: string; end: string }[] }) => d.slots)[0];
    expect(new Date(first.end).getTime() - new Date(first.start).getTime()).toBe(30 * 60_000);
    // Day 16 from today lies past the two weeks: no start is offered there.
    const late = await (await getSlots(token, `?from=${addDaysIso(a.today, 16)}&days=3`)).json();
    expect(late.days.flatMap((d: { slots: unknown[] }) => d.slots)).toEqual([]);
  });

  it("books once: the booking, its bay time and the confirmation with its calendar file; the calendar shows it as a re-check", async () => {
    const { quoteId, email, token } = await mailedRecheck();
    const start = await firstStart(token);
    const r = await postBooking(token, start);
    expect(r.status).toBe(201);
    const { booking } = await r.json();
    expect(booking).toMatchObject({ quoteId, kind: "recheck", status: "booked", startsAt: start, bookedBy: "customer" });
    expect(booking.bays).toHaveLength(1);
    expect(booking.bays[0]).toMatchObject({ bayName: "Lift 1", bayKind: "lift_bay" });
    // The install's own confirmation went to this customer too; the re-check's is the second "Booked:" mail.
    const booked = (await mails(email)).filter((m) => m.subject.startsWith("Booked:"));
    expect(booked.map((m) => m.subject.replace(/, .*/, ""))).toEqual(
      expect.arrayContaining(["Booked: your install at Shop A", "Booked: your lug and ring re-check at Shop A"]),
    );
    const confirmation = booked.find((m) => m.subject.includes("re-check"))!;
    expect(confirmation.attachments?.[0]?.filename).toMatch(/^recheck-Q-\d+\.ics$/);
    // The quote's install booking is still the install one; the re-check sits beside it on the calendar.
    const quote = await db("quotes").where({ id: quoteId }).first();
    expect((await slotsForQuote(db, quote)).booking?.kind).toBe("install");
    const week = await calendar(db, SHOP_A, { from: start.slice(0, 10), days: 2 });
    expect(week.bookings.find((b) => b.id === booking.id)).toMatchObject({ kind: "recheck", customerName: "Check Customer" });
    // The page now shows what is booked.
    expect((await (await getSlots(token)).json()).booking).toMatchObject({ id: booking.id });

    const before = await written();
    const again = await postBooking(token, start);
    expect(again.status).toBe(409);
    expect((await again.json()).error).toMatch(/^Your re-check is already booked for .+\. Call the shop to move it\.$/);
    expect(await written()).toEqual(before);
  });

  it("refuses a start another booking holds with 409, and a start past the two weeks with 422; nothing is written", async () => {
    const first = await mailedRecheck();
    const start = await firstStart(first.token);
    expect((await postBooking(first.token, start)).status).toBe(201);
    const second = await mailedRecheck();
    const before = await written();
    const taken = await postBooking(second.token, start);
    expect(taken.status).toBe(409);
    expect((await taken.json()).fieldErrors.start[0]).toMatch(/^Install time: /);
    const far = await postBooking(second.token, new Date(Date.now() + 20 * 24 * HOUR).toISOString().slice(0, 11) + "16:00:00.000Z");
    expect(far.status).toBe(422);
    expect(await written()).toEqual(before);
  });

  it("two customers taking the last free start at once: exactly one wins (PostgreSQL's exclusion constraint), the other gets 409", async () => {
    const a = await mailedRecheck();
    const b = await mailedRecheck();
    const start = await firstStart(a.token);
    const before = await written();
    const answers = await Promise.all([postBooking(a.token, start), postBooking(b.token, start)]);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409]);
    const after = await written();
    expect(after.bookings - before.bookings).toBe(1);
    expect(after.bayTime - before.bayTime).toBe(1);
  });

  it("an unknown link is 404 and an expired one 410 naming the shop's phone; nothing is written", async () => {
    const before = await written();
    const unknown = "A".repeat(43);
    const u = await getSlots(unknown);
    expect(u.status).toBe(404);
    expect((await u.json()).error).toBe("That re-check link was not found.");
    expect((await postBooking(unknown, new Date(Date.now() + 2 * 24 * HOUR).toISOString())).status).toBe(404);
    expect(await written()).toEqual(before);

    const { id, token } = await mailedRecheck();
    const start = await firstStart(token);
    await db("work_orders")
      .where({ id })
      .update({ recheck_link_expires_at: new Date(Date.now() - 1000) });
    const mid = await written();
    const g = await getSlots(token);
    expect(g.status).toBe(410);
    expect((await g.json()).error).toBe("This re-check link has expired. Call Shop A on 555-0100 to book your re-check.");
    const p = await postBooking(token, start);
    expect(p.status).toBe(410);
    expect(await written()).toEqual(mid);
  });
});

/** A shop date moved by whole days (the test's own arithmetic, on the UTC calendar). */
function addDaysIso(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * 24 * HOUR).toISOString().slice(0, 10);
}
