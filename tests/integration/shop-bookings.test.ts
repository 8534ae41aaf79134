import { createHash, randomBytes } from "node:crypto";
import ical from "node-ical";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { drainQueue, startTestBoss, stopBoss } from "./support/jobs";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, SHOP_B, U, VEHICLE, item, quoteRequest, seedShops } from "./support/shopFixture";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);

const bays = await import("@/app/api/shop/bays/route");
const publicSlots = (await import("@/app/api/q/[token]/slots/route")).GET;
const publicBook = (await import("@/app/api/q/[token]/booking/route")).POST;
const counter = await import("@/app/api/shop/quotes/[id]/booking/route");
const counterSlots = (await import("@/app/api/shop/quotes/[id]/booking/slots/route")).GET;
const calendarRoute = (await import("@/app/api/shop/bookings/route")).GET;
const quotes = await import("@/app/api/shop/quotes/route");
const customers = await import("@/app/api/shop/customers/route");
const { bookInstall, queueDueReminders } = await import("@/lib/shop/bookings/queries");
const { errorResponse } = await import("@/lib/platform/http/route");
const { addDays, wallTime, weekdayOf, zonedInstant } = await import("@/lib/shop/bookings/zoned");
const { db: appDb } = await import("@/lib/platform/db");
const { QUEUES, getBoss } = await import("@/lib/platform/jobs/boss");

const TZ = "America/Denver";
const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

/** The first date with this ISO weekday at least `ahead` days after today in Denver. */
function nextWeekday(weekday: number, ahead = 7): string {
  let d = addDays(wallTime(new Date(), TZ).date, ahead);
  while (weekdayOf(d) !== weekday) d = addDays(d, 1);
  return d;
}
const MONDAY = nextWeekday(1);
const TUESDAY = addDays(MONDAY, 1);
const WEDNESDAY = addDays(MONDAY, 2);
const SUNDAY = addDays(MONDAY, 6);
const at = (date: string, h: number, m = 0) => zonedInstant(date, h * 60 + m, TZ).toISOString();

const week = [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, open: weekday <= 5, opens: "08:00", closes: "17:00" }));
let bayB = "";

/** A quote of shop A with its deposit paid (the payment itself is tested in shop-payments.test.ts), and its public token. */
async function paidQuote(status: "deposit_paid" | "accepted" = "deposit_paid", email = `c${randomBytes(4).toString("hex")}@example.test`) {
  as(U.staffA);
  const c = await customers.POST(
    req("POST", "/api/shop/customers", { name: "Booker", phone: `555 ${Math.floor(1000000 + Math.random() * 8999999)}`, email }),
    ctx(),
  );
  const customerId = (await c.json()).customer.id;
  const r = await quotes.POST(req("POST", "/api/shop/quotes", await quoteRequest(db, { customerId, vehicle: VEHICLE })), ctx());
  const id = (await r.json()).id as string;
  const token = randomBytes(32).toString("base64url");
  await db("quotes")
    .where({ id })
    .update({ status, public_token_hash: sha256(token), valid_until: db.raw("now() + interval '30 days'") });
  return { id, token, email };
}

/** Mail jobs to the customers: the owner's notices of the same changes are shop-notices.test.ts's. */
const customerMailJobs = () =>
  db.withSchema("pgboss").from("job").where({ name: "mail.send" }).whereRaw("data->>'to' <> ?", [U.ownerA.email]);

const counts = async () => ({
  bookings: Number((await db("bookings").count({ n: "*" }))[0]!.n),
  reservations: Number((await db("bay_reservations").count({ n: "*" }))[0]!.n),
  mails: Number((await customerMailJobs().count({ n: "*" }))[0]!.n),
});

