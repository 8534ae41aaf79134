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

/** A duplicate (same phone digits or e-mail) is a 409 carrying the `existing` customer. */
export const POST = route({ access: SHOP_ANY, body: customerSchema, idempotent: true }, async ({ caller, body }) => {
  return Response.json({ customer: await customerQueries.createCustomer(shopIdOf(caller), body) }, { status: 201 });
});
