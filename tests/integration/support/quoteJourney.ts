import { randomBytes } from "node:crypto";
import type { Knex } from "knex";
import { SHOP_A, U, VEHICLE, quoteRequest } from "./shopFixture";

/*
 * A quote of shop A taken along its way through the queries themselves (no provider, no HTTP):
 * written and sent by staff, its deposit paid by a provider event as the webhook hands it over,
 * bookable in an always-open shop. For tests of what happens around those steps.
 */

export const STAFF_A = { userId: U.staffA.id, label: U.staffA.name };

const unique = () => randomBytes(4).toString("hex");

/** Opens shop A every day, all day, in one zone, with a lift bay and a rack; every service 5 minutes in the bay of its kind. */
export async function openAllDay(db: Knex, timeZone = "America/Denver"): Promise<{ lift: string; rack: string }> {
  await db("shop_schedules").insert({ shop_id: SHOP_A, time_zone: timeZone });
  await db("shop_opening_hours").insert(
    [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ shop_id: SHOP_A, weekday, opens_minute: 0, closes_minute: 1440 })),
  );
  const [lift, rack] = (await db("bays")
    .insert([
      { shop_id: SHOP_A, name: "Lift 1", kind: "lift_bay", position: 0 },
      { shop_id: SHOP_A, name: "Rack", kind: "alignment_rack", position: 1 },
    ])
    .returning("id")) as { id: string }[];
  const services = await db("catalog_items").where({ shop_id: SHOP_A, kind: "service" }).select("id", "service_type");
  await db("service_times").insert(
    services.map((s: { id: string; service_type: string }) => ({
      shop_id: SHOP_A,
      catalog_item_id: s.id,
      minutes_per_unit: 5,
      bay_kind: s.service_type === "alignment" ? "alignment_rack" : "lift_bay",
    })),
  );
  return { lift: lift!.id, rack: rack!.id };
}

/** A new customer and a quote for them, written and sent by shop A's staff; its id and the customer's link token. */
export async function sentQuote(
  db: Knex,
  name = "Journey Customer",
  vehicle: object = VEHICLE,
): Promise<{ id: string; token: string; email: string }> {
  const { createCustomer } = await import("@/lib/shop/customers/queries");
  const { createQuote, markSent } = await import("@/lib/shop/quotes/queries");
  const { createQuoteSchema } = await import("@/lib/shop/quotes/schema");
  const email = `j${unique()}@example.test`;
  const customer = await createCustomer(db, SHOP_A, { name, phone: "", email });
  const request = createQuoteSchema.parse(await quoteRequest(db, { customerId: customer.id, vehicle }));
  const id = await createQuote(db, SHOP_A, STAFF_A, request);
  const { token } = await markSent(db, { shopId: SHOP_A }, id, STAFF_A);
  return { id, token, email };
}

/** The provider's "checkout completed" for a deposit session recorded on the quote, as the webhook route hands it to applyPaymentEvent. */
export async function depositEvent(db: Knex, quoteId: string) {
  const { recordDepositSession } = await import("@/lib/shop/payments/queries");
  const quote = await db("quotes").where({ id: quoteId }).first();
  const session = `cs_${unique()}`;
  await recordDepositSession(db, quote, session);
  return {
    id: `evt_${unique()}`,
    type: "checkout.session.completed" as const,
    data: {
      object: {
        id: session,
        amount_total: quote.deposit_cents as number,
        currency: "usd",
        payment_status: "paid",
        client_reference_id: quoteId,
        metadata: { quote_id: quoteId },
        payment_intent: `pi_${unique()}`,
      },
    },
  };
}

/** A sent quote accepted on its link and its deposit paid through the provider's event. */
export async function depositPaidQuote(db: Knex, name?: string, vehicle?: object) {
  const { answerByToken } = await import("@/lib/shop/quotes/queries");
  const { applyPaymentEvent } = await import("@/lib/shop/payments/queries");
  const q = await sentQuote(db, name, vehicle);
  await answerByToken(db, q.token, "accepted", { userId: null, label: "customer" });
  await applyPaymentEvent(db, await depositEvent(db, q.id));
  return q;
}

/** The first free start for the quote's work within two weeks (ISO). */
export async function firstFreeStart(db: Knex, quoteId: string): Promise<string> {
  const { slotsForQuote } = await import("@/lib/shop/bookings/queries");
  const quote = await db("quotes").where({ id: quoteId }).first();
  const slots = await slotsForQuote(db, quote, { days: 14 });
  return slots.days.flatMap((d) => d.slots)[0]!.start;
}

/** Every mail job queued so far, oldest first. */
export async function queuedMails(db: Knex): Promise<{ to: string; subject: string; text: string; html?: string }[]> {
  const rows = await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).orderBy("created_on").select("data");
  return rows.map((r: { data: { to: string; subject: string; text: string; html?: string } }) => r.data);
}
