import { type MatrixCase, only, publicRoute } from "./types";

/** The demo draft quote (db/seeds/05_demo_shop.ts), written by the demo staff member: staff and owner both see it. */
const DRAFT = "d0000000-0000-4000-8000-000000000001";
const UNKNOWN_LINK = "A".repeat(43);
const UNKNOWN_BOOKING = "d0000000-0000-4000-8000-0000000000ff";
const SHOP = ["shop_staff", "shop_owner"] as const;
const owner = (status: number) => ({ ...only(["shop_owner"], status), shop_staff: 403 });

export const cases: MatrixCase[] = [
  { route: "/api/shop/bays", method: "GET", path: "/api/shop/bays", expect: only([...SHOP]) },
  {
    route: "/api/shop/bays",
    method: "PUT",
    path: "/api/shop/bays",
    body: { timeZone: "" },
    expect: owner(422),
    note: "invalid body: owners get field errors, staff a 403 before any parsing",
  },
  { route: "/api/shop/bookings", method: "GET", path: "/api/shop/bookings?days=7", expect: only([...SHOP]) },
  {
    route: "/api/shop/quotes/[id]/booking/slots",
    method: "GET",
    path: `/api/shop/quotes/${DRAFT}/booking/slots`,
    expect: only([...SHOP], 409),
    note: "a draft has no deposit paid",
  },
  // Booking and moving take the same body and refuse the same way.
  ...(["POST", "PUT"] as const).map((method) => ({
    route: "/api/shop/quotes/[id]/booking",
    method,
    path: `/api/shop/quotes/${DRAFT}/booking`,
    body: { start: "tomorrow" },
    expect: only([...SHOP], 422),
    note: "not a time",
  })),
  {
    route: "/api/shop/quotes/[id]/booking",
    method: "DELETE",
    path: `/api/shop/quotes/${DRAFT}/booking`,
    expect: only([...SHOP], 409),
    note: "nothing booked to cancel",
  },
  // A booking of either kind by its id (the calendar): one of another shop, or none, is not found.
  {
    route: "/api/shop/bookings/[id]/slots",
    method: "GET",
    path: `/api/shop/bookings/${UNKNOWN_BOOKING}/slots`,
    expect: only([...SHOP], 404),
    note: "no such booking",
  },
  ...(["PUT", "DELETE"] as const).map((method) => ({
    route: "/api/shop/bookings/[id]",
    method,
    path: `/api/shop/bookings/${UNKNOWN_BOOKING}`,
    ...(method === "PUT" ? { body: { start: "2030-01-07T15:00:00Z" } } : {}),
    expect: only([...SHOP], 404),
    note: "no such booking",
  })),
  { route: "/api/q/[token]/slots", method: "GET", path: `/api/q/${UNKNOWN_LINK}/slots`, expect: publicRoute(404), note: "unknown link" },
  {
    route: "/api/q/[token]/booking",
    method: "POST",
    path: `/api/q/${UNKNOWN_LINK}/booking`,
    body: { start: "2030-01-07T15:00:00Z" },
    expect: publicRoute(404),
    note: "unknown link",
  },
];
