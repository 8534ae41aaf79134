import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U } from "./support/shopFixture";
import { bookedInstallOfShopA } from "./support/bookedInstall";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";
import { workOrderRoutes } from "./support/workOrderRoutes";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const slotsRoute = await import("@/app/api/recheck/[token]/slots/route");
const bookRoute = await import("@/app/api/recheck/[token]/booking/route");
const bookingRoute = await import("@/app/api/shop/bookings/[id]/route");
const bookingSlotsRoute = await import("@/app/api/shop/bookings/[id]/slots/route");
const recheckSlotRoute = await import("@/app/api/shop/rechecks/slot/route");
const { bookInstall, calendar, getSetup, saveSetup, slotsForQuote } = await import("@/lib/shop/bookings/queries");
const { bookRecheck, recheckPageByLink } = await import("@/lib/shop/workOrders/recheckBookingQueries");
const { baysSetupSchema } = await import("@/lib/shop/bookings/schema");
const { ConflictError, InvalidError } = await import("@/lib/platform/errors");
const { open: openWorkOrder } = await workOrderRoutes();
const { queueDueRechecks } = await import("@/lib/shop/workOrders/queries");
const { db: appDb } = await import("@/lib/platform/db");

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const HOUR = 3_600_000;

interface Mail {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; contentType: string; contentBase64: string }[];
}
/** The calendar file riding along a mail, as text. */
const icsOf = (m: Mail) =>
  Buffer.from(m.attachments?.find((a) => a.filename.endsWith(".ics"))?.contentBase64 ?? "", "base64").toString("utf8");
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
  const { id } = await (await openWorkOrder(req("POST", "/api/shop/work-orders", { quoteId }), ctx())).json();
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
    // RFC 5546: a REQUEST carrying the booking's own UID, as an install's confirmation does.
    expect(icsOf(confirmation)).toContain("METHOD:REQUEST");
    expect(icsOf(confirmation)).toContain(`UID:booking-${booking.id}@`);
    // The shop hears of it as of an install booked on the customer's link, in the re-check's words.
    const number = (await db("quotes").where({ id: quoteId }).first()).number;
    const notice = (await mails(U.ownerA.email)).filter((m) => m.subject.startsWith(`Booked: re-check for quote Q-${number}, `));
    expect(notice).toHaveLength(1);
    expect(notice[0]!.text).toMatch(
      new RegExp(`^The lug and ring re-check for quote Q-${number} was booked by the customer on their link for `),
    );
    // The quote's install booking is still the install one; the re-check sits beside it on the calendar.
    const quote = await db("quotes").where({ id: quoteId }).first();
    expect((await slotsForQuote(db, quote)).booking?.kind).toBe("install");
    // The shop's own day of the start (its clock, not UTC: an afternoon start in Denver is the next UTC day).
    const week = await calendar(db, SHOP_A, { now: new Date(start), days: 1 });
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
    // The field is the re-check page's "Re-check time", never the install's.
    const message = (await taken.json()).fieldErrors.start[0];
    expect(message).toBe("Re-check time: that time is already taken in the shop's bays. Pick another time.");
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

const asStaff = () => void (session.current = sessionOf(U.staffA));
const moveRoute = (id: string, body: object) => bookingRoute.PUT(req("PUT", `/api/shop/bookings/${id}`, body), ctx({ id }));
const cancelRoute = (id: string) => bookingRoute.DELETE(req("DELETE", `/api/shop/bookings/${id}`), ctx({ id }));
const moveSlots = (id: string, query = "?days=7") =>
  bookingSlotsRoute.GET(req("GET", `/api/shop/bookings/${id}/slots${query}`), ctx({ id }));
const startsOf = (a: { days: { slots: { start: string }[] }[] }) => a.days.flatMap((d) => d.slots).map((s) => s.start);

/** A re-check booked on its link at the first free start, with the quote's number. */
async function bookedRecheck() {
  const m = await mailedRecheck();
  const start = await firstStart(m.token);
  const { booking } = await (await postBooking(m.token, start)).json();
  const number = (await db("quotes").where({ id: m.quoteId }).first()).number as number;
  return { ...m, start, booking, number };
}

