/**
 * The re-check e-mail: after the shop's number of days, the customer is asked back to have lug
 * nuts and beadlock ring bolts re-checked. Pure composition; the query queues it in the
 * transaction that marks the work order reminded.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import { escapeHtml } from "@/lib/platform/text";
import { RECHECK_BOOKING_DAYS, RECHECK_LINK_DAYS, RECHECK_SLOT } from "./recheckLink";
import { RECHECK_NOTE } from "./vocabulary";

export interface RecheckFacts {
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  quoteNumber: number;
  vehicle: string;
  beadlock: boolean;
  /** The customer's page to book the short re-check slot (recheckLink.ts). */
  bookUrl: string;
  /** The shop's re-check length in minutes (shops.recheck_slot_minutes); RECHECK_SLOT's default when left out. */
  slotMinutes?: number;
}

/**
 * @example
 * recheckMail({ customer: { name: "Ada", email: "a@x.test" }, shop, quoteNumber: 1003, vehicle: "Pickup", beadlock: true, bookUrl }).subject;
 * // "Time for your lug and ring re-check at Shop A"
 */
export function recheckMail(f: RecheckFacts): OutgoingMail {
  const what = f.beadlock ? "lug nuts and beadlock ring bolts" : "lug nuts";
  const lead = `your new wheels and tires (quote Q-${f.quoteNumber}, ${f.vehicle}) have had time to settle: it is time to have the ${what} re-checked to the maker's torque. It takes a few minutes.`;
  const book = `Book a ${f.slotMinutes ?? RECHECK_SLOT.minutes}-minute slot in the next ${RECHECK_BOOKING_DAYS} days here (the link works for ${RECHECK_LINK_DAYS} days):`;
  const call = f.shop.phone ? `Or call ${f.shop.name} on ${f.shop.phone}.` : `Or contact ${f.shop.name}.`;
  const contact = [f.shop.name, f.shop.address, f.shop.phone].filter(Boolean).join(" · ");
  return {
    to: f.customer.email,
    subject: `Time for your ${f.beadlock ? "lug and ring" : "lug"} re-check at ${f.shop.name}`,
    text: `Hello ${f.customer.name},\n\n${lead}\n\n${book}\n${f.bookUrl}\n\n${call}\n\n${RECHECK_NOTE}\n\n${contact}\n`,
    html: `<p>Hello ${escapeHtml(f.customer.name)},</p><p>${escapeHtml(lead)}</p><p>${escapeHtml(book)} <a href="${escapeHtml(f.bookUrl)}">${escapeHtml(f.bookUrl)}</a></p><p>${escapeHtml(call)}</p><p>${escapeHtml(RECHECK_NOTE)}</p><p>${escapeHtml(contact)}</p>`,
  };
}
