/**
 * The shop's own notices: an e-mail to the shop when a customer accepts a quote, a payment comes
 * in through the provider, or an install or a re-check is booked, moved or cancelled — so the owner learns of
 * it without watching the counter. Pure composition; noticeQueries.ts queues what this returns in
 * the transaction that makes the change. The customer's receipts are lib/shop/payments/receiptMail.ts.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import type { BookingKind, PaymentKind } from "@/lib/platform/db/types";
import { escapeHtml } from "@/lib/platform/text";
import { formatClock, formatInstant } from "@/lib/shop/bookings/zoned";
import { PAYMENT_KIND_LABEL } from "@/lib/shop/payments/labels";
import { formatUsd } from "@/lib/shop/quotes/money";

/** What happened to the quote. `by`: who did it, as the change records it ("customer", a staff member's name). */
export type ShopNoticeEvent =
  | { kind: "accepted" }
  | { kind: "paid"; payment: PaymentKind; amountCents: number }
  | { kind: "booked" | "moved" | "cancelled"; job?: BookingKind; start: Date; end: Date; by: string; previousStart?: Date };

/** What a booking is for, as the notice names it in its lead and (for a re-check) its subject; an install when left out. */
const JOB_NOTICE: Record<BookingKind, { lead: string; subject: string }> = {
  install: { lead: "The install", subject: "" },
  recheck: { lead: "The lug and ring re-check", subject: "re-check for " },
};

export interface ShopNoticeFacts {
  event: ShopNoticeEvent;
  /** The shop's recipients, one address or several joined by ", ". */
  to: string;
  shopName: string;
  quoteNumber: number;
  customer: { name: string; phone: string; email: string };
  vehicle: string;
  totalCents: number;
  depositCents: number;
  /** The staff quote page. */
  link: string;
  timeZone: string;
}

const byWhom = (by: string) => (by === "customer" ? "by the customer on their link" : `by ${by}`);

function headline(f: ShopNoticeFacts): { subject: string; lead: string } {
  const q = `Q-${f.quoteNumber}`;
  const who = f.customer.name;
  const e = f.event;
  switch (e.kind) {
    case "accepted":
      return {
        subject: `Accepted: quote ${q} by ${who}`,
        lead: `${who} accepted quote ${q} (${formatUsd(f.totalCents)}).${f.depositCents > 0 ? ` Deposit asked: ${formatUsd(f.depositCents)}.` : ""}`,
      };
    case "paid": {
      const what = PAYMENT_KIND_LABEL[e.payment].toLowerCase();
      return {
        subject: `Paid: ${formatUsd(e.amountCents)} ${what} on quote ${q} by ${who}`,
        lead: `${who} paid the ${what} of ${formatUsd(e.amountCents)} on quote ${q} online.`,
      };
    }
    case "booked":
    case "moved":
    case "cancelled": {
      const when = `${formatInstant(e.start, f.timeZone)} – ${formatClock(e.end, f.timeZone)}`;
      const job = JOB_NOTICE[e.job ?? "install"];
      if (e.kind === "booked")
        return {
          subject: `Booked: ${job.subject}quote ${q}, ${when}`,
          lead: `${job.lead} for quote ${q} was booked ${byWhom(e.by)} for ${when}.`,
        };
      if (e.kind === "moved")
        return {
          subject: `Moved: ${job.subject}quote ${q}, now ${when}`,
          lead: `${job.lead} for quote ${q} was moved ${byWhom(e.by)}${e.previousStart ? ` from ${formatInstant(e.previousStart, f.timeZone)}` : ""} to ${when}.`,
        };
      return {
        subject: `Cancelled: ${job.subject}quote ${q}, ${when}`,
        lead: `${job.lead} for quote ${q} on ${when} was cancelled ${byWhom(e.by)}.`,
      };
    }
  }
}

/**
 * @example
 * shopNoticeMail({ event: { kind: "accepted" }, quoteNumber: 1001, customer: { name: "Jo Doe", ... }, ... }).subject;
 * // "Accepted: quote Q-1001 by Jo Doe"
 */
export function shopNoticeMail(f: ShopNoticeFacts): OutgoingMail {
  const { subject, lead } = headline(f);
  // Dots, not brackets: a phone number is often written with its own, "(555) 014-2278".
  const lines = [
    lead,
    `Customer: ${[f.customer.name, f.customer.phone, f.customer.email].filter(Boolean).join(" · ")}`,
    `Vehicle: ${f.vehicle}`,
  ];
  return {
    to: f.to,
    subject,
    text: `${lines.join("\n")}\n\nOpen the quote: ${f.link}\n\n${f.shopName}, sent by Hubface\n`,
    html: `${lines.map((l) => `<p>${escapeHtml(l)}</p>`).join("")}<p><a href="${escapeHtml(f.link)}">Open the quote</a></p><p>${escapeHtml(f.shopName)}, sent by Hubface</p>`,
  };
}
