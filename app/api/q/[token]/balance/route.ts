import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { LINK_TOKEN_RE } from "@/lib/platform/tokenFormat";
import { ledgerQueries } from "@/lib/shop/payments/ledgerQueries";
import { refuseTooManyLinkActions } from "@/lib/shop/quotes/linkLimits";

const params = z.object({ token: z.string().regex(LINK_TOKEN_RE) });

/** The customer's invoice and payment history on their link. */
export const GET = route({ access: "public", params }, async ({ params }) => ({
  payments: await ledgerQueries.publicPayments(params.token),
}));

/** The customer pays the balance: a checkout session on the provider's page for what is still owed; the answer is its URL. */
export const POST = route({ access: "public", params, body: z.object({}) }, async ({ req, params }) => {
  await refuseTooManyLinkActions(req, params.token);
  return ledgerQueries.openBalanceCheckout(params.token);
});
