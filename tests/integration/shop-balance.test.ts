import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { signPayload, startFakePay } from "@/scripts/services/fake-pay";
import { testDb } from "./support/db";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";
import { ctx, req, sessionOf } from "./support/requests";
import { openAllDay } from "./support/quoteJourney";
import { SHOP_A, U, VEHICLE, item } from "./support/shopFixture";
import { postWebhook as post, startWebhookForwarder } from "./support/webhookForwarder";
import { bodyFor } from "./support/workOrderSteps";
import { workOrderRoutes } from "./support/workOrderRoutes";

/*
 * Completion and the balance: the completion mail with the invoice, the balance paid through the
 * payment SDK and its signed webhook or at the counter, receipts, and refunds of a deposit on a
 * cancelled booking. Figures: the quote of shop-quotes.test.ts (4 × the 35" tire and the beadlock
 * wheel with services, 8.25 % tax): total 4,307.82, 25 % deposit 1,076.96 (half a cent up),
 * balance 4,307.82 − 1,076.96 = 3,230.86 — worked by hand in integer cents.
 */

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const SECRET = "whsec_balance_test_secret";
process.env.STRIPE_SECRET_KEY = "sk_test_balance";
process.env.STRIPE_WEBHOOK_SECRET = SECRET;
process.env.STRIPE_API_HOST = "127.0.0.1";
process.env.APP_ORIGIN = "http://127.0.0.1:3000";

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);

const webhook = (await import("@/app/api/payments/webhook/route")).POST;
const act = (await import("@/app/api/q/[token]/route")).POST;
const balance = await import("@/app/api/q/[token]/balance/route");
const counter = await import("@/app/api/shop/quotes/[id]/payments/route");
const refunds = (await import("@/app/api/shop/quotes/[id]/refunds/route")).POST;
const statusRoute = (await import("@/app/api/shop/quotes/[id]/status/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const sendRoute = (await import("@/app/api/shop/quotes/[id]/send/route")).POST;
const customers = await import("@/app/api/shop/customers/route");
const { open: openOrder, sign, move } = await workOrderRoutes();
const { bookInstall, cancelInstall, slotsForQuote } = await import("@/lib/shop/bookings/queries");
const { requiredSteps } = await import("@/lib/shop/workOrders/api");

let forwarder: Awaited<ReturnType<typeof startWebhookForwarder>>;
const postWebhook = (body: string, signature: string) => post(webhook, body, signature);
let pay: Awaited<ReturnType<typeof startFakePay>>;

/** Every mail job queued so far, oldest first. */
async function mails(): Promise<{ to: string; subject: string; text: string }[]> {
  const rows = await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).orderBy("created_on").select("data");
  return rows.map((r: { data: { to: string; subject: string; text: string } }) => r.data);
}
const mailsTo = async (to: string) => (await mails()).filter((m) => m.to === to);
const linkIn = (text: string) => /\/q\/([A-Za-z0-9_-]{43})/.exec(text)![1]!;

async function until(check: () => boolean, what: string) {
  for (let i = 0; i < 100 && !check(); i++) await new Promise((r) => setTimeout(r, 20));
  if (!check()) throw new Error(`timed out waiting for ${what}`);
}

/** The fake's test card that pays, and the one that pays but whose refunds fail (scripts/services/fake-pay.ts). */
const CARD_PAYS = "4242 4242 4242 4242";
const CARD_REFUNDS_FAIL = "4000 0000 0000 5126";

/** Pays a checkout page of the fake with a test card that pays; waits for its webhook. */
async function payOnPage(url: string, card = CARD_PAYS) {
  const before = forwarder.delivered.length;
  const res = await fetch(url, {
    method: "POST",
    body: new URLSearchParams({ card, exp: "12/30", cvc: "123" }),
    redirect: "manual",
  });
  expect(res.status).toBe(303);
  await until(() => forwarder.delivered.length > before, "the payment webhook");
  return res.headers.get("location");
}

/** A quote of shop A, sent, accepted and its deposit paid on the fake's page; its customer's address and link. */
async function depositPaidQuote(card = CARD_PAYS) {
  as(U.staffA);
  const email = `b${randomBytes(4).toString("hex")}@example.test`;
  const c = await customers.POST(
    req("POST", "/api/shop/customers", { name: "Balance Customer", phone: `555 ${Math.floor(1000000 + Math.random() * 8999999)}`, email }),
    ctx(),
  );
  const customerId = (await c.json()).customer.id;
  const tire = await item(db, SHOP_A, "TR-EXAMPLE-35");
  const wheel = await item(db, SHOP_A, "WH-EXAMPLE-BL");
  const q = await quotes.POST(
    req("POST", "/api/shop/quotes", { customerId, vehicle: VEHICLE, tireItemId: tire.id, wheelItemId: wheel.id, quantity: 4 }),
    ctx(),
  );
  const id = (await q.json()).id as string;
  expect((await sendRoute(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }))).status).toBe(200);
  const token = linkIn((await mailsTo(email)).at(-1)!.text);
  as(null);
  const action = (a: string) => act(req("POST", `/api/q/${token}`, { action: a }), ctx({ token }));
  expect((await action("accept")).status).toBe(200);
  await payOnPage((await (await action("pay")).json()).url, card);
  expect((await db("quotes").where({ id }).first()).status).toBe("deposit_paid");
  return { id, email, token };
}

