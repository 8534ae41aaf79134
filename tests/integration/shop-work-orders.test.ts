import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { drainQueue } from "./support/jobs";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U } from "./support/shopFixture";
import { bookedInstallOfShopA } from "./support/bookedInstall";
import { bodyFor } from "./support/workOrderSteps";
import { workOrderRoutes } from "./support/workOrderRoutes";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);

const { open, read, sign, move } = await workOrderRoutes();
const { requiredSteps } = await import("@/lib/shop/workOrders/api");
const { db: appDb } = await import("@/lib/platform/db");
const rechecks = await import("@/app/api/shop/rechecks/route");
const { queueDueRechecks } = await import("@/lib/shop/workOrders/queries");
const { QUEUES, getBoss } = await import("@/lib/platform/jobs/boss");

/** A quote of shop A with its deposit paid and, unless told, its install booked at the first free start. */
async function bookedQuote(book = true) {
  as(U.staffA);
  return (await bookedInstallOfShopA(db, "Bay Customer", { book })).quoteId;
}

const openFor = (quoteId: string) => open(req("POST", "/api/shop/work-orders", { quoteId }), ctx());
const signAs = (id: string, body: object) => sign(req("PUT", `/api/shop/work-orders/${id}/steps`, body), ctx({ id }));
const moveTo = (id: string, to: string) => move(req("POST", `/api/shop/work-orders/${id}/status`, { to }), ctx({ id }));
const stepRows = async () => Number((await db("work_order_steps").count({ n: "*" }))[0]!.n);

beforeAll(() => setUpBookableShops(db));
afterAll(() => tearDownBookableShops(db));

describe("opening the work order", () => {
  it("is made from a booked quote, once; an unbooked quote is refused and nothing is written", async () => {
    const unbooked = await bookedQuote(false);
    as(U.staffA);
    const r = await openFor(unbooked);
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("Book the install first: a work order is made from a booked quote.");
    expect(await db("work_orders").where({ quote_id: unbooked }).first()).toBeUndefined();

    const quoteId = await bookedQuote();
    const a = await openFor(quoteId);
    expect(a.status).toBe(201);
    const { id } = await a.json();
    expect((await (await openFor(quoteId)).json()).id).toBe(id);
    const w = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    // The quote's beadlock wheel, alignment and trimming lines put those steps on the sheet; 6x5.5 has 6 lugs.
    expect(w).toMatchObject({ status: "booked", beadlock: true, alignment: true, trimming: true, spare: false, lugCount: 6 });
    expect(w.bookedFor).toMatch(/AM|PM/);
    // The sheet's times read on the shop's clock (its schedule's zone; the schema's default here).
    expect(w.timeZone).toBe("America/Denver");
    expect(requiredSteps(w)).toHaveLength(4 * 7 + 2);
  });

  it("staff of another shop cannot open, read or move it (404, nothing written)", async () => {
    const quoteId = await bookedQuote();
    as(U.staffB);
    const r = await openFor(quoteId);
    expect(r.status).toBe(404);
    expect((await r.json()).error).toBe("That quote was not found.");
    expect(await db("work_orders").where({ quote_id: quoteId }).first()).toBeUndefined();
    as(U.staffA);
    const { id } = await (await openFor(quoteId)).json();
    as(U.ownerB);
    expect((await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).status).toBe(404);
    const m = await moveTo(id, "in_bay");
    expect(m.status).toBe(404);
    expect((await m.json()).error).toBe("That work order was not found.");
    expect((await db("work_orders").where({ id }).first()).status).toBe("booked");
  });
});

