import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { signPayload, startFakePay } from "@/scripts/services/fake-pay";
import { internalKeys } from "./support/apiKeys";
import { rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U, VEHICLE, item, seedShops } from "./support/shopFixture";
import { startWebhookForwarder } from "./support/webhookForwarder";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
const sent = vi.hoisted(() => [] as { to: string; text: string }[]);
// Receipts are queued in the webhook's transaction (queueMailIn), through the real module's toQueued.
vi.mock("@/lib/platform/mail", async (original) => ({
  ...(await original<object>()),
  queueMail: async (m: { to: string; text: string }) => void sent.push(m),
  appOrigin: () => "http://127.0.0.1:3000",
}));

const SECRET = "whsec_integration_test_secret";
process.env.STRIPE_SECRET_KEY = "sk_test_integration";
process.env.STRIPE_WEBHOOK_SECRET = SECRET;
process.env.STRIPE_API_HOST = "127.0.0.1";

const db = testDb();
const as = (u: (typeof U)[keyof typeof U]) => void (session.current = sessionOf(u));

const webhook = (await import("@/app/api/payments/webhook/route")).POST;
const act = (await import("@/app/api/q/[token]/route")).POST;
const quotes = await import("@/app/api/shop/quotes/route");
const sendRoute = (await import("@/app/api/shop/quotes/[id]/send/route")).POST;
const customers = await import("@/app/api/shop/customers/route");
const { findPublicQuoteView } = await import("@/lib/shop/quotes/send");

let forwarder: Awaited<ReturnType<typeof startWebhookForwarder>>;
const delivered = () => forwarder.delivered;
let pay: Awaited<ReturnType<typeof startFakePay>>;

beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  forwarder = await startWebhookForwarder(webhook);
  pay = await startFakePay({
    port: 0,
    secretKey: process.env.STRIPE_SECRET_KEY!,
    webhookSecret: SECRET,
    webhookUrl: forwarder.url,
  });
  process.env.STRIPE_API_PORT = String(pay.port);
});
afterAll(async () => {
  await pay.close();
  await (await import("./support/jobs")).stopBoss();
  await forwarder.close();
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

/** A sent quote of shop A and its public token. */
async function sentQuote(tireSku = "TR-EXAMPLE-35", wheelSku = "WH-EXAMPLE-BL") {
  as(U.staffA);
  const c = await customers.POST(
    req("POST", "/api/shop/customers", {
      name: "Payer",
      phone: `555 ${Math.floor(1000000 + Math.random() * 8999999)}`,
      email: `payer${Date.now()}@example.test`,
    }),
    ctx(),
  );
  const customerId = (await c.json()).customer.id;
  const tire = await item(db, SHOP_A, tireSku);
  const wheel = await item(db, SHOP_A, wheelSku);
  const id = (
    await (
      await quotes.POST(
        req("POST", "/api/shop/quotes", { customerId, vehicle: VEHICLE, tireItemId: tire.id, wheelItemId: wheel.id, quantity: 4 }),
        ctx(),
      )
    ).json()
  ).id as string;
  sent.length = 0;
  await sendRoute(req("POST", `/api/shop/quotes/${id}/send`, {}), ctx({ id }));
  const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(sent[0]!.text)![1]!;
  session.current = null;
  return { id, token };
}
const action = (token: string, a: string) => act(req("POST", `/api/q/${token}`, { action: a }), ctx({ token }));
const quoteRow = (id: string) => db("quotes").where({ id }).first();

describe("deposit through the payment SDK and the fake provider", () => {
  let first: { id: string; token: string };
  it("cannot pay before accepting; accepting is recorded as the customer's", async () => {
    first = await sentQuote();
    expect((await action(first.token, "pay")).status).toBe(409);
    const accepted = await action(first.token, "accept");
    expect(accepted.status).toBe(200);
    expect(internalKeys(await accepted.json())).toEqual([]);
    const ev = await db("quote_events").where({ quote_id: first.id }).orderBy("id");
    expect(ev.at(-1)).toMatchObject({ from_status: "sent", to_status: "accepted", actor: "customer", actor_user_id: null });
  });

  it("a declined test card pays nothing and sends no webhook", async () => {
    const { url } = await (await action(first.token, "pay")).json();
    const res = await fetch(url, {
      method: "POST",
      body: new URLSearchParams({ card: "4000 0000 0000 0002", exp: "12/30", cvc: "123" }),
      redirect: "manual",
    });
    expect(res.status).toBe(402);
    expect(delivered()).toHaveLength(0);
    expect((await quoteRow(first.id)).status).toBe("accepted");
  });

  it("paying on the hosted page sends a signed webhook; the SDK verifies it and the deposit is marked paid", async () => {
    const res = await action(first.token, "pay");
    const answer = await res.json();
    expect(internalKeys(answer)).toEqual([]);
    const { url } = answer;
    expect(url).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${pay.port}/pay/cs_test_`));
    const page = await fetch(url);
    expect(await page.text()).toContain("$1,076.96"); // the quote's deposit (see shop-quotes.test.ts for the arithmetic)
    const paid = await fetch(url, {
      method: "POST",
      body: new URLSearchParams({ card: "4242 4242 4242 4242", exp: "12/30", cvc: "123" }),
      redirect: "manual",
    });
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toBe(`http://127.0.0.1:3000/q/${first.token}?paid=1`);
    expect(delivered()).toHaveLength(1);
    expect(delivered()[0]).toMatchObject({ status: 200, answer: { outcome: "deposit_paid" } });
    const q = await quoteRow(first.id);
    expect(q.status).toBe("deposit_paid");
    const ev = await db("quote_events").where({ quote_id: first.id }).orderBy("id");
    expect(ev.at(-1)).toMatchObject({ from_status: "accepted", to_status: "deposit_paid", actor: "payment provider" });
    expect(await db("payments").where({ quote_id: first.id, status: "paid" })).toHaveLength(1);
  });

  it("a replayed event changes nothing", async () => {
    const before = await db("quote_events").where({ quote_id: first.id }).count<{ c: string }[]>({ c: "*" });
    const { body, signature } = delivered()[0]!;
    for (let i = 0; i < 3; i++) {
      const res = await webhook(
        new NextRequest("http://127.0.0.1:3000/api/payments/webhook", { method: "POST", body, headers: { "stripe-signature": signature } }),
        ctx(),
      );
      expect(res.status).toBe(200);
      expect((await res.json()).outcome).toBe("duplicate");
    }
    expect(await db("quote_events").where({ quote_id: first.id }).count<{ c: string }[]>({ c: "*" })).toEqual(before);
    expect(await db("payment_webhook_events")).toHaveLength(1);
  });

  it("a bad signature, a tampered body, an old timestamp or no signature: 400, nothing written", async () => {
    const second = await sentQuote("TR-EXAMPLE-35", "WH-EXAMPLE-17");
    await action(second.token, "accept");
    const { url } = await (await action(second.token, "pay")).json();
    const sessionId = url.split("/").pop();
    const q = await quoteRow(second.id);
    const event = (amount: number, quoteId = second.id) =>
      JSON.stringify({
        id: `evt_forged_${amount}_${quoteId.slice(0, 4)}`,
        object: "event",
        type: "checkout.session.completed",
        data: {
          object: {
            id: sessionId,
            object: "checkout.session",
            amount_total: amount,
            currency: "usd",
            payment_status: "paid",
            status: "complete",
            client_reference_id: quoteId,
            metadata: { quote_id: quoteId },
          },
        },
      });
    const post = (body: string, signature?: string) =>
      webhook(
        new NextRequest("http://127.0.0.1:3000/api/payments/webhook", {
          method: "POST",
          body,
          headers: signature ? { "stripe-signature": signature } : {},
        }),
        ctx(),
      );
    const good = event(q.deposit_cents);
    expect((await post(good, signPayload(good, "whsec_someone_else"))).status).toBe(400);
    expect((await post(good.replace(String(q.deposit_cents), "1"), signPayload(good, SECRET))).status).toBe(400);
    expect((await post(good, signPayload(good, SECRET, Math.floor(Date.now() / 1000) - 3600))).status).toBe(400);
    expect((await post(good)).status).toBe(400);

    // Correctly signed, but for another quote's amount: refused, nothing written.
    const wrongAmount = event(q.deposit_cents + 100);
    const r = await post(wrongAmount, signPayload(wrongAmount, SECRET));
    expect(r.status).toBe(422);
    expect((await r.json()).error).toMatch(/does not match/);
    const otherQuote = event(q.deposit_cents, first.id);
    expect((await post(otherQuote, signPayload(otherQuote, SECRET))).status).toBe(422);

    expect((await quoteRow(second.id)).status).toBe("accepted");
    expect(await db("payments").where({ quote_id: second.id, status: "paid" })).toHaveLength(0);
    expect(await db("payment_webhook_events")).toHaveLength(1);

    // The genuine event still goes through afterwards.
    expect((await post(good, signPayload(good, SECRET))).status).toBe(200);
    expect((await quoteRow(second.id)).status).toBe("deposit_paid");
  });

  it("a correctly signed event with a malformed body is a 400 with a message, nothing written", async () => {
    const before = await db("payment_webhook_events").count<{ count: string }[]>();
    const post = (body: string) =>
      webhook(
        new NextRequest("http://127.0.0.1:3000/api/payments/webhook", {
          method: "POST",
          body,
          headers: { "stripe-signature": signPayload(body, SECRET) },
        }),
        ctx(),
      );
    const malformed = [
      { id: "evt_no_data", object: "event", type: "checkout.session.completed", data: null },
      { id: "evt_no_object", object: "event", type: "checkout.session.completed", data: {} },
      {
        id: "evt_amount_text",
        object: "event",
        type: "checkout.session.completed",
        data: {
          object: { id: "cs_x", amount_total: "lots", currency: "usd", payment_status: "paid", client_reference_id: null, metadata: {} },
        },
      },
      { object: "event", type: "checkout.session.completed", data: { object: { id: "cs_x" } } },
      { id: "evt_other_type_no_data", object: "event", type: "charge.refunded" },
      [1, 2, 3],
    ];
    for (const event of malformed) {
      const res = await post(JSON.stringify(event));
      expect(res.status, JSON.stringify(event)).toBe(400);
      expect((await res.json()).error).toMatch(/not in the form/);
    }
    expect(await db("payment_webhook_events").count<{ count: string }[]>()).toEqual(before);
  });

  it("an unknown or expired link is 404; a declined quote cannot be accepted", async () => {
    expect((await action("A".repeat(43), "accept")).status).toBe(404);
    const third = await sentQuote();
    expect((await action(third.token, "decline")).status).toBe(200);
    expect((await action(third.token, "accept")).status).toBe(409);
    const fourth = await sentQuote();
    await db("quotes")
      .where({ id: fourth.id })
      .update({ valid_until: db.raw("now() - interval '1 second'") });
    expect((await action(fourth.token, "accept")).status).toBe(409);
    // Shown as expired at once; the row itself is written by the scheduled expiry job (tests/integration/jobs.test.ts).
    expect((await findPublicQuoteView(db, fourth.token))!.quote.status).toBe("expired");
    expect((await quoteRow(fourth.id)).status).toBe("sent");
  });

  it("takes the deposit under the shop name on the quote as sent, and the customer's page then shows the balance still due", async () => {
    const q = await sentQuote();
    await db("shops").where({ id: SHOP_A }).update({ name: "Renamed Rims" });
    try {
      await action(q.token, "accept");
      const { url } = await (await action(q.token, "pay")).json();
      const page = await (await fetch(url)).text();
      expect(page).toContain("at Shop A");
      expect(page).not.toContain("Renamed Rims");
      const paid = await fetch(url, {
        method: "POST",
        body: new URLSearchParams({ card: "4242 4242 4242 4242", exp: "12/30", cvc: "123" }),
        redirect: "manual",
      });
      expect(paid.status).toBe(303);
      const row = await quoteRow(q.id);
      expect(row.status).toBe("deposit_paid");
      const view = await findPublicQuoteView(db, q.token);
      // 4307.82 − 1076.96 = 3230.86 (the quote of shop-quotes.test.ts; deposit 25 % half a cent up).
      expect(view!.document.totals).toMatchObject({ totalCents: 430782, depositCents: 107696, balanceCents: 323086 });
      expect(view!.document.shop.name).toBe("Shop A");
    } finally {
      await db("shops").where({ id: SHOP_A }).update({ name: "Shop A" });
    }
  });

  it("the fake refuses a wrong API key as the provider would", async () => {
    const res = await fetch(`http://127.0.0.1:${pay.port}/v1/checkout/sessions`, {
      method: "POST",
      headers: { Authorization: "Bearer sk_test_wrong" },
      body: "mode=payment",
    });
    expect(res.status).toBe(401);
  });
});
