import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support/db";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";
import { STAFF_A, depositEvent, depositPaidQuote, firstFreeStart, openAllDay, queuedMails, sentQuote } from "./support/quoteJourney";
import { SHOP_A, U } from "./support/shopFixture";

/*
 * The shop hears of its customers' moves: a notice is queued (in the change's own transaction)
 * to the shop's owners when a customer accepts a quote, a payment comes in through the provider,
 * and when an install is booked, moved or cancelled. Each exactly once, with the quote number,
 * the customer, the vehicle and the link to the staff quote page; nothing when the change is refused.
 */

process.env.APP_ORIGIN = "http://127.0.0.1:3000";
const db = testDb();
const { answerByToken } = await import("@/lib/shop/quotes/queries");
const { applyPaymentEvent } = await import("@/lib/shop/payments/queries");
const { bookInstall, cancelInstall, moveInstall } = await import("@/lib/shop/bookings/queries");

/** Both owners of shop A, in the order of their addresses. */
const OWNERS = `owner-a2@example.test, ${U.ownerA.email}`;
const CUSTOMER = { userId: null, label: "customer" };
const staff = (quoteId: string) => ({ by: "staff" as const, scope: { shopId: SHOP_A }, quoteId });

/** The notices queued for shop A's owners since `before` notices were counted. */
const notices = async () => (await queuedMails(db)).filter((m) => m.to === OWNERS);
async function newNotices(run: () => Promise<unknown>) {
  const before = (await notices()).length;
  await run();
  return (await notices()).slice(before);
}
const quoteRow = (id: string) => db("quotes").where({ id }).first();

beforeAll(async () => {
  await setUpBookableShops(db, openAllDay);
  // A second owner: the notice names every owner of the shop (and nobody of shop B or the staff).
  await db("users").insert({
    role: "shop_owner",
    shop_id: SHOP_A,
    email: "owner-a2@example.test",
    name: "Second Owner",
    password_hash: "x",
  });
});
afterAll(() => tearDownBookableShops(db));

describe("the customer accepts", () => {
  it("queues one notice to the owners with the quote number, customer, vehicle and the staff link", async () => {
    const q = await sentQuote(db, "Ada Accepting");
    const quote = await quoteRow(q.id);
    const sent = await newNotices(() => answerByToken(db, q.token, "accepted", CUSTOMER));
    expect(sent).toHaveLength(1);
    const [n] = sent;
    expect(n!.subject).toBe(`Accepted: quote Q-${quote.number} by Ada Accepting`);
    expect(n!.text).toContain(`Ada Accepting accepted quote Q-${quote.number}`);
    expect(n!.text).toContain(`Customer: Ada Accepting · ${q.email}`);
    expect(n!.text).toContain("Vehicle: Test pickup");
    expect(n!.text).toContain(`Open the quote: http://127.0.0.1:3000/shop/quotes/${q.id}`);
    expect(n!.html).toContain(`href="http://127.0.0.1:3000/shop/quotes/${q.id}"`);
  });

  it("a refused answer (accepting twice) and a decline queue nothing", async () => {
    const q = await sentQuote(db, "Twice Accepting");
    await answerByToken(db, q.token, "accepted", CUSTOMER);
    const again = await newNotices(() =>
      expect(answerByToken(db, q.token, "accepted", CUSTOMER)).rejects.toThrow(/cannot become accepted/),
    );
    expect(again).toEqual([]);
    const other = await sentQuote(db, "Dee Declining");
    expect(await newNotices(() => answerByToken(db, other.token, "declined", CUSTOMER))).toEqual([]);
  });
});

describe("a payment through the provider", () => {
  it("the deposit queues one notice with the amount; the customer's receipt is separate and unchanged", async () => {
    const q = await sentQuote(db, "Pat Paying");
    await answerByToken(db, q.token, "accepted", CUSTOMER);
    const event = await depositEvent(db, q.id);
    const quote = await quoteRow(q.id);
    const sent = await newNotices(() => applyPaymentEvent(db, event));
    expect(sent).toHaveLength(1);
    // The quote of shop-balance.test.ts: total 4,307.82, 25 % deposit 1,076.96 (worked by hand there).
    expect(sent[0]!.subject).toBe(`Paid: $1,076.96 deposit on quote Q-${quote.number} by Pat Paying`);
    expect(sent[0]!.text).toContain(`/shop/quotes/${q.id}`);
    expect((await queuedMails(db)).filter((m) => m.to === q.email && m.subject.startsWith("Receipt:"))).toHaveLength(1);
    // The same event again (the provider retries): nothing more.
    expect(await newNotices(() => applyPaymentEvent(db, event))).toEqual([]);
  });

  it("an event whose amount does not match the deposit is refused and queues nothing", async () => {
    const q = await sentQuote(db, "Mo Mismatch");
    await answerByToken(db, q.token, "accepted", CUSTOMER);
    const event = await depositEvent(db, q.id);
    event.data.object.amount_total -= 1;
    expect(await newNotices(() => expect(applyPaymentEvent(db, event)).rejects.toThrow(/does not match/))).toEqual([]);
  });

  it("the balance paid online queues one notice naming the balance", async () => {
    const q = await depositPaidQuote(db, "Bea Balance");
    await db("quotes").where({ id: q.id }).update({ status: "installed" });
    const quote = await quoteRow(q.id);
    const session = `cs_balance_${quote.number}`;
    await db("payments").insert({
      shop_id: SHOP_A,
      quote_id: q.id,
      provider_session_id: session,
      kind: "balance",
      method: "provider",
      amount_cents: 12345,
      currency: "usd",
    });
    const event = {
      id: `evt_balance_${quote.number}`,
      type: "checkout.session.completed" as const,
      data: {
        object: {
          id: session,
          amount_total: 12345,
          currency: "usd",
          payment_status: "paid",
          client_reference_id: q.id,
          metadata: { quote_id: q.id },
          payment_intent: `pi_balance_${quote.number}`,
        },
      },
    };
    const sent = await newNotices(() => applyPaymentEvent(db, event));
    expect(sent.map((m) => m.subject)).toEqual([`Paid: $123.45 balance on quote Q-${quote.number} by Bea Balance`]);
  });
});

