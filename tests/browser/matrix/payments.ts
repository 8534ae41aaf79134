import { type MatrixCase, onDraftQuote, ownerOnly, publicRoute, shopTeam } from "./types";

const UNKNOWN_LINK = "A".repeat(43);

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
  onDraftQuote("payments", "GET", shopTeam()),
  onDraftQuote("payments", "POST", shopTeam(422), { body: { amount: "", method: "cash" }, note: "no amount: refused before any lookup" }),
  onDraftQuote("refunds", "POST", ownerOnly(409), { body: { amount: "10.00" }, note: "owner only; a draft has no deposit to refund" }),
];
