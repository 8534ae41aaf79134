// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { PaymentHistory } from "./PaymentHistory";
import { PAID_DEPOSIT } from "./paymentsTestUtil";

afterEach(cleanup);

// 4,307.82 − 1,076.96 = 3,230.86 (the quote of tests/integration/shop-quotes.test.ts, worked by hand).
const deposit = PAID_DEPOSIT;

describe("PaymentHistory", () => {
  it("shows the invoice with what is still to pay, and the deposit in the history", () => {
    const invoice = invoiceFigures(430782, [{ kind: "deposit", status: "paid", amountCents: 107696 }], []);
    render(<PaymentHistory payments={{ invoice, invoiceOpen: true, refundBlocked: null, payments: [deposit], refunds: [] }} />);
    expect(screen.getByTestId("invoice-status").textContent).toBe("$3,230.86 to pay");
    expect(screen.getByText("Balance due: $3,230.86")).toBeTruthy();
    expect(within(screen.getByRole("list", { name: "Payment history" })).getByText("$1,076.96")).toBeTruthy();
  });

  it("says Paid once the balance is in, naming who took a counter payment", () => {
    const invoice = invoiceFigures(
      430782,
      [
        { kind: "deposit", status: "paid", amountCents: 107696 },
        { kind: "balance", status: "paid", amountCents: 323086 },
      ],
      [],
    );
    const cash = {
      id: "p2",
      kind: "balance" as const,
      method: "cash" as const,
      amountCents: 323086,
      paidAt: "2027-03-16T17:00:00Z",
      recordedBy: "Sam Staff",
    };
    render(<PaymentHistory payments={{ invoice, invoiceOpen: true, refundBlocked: null, payments: [deposit, cash], refunds: [] }} />);
    expect(screen.getByTestId("invoice-status").textContent).toBe("Paid");
    expect(screen.getByRole("list", { name: "Payment history" }).textContent).toContain("Balance · Cash · $3,230.86 · taken by Sam Staff");
  });

  it("before the work is done shows no invoice, and lists a refund waiting for the provider", () => {
    const invoice = invoiceFigures(
      430782,
      [{ kind: "deposit", status: "paid", amountCents: 107696 }],
      [{ status: "pending", amountCents: 40000 }],
    );
    const refund = {
      id: "r1",
      paymentId: "p1",
      amountCents: 40000,
      status: "pending" as const,
      requestedBy: "Olive Owner",
      createdAt: "2027-03-02T17:00:00Z",
      succeededAt: null,
    };
    render(<PaymentHistory payments={{ invoice, invoiceOpen: false, refundBlocked: null, payments: [deposit], refunds: [refund] }} />);
    expect(screen.queryByTestId("invoice-status")).toBeNull();
    expect(screen.getByRole("list", { name: "Payment history" }).textContent).toContain(
      "−$400.00 · waiting for the provider · by Olive Owner",
    );
  });
});