describe("install bookings", () => {
  it("booked by the customer, moved and cancelled at the counter: one notice each, naming who and when", async () => {
    const q = await depositPaidQuote(db, "Cy Calendar");
    const quote = await quoteRow(q.id);
    const booked = await newNotices(() => bookInstall(db, { by: "customer", token: q.token }, { start: "" }, CUSTOMER).catch(() => null));
    // An empty start is refused before anything is written.
    expect(booked).toEqual([]);
    const first = await firstFreeStart(db, q.id);
    const made = await newNotices(() => bookInstall(db, { by: "customer", token: q.token }, { start: first }, CUSTOMER));
    expect(made).toHaveLength(1);
    expect(made[0]!.subject).toMatch(new RegExp(`^Booked: quote Q-${quote.number}, `));
    expect(made[0]!.text).toContain("was booked by the customer on their link for");
    expect(made[0]!.text).toContain("Customer: Cy Calendar");
    expect(made[0]!.text).toContain("Vehicle: Test pickup");

    const later = new Date(new Date(first).getTime() + 3 * 3_600_000).toISOString();
    const moved = await newNotices(() => moveInstall(db, { shopId: SHOP_A }, q.id, { start: later }, STAFF_A));
    expect(moved).toHaveLength(1);
    expect(moved[0]!.subject).toMatch(new RegExp(`^Moved: quote Q-${quote.number}, now `));
    expect(moved[0]!.text).toMatch(/was moved by Sam Staff from .+ to /);

    const cancelled = await newNotices(() => cancelInstall(db, { shopId: SHOP_A }, q.id, STAFF_A));
    expect(cancelled).toHaveLength(1);
    expect(cancelled[0]!.subject).toMatch(new RegExp(`^Cancelled: quote Q-${quote.number}, `));
    expect(cancelled[0]!.text).toContain("was cancelled by Sam Staff.");
  });

  it("a refused booking, move or cancel queues nothing", async () => {
    const q = await depositPaidQuote(db, "Ray Refused");
    const past = new Date(Date.now() - 86_400_000).toISOString();
    expect(await newNotices(() => expect(bookInstall(db, staff(q.id), { start: past }, STAFF_A)).rejects.toThrow())).toEqual([]);
    expect(await newNotices(() => expect(moveInstall(db, { shopId: SHOP_A }, q.id, { start: past }, STAFF_A)).rejects.toThrow())).toEqual(
      [],
    );
    expect(await newNotices(() => expect(cancelInstall(db, { shopId: SHOP_A }, q.id, STAFF_A)).rejects.toThrow())).toEqual([]);
    expect(await db("bookings").where({ quote_id: q.id })).toEqual([]);
  });
});

describe("the shop's own notice address", () => {
  it("set in the shop's settings, it receives the notices instead of the owners; a bad one is refused naming the field", async () => {
    const { updateShopSettings, getShop } = await import("@/lib/shop/queries");
    const { shopSettingsSchema } = await import("@/lib/shop/schema");
    const shop = await getShop(db, SHOP_A);
    const form = {
      name: shop.name,
      address: shop.address,
      phone: shop.phone,
      taxRate: "8.25",
      labourRate: "0",
      fabricationRate: "0",
      quoteValidityDays: "14",
      depositPct: "25",
      currency: "USD",
    };
    const bad = shopSettingsSchema.safeParse({ ...form, noticeEmail: "front desk" });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["noticeEmail", "Enter an e-mail address like name@example.com, or leave it empty."],
    ]);
    await updateShopSettings(db, SHOP_A, shopSettingsSchema.parse({ ...form, noticeEmail: " desk@shop-a.example.test " }));
    const q = await sentQuote(db, "Nia Notice");
    await answerByToken(db, q.token, "accepted", CUSTOMER);
    const last = (await queuedMails(db)).at(-1)!;
    expect(last.to).toBe("desk@shop-a.example.test");
    expect(last.subject).toMatch(/^Accepted: quote Q-\d+ by Nia Notice$/);
    // Cleared again (the form left empty): back to the owners.
    await updateShopSettings(db, SHOP_A, shopSettingsSchema.parse({ ...form, noticeEmail: "" }));
    const other = await sentQuote(db, "Ola Owners");
    expect(await newNotices(() => answerByToken(db, other.token, "accepted", CUSTOMER))).toHaveLength(1);
  });
});