describe("the counter moves and cancels a re-check as it does an install", () => {
  it("lists the re-check's own free starts and moves it: checked again, the same calendar entry raised, customer and shop told", async () => {
    const a = await bookedRecheck();
    const b = await bookedRecheck();
    asStaff();
    const listed = await moveSlots(a.booking.id);
    expect(listed.status).toBe(200);
    const slots = await listed.json();
    expect(slots).toMatchObject({
      kind: "recheck",
      minutes: 30,
      segments: [{ bayKind: "lift_bay", minutes: 30 }],
      booking: { id: a.booking.id },
    });
    // Its own time counts as free for the move; the other re-check's does not (one lift in shop A).
    expect(startsOf(slots)).toContain(a.start);
    expect(startsOf(slots)).not.toContain(b.start);

    const before = await written();
    const taken = await moveRoute(a.booking.id, { start: b.start });
    expect(taken.status).toBe(409);
    expect((await taken.json()).fieldErrors.start).toEqual([
      "Re-check time: that time is already taken in the shop's bays. Pick another time.",
    ]);
    const bad = await moveRoute(a.booking.id, { start: "tomorrow" });
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors.start).toEqual(["Re-check time: pick one of the offered times."]);
    expect(await written()).toEqual(before);

    const to = startsOf(slots).find((s) => s > b.start)!;
    const moved = await moveRoute(a.booking.id, { start: to });
    expect(moved.status).toBe(200);
    const { booking } = await moved.json();
    expect(booking).toMatchObject({ id: a.booking.id, kind: "recheck", status: "booked", startsAt: to, sequence: 1 });
    expect(new Date(booking.endsAt).getTime() - new Date(to).getTime()).toBe(30 * 60_000);
    const mail = (await mails(a.email)).find((m) => m.subject.startsWith("Moved: your lug and ring re-check at Shop A is now"))!;
    expect(icsOf(mail)).toContain(`UID:booking-${a.booking.id}@`);
    expect(icsOf(mail)).toContain("SEQUENCE:1");
    const notices = (await mails(U.ownerA.email)).filter((m) => m.subject.startsWith(`Moved: re-check for quote Q-${a.number}, now `));
    expect(notices).toHaveLength(1);
    expect(notices[0]!.text).toContain("was moved by Sam Staff from ");
  });

  it("cancels it: the bay time freed, METHOD:CANCEL to the customer, the shop told, the link open to book again; twice is a 409", async () => {
    const a = await bookedRecheck();
    asStaff();
    const r = await cancelRoute(a.booking.id);
    expect(r.status).toBe(200);
    expect((await r.json()).booking).toMatchObject({ id: a.booking.id, kind: "recheck", status: "cancelled", sequence: 1 });
    expect(Number((await db("bay_reservations").where({ booking_id: a.booking.id }).count({ n: "*" }))[0]!.n)).toBe(0);
    const mail = (await mails(a.email)).find((m) => m.subject.startsWith("Cancelled: your lug and ring re-check at Shop A"))!;
    expect(icsOf(mail)).toContain("METHOD:CANCEL");
    expect(icsOf(mail)).toContain("STATUS:CANCELLED");
    expect((await mails(U.ownerA.email)).filter((m) => m.subject.startsWith(`Cancelled: re-check for quote Q-${a.number}, `))).toHaveLength(
      1,
    );
    expect((await (await getSlots(a.token)).json()).booking).toBeNull();

    const before = await written();
    const again = await cancelRoute(a.booking.id);
    expect(again.status).toBe(409);
    expect((await again.json()).error).toBe("This booking is cancelled: there is nothing to move or cancel.");
    expect((await moveRoute(a.booking.id, { start: a.start })).status).toBe(409);
    expect(await written()).toEqual(before);
  });

  it("moves an install through the same booking route (the calendar's drag), in the install's words", async () => {
    asStaff();
    const { quoteId, email } = await bookedInstallOfShopA(db, "Drag Customer");
    const install = await db("bookings").where({ quote_id: quoteId, kind: "install", status: "booked" }).first();
    const slots = await (await moveSlots(install.id)).json();
    expect(slots.kind).toBe("install");
    const to = startsOf(slots).find((s) => s !== new Date(install.starts_at).toISOString())!;
    const r = await moveRoute(install.id, { start: to });
    expect(r.status).toBe(200);
    expect((await r.json()).booking).toMatchObject({ kind: "install", startsAt: to, sequence: 1 });
    expect((await mails(email)).some((m) => m.subject.startsWith("Moved: your install at Shop A is now"))).toBe(true);
  });

  it("another shop's staff find no such booking, and change nothing", async () => {
    const a = await bookedRecheck();
    session.current = sessionOf(U.staffB);
    const before = await written();
    expect((await moveSlots(a.booking.id)).status).toBe(404);
    expect((await moveRoute(a.booking.id, { start: a.start })).status).toBe(404);
    expect((await cancelRoute(a.booking.id)).status).toBe(404);
    expect(await written()).toEqual(before);
  });
});