describe("signing off and the status", () => {
  let id = "";
  beforeAll(async () => {
    const quoteId = await bookedQuote();
    as(U.staffA);
    id = (await (await openFor(quoteId)).json()).id;
  });

  it("refuses a sign-off before the work order is in the bay; nothing is written", async () => {
    const before = await stepRows();
    const r = await signAs(id, bodyFor("LF", "match_mount"));
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("Mark the work order “In the bay” before signing steps off.");
    expect(await stepRows()).toBe(before);
  });

  it("moves booked → in the bay, recording who", async () => {
    const r = await moveTo(id, "in_bay");
    expect(r.status).toBe(200);
    expect((await r.json()).workOrder).toMatchObject({ status: "in_bay", startedBy: "Sam Staff" });
    expect((await moveTo(id, "in_bay")).status).toBe(409);
  });

  it("staff of another shop cannot sign a step (404 with a message, nothing written)", async () => {
    const before = await stepRows();
    for (const who of [U.staffB, U.ownerB]) {
      as(who);
      const r = await signAs(id, bodyFor("LF", "match_mount"));
      expect(r.status).toBe(404);
      expect((await r.json()).error).toBe("That work order was not found.");
    }
    as(null);
    expect((await signAs(id, bodyFor("LF", "match_mount"))).status).toBe(401);
    expect(await stepRows()).toBe(before);
  });

  it("refuses bad entries naming the field as the sheet labels it; nothing is written", async () => {
    as(U.staffA);
    const before = await stepRows();
    const cases: [object, string, RegExp][] = [
      [{ ...bodyFor("LF", "fitted"), dotCode: "2399" }, "dotCode", /^DOT date code: week 23 of 2099 has not started yet/],
      [{ ...bodyFor("LF", "fitted"), dotCode: "5421" }, "dotCode", /^DOT date code: week 54 does not exist: 2021 has weeks 01 to 52/],
      [{ ...bodyFor("LF", "fitted"), dotCode: "232" }, "dotCode", /^DOT date code: "232" is a three-digit code/],
      [{ ...bodyFor("LF", "beadlock"), torque: "16-18" }, "torque", /^Maker's torque \(ft·lb\): "16-18" is a range/],
      [
        { ...bodyFor("LF", "lug_torque"), torque: "190 ft-lb" },
        "torque",
        /^Maker's torque \(N·m\): "190 ft-lb" is in ft·lb but the chosen unit is N·m/,
      ],
      // Beyond the engine's 2000 N·m the lug nut band still answers, with its guess: 5000 N·m / 1.355818 = 3687.8 ft·lb.
      [
        { ...bodyFor("LF", "lug_torque"), torque: "5000" },
        "torque",
        /^Maker's torque \(N·m\): 5000 N·m \(3687\.8 ft·lb\) is outside what lug nuts are torqued to, .*Did you mean 500 N·m\?/,
      ],
      [
        { ...bodyFor("LF", "lug_torque"), passesDone: false },
        "passesDone",
        /^All passes done in the order shown: tick it once it is done\.$/,
      ],
      [{ ...bodyFor("LF", "pressure"), pressure: "3,5" }, "pressure", /^Cold pressure set \(psi\): "3,5" is ambiguous/],
      [
        { ...bodyFor("LF", "pressure"), pressure: "350", pressureUnit: "psi" },
        "pressure",
        /^Cold pressure set \(psi\): use 10 to 120, got 350\.$/,
      ],
      // Above the quoted 35x12.50R17LT load range E's 65 psi (flotation LT, the engine's table): refused, nothing signed.
      [
        { ...bodyFor("LF", "pressure"), pressure: "80", pressureUnit: "psi" },
        "pressure",
        /^Cold pressure set \(psi\): 80 psi \(552 kPa\) is above the highest pressure 35x12\.50R17LT 121Q LRE allows, 65 psi \(448 kPa\)/,
      ],
      [{ ...bodyFor("LF", "balance"), innerGrams: "" }, "innerGrams", /^Inner plane weight \(g\): enter a number\.$/],
    ];
    for (const [body, field, message] of cases) {
      const r = await signAs(id, body);
      expect(r.status, field).toBe(422);
      expect((await r.json()).fieldErrors?.[field]?.[0], field).toMatch(message);
    }
    // The spare is not on this sheet (four wheels quoted).
    const spare = await signAs(id, bodyFor("spare", "fitted"));
    expect(spare.status).toBe(422);
    expect((await spare.json()).fieldErrors.position[0]).toBe("Spare: tire and wheel as fitted is not on this work order.");
    expect(await stepRows()).toBe(before);
  });

  it("stores torque in N·m from either unit and pressure in kPa (NIST SP 811 B.8, B.9)", async () => {
    as(U.staffA);
    expect((await signAs(id, bodyFor("LF", "beadlock"))).status).toBe(200);
    expect((await signAs(id, bodyFor("LF", "lug_torque"))).status).toBe(200);
    const w = (await (await signAs(id, bodyFor("LF", "pressure"))).json()).workOrder;
    const data = (step: string) => w.steps.find((s: { position: string; step: string }) => s.position === "LF" && s.step === step).data;
    // 17 ft·lbf × 1.355818 N·m per ft·lbf = 23.049 N·m.
    expect(data("beadlock").torqueNm).toBeCloseTo(23.049, 3);
    expect(data("lug_torque").torqueNm).toBe(190);
    // 40 psi × 6.894757 kPa per psi = 275.79 kPa.
    expect(data("pressure").pressureKpa).toBeCloseTo(275.79, 2);
    expect(w.steps.find((s: { step: string }) => s.step === "beadlock")).toMatchObject({ signedBy: "Sam Staff" });
  });

  it("refuses torque outside the fastener's band and pressure below the road minimum (nothing written); the maker's-table tick signs", async () => {
    as(U.staffA);
    const before = await stepRows();
    const refused = async (body: object, field: string) => {
      const r = await signAs(id, body);
      expect(r.status, field).toBe(422);
      return (await r.json()).fieldErrors?.[field]?.[0] as string;
    };
    // 1400 ft·lb × 1.355818 = 1898.1 N·m (NIST SP 811 B.9): inside the engine's 2000 N·m, outside what lug nuts take.
    expect(await refused({ ...bodyFor("RF", "lug_torque"), torque: "1400", unit: "ftlb" }, "torque")).toMatch(
      /^Maker's torque \(ft·lb\): 1400 ft·lb \(1898\.1 N·m\) is outside what lug nuts are torqued to, .*Did you mean 140 ft·lb\?/,
    );
    // 3000 ft·lb × 1.355818 = 4067.5 N·m, beyond the engine's 2000 N·m: the band's message, not the engine's limit.
    expect(await refused({ ...bodyFor("RF", "lug_torque"), torque: "3000", unit: "ftlb" }, "torque")).toMatch(
      /^Maker's torque \(ft·lb\): 3000 ft·lb \(4067\.5 N·m\) is outside what lug nuts are torqued to, .*Did you mean 300 ft·lb\?/,
    );
    // 150 ft·lb = 203.4 N·m on a ring bolt (common practice, no source: 5–70 N·m).
    expect(await refused({ ...bodyFor("RF", "beadlock"), torque: "150" }, "torque")).toMatch(
      /^Maker's torque \(ft·lb\): 150 ft·lb \(203\.4 N·m\) is outside what beadlock ring bolts are torqued to, .*Did you mean 15 ft·lb\?/,
    );
    // 30 psi = 206.8 kPa (NIST SP 811 B.8) below the road minimum 0.5833 × 448.2 kPa = 261.4 kPa = 37.9 psi.
    expect(await refused({ ...bodyFor("RF", "pressure"), pressure: "30" }, "pressure")).toMatch(
      /^Cold pressure set \(psi\): 30 psi \(207 kPa\) is below the road minimum for 35x12\.50R17LT 121Q LRE, 37\.9 psi \(261 kPa\)/,
    );
    // The tick does not lift the maximum.
    expect(await refused({ ...bodyFor("RF", "pressure"), pressure: "80", makerTable: true }, "pressure")).toMatch(/is above the highest/);
    expect(await stepRows()).toBe(before);
    expect(
      await db("work_order_steps").where({ work_order_id: id, position: "RF" }).whereIn("step", ["lug_torque", "beadlock", "pressure"]),
    ).toEqual([]);

    // On the technician's word for the tire maker's load table it signs, and the record says so.
    const ok = await signAs(id, { ...bodyFor("RF", "pressure"), pressure: "30", makerTable: true });
    expect(ok.status).toBe(200);
    const row = await db("work_order_steps").where({ work_order_id: id, position: "RF", step: "pressure" }).first();
    expect(row.data).toMatchObject({ unit: "psi", makerTable: true });
    expect(row.data.pressureKpa).toBeCloseTo(206.84, 2);
    // A tick on a figure above the minimum does nothing, and the record does not claim it.
    expect((await signAs(id, { ...bodyFor("RF", "pressure"), makerTable: true })).status).toBe(200);
    const again = await db("work_order_steps").where({ work_order_id: id, position: "RF", step: "pressure" }).first();
    expect(again.data).toMatchObject({ unit: "psi", makerTable: false });
  });

  it("done is refused while steps are open, naming them; any of the shop's staff signs; done marks the quote installed", async () => {
    as(U.staffA);
    const early = await moveTo(id, "done");
    expect(early.status).toBe(409);
    expect((await early.json()).error).toMatch(
      /^Sign every step off before marking the work order done\. Still open: LF tire and wheel as fitted; LF match-mounting;/,
    );
    expect((await db("work_orders").where({ id }).first()).status).toBe("in_bay");

    const w = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    // A second technician, who did not write the quote, signs the rest.
    as(U.staffA2);
    for (const s of requiredSteps(w)) {
      const r = await signAs(id, bodyFor(s.position, s.step));
      expect(r.status, `${s.position} ${s.step}`).toBe(200);
    }
    const before = new Date();
    const done = await moveTo(id, "done");
    expect(done.status).toBe(200);
    const out = (await done.json()).workOrder;
    expect(out).toMatchObject({ status: "done", doneBy: "Second Staff" });
    expect(out.steps.filter((s: { signedBy: string }) => s.signedBy === "Second Staff")).toHaveLength(requiredSteps(w).length);
    // The shop's default: the re-check 7 days after the work is done.
    expect(new Date(out.recheckDueAt).getTime() - new Date(out.doneAt).getTime()).toBe(7 * 86_400_000);
    expect(new Date(out.doneAt).getTime()).toBeGreaterThanOrEqual(before.getTime() - 1000);
    const quote = await db("quotes").where({ id: w.quoteId }).first();
    expect(quote.status).toBe("installed");

    const after = await stepRows();
    const late = await signAs(id, bodyFor("LF", "balance"));
    expect(late.status).toBe(409);
    expect((await late.json()).error).toBe("This work order is done: Left front: balance weights can no longer be signed.");
    expect(await stepRows()).toBe(after);
    expect((await moveTo(id, "in_bay")).status).toBe(409);
  });
});

describe("the re-check reminder", () => {
  const DAY = 86_400_000;
  const recheckMails = async () =>
    (await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).select("data")).filter((r: { data: { subject: string } }) =>
      /re-check/.test(r.data.subject),
    ) as { data: { to: string; subject: string; text: string } }[];

  /** A work order of shop A taken from booked to done by staff A, every step signed. */
  async function doneWorkOrder() {
    const quoteId = await bookedQuote();
    as(U.staffA);
    const { id } = await (await openFor(quoteId)).json();
    await moveTo(id, "in_bay");
    const w = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    for (const s of requiredSteps(w)) expect((await signAs(id, bodyFor(s.position, s.step))).status).toBe(200);
    const done = (await (await moveTo(id, "done")).json()).workOrder;
    const email = (await db("quotes as q").join("customers as c", "c.id", "q.customer_id").where("q.id", quoteId).first("c.email")).email;
    return { id, quoteId, doneAt: new Date(done.doneAt), dueAt: new Date(done.recheckDueAt), email };
  }

  it("the owner sets the days (staff cannot; bad input names the field; nothing changes)", async () => {
    as(U.staffA);
    expect((await (await rechecks.GET(req("GET", "/api/shop/rechecks"), ctx())).json()).days).toBe(7);
    expect((await rechecks.PUT(req("PUT", "/api/shop/rechecks", { days: 10 }), ctx())).status).toBe(403);
    as(U.ownerA);
    const bad = await rechecks.PUT(req("PUT", "/api/shop/rechecks", { days: "0" }), ctx());
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors.days[0]).toBe("Re-check after (days): use 1 to 90.");
    expect((await db("shops").where({ id: SHOP_A }).first()).recheck_after_days).toBe(7);
    const r = await rechecks.PUT(req("PUT", "/api/shop/rechecks", { days: "10" }), ctx());
    expect(r.status).toBe(200);
    expect((await r.json()).days).toBe(10);
  });

  it("mails the customer once when the clock reaches the date, through the queue; the counter lists the job as due", async () => {
    const w = await doneWorkOrder();
    expect(w.dueAt.getTime() - w.doneAt.getTime()).toBe(10 * DAY);
    // A day early: not this one (the earlier job of this file, due after 7 days, goes out here).
    await queueDueRechecks(appDb, new Date(w.dueAt.getTime() - DAY));
    expect((await db("work_orders").where({ id: w.id }).first()).recheck_queued_at).toBeNull();
    expect((await recheckMails()).filter((m) => m.data.to === w.email)).toHaveLength(0);
    as(U.staffA);
    const early = (await (await rechecks.GET(req("GET", "/api/shop/rechecks"), ctx())).json()).due;
    expect(early.some((d: { workOrderId: string }) => d.workOrderId === w.id)).toBe(false);

    // The clock moved forward past the date; the hourly job runs through the workers' own handler.
    vi.useFakeTimers({ toFake: ["Date"] });
    try {
      vi.setSystemTime(new Date(w.dueAt.getTime() + 3_600_000));
      await (await getBoss()).send(QUEUES.recheckReminders.name, {});
      expect(await drainQueue(QUEUES.recheckReminders.name)).toEqual({ completed: [expect.any(String)], failed: [] });
      const mails = await recheckMails();
      const mine = mails.filter((m) => m.data.to === w.email);
      expect(mine).toHaveLength(1);
      expect(mine[0]!.data.subject).toBe("Time for your lug and ring re-check at Shop A");
      expect(mine[0]!.data.text).toMatch(/Or call Shop A on 555-0100\./);
      expect(mine[0]!.data.text).toMatch(/\/recheck\/[A-Za-z0-9_-]{43}\n/);
      expect(mine[0]!.data.text).toMatch(/first 50–100 miles/);

      // Again, and from a second run: never twice.
      await (await getBoss()).send(QUEUES.recheckReminders.name, {});
      await drainQueue(QUEUES.recheckReminders.name);
      expect(await queueDueRechecks(appDb)).toBe(0);
      expect((await recheckMails()).filter((m) => m.data.to === w.email)).toHaveLength(1);

      as(U.staffA);
      const due = (await (await rechecks.GET(req("GET", "/api/shop/rechecks"), ctx())).json()).due;
      const row = due.find((d: { workOrderId: string }) => d.workOrderId === w.id);
      expect(row).toMatchObject({ quoteId: w.quoteId, customerName: "Bay Customer", remindedAt: expect.any(String) });
      // The due day as the shop's clock reads it (America/Denver), not the server's UTC date.
      const shopDay = new Date(row.recheckDueAt).toLocaleDateString("en-US", {
        timeZone: "America/Denver",
        weekday: "long",
        year: "numeric",
        month: "long",
        day: "numeric",
      });
      expect(row.dueOn).toBe(shopDay);
      // Another shop's counter does not see it.
      as(U.staffB);
      const other = (await (await rechecks.GET(req("GET", "/api/shop/rechecks"), ctx())).json()).due;
      expect(other).toEqual([]);
    } finally {
      vi.useRealTimers();
    }
  });
});