/** Mail jobs queued so far, oldest first, with the calendar file parsed. */
async function queuedMails() {
  const rows = await customerMailJobs().orderBy("created_on").select("data");
  return rows.map(
    (r: {
      data: { to: string; subject: string; text: string; attachments?: { filename: string; contentType: string; contentBase64: string }[] };
    }) => {
      const ics = r.data.attachments?.find((a) => a.filename.endsWith(".ics"));
      const text = ics ? Buffer.from(ics.contentBase64, "base64").toString("utf8") : "";
      const parsed = text ? ical.sync.parseICS(text) : {};
      const event = Object.values(parsed).find((c) => c?.type === "VEVENT") as ical.VEvent | undefined;
      return { ...r.data, ics: text, event, method: (parsed.vcalendar as unknown as { method?: string } | undefined)?.method };
    },
  );
}

const book = (token: string, start: string) => publicBook(req("POST", `/api/q/${token}/booking`, { start }), ctx({ token }));
const staffBook = (id: string, body: object, method: "POST" | "PUT" = "POST") =>
  counter[method](req(method, `/api/shop/quotes/${id}/booking`, body), ctx({ id }));

beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  await startTestBoss();
  as(U.ownerB);
  const b = await bays.PUT(
    req("PUT", "/api/shop/bays", {
      timeZone: TZ,
      slotStepMinutes: 30,
      weekdays: week,
      closedDays: [],
      bays: [{ name: "B lift", kind: "lift_bay" }],
      serviceTimes: [],
    }),
    ctx(),
  );
  expect(b.status).toBe(200);
  bayB = (await b.json()).setup.bays[0].id;
});
afterAll(async () => {
  await stopBoss();
  await closeDatabases(db);
});

describe("bays and hours (owner)", () => {
  it("staff read the setup but cannot save it; the owner saves hours, a closed day, bays and service times", async () => {
    as(U.staffA);
    const read = await bays.GET(req("GET", "/api/shop/bays"), ctx());
    const setup = (await read.json()).setup;
    // Before any save: the default zone, every weekday closed, and each catalog service with its default time.
    expect(setup.timeZone).toBe("America/Denver");
    expect(setup.weekdays.every((h: { open: boolean }) => !h.open)).toBe(true);
    const mb = setup.serviceTimes.find((s: { sku: string }) => s.sku === "SV-MB");
    expect(mb).toMatchObject({ minutes: 20, bayKind: "lift_bay", unit: "per_wheel", isDefault: true });
    expect(setup.serviceTimes.find((s: { sku: string }) => s.sku === "SV-FT")).toMatchObject({ minutes: 60, unit: "per_hour" });
    expect((await bays.PUT(req("PUT", "/api/shop/bays", setup), ctx())).status).toBe(403);

    as(U.ownerA);
    const body = {
      timeZone: TZ,
      slotStepMinutes: "30",
      weekdays: week,
      closedDays: [{ day: WEDNESDAY, note: "Stock count" }],
      bays: [
        { name: "Lift 1", kind: "lift_bay" },
        { name: "Rack", kind: "alignment_rack" },
      ],
      serviceTimes: setup.serviceTimes.map((s: { catalogItemId: string; minutes: number; bayKind: string }) => ({
        catalogItemId: s.catalogItemId,
        minutes: String(s.minutes),
        bayKind: s.bayKind,
      })),
    };
    const saved = await bays.PUT(req("PUT", "/api/shop/bays", body), ctx());
    expect(saved.status).toBe(200);
    const after = (await saved.json()).setup;
    expect(after.bays.map((b: { name: string }) => b.name)).toEqual(["Lift 1", "Rack"]);
    expect(after.weekdays[0]).toEqual({ weekday: 1, open: true, opens: "08:00", closes: "17:00" });
    expect(after.closedDays).toEqual([{ day: WEDNESDAY, note: "Stock count" }]);
    expect(after.serviceTimes.every((s: { isDefault: boolean }) => !s.isDefault)).toBe(true);
  });

  it("refuses bad hours, a made-up zone, another shop's bay or service, naming the field; nothing changes", async () => {
    as(U.ownerA);
    const before = await db("bays").where({ shop_id: SHOP_A }).orderBy("name");
    const base = (await (await bays.GET(req("GET", "/api/shop/bays"), ctx())).json()).setup;
    const tries: [object, string, RegExp][] = [
      [
        { ...base, weekdays: week.map((h) => (h.weekday === 1 ? { ...h, closes: "07:00" } : h)) },
        "weekdays.0.closes",
        /^Weekday 1: Monday closes before it opens/,
      ],
      [{ ...base, timeZone: "Mountain Time" }, "timeZone", /IANA name/],
      [
        { ...base, bays: [...base.bays, { id: bayB, name: "Borrowed", kind: "lift_bay" }] },
        "bays.2.id",
        /^Bay 3: this bay is not one of your shop's bays/,
      ],
      [
        { ...base, serviceTimes: [{ catalogItemId: (await item(db, SHOP_B, "TR-EXAMPLE-35")).id, minutes: "10", bayKind: "lift_bay" }] },
        "serviceTimes.0.catalogItemId",
        /^Service time 1: this is not a service in your catalog/,
      ],
      [
        {
          ...base,
          bays: [
            { name: "Lift", kind: "lift_bay" },
            { name: "lift", kind: "lift_bay" },
          ],
        },
        "bays.1.name",
        /^Bay 2: Two bays are called/,
      ],
      [
        { ...base, closedDays: [{ day: "2027-02-30", note: "" }] },
        "closedDays.0.day",
        /^Closed day 1: Enter the closed date as a calendar date/,
      ],
    ];
    for (const [body, field, message] of tries) {
      const r = await bays.PUT(req("PUT", "/api/shop/bays", body), ctx());
      expect(r.status, field).toBe(422);
      const out = await r.json();
      expect(out.fieldErrors?.[field]?.[0], field).toMatch(message);
    }
    expect(await db("bays").where({ shop_id: SHOP_A }).orderBy("name")).toEqual(before);
    expect(await db("bays").where({ id: bayB }).first()).toMatchObject({ shop_id: SHOP_B, name: "B lift" });
  });
});

