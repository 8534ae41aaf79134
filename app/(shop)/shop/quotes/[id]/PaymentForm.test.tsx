// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { invoiceFigures } from "@/lib/shop/payments/invoice";
import { PaymentForm } from "./PaymentForm";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  refresh.mockReset();
});

const QUOTE = "d0000000-0000-4000-8000-0000000000aa";
function answer(status: number, body: unknown) {
  const fetch = vi.fn(async () => new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } }));
  vi.stubGlobal("fetch", fetch);
  return fetch;
}

// The quote of tests/integration/shop-balance.test.ts, by hand in integer cents: total 4,307.82,
// deposit 1,076.96, balance 4,307.82 − 1,076.96 = 3,230.86.
const deposit = { kind: "deposit" as const, status: "paid" as const, amountCents: 107696 };
/** The route's answer: the quote's payments as the server computed them after the change. */
const paymentsAfter = (...args: Parameters<typeof invoiceFigures>) => ({
  payments: { invoice: invoiceFigures(...args), invoiceOpen: true, refundBlocked: null, payments: [], refunds: [], timeZone: "UTC" },
});

describe("PaymentForm", () => {
  it("records a counter payment with the amount as typed and the method picked", async () => {
    const fetch = answer(201, paymentsAfter(430782, [deposit, { kind: "balance", status: "paid", amountCents: 323086 }], []));
    render(<PaymentForm quoteId={QUOTE} mode="counter" suggested="3230.86" />);
    await userEvent.selectOptions(screen.getByLabelText("Paid by"), "card");
    await userEvent.click(screen.getByRole("button", { name: "Record the payment" }));
    await waitFor(() => expect(refresh).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe(`/api/shop/quotes/${QUOTE}/payments`);
    expect(JSON.parse(String(init.body))).toEqual({ amount: "3230.86", method: "card" });
    expect(screen.getByText("Payment recorded; the customer gets a receipt.")).toBeTruthy();
  });

  it("refuses an amount that is not dollars and cents before sending, naming the field", async () => {
    const fetch = answer(201, {});
    render(<PaymentForm quoteId={QUOTE} mode="counter" suggested="" />);
    await userEvent.type(screen.getByLabelText("Amount ($)"), "12.5.0");
    await userEvent.click(screen.getByRole("button", { name: "Record the payment" }));
    expect(await screen.findByText('Amount ($): "12.5.0" is not an amount in dollars and cents, e.g. 250.00.')).toBeTruthy();
    expect(screen.getByLabelText("Amount ($)").getAttribute("aria-invalid")).toBe("true");
    expect(fetch).not.toHaveBeenCalled();
  });

  it("puts the server's over-refund message on the refund amount field", async () => {
    const message = "Refund amount ($): $1,076.97 is more than the deposit paid and not yet refunded, $1,076.96.";
    const fetch = answer(422, { error: "Some fields need attention.", fieldErrors: { amount: [message] } });
    render(<PaymentForm quoteId={QUOTE} mode="refund" suggested="1076.97" />);
    expect(screen.queryByLabelText("Paid by")).toBeNull();
    await userEvent.click(screen.getByRole("button", { name: "Refund through the provider" }));
    expect(await screen.findByText(message)).toBeTruthy();
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe(`/api/shop/quotes/${QUOTE}/refunds`);
    expect(JSON.parse(String(init.body))).toEqual({ amount: "1076.97" });
    expect(refresh).not.toHaveBeenCalled();
  });

  it("after a payment the amount offers what is still owed, not the amount just taken (3,230.86 − 1,000.00 = 2,230.86)", async () => {
    const fetch = answer(201, paymentsAfter(430782, [deposit, { kind: "balance", status: "paid", amountCents: 100000 }], []));
    render(<PaymentForm quoteId={QUOTE} mode="counter" suggested="3230.86" />);
    const amount = screen.getByLabelText("Amount ($)") as HTMLInputElement;
    await userEvent.clear(amount);
    await userEvent.type(amount, "1000");
    await userEvent.selectOptions(screen.getByLabelText("Paid by"), "card");
    await userEvent.click(screen.getByRole("button", { name: "Record the payment" }));
    await waitFor(() => expect(refresh).toHaveBeenCalled());
    expect(JSON.parse(String((fetch.mock.calls[0] as unknown as [string, RequestInit])[1].body))).toEqual({
      amount: "1000",
      method: "card",
    });
    await waitFor(() => expect(amount.value).toBe("2230.86"));
    expect((screen.getByLabelText("Paid by") as HTMLSelectElement).value).toBe("card");
  });

  it("after a refund the amount offers what is left to refund (1,076.96 − 125.12 = 951.84), and is empty once all is refunded", async () => {
    answer(202, paymentsAfter(430782, [deposit], [{ status: "pending", amountCents: 12512 }]));
    render(<PaymentForm quoteId={QUOTE} mode="refund" suggested="1076.96" />);
    const amount = screen.getByLabelText("Refund amount ($)") as HTMLInputElement;
    await userEvent.clear(amount);
    await userEvent.type(amount, "125.12");
    await userEvent.click(screen.getByRole("button", { name: "Refund through the provider" }));
    await waitFor(() => expect(amount.value).toBe("951.84"));
    answer(
      202,
      paymentsAfter(
        430782,
        [deposit],
        [
          { status: "pending", amountCents: 12512 },
          { status: "pending", amountCents: 95184 },
        ],
      ),
    );
    await userEvent.click(screen.getByRole("button", { name: "Refund through the provider" }));
    await waitFor(() => expect(amount.value).toBe(""));
  });
});
