/**
 * Who keeps a garage: every signed-in person. Shop staff and owners included: joining a shop
 * turns a person's existing account into the shop account (same e-mail, same password), so the
 * garage they kept as a member must not vanish while they work at a shop, and comes with them
 * when they leave it. Every row is scoped by the caller: the shop never sees a staff member's
 * garage, and customers' vehicles belong with the customer on a quote, not in anyone's garage.
 */
export const GARAGE_ACCESS = ["member", "shop_staff", "shop_owner", "admin"] as const;
