/**
 * The invoice once the work is done, in integer cents. Pure: the figures are read off the quote's
 * total and its payment records, so the counter, the customer's page and the mails agree.
 *
 * - deposit paid = Σ paid deposits (a quote that asked none has 0);
 * - refunded = Σ refunds the provider confirmed (succeeded);
 * - deposit held = deposit paid − refunded: a deposit given back (wholly or in part) is not money
 *   the shop holds, so it no longer counts against the total. A refund still waiting for the
 *   provider is not taken off yet: until it is confirmed the shop still holds that money, and a
 *   refund the provider never makes must not leave the customer owing it twice;
 * - balance due = quote total − deposit held;
 * - balance paid = Σ paid balance payments (online or at the counter);
 * - outstanding = balance due − balance paid; the invoice is "Paid" at 0;
 * - refundable = deposit paid − Σ refunds asked (pending or succeeded), so two refunds can never
 *   add up to more than was paid; a refund the provider reports as failed gave nothing back and
 *   counts nowhere (the deposit can be refunded again).
 */
import type { PaymentKind } from "@/lib/platform/db/types";
import { formatUsd } from "@/lib/shop/quotes/money";
import { REFUND_ASKED_STATUSES } from "./depositBack";

export interface LedgerPayment {
  kind: PaymentKind;
  status: "open" | "paid" | "expired";
  amountCents: number;
}
export interface LedgerRefund {
  amountCents: number;
  status: "pending" | "succeeded" | "failed";
}

export interface InvoiceFigures {
  totalCents: number;
  depositPaidCents: number;
  /** Deposit paid less the refunds confirmed: what the shop still holds of it. */
  depositHeldCents: number;
  balanceDueCents: number;
  balancePaidCents: number;
  outstandingCents: number;
  paid: boolean;
  refundedCents: number;
  refundableCents: number;
}

const sum = (xs: { amountCents: number }[]) => xs.reduce((n, x) => n + x.amountCents, 0);

/**
 * @example
 * // The quote of tests/integration/shop-quotes.test.ts: total 4,307.82, 25 % deposit 1,076.96 paid.
 * invoiceFigures(430782, [{ kind: "deposit", status: "paid", amountCents: 107696 }], []).balanceDueCents; // 323086
 */
export function invoiceFigures(totalCents: number, payments: readonly LedgerPayment[], refunds: readonly LedgerRefund[]): InvoiceFigures {
  const paid = payments.filter((p) => p.status === "paid");
  const depositPaid = sum(paid.filter((p) => p.kind === "deposit"));
  const balancePaid = sum(paid.filter((p) => p.kind === "balance"));
  const refunded = sum(refunds.filter((r) => r.status === "succeeded"));
  const depositHeld = depositPaid - refunded;
  const balanceDue = totalCents - depositHeld;
  const outstanding = balanceDue - balancePaid;
  return {
    totalCents,
    depositPaidCents: depositPaid,
    depositHeldCents: depositHeld,
    balanceDueCents: balanceDue,
    balancePaidCents: balancePaid,
    outstandingCents: outstanding,
    paid: outstanding <= 0,
    refundedCents: refunded,
    refundableCents: depositPaid - sum(refunds.filter((r) => (REFUND_ASKED_STATUSES as readonly string[]).includes(r.status))),
  };
}

/**
 * An amount against what is still owed (or refundable): a message naming the field, or null when it fits.
 *
 * @example
 * overLimit(5000, 4000, "Amount ($)", "the balance outstanding"); // "Amount ($): $50.00 is more than the balance outstanding, $40.00."
 */
export function overLimit(amountCents: number, limitCents: number, label: string, what: string): string | null {
  if (amountCents <= limitCents) return null;
  return `${label}: ${formatUsd(amountCents)} is more than ${what}, ${formatUsd(limitCents)}.`;
}

/** The invoice in lines: total − deposit paid + deposit refunded = balance due, and what is still to pay. */
export function invoiceLines(i: InvoiceFigures): string[] {
  return [
    `Quote total: ${formatUsd(i.totalCents)}`,
    `Deposit paid: −${formatUsd(i.depositPaidCents)}`,
    ...(i.refundedCents > 0 ? [`Deposit refunded: +${formatUsd(i.refundedCents)}`] : []),
    `Balance due: ${formatUsd(i.balanceDueCents)}`,
    ...(i.balancePaidCents > 0 ? [`Paid since: −${formatUsd(i.balancePaidCents)}`] : []),
    i.paid ? "Status: Paid" : `Still to pay: ${formatUsd(i.outstandingCents)}`,
  ];
}
