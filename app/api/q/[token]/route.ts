import { z } from "zod";
import { ConflictError, NotFoundError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { appOrigin } from "@/lib/platform/mail";
import { createDepositSession } from "@/lib/shop/payments/provider";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { paymentQueries } from "@/lib/shop/payments/queries";
import { quoteQueries } from "@/lib/shop/quotes/queries";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { publicQuoteActionSchema } from "@/lib/shop/quotes/schema";
import { LINK_TOKEN_RE } from "@/lib/platform/tokenFormat";

const params = z.object({ token: z.string().regex(LINK_TOKEN_RE) });
const customer = { userId: null, label: "customer" };

/** The customer's actions on their quote link: accept, decline, or pay the deposit. */
export const POST = route({ access: "public", params, body: publicQuoteActionSchema }, async ({ req, params, body }) => {
  // Anyone with the link may act on it: a cap per link and per address keeps scripts from
  // opening checkout sessions (each a provider call and a payments row) in a loop.
  await rateLimitQueries.consumeOrRefuse(
    [
      { spec: RATE_LIMITS.quoteActionsPerLink, key: params.token },
      { spec: RATE_LIMITS.quoteActionsPerAddress, key: clientAddress(req.headers) },
    ],
    "Too many actions on this quote.",
  );
  if (body.action === "accept" || body.action === "decline") {
    await quoteQueries.answerByToken(params.token, body.action === "accept" ? "accepted" : "declined", customer);
    return { ok: true };
  }
  const quote = await quoteQueries.findByToken(params.token);
  if (!quote) throw new NotFoundError("That quote");
  if (quote.status !== "accepted") throw new ConflictError("Accept the quote before paying the deposit.");
  if (quote.deposit_cents <= 0) throw new ConflictError("This quote asks no deposit.");
  // The shop's name as on the quote the customer received, even if the shop renamed itself since.
  const [sent, parties] = await Promise.all([quoteQueries.latestSentDocument(quote.id), paymentQueries.depositParties(quote)]);
  const link = `${appOrigin()}/q/${params.token}`;
  const session = await createDepositSession({
    quoteId: quote.id,
    shopId: quote.shop_id,
    quoteNumber: quote.number,
    shopName: sent?.shop.name ?? parties.shopName,
    amountCents: quote.deposit_cents,
    customerEmail: parties.customerEmail,
    successUrl: `${link}?paid=1`,
    cancelUrl: link,
  });
  await paymentQueries.recordDepositSession(quote, session.id);
  return { url: session.url };
});
