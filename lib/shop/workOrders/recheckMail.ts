/**
 * The re-check e-mail: after the shop's number of days, the customer is asked back to have lug
 * nuts and beadlock ring bolts re-checked. Pure composition; the query queues it in the
 * transaction that marks the work order reminded.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import { escapeHtml } from "@/lib/platform/text";
import { RECHECK_NOTE } from "./vocabulary";

export interface RecheckFacts {
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  quoteNumber: number;
  vehicle: string;
  beadlock: boolean;
}

/**
 * @example
 * recheckMail({ customer: { name: "Ada", email: "a@x.test" }, shop, quoteNumber: 1003, vehicle: "Pickup", beadlock: true }).subject;
 * // "Time for your lug and ring re-check at Shop A"
 */
export function recheckMail(f: RecheckFacts): OutgoingMail {
  const what = f.beadlock ? "lug nuts and beadlock ring bolts" : "lug nuts";
  const lead = `your new wheels and tires (quote Q-${f.quoteNumber}, ${f.vehicle}) have had time to settle: it is time to have the ${what} re-checked to the maker's torque. It takes a few minutes.`;
  const book = f.shop.phone
    ? `Call ${f.shop.name} on ${f.shop.phone} to book a short slot.`
    : `Contact ${f.shop.name} to book a short slot.`;
  const contact = [f.shop.name, f.shop.address, f.shop.phone].filter(Boolean).join(" · ");
  return {
    to: f.customer.email,
    subject: `Time for your ${f.beadlock ? "lug and ring" : "lug"} re-check at ${f.shop.name}`,
    text: `Hello ${f.customer.name},\n\n${lead}\n\n${book}\n\n${RECHECK_NOTE}\n\n${contact}\n`,
    html: `<p>Hello ${escapeHtml(f.customer.name)},</p><p>${escapeHtml(lead)}</p><p>${escapeHtml(book)}</p><p>${escapeHtml(RECHECK_NOTE)}</p><p>${escapeHtml(contact)}</p>`,
  };
}
