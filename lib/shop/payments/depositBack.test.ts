import { describe, expect, it } from "vitest";
import { depositGivenBack, invoiceDepositGivenBack } from "./depositBack";
import { invoiceFigures } from "./invoice";

// The deposit of shop-balance.test.ts: 25 % of 4,307.82 = 1,076.96 (worked by hand there).
const DEPOSIT = 107696;

describe("depositGivenBack", () => {
  it("is true once the refunds asked reach the deposit paid, not for a part refund or when nothing was paid", () => {
    expect(depositGivenBack(DEPOSIT, DEPOSIT)).toBe(true);
    expect(depositGivenBack(DEPOSIT, DEPOSIT - 1)).toBe(false);
    expect(depositGivenBack(0, 0)).toBe(false);
  });

  it("reads the same from the invoice, pending refunds included (they are already asked of the provider)", () => {
    const paid = [{ kind: "deposit" as const, status: "paid" as const, amountCents: DEPOSIT }];
    expect(invoiceDepositGivenBack(invoiceFigures(430782, paid, [{ status: "pending", amountCents: DEPOSIT }]))).toBe(true);
    expect(invoiceDepositGivenBack(invoiceFigures(430782, paid, [{ status: "succeeded", amountCents: 40000 }]))).toBe(false);
    // 400.00 + 676.96 = 1,076.96 (by hand): two refunds that together give back the whole deposit.
    const both = [
      { status: "succeeded" as const, amountCents: 40000 },
      { status: "succeeded" as const, amountCents: 67696 },
    ];
    expect(invoiceDepositGivenBack(invoiceFigures(430782, paid, both))).toBe(true);
    expect(invoiceDepositGivenBack(invoiceFigures(430782, [], []))).toBe(false);
  });
});
