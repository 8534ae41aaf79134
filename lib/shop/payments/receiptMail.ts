/**
 * The receipt e-mail for each payment, and the note of a refund. Pure composition; the queries
 * queue what this returns in the transaction that records the payment or the refund.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import type { PaymentKind, PaymentMethod } from "@/lib/platform/db/types";
import { escapeHtml } from "@/lib/platform/text";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import { formatUsd } from "@/lib/shop/quotes/money";
import { PAYMENT_KIND_LABEL, PAYMENT_METHOD_LABEL } from "./labels";

export interface ReceiptFacts {
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  quoteNumber: number;
  vehicle: string;
  /** A payment received, or a refund sent back. */
  what: { kind: PaymentKind; method: PaymentMethod } | { kind: "refund" };
  amountCents: number;
  at: Date;
  timeZone: string;
  /** What is still owed after this payment (balance payments), or null where nothing is invoiced yet. */
  outstandingCents: number | null;
}

/**
 * @example
 * receiptMail({ ...facts, what: { kind: "balance", method: "cash" }, amountCents: 323086, outstandingCents: 0 }).subject;
 * // "Receipt: $3,230.86 balance for quote Q-1003 at Shop A"
 */
export function receiptMail(f: ReceiptFacts): OutgoingMail {
  const amount = formatUsd(f.amountCents);
  const when = formatInstant(f.at, f.timeZone);
  const w = f.what;
  const subject =
    w.kind === "refund"
      ? `Refund: ${amount} of your deposit for quote Q-${f.quoteNumber} at ${f.shop.name}`
      : `Receipt: ${amount} ${PAYMENT_KIND_LABEL[w.kind].toLowerCase()} for quote Q-${f.quoteNumber} at ${f.shop.name}`;
  const lines =
    w.kind === "refund"
      ? [
          `${f.shop.name} has refunded ${amount} of your deposit for quote Q-${f.quoteNumber} (${f.vehicle}) on ${when}.`,
          "It goes back to the card you paid with.",
        ]
      : [
          `${f.shop.name} received ${amount} on ${when} for quote Q-${f.quoteNumber} (${f.vehicle}).`,
          `Paid: ${PAYMENT_KIND_LABEL[w.kind]}, ${PAYMENT_METHOD_LABEL[w.method].toLowerCase()}.`,
          ...(f.outstandingCents === null
            ? []
            : [f.outstandingCents <= 0 ? "Your invoice is paid in full. Thank you." : `Still to pay: ${formatUsd(f.outstandingCents)}.`]),
        ];
  const contact = [f.shop.name, f.shop.address, f.shop.phone].filter(Boolean).join(" · ");
  return {
    to: f.customer.email,
    subject,
    text: `Hello ${f.customer.name},\n\n${lines.join("\n")}\n\n${contact}\n`,
    html: `<p>Hello ${escapeHtml(f.customer.name)},</p>${lines.map((l) => `<p>${escapeHtml(l)}</p>`).join("")}<p>${escapeHtml(contact)}</p>`,
  };
}
