// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { DEPOSIT_PAID, quotePayments, refundEntry } from "@/components/payments/paymentsTestUtil";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { REFUND_FAILED_NOTE } from "@/lib/shop/payments/labels";
import { PaymentsCard } from "./PaymentsCard";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: vi.fn() }) }));
afterEach(cleanup);

const QUOTE = "d0000000-0000-4000-8000-0000000000ab";

/** The owner's card after a refund of the whole deposit (1,076.96, tests/integration/shop-balance.test.ts, worked by hand there). */
function renderAfterRefund(status: "pending" | "failed", refundBlocked: string | null) {
  const invoice = invoiceFigures(430782, [DEPOSIT_PAID], [{ status, amountCents: 107696 }]);
  const payments = quotePayments(invoice, { invoiceOpen: false, refundBlocked, refunds: [refundEntry(status, 107696)], timeZone: "UTC" });
  render(<PaymentsCard quoteId={QUOTE} owner payments={payments} />);
}

describe("PaymentsCard", () => {
  it("after a failed refund tells the owner nothing was given back and offers the whole deposit again", () => {
    renderAfterRefund("failed", null);
    expect(screen.getByText(REFUND_FAILED_NOTE)).toBeTruthy();
    expect((screen.getByLabelText("Refund amount ($)") as HTMLInputElement).value).toBe("1076.96");
  });

  it("says nothing of a failure while a refund is only waiting for the provider", () => {
    renderAfterRefund("pending", "The deposit has been refunded in full.");
    expect(screen.queryByText(REFUND_FAILED_NOTE)).toBeNull();
  });
});
