// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { DEPOSIT_PAID, quotePayments } from "@/components/payments/paymentsTestUtil";
import { BALANCE_ALREADY_PAID } from "@/lib/shop/payments/labels";
import { BalancePanel } from "./BalancePanel";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const TOKEN = "A".repeat(43);
const deposit = DEPOSIT_PAID;

describe("BalancePanel", () => {
  it("offers the balance still owed (4,307.82 − 1,076.96 = 3,230.86) and sends the customer to the provider's page", async () => {
    const fetch = vi.fn(async () => new Response(JSON.stringify({ url: "http://127.0.0.1:2527/pay/cs_test_x" }), { status: 200 }));
    vi.stubGlobal("fetch", fetch);
    const assign = vi.fn();
    vi.stubGlobal("location", { ...window.location, assign });
    const payments = quotePayments(invoiceFigures(430782, [deposit], []));
    render(<BalancePanel token={TOKEN} payments={payments} justPaid={false} />);
    await userEvent.click(screen.getByRole("button", { name: "Pay the $3,230.86 balance" }));
    await waitFor(() => expect(assign).toHaveBeenCalledWith("http://127.0.0.1:2527/pay/cs_test_x"));
    expect((fetch.mock.calls[0] as unknown as [string])[0]).toBe(`/api/q/${TOKEN}/balance`);
  });

  it("back from a balance page closed because the balance was taken at the counter: says it is paid, never 'expired'", () => {
    // 1,076.96 + 3,230.86 = 4,307.82: nothing owed (by hand).
    const invoice = invoiceFigures(430782, [deposit, { kind: "balance", status: "paid", amountCents: 323086 }], []);
    render(<BalancePanel token={TOKEN} payments={quotePayments(invoice)} justPaid={false} returned />);
    expect(screen.getByText(BALANCE_ALREADY_PAID)).toBeTruthy();
    expect(screen.queryByText(/expired/i)).toBeNull();
    expect(screen.queryByRole("button")).toBeNull();
  });

  it("back from a balance page without paying while something is owed: no paid message, the payment is offered again", () => {
    const invoice = invoiceFigures(430782, [deposit], []);
    render(<BalancePanel token={TOKEN} payments={quotePayments(invoice)} justPaid={false} returned />);
    expect(screen.queryByText(BALANCE_ALREADY_PAID)).toBeNull();
    expect(screen.getByRole("button", { name: "Pay the $3,230.86 balance" })).toBeTruthy();
  });

  it("a paid invoice says Paid and offers no payment", () => {
    const invoice = invoiceFigures(430782, [deposit, { kind: "balance", status: "paid", amountCents: 323086 }], []);
    render(<BalancePanel token={TOKEN} payments={quotePayments(invoice)} justPaid />);
    expect(screen.getByTestId("invoice-status").textContent).toBe("Paid");
    expect(screen.queryByRole("button")).toBeNull();
    expect(screen.queryByText(/waiting for its confirmation/)).toBeNull();
  });
});
