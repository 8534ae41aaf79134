import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";
import { quoteSendQueries } from "@/lib/shop/quotes/send";
import { SHOP_ANY } from "@/lib/shop/queries";
import { sendQuoteSchema } from "@/lib/shop/quotes/schema";

/**
 * Sends (or sends again) the quote: a new public link, the PDF attached, e-mailed to the
 * customer. With `seenUpdatedAt` a quote changed since the sender loaded it is refused (409).
 */
export const POST = route(
  { access: SHOP_ANY, params: z.object({ id: z.uuid() }), body: sendQuoteSchema },
  async ({ caller, params, body }) => {
    return quoteDetailDto(
      await quoteSendQueries.sendQuote(
        quoteScopeOf(caller),
        params.id,
        { userId: caller.userId, label: caller.name || caller.email },
        body.seenUpdatedAt,
      ),
    );
  },
);