describe("booking an install", () => {
  let first: Awaited<ReturnType<typeof paidQuote>>;
  let minutes = 0;

  it("before the deposit is paid, neither the customer nor the counter can list or book a slot", async () => {
    const q = await paidQuote("accepted");
    const before = await counts();
    as(null);
    const slots = await publicSlots(req("GET", `/api/q/${q.token}/slots`), ctx({ token: q.token }));
    expect(slots.status).toBe(409);
    const r = await book(q.token, at(MONDAY, 8));
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("Pay the deposit before booking an install time.");
    as(U.staffA);
    const s = await staffBook(q.id, { start: at(MONDAY, 8) });
    expect(s.status).toBe(409);
    expect((await s.json()).error).toMatch(/deposit is not paid yet/);
    expect(await counts()).toEqual(before);
  });

  it("the customer lists free starts on the shop's clock and books one; the confirmation mail's calendar file reads back", async () => {
    first = await paidQuote();
    as(null);
    const r = await publicSlots(req("GET", `/api/q/${first.token}/slots?from=${MONDAY}&days=3`), ctx({ token: first.token }));
    expect(r.status).toBe(200);
    const slots = await r.json();
    minutes = slots.minutes;
    // Default times (lib/shop/bookings/vocabulary.ts): mount and balance 4 × 20, beadlock rings 4 × 30, valve stems 4 × 5,
    // the suggested hour of trimming 1 × 60 = 280 min on the lift, then the alignment 60 min on the rack; disposal takes none.
    expect(slots.segments).toEqual([
      { bayKind: "lift_bay", minutes: 280 },
      { bayKind: "alignment_rack", minutes: 60 },
    ]);
    expect(minutes).toBe(340);
    // 08:00 to 17:00 is 540 min: the last start is 11:00 (11:20 is off the 30-minute step).
    expect(slots.days[0].slots.at(-1).label).toBe("11:00 AM");
    expect(slots.days.map((d: { date: string }) => d.date)).toEqual([MONDAY, TUESDAY, WEDNESDAY]);
    expect(slots.days[2].closed).toBe("Stock count");
    expect(slots.days[0].slots[0]).toMatchObject({ start: at(MONDAY, 8), label: "8:00 AM" });

    const before = await counts();
    const booked = await book(first.token, at(MONDAY, 8));
    expect(booked.status).toBe(201);
    const { booking } = await booked.json();
    expect(booking).toMatchObject({ status: "booked", startsAt: at(MONDAY, 8), bookedBy: "customer", sequence: 0 });
    expect(new Date(booking.endsAt).getTime() - new Date(booking.startsAt).getTime()).toBe(minutes * 60_000);
    expect(booking.bays.map((b: { bayName: string }) => b.bayName)).toEqual(
      slots.segments.map((s: { bayKind: string }) => (s.bayKind === "lift_bay" ? "Lift 1" : "Rack")),
    );
    expect(await counts()).toEqual({
      bookings: before.bookings + 1,
      reservations: before.reservations + slots.segments.length,
      mails: before.mails + 1,
    });

    const mail = (await queuedMails()).at(-1)!;
    expect(mail.to).toBe(first.email);
    expect(mail.subject).toMatch(/^Booked: your install at Shop A/);
    expect(mail.method).toBe("REQUEST");
    expect(mail.event!.start.toISOString()).toBe(at(MONDAY, 8));
    expect(mail.event!.end!.toISOString()).toBe(booking.endsAt);
    expect(mail.event!.location).toBe("Shop A, 1 Test Lane");
    expect(mail.event!.uid).toBe(`booking-${booking.id}@127.0.0.1`);
    expect(Number(mail.event!.sequence)).toBe(0);
  });

  it("refuses each bad start with a message naming the install time; nothing is written and no mail queued", async () => {
    const q = await paidQuote();
    as(null);
    const before = await counts();
    const cases: [string, number, RegExp][] = [
      [at(addDays(wallTime(new Date(), TZ).date, -1), 9), 422, /^Install time: that time has already passed/],
      [at(TUESDAY, 6), 422, /^Install time: on Tuesdays the shop works 8:00 AM to 5:00 PM/],
      [at(TUESDAY, 15), 422, /ends by closing time/],
      [at(WEDNESDAY, 9), 422, /^Install time: the shop is closed on .* \(Stock count\)\.$/],
      [at(SUNDAY, 9), 422, /^Install time: the shop is closed on Sundays\.$/],
      [at(TUESDAY, 8, 10), 422, /every 30 minutes from opening/],
      [at(MONDAY, 9), 409, /^Install time: that time is already taken/],
      ["next tuesday", 422, /^Install time: pick one of the offered times\.$/],
    ];
    for (const [start, status, message] of cases) {
      const r = await book(q.token, start);
      expect(r.status, start).toBe(status);
      const out = await r.json();
      expect(out.error ?? "", start).toMatch(status === 409 ? message : /./);
      expect(out.fieldErrors?.start?.[0], start).toMatch(message);
    }
    expect(await counts()).toEqual(before);
  });

  it("another shop's bay or quote: the counter of shop A cannot pin shop B's bay, and shop B's staff cannot see shop A's quote", async () => {
    const q = await paidQuote();
    const before = await counts();
    as(U.staffA);
    const r = await staffBook(q.id, { start: at(TUESDAY, 8), bayId: bayB });
    expect(r.status).toBe(422);
    expect((await r.json()).fieldErrors.bayId).toEqual(["Bay: that is not one of your shop's bays."]);
    as(U.staffB);
    expect((await staffBook(q.id, { start: at(TUESDAY, 8) })).status).toBe(404);
    expect((await counterSlots(req("GET", `/api/shop/quotes/${q.id}/booking/slots`), ctx({ id: q.id }))).status).toBe(404);
    expect((await counter.DELETE(req("DELETE", `/api/shop/quotes/${first.id}/booking`), ctx({ id: first.id }))).status).toBe(404);
    expect(await counts()).toEqual(before);
    // Underneath, the database refuses a reservation that names a bay of another shop.
    const booking = await db("bookings").where({ quote_id: first.id, status: "booked" }).first();
    await expect(
      db("bay_reservations").insert({
        booking_id: booking.id,
        shop_id: SHOP_A,
        bay_id: bayB,
        during: db.raw("tstzrange(?, ?)", [at(TUESDAY, 8), at(TUESDAY, 9)]),
      }),
    ).rejects.toMatchObject({
      constraint: "bay_reservations_bay_of_shop",
    });
  });

  it("the counter moves the booking (same UID, SEQUENCE 1, reminder due again) and cancels it (METHOD:CANCEL, SEQUENCE 2), freeing the bay", async () => {
    as(U.staffA);
    const slots = await (
      await counterSlots(req("GET", `/api/shop/quotes/${first.id}/booking/slots?from=${MONDAY}&days=1`), ctx({ id: first.id }))
    ).json();
    // Its own bay time counts as free while it is being moved: 08:00 is offered again.
    expect(slots.booking.startsAt).toBe(at(MONDAY, 8));
    expect(slots.days[0].slots[0].start).toBe(at(MONDAY, 8));
    const moved = await staffBook(first.id, { start: at(TUESDAY, 9) }, "PUT");
    expect(moved.status).toBe(200);
    const m = (await moved.json()).booking;
    expect(m).toMatchObject({ startsAt: at(TUESDAY, 9), sequence: 1 });
    const moveMail = (await queuedMails()).at(-1)!;
    expect(moveMail.subject).toMatch(/^Moved: /);
    expect(moveMail.event!.uid).toBe(`booking-${m.id}@127.0.0.1`);
    expect(Number(moveMail.event!.sequence)).toBe(1);
    expect(moveMail.event!.start.toISOString()).toBe(at(TUESDAY, 9));

    const cancelled = await counter.DELETE(req("DELETE", `/api/shop/quotes/${first.id}/booking`), ctx({ id: first.id }));
    expect(cancelled.status).toBe(200);
    expect((await cancelled.json()).booking).toMatchObject({ status: "cancelled", sequence: 2 });
    const cancelMail = (await queuedMails()).at(-1)!;
    expect(cancelMail.method).toBe("CANCEL");
    expect(cancelMail.event!.status).toBe("CANCELLED");
    expect(Number(cancelMail.event!.sequence)).toBe(2);
    expect(cancelMail.event!.uid).toBe(moveMail.event!.uid);
    expect(await db("bay_reservations").where({ booking_id: m.id })).toEqual([]);
    // Cancelled: nothing to cancel or move any more.
    expect((await counter.DELETE(req("DELETE", `/api/shop/quotes/${first.id}/booking`), ctx({ id: first.id }))).status).toBe(409);
  });

  it("the owner cannot remove or re-kind a bay that has bookings ahead", async () => {
    const q = await paidQuote();
    as(U.staffA);
    expect((await staffBook(q.id, { start: at(TUESDAY, 11) })).status).toBe(201);
    as(U.ownerA);
    const setup = (await (await bays.GET(req("GET", "/api/shop/bays"), ctx())).json()).setup;
    const removeLift = await bays.PUT(
      req("PUT", "/api/shop/bays", { ...setup, bays: setup.bays.filter((b: { name: string }) => b.name !== "Lift 1") }),
      ctx(),
    );
    expect(removeLift.status).toBe(409);
    // One booking in the singular ("booking(s)" before; the count's noun now agrees with it).
    expect((await removeLift.json()).error).toBe("Lift 1 has 1 booking from now on: move or cancel it before removing the bay.");
    const rekind = await bays.PUT(
      req("PUT", "/api/shop/bays", {
        ...setup,
        bays: setup.bays.map((b: { name: string }) => (b.name === "Lift 1" ? { ...b, kind: "fabrication_bay" } : b)),
      }),
      ctx(),
    );
    expect(rekind.status).toBe(422);
    expect((await rekind.json()).fieldErrors["bays.0.kind"][0]).toBe(
      "Bay 1: Lift 1 has 1 booking from now on: move or cancel it before changing its kind.",
    );
    expect(await db("bays").where({ shop_id: SHOP_A, name: "Lift 1" }).first()).toMatchObject({ kind: "lift_bay", archived_at: null });
  });

  it("the staff calendar lists the week's bookings per bay with quote and customer", async () => {
    as(U.staffA);
    const r = await calendarRoute(req("GET", `/api/shop/bookings?from=${MONDAY}&days=7`), ctx());
    expect(r.status).toBe(200);
    const cal = await r.json();
    expect(cal.days).toHaveLength(7);
    expect(cal.hours[WEDNESDAY]).toBeNull();
    expect(cal.hours[MONDAY]).toEqual({ opens: 480, closes: 1020 });
    expect(cal.bookings.map((b: { startsAt: string }) => b.startsAt)).toContain(at(TUESDAY, 11));
    expect(cal.bookings[0]).toMatchObject({ customerName: "Booker", quoteNumber: expect.any(Number) });
    expect((await calendarRoute(req("GET", `/api/shop/bookings?days=3`), ctx())).status).toBe(400);
  });
});

