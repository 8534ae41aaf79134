import { type MatrixCase, invalidOwnerForm, onDraftQuote, publicRoute, shopTeam } from "./types";

const UNKNOWN_LINK = "A".repeat(43);
const UNKNOWN_BOOKING = "d0000000-0000-4000-8000-0000000000ff";

export const cases: MatrixCase[] = [
  { route: "/api/shop/bays", method: "GET", path: "/api/shop/bays", expect: shopTeam() },
  invalidOwnerForm("/api/shop/bays", { timeZone: "" }),
  { route: "/api/shop/bookings", method: "GET", path: "/api/shop/bookings?days=7", expect: shopTeam() },
  onDraftQuote("booking/slots", "GET", shopTeam(409), { note: "a draft has no deposit paid" }),
  // Booking and moving take the same body and refuse the same way.
  ...(["POST", "PUT"] as const).map((method) =>
    onDraftQuote("booking", method, shopTeam(422), { body: { start: "tomorrow" }, note: "not a time" }),
  ),
  onDraftQuote("booking", "DELETE", shopTeam(409), { note: "nothing booked to cancel" }),
  // A booking of either kind by its id (the calendar): one of another shop, or none, is not found.
  {
    route: "/api/shop/bookings/[id]/slots",
    method: "GET",
    path: `/api/shop/bookings/${UNKNOWN_BOOKING}/slots`,
    expect: shopTeam(404),
    note: "no such booking",
  },
  ...(["PUT", "DELETE"] as const).map((method) => ({
    route: "/api/shop/bookings/[id]",
    method,
    path: `/api/shop/bookings/${UNKNOWN_BOOKING}`,
    ...(method === "PUT" ? { body: { start: "2030-01-07T15:00:00Z" } } : {}),
    expect: shopTeam(404),
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