async function book(id: string) {
  const quote = await db("quotes").where({ id }).first();
  const slots = await slotsForQuote(db, quote, { days: 14 });
  const start = slots.days.flatMap((d) => d.slots)[0]!.start;
  await bookInstall(db, { by: "staff", scope: { shopId: SHOP_A }, quoteId: id }, { start }, { userId: U.staffA.id, label: "Sam Staff" });
}

/** Books the install, opens the work order, signs every step and marks it done. */
async function completed(id: string) {
  await book(id);
  as(U.staffA);
  const orderId = (await (await openOrder(req("POST", "/api/shop/work-orders", { quoteId: id }), ctx())).json()).id as string;
  const moveTo = (to: string) => move(req("POST", `/api/shop/work-orders/${orderId}/status`, { to }), ctx({ id: orderId }));
  expect((await moveTo("in_bay")).status).toBe(200);
  const order = await db("work_orders").where({ id: orderId }).first();
  for (const s of requiredSteps(order)) {
    const r = await sign(req("PUT", `/api/shop/work-orders/${orderId}/steps`, bodyFor(s.position, s.step)), ctx({ id: orderId }));
    expect(r.status, `${s.position} ${s.step}`).toBe(200);
  }
  expect((await moveTo("done")).status).toBe(200);
  return orderId;
}

const counterPay = (id: string, body: object) => counter.POST(req("POST", `/api/shop/quotes/${id}/payments`, body), ctx({ id }));
const refund = (id: string, body: object) => refunds(req("POST", `/api/shop/quotes/${id}/refunds`, body), ctx({ id }));
const count = async (table: string) => Number((await db(table).count({ n: "*" }))[0]!.n);

/**
 * The provider's event about the app's refund `row` of `payment`, unsigned: a confirmed refund
 * (`refund.updated`, succeeded) unless `over` changes the refund's fields or the event's `type`.
 */
function refundEvent(
  row: { id: string; provider_refund_id: string; amount_cents: number },
  payment: { provider_payment_intent: string },
  { type = "refund.updated", ...over }: Record<string, unknown> = {},
) {
  return JSON.stringify({
    id: `evt_test_${randomBytes(4).toString("hex")}`,
    object: "event",
    type,
    data: {
      object: {
        id: row.provider_refund_id,
        object: "refund",
        amount: row.amount_cents,
        currency: "usd",
        status: "succeeded",
        payment_intent: payment.provider_payment_intent,
        metadata: { refund_id: row.id },
        ...over,
      },
    },
  });
}

/**
 * Sends the provider's last event again: as it was (the same event id, answered "duplicate"), then
 * as a new event about the same refund (a new id), which must be answered `outcome` and change nothing.
 */
async function replayLastEvent(outcome: string) {
  const last = forwarder.delivered.at(-1)!;
  expect(await postWebhook(last.body, last.signature)).toMatchObject({ status: 200, answer: { outcome: "duplicate" } });
  const again = JSON.parse(last.body);
  again.id = `evt_again_${randomBytes(4).toString("hex")}`;
  const body = JSON.stringify(again);
  expect(await postWebhook(body, signPayload(body, SECRET))).toMatchObject({ status: 200, answer: { outcome } });
}

beforeAll(async () => {
  await setUpBookableShops(db, openAllDay);
  forwarder = await startWebhookForwarder(webhook);
  pay = await startFakePay({ port: 0, secretKey: process.env.STRIPE_SECRET_KEY!, webhookSecret: SECRET, webhookUrl: forwarder.url });
  process.env.STRIPE_API_PORT = String(pay.port);
});
afterAll(async () => {
  await pay.close();
  await forwarder.close();
  await tearDownBookableShops(db);
});

