/**
 * What the payment routes answer (camelCase, ISO instants) and the row → API mappers, shared by
 * server and browser.
 */
import type { PaymentKind, PaymentMethod, PaymentRefundRow, PaymentRow } from "@/lib/platform/db/types";
import type { InvoiceFigures } from "./invoice";

const iso = (d: Date | string | null) => (d === null ? null : new Date(d).toISOString());

/** One payment received, as the history lists it. */
export interface PaymentEntry {
  id: string;
  kind: PaymentKind;
  method: PaymentMethod;
  amountCents: number;
  paidAt: string | null;
  /** Who took it at the counter; "" for a payment made online. */
  recordedBy: string;
}

export interface RefundEntry {
  id: string;
  paymentId: string;
  amountCents: number;
  status: PaymentRefundRow["status"];
  requestedBy: string;
  createdAt: string;
  succeededAt: string | null;
  /** When the provider reported it failed (nothing given back); null otherwise. */
  failedAt: string | null;
}

/** A quote's money after the deposit: the invoice once the work is done, the history, and what may be refunded. */
export interface QuotePayments {
  invoice: InvoiceFigures;
  /** The work order is done (the quote installed): the balance can be paid. */
  invoiceOpen: boolean;
  /** Why the deposit cannot be refunded now, or null when it can. */
  refundBlocked: string | null;
  payments: PaymentEntry[];
  refunds: RefundEntry[];
  /** The shop's time zone (IANA): payment times read on the shop's clock on the counter and the customer's page alike. */
  timeZone: string;
}

export const paymentEntryDto = (r: PaymentRow): PaymentEntry => ({
  id: r.id,
  kind: r.kind,
  method: r.method,
  amountCents: r.amount_cents,
  paidAt: iso(r.paid_at),
  recordedBy: r.recorded_by,
});

export const refundEntryDto = (r: PaymentRefundRow): RefundEntry => ({
  id: r.id,
  paymentId: r.payment_id,
  amountCents: r.amount_cents,
  status: r.status,
  requestedBy: r.requested_by,
  createdAt: new Date(r.created_at).toISOString(),
  succeededAt: iso(r.succeeded_at),
  failedAt: iso(r.failed_at),
});
