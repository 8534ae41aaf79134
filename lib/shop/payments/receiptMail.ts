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
  const w = f.what;
  const subject =
    w.kind === "refund"
      ? `Refund: ${amount} of your deposit for quote Q-${f.quoteNumber} at ${f.shop.name}`
      : `Receipt: ${amount} ${PAYMENT_KIND_LABEL[w.kind].toLowerCase()} for quote Q-${f.quoteNumber} at ${f.shop.name}`;
  const lines =
    w.kind === "refund"
      ? [refundSentence(f, f.amountCents), "It goes back to the card you paid with."]
      : [
          `${f.shop.name} received ${amount} on ${formatInstant(f.at, f.timeZone)} for quote Q-${f.quoteNumber} (${f.vehicle}).`,
          `Paid: ${PAYMENT_KIND_LABEL[w.kind]}, ${PAYMENT_METHOD_LABEL[w.method].toLowerCase()}.`,
          ...(f.outstandingCents === null
            ? []
            : [f.outstandingCents <= 0 ? "Your invoice is paid in full. Thank you." : `Still to pay: ${formatUsd(f.outstandingCents)}.`]),
        ];
  return linesMail(f, subject, lines);
}

/**
 * What a refund's receipt says first: who refunded how much of the deposit, for which quote, when.
 * The closing mail of a full refund (closedMail.ts) opens with it too.
 */
export function refundSentence(f: Pick<ReceiptFacts, "shop" | "quoteNumber" | "vehicle" | "at" | "timeZone">, amountCents: number): string {
  return `${f.shop.name} has refunded ${formatUsd(amountCents)} of your deposit for quote Q-${f.quoteNumber} (${f.vehicle}) on ${formatInstant(f.at, f.timeZone)}.`;
}

/** A mail to the quote's customer of plain lines: the greeting, a paragraph per line, the shop's contact line. */
export function linesMail(f: Pick<ReceiptFacts, "customer" | "shop">, subject: string, lines: readonly string[]): OutgoingMail {
  const contact = [f.shop.name, f.shop.address, f.shop.phone].filter(Boolean).join(" · ");
  return {
    to: f.customer.email,
    subject,
    text: `Hello ${f.customer.name},\n\n${lines.join("\n")}\n\n${contact}\n`,
    html: `<p>Hello ${escapeHtml(f.customer.name)},</p>${lines.map((l) => `<p>${escapeHtml(l)}</p>`).join("")}<p>${escapeHtml(contact)}</p>`,
  };
}