describe("completion mail and the balance through the payment SDK", () => {
  let q: { id: string; email: string; token: string };
  let link: string;

  it("the deposit gets a receipt", async () => {
    q = await depositPaidQuote();
    const receipt = (await mailsTo(q.email)).at(-1)!;
    expect(receipt.subject).toBe(
      "Receipt: $1,076.96 deposit for quote Q-" + (await db("quotes").where({ id: q.id }).first()).number + " at Shop A",
    );
  });

  it("before the work is done, no balance can be paid online or at the counter; nothing written", async () => {
    as(null);
    const r = await balance.POST(req("POST", `/api/q/${q.token}/balance`, {}), ctx({ token: q.token }));
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("The balance is due once the work order is done.");
    as(U.staffA);
    expect((await counterPay(q.id, { amount: "10.00", method: "cash" })).status).toBe(409);
    expect(await db("payments").where({ quote_id: q.id, kind: "balance" })).toHaveLength(0);
  });

  it("marking the work order done queues the completion mail: work per wheel, re-check advice, invoice figures and a pay link", async () => {
    await completed(q.id);
    const done = (await mailsTo(q.email)).filter((m) => m.subject.startsWith("Done:"));
    expect(done).toHaveLength(1);
    const mail = done[0]!;
    expect(mail.subject).toMatch(/^Done: your wheels and tires at Shop A \(quote Q-\d+\)$/);
    // total − deposit = balance: 4,307.82 − 1,076.96 = 3,230.86
    expect(mail.text).toContain("Quote total: $4,307.82");
    expect(mail.text).toContain("Deposit paid: −$1,076.96");
    expect(mail.text).toContain("Balance due: $3,230.86");
    expect(mail.text).toContain("Still to pay: $3,230.86");
    for (const heading of ["Left front", "Right front", "Left rear", "Right rear"]) expect(mail.text).toContain(`\n\n${heading}\n- `);
    // 40 psi × 6.894757 kPa/psi = 275.8 kPa (NIST SP 811, B.8); 190 N·m ÷ 1.355818 = 140.1 ft·lb (NIST SP 811, B.8).
    expect(mail.text).toContain("Cold pressure set: Set cold to 40 psi (276 kPa) (signed by Sam Staff)");
    expect(mail.text).toContain("Lug nuts torqued: Lug nuts to 190 N·m (140.1 ft·lb) in the star order, all passes (signed by Sam Staff)");
    expect(mail.text).toContain("re-checked after the first 50–100 miles");
    link = linkIn(mail.text);
    expect(mail.text).toContain(`Pay the balance of $3,230.86 here: http://127.0.0.1:3000/q/${link}`);
    // The mail's link is the quote's link now; the earlier one is replaced.
    as(null);
    expect((await balance.GET(req("GET", `/api/q/${q.token}/balance`), ctx({ token: q.token }))).status).toBe(404);
    const view = await (await balance.GET(req("GET", `/api/q/${link}/balance`), ctx({ token: link }))).json();
    expect(view.payments.invoice).toMatchObject({ totalCents: 430782, depositPaidCents: 107696, balanceDueCents: 323086, paid: false });
    expect(view.payments.payments).toEqual([
      expect.objectContaining({
        kind: "deposit",
        method: "provider",
        amountCents: 107696,
        recordedBy: "",
        paidAt: expect.stringMatching(/Z$/),
      }),
    ]);
  });

  it("the balance is paid on the provider's page; the signed webhook marks it paid and queues a receipt; the invoice shows Paid", async () => {
    as(null);
    const first = await (await balance.POST(req("POST", `/api/q/${link}/balance`, {}), ctx({ token: link }))).json();
    // Opening again expires the first page: only one can take the money.
    const second = await (await balance.POST(req("POST", `/api/q/${link}/balance`, {}), ctx({ token: link }))).json();
    expect((await fetch(first.url)).status).toBe(410);
    expect(await (await fetch(second.url)).text()).toContain("$3,230.86");
    const back = await payOnPage(second.url);
    expect(back).toBe(`http://127.0.0.1:3000/q/${link}?paid=balance`);
    expect(forwarder.delivered.at(-1)).toMatchObject({ status: 200, answer: { outcome: "balance_paid" } });
    const receipt = (await mailsTo(q.email)).at(-1)!;
    expect(receipt.subject).toMatch(/^Receipt: \$3,230\.86 balance for quote Q-\d+ at Shop A$/);
    expect(receipt.text).toContain("Your invoice is paid in full.");
    const view = await (await balance.GET(req("GET", `/api/q/${link}/balance`), ctx({ token: link }))).json();
    expect(view.payments.invoice).toMatchObject({ balancePaidCents: 323086, outstandingCents: 0, paid: true });
    expect(view.payments.payments.map((p: { kind: string }) => p.kind)).toEqual(["deposit", "balance"]);
  });

  it("a replayed balance webhook changes nothing", async () => {
    const last = forwarder.delivered.at(-1)!;
    const mailsBefore = (await mails()).length;
    for (let i = 0; i < 2; i++)
      expect(await postWebhook(last.body, last.signature)).toMatchObject({ status: 200, answer: { outcome: "duplicate" } });
    expect((await mails()).length).toBe(mailsBefore);
    expect(await db("payments").where({ quote_id: q.id, status: "paid" })).toHaveLength(2);
  });

  it("a paid invoice cannot be paid twice: online or at the counter; nothing written", async () => {
    as(null);
    const r = await balance.POST(req("POST", `/api/q/${link}/balance`, {}), ctx({ token: link }));
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("This invoice is already paid.");
    as(U.staffA);
    const c = await counterPay(q.id, { amount: "1.00", method: "cash" });
    expect(c.status).toBe(409);
    expect(await db("payments").where({ quote_id: q.id })).toHaveLength(3); // the deposit and two balance sessions (one expired), no more
  });
});

