import { z } from "zod";
import { db } from "@/lib/db";
import { HttpError, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { clientAddress } from "@/lib/auth/clientAddress";
import { appOrigin } from "@/lib/mail";
import { RATE_LIMITS } from "@/lib/server/limits";
import { consumeOrRefuse } from "@/lib/server/rateLimit";
import { createDepositSession } from "@/lib/payments/provider";
import { findByToken, latestSentDocument, transition } from "@/lib/server/quotes";
import { publicQuoteActionSchema } from "@/lib/validation/quotes";

const params = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/) });
const customer = { userId: null, label: "customer" };

/** The customer's actions on their quote link: accept, decline, or pay the deposit. */
export const POST = route({ access: "public", params, body: publicQuoteActionSchema }, async ({ req, params, body }) => {
  // Anyone with the link may act on it: a cap per link and per address keeps scripts from
  // opening checkout sessions (each a provider call and a payments row) in a loop.
  await consumeOrRefuse(
    db,
    [
      { spec: RATE_LIMITS.quoteActionsPerLink, key: params.token },
      { spec: RATE_LIMITS.quoteActionsPerAddress, key: clientAddress(req.headers) },
    ],
    "Too many actions on this quote.",
  );
  if (body.action === "accept" || body.action === "decline") {
    await db.transaction(async (trx) => {
      const quote = await findByToken(trx, params.token, true);
      if (!quote) throw notFound("That quote");
      await transition(trx, quote, body.action === "accept" ? "accepted" : "declined", customer);
    });
    return { ok: true };
  }
  const quote = await findByToken(db, params.token);
  if (!quote) throw notFound("That quote");
  if (quote.status !== "accepted") throw new HttpError(409, "Accept the quote before paying the deposit.");
  if (quote.deposit_cents <= 0) throw new HttpError(409, "This quote asks no deposit.");
  // The shop's name as on the quote the customer received, even if the shop renamed itself since.
  const [sent, shop, cust] = await Promise.all([
    latestSentDocument(db, quote.id),
    db("shops").where({ id: quote.shop_id }).first("name"),
    db("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("email"),
  ]);
  const link = `${appOrigin()}/q/${params.token}`;
  const session = await createDepositSession({
    quoteId: quote.id,
    shopId: quote.shop_id,
    quoteNumber: quote.number,
    shopName: sent?.shop.name ?? shop.name,
    amountCents: quote.deposit_cents,
    customerEmail: cust?.email ?? "",
    successUrl: `${link}?paid=1`,
    cancelUrl: link,
  });
  await db("payments").insert({ shop_id: quote.shop_id, quote_id: quote.id, provider_session_id: session.id, amount_cents: quote.deposit_cents, currency: "usd" });
  return { url: session.url };
});
