import { describe, expect, it } from "vitest";
import { invoiceFigures, overLimit } from "./invoice";

// The quote of tests/integration/shop-quotes.test.ts, worked by hand in integer cents:
// total 4,307.82; 25 % deposit = 1,076.955 → 1,076.96 (half a cent up); balance 4,307.82 − 1,076.96 = 3,230.86.
const TOTAL = 430782;
const deposit = { kind: "deposit" as const, status: "paid" as const, amountCents: 107696 };

describe("invoiceFigures", () => {
  it("balance due = total − deposit paid; open or expired sessions count for nothing", () => {
    const f = invoiceFigures(TOTAL, [deposit, { kind: "balance", status: "open", amountCents: 323086 }], []);
    expect(f).toMatchObject({
      depositPaidCents: 107696,
      balanceDueCents: 323086,
      balancePaidCents: 0,
      outstandingCents: 323086,
      paid: false,
    });
  });

  it("is paid when the balance payments add up to the balance due, to the cent", () => {
    const f = invoiceFigures(
      TOTAL,
      [deposit, { kind: "balance", status: "paid", amountCents: 100000 }, { kind: "balance", status: "paid", amountCents: 223086 }],
      [],
    );
    expect(f).toMatchObject({ balancePaidCents: 323086, outstandingCents: 0, paid: true });
    expect(invoiceFigures(TOTAL, [deposit, { kind: "balance", status: "paid", amountCents: 323085 }], []).paid).toBe(false);
  });

  it("a quote that asked no deposit owes its whole total", () => {
    expect(invoiceFigures(TOTAL, [], [])).toMatchObject({ depositPaidCents: 0, balanceDueCents: TOTAL, refundableCents: 0 });
  });

  it("refundable = deposit paid − refunds asked, pending ones included, so two refunds never exceed the deposit", () => {
    const f = invoiceFigures(
      TOTAL,
      [deposit],
      [
        { status: "succeeded", amountCents: 40000 },
        { status: "pending", amountCents: 60000 },
      ],
    );
    expect(f).toMatchObject({ refundedCents: 40000, refundableCents: 7696 });
  });
});

describe("overLimit", () => {
  it("names the field and both amounts; an amount equal to the limit fits", () => {
    expect(overLimit(323087, 323086, "Amount ($)", "the balance outstanding")).toBe(
      "Amount ($): $3,230.87 is more than the balance outstanding, $3,230.86.",
    );
    expect(overLimit(323086, 323086, "Amount ($)", "the balance outstanding")).toBeNull();
  });
});