describe("the booking queries throw domain errors; only route() makes HTTP of them", () => {
  it("a taken start is a ConflictError beside the time field, a start past the horizon an InvalidError, a foreign bay an InvalidError", async () => {
    const a = await bookedRecheck();
    const b = await mailedRecheck();
    const taken = await bookRecheck(db, b.token, { start: a.start }).catch((e: unknown) => e);
    expect(taken).toBeInstanceOf(ConflictError);
    expect((taken as InstanceType<typeof ConflictError>).fieldErrors).toEqual({
      start: ["Re-check time: that time is already taken in the shop's bays. Pick another time."],
    });
    const far = await bookRecheck(db, b.token, { start: new Date(Date.now() + 20 * 24 * HOUR).toISOString() }).catch((e: unknown) => e);
    expect(far).toBeInstanceOf(InvalidError);
    expect((far as InstanceType<typeof InvalidError>).fieldErrors?.start?.[0]).toMatch(/^Re-check time: bookings open 14 days ahead/);

    const setup = await getSetup(db, SHOP_A);
    const foreign = await saveSetup(
      db,
      SHOP_A,
      baysSetupSchema.parse({
        ...setup,
        bays: [...setup.bays, { id: "0b000000-0000-4000-8000-00000000ffff", name: "Ghost", kind: "lift_bay" }],
        serviceTimes: setup.serviceTimes.map((s) => ({ ...s, minutes: String(s.minutes) })),
      }),
    ).catch((e: unknown) => e);
    expect(foreign).toBeInstanceOf(InvalidError);
    expect((foreign as InstanceType<typeof InvalidError>).fieldErrors).toEqual({
      "bays.2.id": ["Bay 3: this bay is not one of your shop's bays (any more). Reload the page."],
    });
    const twice = await bookInstall(
      db,
      { by: "staff", scope: { shopId: SHOP_A }, quoteId: b.quoteId },
      { start: a.start },
      { userId: null, label: "t" },
    ).catch((e: unknown) => e);
    expect(twice).toBeInstanceOf(ConflictError);
  });
});

describe("the shop's re-check length", () => {
  const setLength = (minutes: unknown) => recheckSlotRoute.PUT(req("PUT", "/api/shop/rechecks/slot", { minutes }), ctx());

  it("refuses a length that is no whole number of minutes from 10 to 120, naming the field as the form labels it; staff cannot set it", async () => {
    session.current = sessionOf(U.ownerA);
    const cases: [unknown, string][] = [
      ["abc", "Re-check slot (minutes): enter a whole number of minutes, e.g. 30."],
      ["30.5", "Re-check slot (minutes): enter a whole number of minutes, e.g. 30."],
      ["9", "Re-check slot (minutes): use 10 to 120 minutes."],
      [121, "Re-check slot (minutes): use 10 to 120 minutes."],
    ];
    for (const [minutes, message] of cases) {
      const r = await setLength(minutes);
      expect(r.status, String(minutes)).toBe(422);
      expect((await r.json()).fieldErrors.minutes).toEqual([message]);
    }
    asStaff();
    expect((await setLength(45)).status).toBe(403);
    expect((await db("shops").where({ id: SHOP_A }).first("recheck_slot_minutes")).recheck_slot_minutes).toBe(30);
  });

  it("the owner's length is what the e-mail and the link offer, book and show", async () => {
    session.current = sessionOf(U.ownerA);
    const set = await setLength("45");
    expect(set.status).toBe(200);
    expect(await set.json()).toEqual({ minutes: 45 });
    try {
      const { token, mail } = await mailedRecheck();
      expect(mail.text).toMatch(/Book a 45-minute slot in the next 14 days here/);
      expect(await recheckPageByLink(db, token)).toMatchObject({ state: "open", slotMinutes: 45 });
      const a = await (await getSlots(token, "?days=7")).json();
      expect(a).toMatchObject({ kind: "recheck", minutes: 45, segments: [{ bayKind: "lift_bay", minutes: 45 }] });
      const first = a.days.flatMap((d: { slots: { start: string; end: string }[] }) => d.slots)[0];
      expect(new Date(first.end).getTime() - new Date(first.start).getTime()).toBe(45 * 60_000);
      const { booking } = await (await postBooking(token, first.start)).json();
      expect(new Date(booking.endsAt).getTime() - new Date(booking.startsAt).getTime()).toBe(45 * 60_000);
    } finally {
      await db("shops").where({ id: SHOP_A }).update({ recheck_slot_minutes: 30 });
    }
  });
});