describe("the last slot, taken twice at once", () => {
  it("PostgreSQL's exclusion constraint lets exactly one of two transactions hold the same bay time", async () => {
    const [lift] = await db("bays").where({ shop_id: SHOP_A, name: "Lift 1" });
    const q = await paidQuote();
    const mk = (trx: typeof db) =>
      trx("bookings")
        .insert({
          shop_id: SHOP_A,
          quote_id: q.id,
          status: "cancelled",
          starts_at: at(MONDAY, 15),
          ends_at: at(MONDAY, 16),
          booked_by: "test",
        })
        .returning("id");
    const t1 = await db.transaction();
    const t2 = await db.transaction();
    try {
      const [b1] = await mk(t1);
      const [b2] = await mk(t2);
      const during = db.raw("tstzrange(?, ?)", [at(MONDAY, 15), at(MONDAY, 16)]);
      await t1("bay_reservations").insert({ booking_id: b1.id, shop_id: SHOP_A, bay_id: lift.id, during });
      // The second waits on the first's uncommitted row, then fails once the first commits.
      const second = t2("bay_reservations").insert({
        booking_id: b2.id,
        shop_id: SHOP_A,
        bay_id: lift.id,
        during: db.raw("tstzrange(?, ?)", [at(MONDAY, 15, 30), at(MONDAY, 16, 30)]),
      });
      const outcome = second.then(
        () => "inserted",
        (e: { code?: string; constraint?: string }) => `${e.code} ${e.constraint}`,
      );
      await new Promise((r) => setTimeout(r, 200));
      await t1.commit();
      expect(await outcome).toBe("23P01 bay_reservations_no_overlap");
    } finally {
      await t2.rollback().catch(() => undefined);
      if (!t1.isCompleted()) await t1.rollback();
    }
    await db("bookings").where({ quote_id: q.id }).delete();
  });

  it("two customers book the same last start at the same moment: one gets it, the other a 409, and one booking holds the bay", async () => {
    // Thursday: Lift 1 is the only lift and the rack the only rack; 11:00 is the last start that ends by 17:00.
    const THURSDAY = addDays(MONDAY, 3);
    const a = await paidQuote();
    const b = await paidQuote();
    const before = await counts();
    as(null);
    const start = at(THURSDAY, 11);
    const answers = await Promise.all([book(a.token, start), book(b.token, start)]);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409]);
    const loser = answers.find((r) => r.status === 409)!;
    expect((await loser.json()).fieldErrors.start[0]).toMatch(/^Install time: that time (is already taken|was taken a moment ago)/);
    const after = await counts();
    expect(after.bookings).toBe(before.bookings + 1);
    expect(after.mails).toBe(before.mails + 1);
  });

  it("a booking whose bay time is committed by another transaction while it is in flight becomes a 409 through the constraint, writing nothing", async () => {
    const FRIDAY = addDays(MONDAY, 4);
    const [lift] = await db("bays").where({ shop_id: SHOP_A, name: "Lift 1" });
    const blocker = await paidQuote();
    const q = await paidQuote();
    const before = await counts();
    const t0 = await db.transaction();
    const [b0] = await t0("bookings")
      .insert({
        shop_id: SHOP_A,
        quote_id: blocker.id,
        status: "booked",
        starts_at: at(FRIDAY, 8),
        ends_at: at(FRIDAY, 9),
        booked_by: "test",
      })
      .returning("id");
    await t0("bay_reservations").insert({
      booking_id: b0.id,
      shop_id: SHOP_A,
      bay_id: lift.id,
      during: db.raw("tstzrange(?, ?)", [at(FRIDAY, 8), at(FRIDAY, 9)]),
    });
    // The booking reads the bays as free (t0 has not committed), inserts, and waits on t0's row.
    const pending = bookInstall(
      appDb,
      { by: "customer", token: q.token },
      { start: at(FRIDAY, 8) },
      { userId: null, label: "customer" },
    ).then(
      () => 201,
      // The query throws a domain error; route() is what answers it over HTTP.
      async (e: unknown) => {
        const res = errorResponse(e);
        const body = (await res.json()) as { fieldErrors?: Record<string, string[]> };
        return { status: res.status, start: body.fieldErrors?.start?.[0] };
      },
    );
    await new Promise((r) => setTimeout(r, 300));
    await t0.commit();
    expect(await pending).toEqual({ status: 409, start: expect.stringMatching(/^Install time: that time is already taken/) });
    const after = await counts();
    expect(after).toEqual({ bookings: before.bookings + 1, reservations: before.reservations + 1, mails: before.mails });
  });
});

