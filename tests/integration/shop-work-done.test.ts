import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U } from "./support/shopFixture";
import { bookedInstallOfShopA } from "./support/bookedInstall";
import { bodyFor } from "./support/workOrderSteps";
import { workOrderRoutes } from "./support/workOrderRoutes";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";

/*
 * When the work is done: a quote with a work order is installed by that work order, and the install's
 * bay time still ahead is given back. The expectations are this app's own rules (common practice, no source):
 * a finished job holds no bay, and the sheet signed step by step is what says the job is finished.
 */

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);

const { open, read, sign, move } = await workOrderRoutes();
const quoteStatus = (await import("@/app/api/shop/quotes/[id]/status/route")).POST;
const { requiredSteps } = await import("@/lib/shop/workOrders/api");
const { moveWorkOrder } = await import("@/lib/shop/workOrders/queries");
const { calendar, slotsForQuote } = await import("@/lib/shop/bookings/queries");
const { wallTime } = await import("@/lib/shop/bookings/zoned");

const STAFF = { userId: U.staffA.id, label: "Sam Staff" };

const openFor = async (quoteId: string) =>
  (await (await open(req("POST", "/api/shop/work-orders", { quoteId }), ctx())).json()).id as string;
const signAs = (id: string, body: object) => sign(req("PUT", `/api/shop/work-orders/${id}/steps`, body), ctx({ id }));
const moveTo = (id: string, to: string) => move(req("POST", `/api/shop/work-orders/${id}/status`, { to }), ctx({ id }));
const markInstalled = (quoteId: string) =>
  quoteStatus(req("POST", `/api/shop/quotes/${quoteId}/status`, { to: "installed" }), ctx({ id: quoteId }));

/** A quote of shop A, deposit paid, its install booked at the first free start; with its work order in the bay when asked. */
async function bookedJob({ inBay = false } = {}) {
  as(U.staffA);
  const { quoteId, email } = await bookedInstallOfShopA(db, "Done Customer");
  const booking = await db("bookings").where({ quote_id: quoteId, kind: "install" }).first();
  if (!inBay) return { quoteId, email, booking, workOrderId: "" };
  const workOrderId = await openFor(quoteId);
  expect((await moveTo(workOrderId, "in_bay")).status).toBe(200);
  return { quoteId, email, booking, workOrderId };
}

async function signEverything(id: string) {
  const w = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
  for (const s of requiredSteps(w)) expect((await signAs(id, bodyFor(s.position, s.step))).status, `${s.position} ${s.step}`).toBe(200);
}

/** The install starts a quote not yet booked may pick now, over the next two weeks. */
async function freeStarts(): Promise<string[]> {
  const { quoteId } = await bookedInstallOfShopA(db, "Slot Looker", { book: false });
  const quote = await db("quotes").where({ id: quoteId }).first();
  return (await slotsForQuote(db, quote, { days: 14 })).days.flatMap((d) => d.slots.map((s) => s.start));
}

/** The shop calendar's bookings (status booked) over the two weeks ahead. */
async function calendarIds(): Promise<string[]> {
  const answer = await calendar(db, SHOP_A, { from: wallTime(new Date(), "America/Denver").date, days: 15 });
  return answer.bookings.map((b) => b.id);
}

/** The booking mails queued for one customer, by subject. */
const mailsTo = async (email: string) =>
  (
    (await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).select("data")) as {
      data: { to: string; subject: string; text: string; attachments?: { contentType: string }[] };
    }[]
  )
    .map((r) => r.data)
    .filter((m) => m.to === email);

const reservations = (bookingId: string) =>
  db("bay_reservations")
    .where({ booking_id: bookingId })
    .orderByRaw("lower(during)")
    .select(db.raw("lower(during) as starts_at"), db.raw("upper(during) as ends_at")) as Promise<{ starts_at: Date; ends_at: Date }[]>;

beforeAll(() => setUpBookableShops(db));
afterAll(() => tearDownBookableShops(db));

