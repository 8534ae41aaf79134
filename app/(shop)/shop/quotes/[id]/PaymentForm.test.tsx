// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
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

describe("PaymentForm", () => {
  it("records a counter payment with the amount as typed and the method picked", async () => {
    const fetch = answer(201, { payments: {} });
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
});