describe("the balance at the counter", () => {
  let q: { id: string; email: string; token: string };

  it("staff record cash then card (amount, method, who, when); each gets a receipt; over-payment refused", async () => {
    q = await depositPaidQuote();
    await completed(q.id);
    as(U.staffA);
    const bad = await counterPay(q.id, { amount: "12.5.0", method: "cash" });
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors.amount[0]).toBe('Amount ($): "12.5.0" is not an amount in dollars and cents, e.g. 250.00.');
    const noMethod = await counterPay(q.id, { amount: "10.00", method: "cheque" });
    expect((await noMethod.json()).fieldErrors.method[0]).toBe("Paid by: pick cash or card.");
    const over = await counterPay(q.id, { amount: "3,230.87", method: "card" });
    expect(over.status).toBe(422);
    expect((await over.json()).fieldErrors.amount[0]).toBe("Amount ($): $3,230.87 is more than the balance outstanding, $3,230.86.");
    expect(await db("payments").where({ quote_id: q.id, kind: "balance" })).toHaveLength(0);

    const cash = await counterPay(q.id, { amount: "1,000.00", method: "cash" });
    expect(cash.status).toBe(201);
    expect((await cash.json()).payments.invoice).toMatchObject({ balancePaidCents: 100000, outstandingCents: 223086, paid: false });
    expect((await mailsTo(q.email)).at(-1)!.text).toContain("Still to pay: $2,230.86.");
    as(U.ownerA);
    const card = await counterPay(q.id, { amount: "2230.86", method: "card" });
    expect(card.status).toBe(201);
    const answer = (await card.json()).payments;
    expect(answer.invoice).toMatchObject({ outstandingCents: 0, paid: true });
    expect(answer.payments.slice(1)).toEqual([
      expect.objectContaining({ kind: "balance", method: "cash", amountCents: 100000, recordedBy: "Sam Staff" }),
      expect.objectContaining({ kind: "balance", method: "card", amountCents: 223086, recordedBy: "Olive Owner" }),
    ]);
    const receipt = (await mailsTo(q.email)).at(-1)!;
    expect(receipt.text).toContain("Paid: Balance, card at the counter.");
    expect(receipt.text).toContain("Your invoice is paid in full.");
    const row = await db("payments").where({ quote_id: q.id, method: "card" }).first();
    expect(row).toMatchObject({ recorded_by_user_id: U.ownerA.id, status: "paid", provider_session_id: null });
    expect(row.paid_at).toBeInstanceOf(Date);
    expect((await counterPay(q.id, { amount: "0.01", method: "cash" })).status).toBe(409);
  });

  it("an online balance page left open while the balance is taken at the counter is closed and leads back to a page that reads Paid", async () => {
    const other = await depositPaidQuote();
    await completed(other.id);
    const link = linkIn((await mailsTo(other.email)).filter((m) => m.subject.startsWith("Done:")).at(-1)!.text);
    as(null);
    const checkout = await (await balance.POST(req("POST", `/api/q/${link}/balance`, {}), ctx({ token: link }))).json();
    as(U.staffA);
    expect((await counterPay(other.id, { amount: "3230.86", method: "cash" })).status).toBe(201);
    const page = await fetch(checkout.url);
    expect(page.status).toBe(410);
    const text = await page.text();
    expect(text).not.toMatch(/start again/i);
    expect(text).toContain(`href="http://127.0.0.1:3000/q/${link}?checkout=balance"`);
    // Where that link lands: the invoice paid, so the page says so (BalancePanel.test.tsx shows the words).
    as(null);
    const view = await (await balance.GET(req("GET", `/api/q/${link}/balance`), ctx({ token: link }))).json();
    expect(view.payments.invoice).toMatchObject({ outstandingCents: 0, paid: true });
  });

  it("another shop's staff cannot see or record payments on the quote (404, nothing written)", async () => {
    as(U.staffB);
    expect((await counter.GET(req("GET", `/api/shop/quotes/${q.id}/payments`), ctx({ id: q.id }))).status).toBe(404);
    as(U.ownerB);
    expect((await counterPay(q.id, { amount: "1.00", method: "cash" })).status).toBe(404);
    expect(await db("payments").where({ quote_id: q.id })).toHaveLength(3);
  });
});

