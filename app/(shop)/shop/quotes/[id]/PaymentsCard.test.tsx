// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PAID_DEPOSIT } from "@/components/payments/paymentsTestUtil";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { REFUND_FAILED_NOTE } from "@/lib/shop/payments/labels";
import { PaymentsCard } from "./PaymentsCard";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: vi.fn() }) }));
afterEach(cleanup);

const QUOTE = "d0000000-0000-4000-8000-0000000000ab";
// The deposit of tests/integration/shop-balance.test.ts: 1,076.96 (worked by hand there).
const paid = [{ kind: "deposit" as const, status: "paid" as const, amountCents: 107696 }];
const refund = (status: "pending" | "failed") => ({
  id: "r1",
  paymentId: "p1",
  amountCents: 107696,
  status,
  requestedBy: "Olive Owner",
  createdAt: "2027-03-02T17:00:00Z",
  succeededAt: null,
  failedAt: status === "failed" ? "2027-03-02T17:05:00Z" : null,
});

describe("PaymentsCard", () => {
  it("after a failed refund tells the owner nothing was given back and offers the whole deposit again", () => {
    const invoice = invoiceFigures(430782, paid, [{ status: "failed", amountCents: 107696 }]);
    render(
      <PaymentsCard
        quoteId={QUOTE}
        owner
        payments={{
          invoice,
          invoiceOpen: false,
          refundBlocked: null,
          payments: [PAID_DEPOSIT],
          refunds: [refund("failed")],
          timeZone: "UTC",
        }}
      />,
    );
    expect(screen.getByText(REFUND_FAILED_NOTE)).toBeTruthy();
    expect((screen.getByLabelText("Refund amount ($)") as HTMLInputElement).value).toBe("1076.96");
  });

  it("says nothing of a failure while a refund is only waiting for the provider", () => {
    const invoice = invoiceFigures(430782, paid, [{ status: "pending", amountCents: 107696 }]);
    render(
      <PaymentsCard
        quoteId={QUOTE}
        owner
        payments={{
          invoice,
          invoiceOpen: false,
          refundBlocked: "The deposit has been refunded in full.",
          payments: [PAID_DEPOSIT],
          refunds: [refund("pending")],
          timeZone: "UTC",
        }}
      />,
    );
    expect(screen.queryByText(REFUND_FAILED_NOTE)).toBeNull();
  });
});
