import { HttpError } from "@/lib/platform/http/errors";
import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { customerQueries } from "@/lib/shop/customers/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { customerSchema, customerSearchSchema } from "@/lib/shop/quotes/schema";

/** Finds the shop's customers again by phone (digits), e-mail or name. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  // The quote builder shows only the message, under its search box labelled like this.
  const query = parseLabelledQuery(customerSearchSchema, req, { q: "Phone, e-mail or name" });
  return { customers: await customerQueries.searchCustomers(shopIdOf(caller), query.q) };
});

export const POST = route({ access: SHOP_ANY, body: customerSchema, idempotent: true }, async ({ caller, body }) => {
  const shopId = shopIdOf(caller);
  const dup = await customerQueries.findDuplicateCustomer(shopId, body);
  if (dup) {
    return Response.json({ error: `${dup.name} already has this phone number or e-mail. Pick the existing customer.`, existing: dup }, { status: 409 });
  }
  if (!body.phone && !body.email) throw new HttpError(422, "Enter a phone number or an e-mail address.");
  return Response.json({ customer: await customerQueries.createCustomer(shopId, body) }, { status: 201 });
});
