import { describe, expect, it } from "vitest";
import { invoiceFigures, invoiceLines, overLimit } from "./invoice";

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

describe("a refunded deposit is not money the shop holds", () => {
  // Worked by hand in integer cents (common practice, no source): a quote of 1,700.49 with a
  // 425.12 deposit (25 % of 1,700.49 = 425.1225 → 425.12), refunded as 125.12 then 300.00.
  const total = 170049;
  const paid = [{ kind: "deposit" as const, status: "paid" as const, amountCents: 42512 }];

  it("refunded in full: 1,700.49 − 425.12 + (125.12 + 300.00) = 1,700.49 still to pay", () => {
    const f = invoiceFigures(total, paid, [
      { status: "succeeded", amountCents: 12512 },
      { status: "succeeded", amountCents: 30000 },
    ]);
    expect(f).toMatchObject({
      depositPaidCents: 42512,
      refundedCents: 42512,
      depositHeldCents: 0,
      balanceDueCents: 170049,
      outstandingCents: 170049,
      paid: false,
      refundableCents: 0,
    });
    expect(invoiceLines(f)).toEqual([
      "Quote total: $1,700.49",
      "Deposit paid: −$425.12",
      "Deposit refunded: +$425.12",
      "Balance due: $1,700.49",
      "Still to pay: $1,700.49",
    ]);
  });

  it("refunded in part: 1,700.49 − (425.12 − 125.12) = 1,400.49 due; a balance of 1,275.37 no longer pays it", () => {
    const f = invoiceFigures(
      total,
      [...paid, { kind: "balance", status: "paid", amountCents: 127537 }],
      [{ status: "succeeded", amountCents: 12512 }],
    );
    // 1,400.49 − 1,275.37 = 125.12: exactly the part given back.
    expect(f).toMatchObject({ depositHeldCents: 30000, balanceDueCents: 140049, outstandingCents: 12512, paid: false });
  });

  it("a refund still waiting for the provider is not taken off yet, but is no longer refundable", () => {
    const f = invoiceFigures(total, paid, [{ status: "pending", amountCents: 42512 }]);
    // 1,700.49 − 425.12 = 1,275.37 until the provider confirms.
    expect(f).toMatchObject({ depositHeldCents: 42512, balanceDueCents: 127537, refundedCents: 0, refundableCents: 0 });
    expect(invoiceLines(f)).not.toContain("Deposit refunded: +$425.12");
  });

  it("a refund the provider reports as failed gave nothing back: the whole deposit is refundable again and still held", () => {
    // 425.12 − 100.00 (the part that succeeded) = 325.12 refundable; the failed 325.12 counts nowhere (by hand).
    const f = invoiceFigures(total, paid, [
      { status: "succeeded", amountCents: 10000 },
      { status: "failed", amountCents: 32512 },
    ]);
    expect(f).toMatchObject({ refundedCents: 10000, depositHeldCents: 32512, refundableCents: 32512 });
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
