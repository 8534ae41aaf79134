import { type MatrixCase, only, publicRoute } from "./types";

/** The demo draft quote (db/seeds/05_demo_shop.ts): in the demo shop, not done, no deposit paid. */
const DRAFT = "d0000000-0000-4000-8000-000000000001";
const UNKNOWN_LINK = "A".repeat(43);
const SHOP = ["shop_staff", "shop_owner"] as const;

export const cases: MatrixCase[] = [
  {
    route: "/api/q/[token]/balance",
    method: "GET",
    path: `/api/q/${UNKNOWN_LINK}/balance`,
    expect: publicRoute(404),
    note: "unknown link",
  },
  {
    route: "/api/q/[token]/balance",
    method: "POST",
    path: `/api/q/${UNKNOWN_LINK}/balance`,
    body: {},
    expect: publicRoute(404),
    note: "unknown link",
  },
  {
    route: "/api/shop/quotes/[id]/payments",
    method: "GET",
    path: `/api/shop/quotes/${DRAFT}/payments`,
    expect: only([...SHOP]),
  },
  {
    route: "/api/shop/quotes/[id]/payments",
    method: "POST",
    path: `/api/shop/quotes/${DRAFT}/payments`,
    body: { amount: "", method: "cash" },
    expect: only([...SHOP], 422),
    note: "no amount: refused before any lookup",
  },
  {
    route: "/api/shop/quotes/[id]/refunds",
    method: "POST",
    path: `/api/shop/quotes/${DRAFT}/refunds`,
    body: { amount: "10.00" },
    expect: only(["shop_owner"], 409),
    note: "owner only; a draft has no deposit to refund",
  },
];