describe("the day-before reminder", () => {
  it("queues one mail per booking once the shop's clock reads 9:00 the day before, and never twice", async () => {
    const q = await paidQuote();
    as(null);
    // Monday morning is free again: the first booking moved to Tuesday and was cancelled.
    const r = await book(q.token, at(MONDAY, 8));
    expect(r.status).toBe(201);
    const SATURDAY_BEFORE = addDays(MONDAY, -2);
    const SUNDAY_BEFORE = addDays(MONDAY, -1);
    expect(await queueDueReminders(appDb, new Date(at(SATURDAY_BEFORE, 10)))).toBe(0); // two days before
    expect(await queueDueReminders(appDb, new Date(at(SUNDAY_BEFORE, 8)))).toBe(0); // the day before, before 9:00
    const before = await counts();
    expect(await queueDueReminders(appDb, new Date(at(SUNDAY_BEFORE, 10)))).toBe(1);
    expect((await counts()).mails).toBe(before.mails + 1);
    const mine = (await queuedMails()).at(-1)!;
    expect(mine.to).toBe(q.email);
    expect(mine.subject).toBe("Reminder: your install at Shop A tomorrow, 8:00 AM");
    expect(mine.event!.start.toISOString()).toBe(at(MONDAY, 8));
    expect(await queueDueReminders(appDb, new Date(at(SUNDAY_BEFORE, 11)))).toBe(0);
    // The hourly job runs the same function through the workers' handler (nothing is due today: every booking here is a week ahead).
    await (await getBoss()).send(QUEUES.bookingReminders.name, {});
    expect(await drainQueue(QUEUES.bookingReminders.name)).toEqual({ completed: [expect.any(String)], failed: [] });
    expect((await counts()).mails).toBe(before.mails + 1);
  });
});
