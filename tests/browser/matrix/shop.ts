import { type MatrixCase, only, publicRoute } from "./types";

/** Ids from db/seeds/01_demo_accounts.ts and db/seeds/05_demo_shop.ts. */
const NOBODY = "00000000-0000-4000-8000-000000000000";
const CUSTOMER = "c0000000-0000-4000-8000-000000000001";
/** Written by the demo staff member, so staff and owner both see it. */
const DRAFT = "d0000000-0000-4000-8000-000000000001";
const SHOP = ["shop_staff", "shop_owner"] as const;
const owner = (status: number, staffStatus = 403) => ({ ...only(["shop_owner"], status), shop_staff: staffStatus });

export const cases: MatrixCase[] = [
  { route: "/api/shop/settings", method: "GET", path: "/api/shop/settings", expect: only([...SHOP]) },
  {
    route: "/api/shop/settings",
    method: "PUT",
    path: "/api/shop/settings",
    body: { name: "" },
    expect: owner(422),
    note: "invalid body: owners get field errors, staff a 403 before any parsing",
  },
  { route: "/api/shop/staff", method: "GET", path: "/api/shop/staff", expect: owner(200) },
  { route: "/api/shop/staff", method: "POST", path: "/api/shop/staff", body: { email: "not-an-address" }, expect: owner(422) },
  { route: "/api/shop/staff/[id]", method: "DELETE", path: `/api/shop/staff/${NOBODY}`, expect: owner(404), note: "no such staff member" },
  { route: "/api/shop/staff/invites/[id]", method: "DELETE", path: `/api/shop/staff/invites/${NOBODY}`, expect: owner(404) },
  {
    route: "/api/join",
    method: "POST",
    path: "/api/join",
    body: { token: "x".repeat(43), password: "whatever" },
    expect: publicRoute(410),
  },
  {
    route: "/api/shop/catalog",
    method: "GET",
    path: "/api/shop/catalog?kind=tire&sort=price_cents&dir=desc&pageSize=5",
    expect: only([...SHOP]),
  },
  {
    route: "/api/shop/catalog/import",
    method: "POST",
    path: "/api/shop/catalog/import",
    body: "sku;price\nA;1\n",
    expect: owner(422),
    note: "wrong headers",
  },
  { route: "/api/shop/catalog/import/[id]", method: "POST", path: `/api/shop/catalog/import/${NOBODY}`, expect: owner(404) },
  {
    route: "/api/shop/catalog",
    method: "POST",
    path: "/api/shop/catalog",
    body: { kind: "tire", sku: "", description: "", price: "" },
    expect: owner(422),
    note: "single-item add: owners get field errors, staff a 403 before any parsing",
  },
  { route: "/api/shop/catalog/[id]", method: "GET", path: `/api/shop/catalog/${NOBODY}`, expect: only([...SHOP], 404) },
  {
    route: "/api/shop/catalog/[id]",
    method: "PUT",
    path: `/api/shop/catalog/${NOBODY}`,
    body: { kind: "service", sku: "SV-X", description: "Valve stem", price: "5", serviceType: "valve_stem" },
    expect: owner(404),
  },
  {
    route: "/api/shop/catalog/[id]/archived",
    method: "PUT",
    path: `/api/shop/catalog/${NOBODY}/archived`,
    body: { archived: true },
    expect: owner(404),
  },
  { route: "/api/shop/catalog/export", method: "GET", path: "/api/shop/catalog/export", expect: only([...SHOP]) },
  { route: "/api/shop/catalog/template", method: "GET", path: "/api/shop/catalog/template", expect: only([...SHOP]) },
  { route: "/api/shop/customers", method: "GET", path: "/api/shop/customers?q=555-0160", expect: only([...SHOP]) },
  {
    route: "/api/shop/customers",
    method: "POST",
    path: "/api/shop/customers",
    body: { name: "", phone: "", email: "" },
    expect: only([...SHOP], 422),
  },
  { route: "/api/shop/customers/[id]", method: "GET", path: `/api/shop/customers/${CUSTOMER}`, expect: only([...SHOP]) },
  {
    route: "/api/shop/fitment/candidates",
    method: "POST",
    path: "/api/shop/fitment/candidates",
    body: { description: "x", boltPattern: "nope" },
    expect: only([...SHOP], 422),
  },
  { route: "/api/shop/quotes", method: "GET", path: "/api/shop/quotes", expect: only([...SHOP]) },
  { route: "/api/shop/quotes/export", method: "GET", path: "/api/shop/quotes/export?q=Q-1", expect: only([...SHOP]) },
  { route: "/api/shop/quotes", method: "POST", path: "/api/shop/quotes", body: { quantity: 6 }, expect: only([...SHOP], 422) },
  { route: "/api/shop/quotes/[id]", method: "GET", path: `/api/shop/quotes/${DRAFT}`, expect: only([...SHOP]) },
  {
    route: "/api/shop/quotes/[id]",
    method: "PUT",
    path: `/api/shop/quotes/${DRAFT}`,
    body: { lines: [{ kind: "custom", description: "x", quantity: -1, unitPriceCents: 100 }], discountCents: 0 },
    expect: only([...SHOP], 422),
    note: "negative quantity",
  },
  {
    route: "/api/shop/quotes/[id]/status",
    method: "POST",
    path: `/api/shop/quotes/${DRAFT}/status`,
    body: { to: "installed" },
    expect: only([...SHOP], 409),
    note: "a draft cannot be installed",
  },
  { route: "/api/shop/quotes/[id]/send", method: "POST", path: `/api/shop/quotes/${NOBODY}/send`, body: {}, expect: only([...SHOP], 404) },
  { route: "/api/shop/quotes/[id]/pdf", method: "GET", path: `/api/shop/quotes/${DRAFT}/pdf`, expect: only([...SHOP]) },
  {
    route: "/api/payments/webhook",
    method: "POST",
    path: "/api/payments/webhook",
    body: { type: "checkout.session.completed" },
    expect: publicRoute(400),
    note: "no signature",
  },
  {
    route: "/api/q/[token]",
    method: "POST",
    path: `/api/q/${"A".repeat(43)}`,
    body: { action: "accept" },
    expect: publicRoute(404),
    note: "unknown link",
  },
];
