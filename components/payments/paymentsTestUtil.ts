/**
 * The deposit of the worked quote the payment tests share: 25 % of 4,307.82 = 1,076.96, paid through the
 * provider (tests/integration/shop-quotes.test.ts, worked by hand in cents), as the payment history lists it.
 */
export const PAID_DEPOSIT = {
  id: "p1",
  kind: "deposit" as const,
  method: "provider" as const,
  amountCents: 107696,
  paidAt: "2027-03-01T17:00:00Z",
  recordedBy: "",
};