describe("marking installed on the quote page while a work order is open", () => {
  it("is refused (409) naming what to do, with the work order in the bay and steps open; nothing is written", async () => {
    const { quoteId, booking } = await bookedJob({ inBay: true });
    const events = await db("quote_events").where({ quote_id: quoteId }).count({ n: "*" });
    const r = await markInstalled(quoteId);
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe(
      "This quote's work order is “In the bay”: the quote becomes installed when the work order is done. Open the work order, sign every step off, then mark it done.",
    );
    expect((await db("quotes").where({ id: quoteId }).first()).status).toBe("deposit_paid");
    expect(await db("quote_events").where({ quote_id: quoteId }).count({ n: "*" })).toEqual(events);
    expect((await db("bookings").where({ id: booking.id }).first()).status).toBe("booked");
  });

  it("is refused too while the work order is only booked", async () => {
    const { quoteId } = await bookedJob();
    as(U.staffA);
    await openFor(quoteId);
    const r = await markInstalled(quoteId);
    expect(r.status).toBe(409);
    expect((await r.json()).error).toMatch(/^This quote's work order is “Booked”: /);
    expect((await db("quotes").where({ id: quoteId }).first()).status).toBe("deposit_paid");
  });

  it("the work order's done installs the quote once every step is signed", async () => {
    const { quoteId, workOrderId } = await bookedJob({ inBay: true });
    await signEverything(workOrderId);
    const done = await moveTo(workOrderId, "done");
    expect(done.status).toBe(200);
    expect((await done.json()).workOrder.status).toBe("done");
    expect((await db("quotes").where({ id: quoteId }).first()).status).toBe("installed");
    const events = await db("quote_events").where({ quote_id: quoteId, to_status: "installed" });
    expect(events.map((e) => e.note)).toEqual(["work order done"]);
  });

  it("a quote without a work order is still marked installed from its page", async () => {
    const { quoteId } = await bookedJob();
    const r = await markInstalled(quoteId);
    expect(r.status).toBe(200);
    expect((await r.json()).quote.status).toBe("installed");
  });

  it("a quote already installed before that rule (old data): the work order still closes when every step is signed", async () => {
    const { quoteId, workOrderId, booking } = await bookedJob({ inBay: true });
    // As the quote page used to leave it: installed, the work order in the bay.
    await db("quotes").where({ id: quoteId }).update({ status: "installed" });
    await signEverything(workOrderId);
    const done = await moveTo(workOrderId, "done");
    expect(done.status).toBe(200);
    const w = (await done.json()).workOrder;
    expect(w).toMatchObject({ status: "done", doneBy: "Sam Staff" });
    expect(w.recheckDueAt).toEqual(expect.any(String));
    expect((await db("quotes").where({ id: quoteId }).first()).status).toBe("installed");
    // No second "installed" event is written for a quote that already was.
    expect(await db("quote_events").where({ quote_id: quoteId, to_status: "installed" })).toEqual([]);
    // Its bay time ahead is given back too.
    expect((await db("bookings").where({ id: booking.id }).first()).status).toBe("cancelled");
  });
});

describe("the calendar's ways into a job", () => {
  it("links the quote only for its author (owners: every quote), and every job's work order once it is opened", async () => {
    const { quoteId, booking } = await bookedJob();
    const from = wallTime(new Date(booking.starts_at), "America/Denver").date;
    const shown = async (quotesOf?: string) =>
      (await calendar(db, SHOP_A, { from, days: 1, quotesOf })).bookings.find((b) => b.id === booking.id)!;
    expect(await shown(U.staffA.id)).toMatchObject({ quoteOpen: true, workOrderId: null });
    expect(await shown(undefined)).toMatchObject({ quoteOpen: true });
    // Another member of staff (an invented id: the calendar only compares it with the quote's author).
    expect(await shown("0a000000-0000-4000-8000-0000000000aa")).toMatchObject({ quoteOpen: false, workOrderId: null });
    const workOrderId = await openFor(quoteId);
    expect(await shown("0a000000-0000-4000-8000-0000000000aa")).toMatchObject({ quoteOpen: false, workOrderId });
  });
});

describe("the install's bay time once the work is done", () => {
  it("a booking not started yet is cancelled as of the moment the quote was marked installed; the slot search and calendar free it", async () => {
    const { quoteId, email, booking } = await bookedJob();
    const start = new Date(booking.starts_at).toISOString();
    expect(await freeStarts()).not.toContain(start);
    expect(await calendarIds()).toContain(booking.id);

    const before = Date.now();
    expect((await markInstalled(quoteId)).status).toBe(200);
    const after = await db("bookings").where({ id: booking.id }).first();
    expect(after.status).toBe("cancelled");
    expect(new Date(after.cancelled_at).getTime()).toBeGreaterThanOrEqual(before - 1000);
    // The record keeps when it was booked for.
    expect(new Date(after.starts_at).toISOString()).toBe(start);
    expect(await reservations(booking.id)).toEqual([]);
    expect(await freeStarts()).toContain(start);
    expect(await calendarIds()).not.toContain(booking.id);
    // The customer's calendar entry is withdrawn (the same entry, its SEQUENCE raised), saying why.
    expect(after.sequence).toBe(booking.sequence + 1);
    const released = (await mailsTo(email)).filter((m) => m.subject.startsWith("No longer needed: your install at Shop A, "));
    expect(released).toHaveLength(1);
    expect(released[0]!.attachments?.[0]?.contentType).toMatch(/method=CANCEL$/);
    expect(released[0]!.text).toMatch(/The work on quote Q-\d+ \(.+\) is done, so the install booked for .+ is no longer needed/);
  });

  it("a booking under way when the work order is done ends then: its later bay time is freed, what was used stays", async () => {
    const { booking, workOrderId } = await bookedJob({ inBay: true });
    const held = await reservations(booking.id);
    // The shop's work (fixture: 5 minutes a service) goes on the lift, then the rack.
    expect(held).toHaveLength(2);
    const doneAt = new Date(new Date(held[0]!.starts_at).getTime() + 60_000);
    await signEverything(workOrderId);
    await moveWorkOrder(db, SHOP_A, workOrderId, "done", STAFF, doneAt);

    const after = await db("bookings").where({ id: booking.id }).first();
    expect(after.status).toBe("booked");
    expect(new Date(after.starts_at).getTime()).toBe(new Date(booking.starts_at).getTime());
    expect(new Date(after.ends_at).getTime()).toBe(doneAt.getTime());
    const left = await reservations(booking.id);
    expect(left).toHaveLength(1);
    expect(new Date(left[0]!.starts_at).getTime()).toBe(new Date(held[0]!.starts_at).getTime());
    expect(new Date(left[0]!.ends_at).getTime()).toBe(doneAt.getTime());
    const shown = (await calendar(db, SHOP_A, { from: wallTime(doneAt, "America/Denver").date, days: 1 })).bookings.find(
      (b) => b.id === booking.id,
    );
    expect(shown?.endsAt).toBe(doneAt.toISOString());
  });

  it("another quote's install and a re-check booking of the same quote are not touched", async () => {
    const other = await bookedJob();
    const otherHeld = await reservations(other.booking.id);
    expect(otherHeld.length).toBeGreaterThan(0);
    const { quoteId, booking } = await bookedJob();
    // A re-check row written straight in (the re-check is booked after the work in real use): only the install is released.
    const dayAfter = (d: Date, h: number) => new Date(new Date(d).getTime() + 86_400_000 + h * 3_600_000);
    const [recheck] = await db("bookings")
      .insert({
        shop_id: SHOP_A,
        quote_id: quoteId,
        kind: "recheck",
        status: "booked",
        starts_at: dayAfter(booking.ends_at, 0),
        ends_at: dayAfter(booking.ends_at, 1),
        booked_by: "Sam Staff",
      })
      .returning("id");
    expect((await markInstalled(quoteId)).status).toBe(200);
    expect((await db("bookings").where({ id: booking.id }).first()).status).toBe("cancelled");
    expect((await db("bookings").where({ id: recheck.id }).first()).status).toBe("booked");
    expect((await db("bookings").where({ id: other.booking.id }).first()).status).toBe("booked");
    expect(await reservations(other.booking.id)).toEqual(otherHeld);
  });
});