describe("refunding a deposit on a cancelled booking", () => {
  let q: { id: string; email: string; token: string };

  it("is refused while the install is booked, and for staff who are not the owner, or another shop; nothing written", async () => {
    q = await depositPaidQuote();
    await book(q.id);
    as(U.ownerA);
    const booked = await refund(q.id, { amount: "100.00" });
    expect(booked.status).toBe(409);
    expect((await booked.json()).error).toBe("Cancel the install booking first: a deposit is refunded once its booking is cancelled.");
    await cancelInstall(db, { shopId: SHOP_A }, q.id, { userId: U.staffA.id, label: "Sam Staff" });
    as(U.staffA);
    const staff = await refund(q.id, { amount: "100.00" });
    expect(staff.status).toBe(403);
    as(U.ownerB);
    const other = await refund(q.id, { amount: "100.00" });
    expect(other.status).toBe(404);
    expect((await other.json()).error).toBe("That quote was not found.");
    expect(await count("payment_refunds")).toBe(0);
  });

  it("a refund larger than what was paid is refused with the field named; nothing written", async () => {
    as(U.ownerA);
    const r = await refund(q.id, { amount: "1076.97" });
    expect(r.status).toBe(422);
    expect((await r.json()).fieldErrors.amount[0]).toBe(
      "Refund amount ($): $1,076.97 is more than the deposit paid and not yet refunded, $1,076.96.",
    );
    expect((await refund(q.id, { amount: "0" })).status).toBe(422);
    expect(await count("payment_refunds")).toBe(0);
  });

  it("the owner refunds part through the SDK; the provider's signed webhook marks it succeeded; a replay changes nothing", async () => {
    as(U.ownerA);
    const before = forwarder.delivered.length;
    const r = await refund(q.id, { amount: "400.00" });
    expect(r.status).toBe(202);
    const pending = (await r.json()).payments;
    expect(pending.refunds).toEqual([expect.objectContaining({ amountCents: 40000, requestedBy: "Olive Owner" })]);
    expect(pending.invoice.refundableCents).toBe(107696 - 40000);
    await until(() => forwarder.delivered.length > before, "the refund webhook");
    expect(forwarder.delivered.at(-1)).toMatchObject({ status: 200, answer: { outcome: "refund_succeeded" } });
    const row = await db("payment_refunds").where({ quote_id: q.id }).first();
    expect(row).toMatchObject({ status: "succeeded", amount_cents: 40000, requested_by_user_id: U.ownerA.id });
    expect(row.provider_refund_id).toMatch(/^re_/);
    expect((await mailsTo(q.email)).at(-1)!.subject).toMatch(/^Refund: \$400\.00 of your deposit for quote Q-\d+ at Shop A$/);
    const mailsBefore = (await mails()).length;
    const last = forwarder.delivered.at(-1)!;
    expect(await postWebhook(last.body, last.signature)).toMatchObject({ status: 200, answer: { outcome: "duplicate" } });
    expect((await mails()).length).toBe(mailsBefore);
  });

  it("the rest can be refunded, then no more: 1,076.96 − 400.00 = 676.96", async () => {
    as(U.ownerA);
    expect((await refund(q.id, { amount: "676.97" })).status).toBe(422);
    const before = forwarder.delivered.length;
    expect((await refund(q.id, { amount: "676.96" })).status).toBe(202);
    await until(() => forwarder.delivered.length > before, "the refund webhook");
    const r = await refund(q.id, { amount: "0.01" });
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("The deposit has been refunded in full.");
    const view = await (await counter.GET(req("GET", `/api/shop/quotes/${q.id}/payments`), ctx({ id: q.id }))).json();
    expect(view.payments.invoice).toMatchObject({ refundedCents: 107696, refundableCents: 0 });
  });

  it("a forged or mismatched refund event is refused; nothing written", async () => {
    const row = await db("payment_refunds").where({ quote_id: q.id }).orderBy("created_at").first();
    const payment = await db("payments").where({ id: row.payment_id }).first();
    const event = (over: Record<string, unknown>) => refundEvent(row, payment, over);
    const eventsBefore = await count("payment_webhook_events");
    const unsigned = event({});
    expect((await postWebhook(unsigned, signPayload(unsigned, "whsec_someone_else"))).status).toBe(400);
    const bigger = event({ amount: row.amount_cents + 1 });
    expect((await postWebhook(bigger, signPayload(bigger, SECRET))).status).toBe(422);
    const unknown = event({ id: "re_unknown", metadata: { refund_id: "0a000000-0000-4000-8000-0000000000ff" } });
    expect((await postWebhook(unknown, signPayload(unknown, SECRET))).status).toBe(400);
    expect(await count("payment_webhook_events")).toBe(eventsBefore);
  });

  it("the provider refuses a refund above what it holds; the app removes its row (nothing left written)", async () => {
    // The app's own check normally stops this first; the provider's refusal is the second guard.
    const other = await depositPaidQuote();
    await book(other.id);
    await cancelInstall(db, { shopId: SHOP_A }, other.id, { userId: U.staffA.id, label: "Sam Staff" });
    const payment = await db("payments").where({ quote_id: other.id, kind: "deposit", status: "paid" }).first();
    // The provider has already refunded it in full outside the app (e.g. from its dashboard).
    const res = await fetch(`http://127.0.0.1:${pay.port}/v1/refunds`, {
      method: "POST",
      headers: { Authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}` },
      body: new URLSearchParams({ payment_intent: payment.provider_payment_intent }),
    });
    expect(res.status).toBe(200);
    await until(
      () => forwarder.delivered.at(-1)?.answer.error !== undefined || forwarder.delivered.at(-1)?.status !== 200,
      "the outside refund's webhook",
    );
    const rows = await count("payment_refunds");
    as(U.ownerA);
    const r = await refund(other.id, { amount: "10.00" });
    expect(r.status).toBe(409);
    expect((await r.json()).error).toMatch(
      /^The payment provider refused the refund: Refund amount \(1000\) is greater than unrefunded amount/,
    );
    expect(await count("payment_refunds")).toBe(rows);
  });
});

describe("a refund the provider reports as failed", () => {
  let q: { id: string; email: string; token: string };

  it("the provider's signed refund.updated (failed) marks the row failed: no longer asked back, nothing blocked, refundable again", async () => {
    q = await depositPaidQuote(CARD_REFUNDS_FAIL);
    await book(q.id);
    await cancelInstall(db, { shopId: SHOP_A }, q.id, { userId: U.staffA.id, label: "Sam Staff" });
    as(U.ownerA);
    const before = forwarder.delivered.length;
    const mailsBefore = (await mails()).length;
    expect((await refund(q.id, { amount: "1076.96" })).status).toBe(202);
    await until(() => forwarder.delivered.length > before, "the refund webhook");
    expect(forwarder.delivered.at(-1)).toMatchObject({ status: 200, answer: { outcome: "refund_failed" } });
    const row = await db("payment_refunds").where({ quote_id: q.id }).first();
    expect(row).toMatchObject({ status: "failed", succeeded_at: null });
    expect(row.failed_at).toBeInstanceOf(Date);
    expect(row.provider_refund_id).toMatch(/^re_/);
    // No money moved: no refund note, the quote stays deposit paid.
    expect((await mails()).length).toBe(mailsBefore);
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("deposit_paid");

    const view = (await (await counter.GET(req("GET", `/api/shop/quotes/${q.id}/payments`), ctx({ id: q.id }))).json()).payments;
    // 1,076.96 paid − 0 given back = 1,076.96 refundable and held again (by hand).
    expect(view.invoice).toMatchObject({ refundedCents: 0, depositHeldCents: 107696, refundableCents: 107696 });
    expect(view.refundBlocked).toBeNull();
    expect(view.refunds).toEqual([expect.objectContaining({ status: "failed", failedAt: expect.stringMatching(/Z$/) })]);
    // Booking is open again: the deposit is held.
    await book(q.id);
    expect(await db("bookings").where({ quote_id: q.id, status: "booked" })).toHaveLength(1);
  });

  it("a replay of the failure changes nothing", async () => {
    await replayLastEvent("already_failed");
    expect(await db("payment_refunds").where({ quote_id: q.id }).pluck("status")).toEqual(["failed"]);
  });

  it("the provider's refund.failed event type is read the same way", async () => {
    const row = await db("payment_refunds").where({ quote_id: q.id }).first();
    await db("payment_refunds").where({ id: row.id }).update({ status: "pending", failed_at: null });
    const payment = await db("payments").where({ id: row.payment_id }).first();
    const body = refundEvent(row, payment, { type: "refund.failed", status: "failed" });
    expect(await postWebhook(body, signPayload(body, SECRET))).toMatchObject({ status: 200, answer: { outcome: "refund_failed" } });
    expect((await db("payment_refunds").where({ id: row.id }).first()).status).toBe("failed");
  });
});

describe("a refunded deposit on the invoice and on the quote", () => {
  /*
   * By hand in integer cents (common practice, no source): a refund the provider confirmed is money
   * given back, so it no longer counts against the total. Quote total 4,307.82, deposit 1,076.96.
   * - refunded 125.12: deposit held 1,076.96 − 125.12 = 951.84; balance due 4,307.82 − 951.84 = 3,355.98;
   *   after 1,000.00 at the counter, 3,355.98 − 1,000.00 = 2,355.98 still to pay.
   * - refunded 125.12 + 951.84 = 1,076.96 (all of it): nothing held, 4,307.82 would be due, and the
   *   quote is declined instead (its stock released; a new quote is needed).
   */
  const owner = { userId: U.ownerA.id, label: "Olive Owner" };
  const markAs = (id: string, to: string) => statusRoute(req("POST", `/api/shop/quotes/${id}/status`, { to }), ctx({ id }));

  /** A deposit-paid quote whose booking was made and cancelled. */
  async function cancelledQuote() {
    const q = await depositPaidQuote();
    await book(q.id);
    await cancelInstall(db, { shopId: SHOP_A }, q.id, owner);
    return q;
  }
  /** The owner refunds `amount` through the SDK; waits for the provider's webhook confirming it. */
  async function refunded(id: string, amount: string) {
    as(U.ownerA);
    const before = forwarder.delivered.length;
    expect((await refund(id, { amount })).status).toBe(202);
    await until(() => forwarder.delivered.length > before, "the refund webhook");
    expect(forwarder.delivered.at(-1)).toMatchObject({ status: 200, answer: { outcome: "refund_succeeded" } });
  }

  it("a part refund comes off the deposit on every figure: the invoice on both pages, the checkout, the counter's check, the receipt", async () => {
    const q = await cancelledQuote();
    await refunded(q.id, "125.12");
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("deposit_paid");
    as(U.staffA);
    expect((await markAs(q.id, "installed")).status).toBe(200);

    const figures = { depositPaidCents: 107696, refundedCents: 12512, depositHeldCents: 95184, balanceDueCents: 335598 };
    const staffView = (await (await counter.GET(req("GET", `/api/shop/quotes/${q.id}/payments`), ctx({ id: q.id }))).json()).payments;
    expect(staffView.invoice).toMatchObject({ ...figures, outstandingCents: 335598, paid: false });
    as(null);
    const publicView = (await (await balance.GET(req("GET", `/api/q/${q.token}/balance`), ctx({ token: q.token }))).json()).payments;
    expect(publicView.invoice).toEqual(staffView.invoice);

    const checkout = await (await balance.POST(req("POST", `/api/q/${q.token}/balance`, {}), ctx({ token: q.token }))).json();
    expect(await (await fetch(checkout.url)).text()).toContain("$3,355.98");

    as(U.staffA);
    const over = await counterPay(q.id, { amount: "3,355.99", method: "cash" });
    expect((await over.json()).fieldErrors.amount[0]).toBe("Amount ($): $3,355.99 is more than the balance outstanding, $3,355.98.");
    const cash = await counterPay(q.id, { amount: "1,000.00", method: "cash" });
    expect(cash.status).toBe(201);
    expect((await cash.json()).payments.invoice).toMatchObject({ balancePaidCents: 100000, outstandingCents: 235598, paid: false });
    expect((await mailsTo(q.email)).at(-1)!.text).toContain("Still to pay: $2,355.98.");
  });

  it("refunded in full in two parts: the quote is declined by the provider's confirmation, its stock released; it cannot be installed", async () => {
    const q = await cancelledQuote();
    const held = await db("stock_reservations").where({ quote_id: q.id, status: "reserved" }).select("catalog_item_id", "quantity");
    expect(held.length).toBeGreaterThan(0);
    const reservedBefore = async () =>
      Object.fromEntries(
        (
          await db("catalog_items")
            .whereIn(
              "id",
              held.map((h) => h.catalog_item_id),
            )
            .select("id", "qty_reserved")
        ).map((r) => [r.id, r.qty_reserved]),
      );
    const before = await reservedBefore();

    await refunded(q.id, "125.12");
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("deposit_paid");
    await refunded(q.id, "951.84");

    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("declined");
    const last = await db("quote_events").where({ quote_id: q.id }).orderBy("id", "desc").first();
    expect(last).toMatchObject({ from_status: "deposit_paid", to_status: "declined", actor: "payment provider", actor_user_id: null });
    expect(last.note).toMatch(/^deposit refunded in full \(last refund re_\S+, asked by Olive Owner\)$/);
    expect(await db("stock_reservations").where({ quote_id: q.id }).pluck("status")).toEqual(held.map(() => "released"));
    const after = await reservedBefore();
    for (const h of held) expect(after[h.catalog_item_id]).toBe(before[h.catalog_item_id] - h.quantity);

    as(U.staffA);
    const install = await markAs(q.id, "installed");
    expect(install.status).toBe(409);
    expect((await install.json()).error).toBe("A quote that is declined cannot become installed.");
    const view = (await (await counter.GET(req("GET", `/api/shop/quotes/${q.id}/payments`), ctx({ id: q.id }))).json()).payments;
    // 4,307.82 − 1,076.96 + 1,076.96 = 4,307.82: nothing of the deposit is held.
    expect(view.invoice).toMatchObject({ refundedCents: 107696, depositHeldCents: 0, balanceDueCents: 430782, refundableCents: 0 });
  });

  it("the confirmation that declines the quote mails the customer once: quote closed, deposit refunded, the last refund receipted in it; a replay sends no second", async () => {
    const q = await cancelledQuote();
    const number = (await db("quotes").where({ id: q.id }).first()).number;
    const closed = async () => (await mailsTo(q.email)).filter((m) => m.subject.startsWith("Closed:"));
    const receipts = async () => (await mailsTo(q.email)).filter((m) => m.subject.startsWith("Refund:"));
    await refunded(q.id, "125.12");
    expect(await closed()).toHaveLength(0); // a part refund leaves the quote open
    expect((await receipts()).map((m) => m.subject)).toEqual([`Refund: $125.12 of your deposit for quote Q-${number} at Shop A`]);
    const mailsBefore = (await mailsTo(q.email)).length;
    await refunded(q.id, "951.84");
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("declined");
    // One mail for the last refund: the closing mail, no separate receipt beside it.
    expect((await mailsTo(q.email)).length).toBe(mailsBefore + 1);
    expect(await receipts()).toHaveLength(1);
    const [mail, ...more] = await closed();
    expect(more).toHaveLength(0);
    // 125.12 + 951.84 = 1,076.96, the whole deposit (by hand).
    expect(mail!.subject).toBe(`Closed: quote Q-${number} at Shop A, your deposit of $1,076.96 refunded`);
    expect(mail!.text).toContain(`Shop A has refunded $951.84 of your deposit for quote Q-${number} (`);
    expect(mail!.text).toContain(`Your deposit of $1,076.96 for quote Q-${number} (`);
    expect(mail!.text).toContain("call Shop A on 555-0100 for a new quote.");

    await replayLastEvent("already_refunded");
    expect(await closed()).toHaveLength(1);
    expect((await mailsTo(q.email)).length).toBe(mailsBefore + 1);
  });

  it("a full refund still waiting for the provider already stops the work being marked installed; nothing written", async () => {
    const q = await cancelledQuote();
    const deposit = await db("payments").where({ quote_id: q.id, kind: "deposit", status: "paid" }).first();
    await db("payment_refunds").insert({
      shop_id: SHOP_A,
      quote_id: q.id,
      payment_id: deposit.id,
      amount_cents: deposit.amount_cents,
      requested_by_user_id: U.ownerA.id,
      requested_by: U.ownerA.name,
    });
    as(U.staffA);
    const install = await markAs(q.id, "installed");
    expect(install.status).toBe(409);
    expect((await install.json()).error).toBe(
      "The deposit on this quote has been refunded in full, so the work cannot be marked installed. A new quote is needed to do the work.",
    );
    expect((await db("quotes").where({ id: q.id }).first()).status).toBe("deposit_paid");
  });

  it("staff cannot decline a quote whose deposit the shop holds (only a full refund ends it)", async () => {
    const q = await cancelledQuote();
    as(U.ownerA);
    const r = await markAs(q.id, "declined");
    expect(r.status).toBe(409);
    expect((await r.json()).error).toBe("A quote that is deposit paid cannot become declined.");
  });
});
