import { DRAFT, type MatrixCase, invalidOwnerForm, publicRoute, rowsOn, shopTeam } from "./types";

/** No work order has this id. */
const UNKNOWN = "e0000000-0000-4000-8000-00000000dead";
const onNoWorkOrder = rowsOn("/api/shop/work-orders", UNKNOWN);
/** No re-check e-mail carried this link. */
const UNKNOWN_LINK = "A".repeat(43);

export const cases: MatrixCase[] = [
  {
    route: "/api/shop/work-orders",
    method: "POST",
    path: "/api/shop/work-orders",
    body: { quoteId: DRAFT },
    expect: shopTeam(409),
    note: "a draft is not booked",
  },
  onNoWorkOrder("", "GET", shopTeam(404)),
  onNoWorkOrder("steps", "PUT", shopTeam(422), {
    body: { step: "fitted", position: "LF", dotCode: "9999", tire: "t", wheel: "w" },
    note: "week 99 does not exist: refused before any lookup",
  }),
  onNoWorkOrder("status", "POST", shopTeam(404), { body: { to: "in_bay" }, note: "no such work order" }),
  // Step photos: the shop's staff only; another shop's (or no) work order is not found, never 403.
  onNoWorkOrder("photos", "GET", shopTeam(404)),
  onNoWorkOrder("photos", "POST", shopTeam(415), {
    body: { file: "not multipart" },
    note: "JSON instead of multipart: refused before any lookup",
  }),
  ...(["GET", "DELETE"] as const).map((method) => ({
    route: "/api/shop/work-orders/[id]/photos/[photoId]",
    method,
    path: `/api/shop/work-orders/${UNKNOWN}/photos/${UNKNOWN}`,
    expect: shopTeam(404),
    note: "no such work order or photo",
  })),
  { route: "/api/shop/rechecks", method: "GET", path: "/api/shop/rechecks", expect: shopTeam() },
  invalidOwnerForm("/api/shop/rechecks", { days: 0 }),
  { route: "/api/shop/rechecks/slot", method: "GET", path: "/api/shop/rechecks/slot", expect: shopTeam() },
  invalidOwnerForm("/api/shop/rechecks/slot", { minutes: 5 }),
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
