// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { PaymentHistory } from "./PaymentHistory";
import { DEPOSIT_PAID, PAID_DEPOSIT, quotePayments, refundEntry } from "./paymentsTestUtil";

afterEach(cleanup);

// 4,307.82 − 1,076.96 = 3,230.86 (the quote of tests/integration/shop-quotes.test.ts, worked by hand).
const deposit = PAID_DEPOSIT;
const DENVER = "America/Denver";

describe("PaymentHistory", () => {
  it("shows the invoice with what is still to pay, and the deposit in the history", () => {
    const invoice = invoiceFigures(430782, [DEPOSIT_PAID], []);
    render(<PaymentHistory payments={quotePayments(invoice)} />);
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
    render(<PaymentHistory payments={quotePayments(invoice, { payments: [deposit, cash] })} />);
    expect(screen.getByTestId("invoice-status").textContent).toBe("Paid");
    expect(screen.getByRole("list", { name: "Payment history" }).textContent).toContain("Balance · Cash · $3,230.86 · taken by Sam Staff");
  });

  it("before the work is done shows no invoice, and lists a refund waiting for the provider", () => {
    const invoice = invoiceFigures(430782, [DEPOSIT_PAID], [{ status: "pending", amountCents: 40000 }]);
    render(<PaymentHistory payments={quotePayments(invoice, { invoiceOpen: false, refunds: [refundEntry("pending", 40000)] })} />);
    expect(screen.queryByTestId("invoice-status")).toBeNull();
    expect(screen.getByRole("list", { name: "Payment history" }).textContent).toContain(
      "−$400.00 · waiting for the provider · by Olive Owner",
    );
  });

  it("lists a refund the provider reported as failed as not given back; the whole deposit is refundable again", () => {
    const invoice = invoiceFigures(430782, [DEPOSIT_PAID], [{ status: "failed", amountCents: 40000 }]);
    render(<PaymentHistory payments={quotePayments(invoice, { invoiceOpen: false, refunds: [refundEntry("failed", 40000)] })} />);
    expect(screen.getByRole("list", { name: "Payment history" }).textContent).toContain(
      "−$400.00 · refund failed — not given back · by Olive Owner",
    );
    expect(invoice.refundableCents).toBe(107696);
  });

  it("dates payments and refunds on the shop's clock, not the device's or the server's (vitest runs in UTC)", () => {
    // 03:30 UTC on Dec 4 is 8:30 PM on Dec 3 in Denver (MST, UTC−7: 49 CFR §71.9); 04:15 UTC is 9:15 PM.
    const invoice = invoiceFigures(
      430782,
      [{ kind: "deposit", status: "paid", amountCents: 107696 }],
      [{ status: "succeeded", amountCents: 40000 }],
    );
    const late = { ...deposit, paidAt: "2026-12-04T03:30:00Z" };
    const refund = {
      id: "r1",
      paymentId: late.id,
      amountCents: 40000,
      status: "succeeded" as const,
      requestedBy: "Olive Owner",
      createdAt: "2026-12-04T04:00:00Z",
      succeededAt: "2026-12-04T04:15:00Z",
      failedAt: null,
    };
    render(
      <PaymentHistory
        payments={{ invoice, invoiceOpen: false, refundBlocked: null, payments: [late], refunds: [refund], timeZone: DENVER }}
      />,
    );
    const items = within(screen.getByRole("list", { name: "Payment history" })).getAllByRole("listitem");
    expect(items[0]!.textContent).toMatch(/^Thu, Dec 3, 2026, 8:30 PM MST · Deposit/);
    expect(items[1]!.textContent).toMatch(/^Thu, Dec 3, 2026, 9:15 PM MST · Refund of the deposit/);
  });
});
