import { type MatrixCase, only, publicRoute } from "./types";

/** The demo draft quote (db/seeds/05_demo_shop.ts): in the demo shop, not booked. */
const DRAFT = "d0000000-0000-4000-8000-000000000001";
/** No work order has this id. */
const UNKNOWN = "e0000000-0000-4000-8000-00000000dead";
const SHOP = ["shop_staff", "shop_owner"] as const;
/** No re-check e-mail carried this link. */
const UNKNOWN_LINK = "A".repeat(43);

export const cases: MatrixCase[] = [
  {
    route: "/api/shop/work-orders",
    method: "POST",
    path: "/api/shop/work-orders",
    body: { quoteId: DRAFT },
    expect: only([...SHOP], 409),
    note: "a draft is not booked",
  },
  { route: "/api/shop/work-orders/[id]", method: "GET", path: `/api/shop/work-orders/${UNKNOWN}`, expect: only([...SHOP], 404) },
  {
    route: "/api/shop/work-orders/[id]/steps",
    method: "PUT",
    path: `/api/shop/work-orders/${UNKNOWN}/steps`,
    body: { step: "fitted", position: "LF", dotCode: "9999", tire: "t", wheel: "w" },
    expect: only([...SHOP], 422),
    note: "week 99 does not exist: refused before any lookup",
  },
  {
    route: "/api/shop/work-orders/[id]/status",
    method: "POST",
    path: `/api/shop/work-orders/${UNKNOWN}/status`,
    body: { to: "in_bay" },
    expect: only([...SHOP], 404),
    note: "no such work order",
  },
  // Step photos: the shop's staff only; another shop's (or no) work order is not found, never 403.
  {
    route: "/api/shop/work-orders/[id]/photos",
    method: "GET",
    path: `/api/shop/work-orders/${UNKNOWN}/photos`,
    expect: only([...SHOP], 404),
  },
  {
    route: "/api/shop/work-orders/[id]/photos",
    method: "POST",
    path: `/api/shop/work-orders/${UNKNOWN}/photos`,
    body: { file: "not multipart" },
    expect: only([...SHOP], 415),
    note: "JSON instead of multipart: refused before any lookup",
  },
  ...(["GET", "DELETE"] as const).map((method) => ({
    route: "/api/shop/work-orders/[id]/photos/[photoId]",
    method,
    path: `/api/shop/work-orders/${UNKNOWN}/photos/${UNKNOWN}`,
    expect: only([...SHOP], 404),
    note: "no such work order or photo",
  })),
  { route: "/api/shop/rechecks", method: "GET", path: "/api/shop/rechecks", expect: only([...SHOP]) },
  {
    route: "/api/shop/rechecks",
    method: "PUT",
    path: "/api/shop/rechecks",
    body: { days: 0 },
    expect: { ...only(["shop_owner"], 422), shop_staff: 403 },
    note: "invalid body: owners get field errors, staff a 403 before any parsing",
  },
  { route: "/api/shop/rechecks/slot", method: "GET", path: "/api/shop/rechecks/slot", expect: only([...SHOP]) },
  {
    route: "/api/shop/rechecks/slot",
    method: "PUT",
    path: "/api/shop/rechecks/slot",
    body: { minutes: 5 },
    expect: { ...only(["shop_owner"], 422), shop_staff: 403 },
    note: "invalid body: owners get field errors, staff a 403 before any parsing",
  },
  // The re-check e-mail's link: both routes look the link up before anything else.
  ...(
    [
      ["slots", "GET", undefined],
      ["booking", "POST", { start: "2030-01-07T15:00:00Z" }],
    ] as const
  ).map(([leaf, method, body]) => ({
    route: `/api/recheck/[token]/${leaf}`,
    method,
    path: `/api/recheck/${UNKNOWN_LINK}/${leaf}`,
    ...(body ? { body } : {}),
    expect: publicRoute(404),
    note: "unknown re-check link",
  })),
];
