/**
 * The e-mail the customer gets when the work order is done: per wheel position what was fitted,
 * the cold pressure set and the torque signed (with who signed it), the vehicle's readings, the
 * re-check advice, and the invoice (quote total − deposit paid = balance due) with the link where
 * the balance can be paid. Pure composition; the query queues it in the transaction that marks
 * the work order done.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import { escapeHtml } from "@/lib/platform/text";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import { type InvoiceFigures, invoiceLines } from "@/lib/shop/payments/invoice";
import { formatUsd } from "@/lib/shop/quotes/money";
import { type WorkOrder, requiredSteps } from "./api";
import { signedText } from "./signedText";
import { POSITION_LABEL, RECHECK_NOTE, STEP_LABEL, type StepKind } from "./vocabulary";

/** The steps a customer is told about: what went on, what it was set to, what it was torqued to. */
const TOLD: ReadonlySet<StepKind> = new Set(["fitted", "beadlock", "pressure", "lug_torque", "alignment", "trimming"]);

export interface SummarySection {
  heading: string;
  lines: string[];
}

/**
 * The work, position by position, from the signed steps.
 *
 * @example
 * workSummary(order)[0]; // { heading: "Left front", lines: ["Tire and wheel as fitted: … (signed by Sam Staff)", …] }
 */
export function workSummary(w: Pick<WorkOrder, "spare" | "beadlock" | "alignment" | "trimming" | "steps">): SummarySection[] {
  const sections = new Map<string, string[]>();
  for (const need of requiredSteps(w)) {
    if (!TOLD.has(need.step)) continue;
    const signed = w.steps.find((s) => s.position === need.position && s.step === need.step);
    if (!signed) continue;
    const heading = POSITION_LABEL[need.position];
    const lines = sections.get(heading) ?? [];
    lines.push(`${STEP_LABEL[need.step]}: ${signedText(signed)} (signed by ${signed.signedBy})`);
    sections.set(heading, lines);
  }
  return [...sections].map(([heading, lines]) => ({ heading, lines }));
}

export interface CompletionFacts {
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  order: Pick<WorkOrder, "quoteNumber" | "vehicleDescription" | "spare" | "beadlock" | "alignment" | "trimming" | "steps">;
  doneAt: Date;
  recheckDueAt: Date;
  timeZone: string;
  invoice: InvoiceFigures;
  /** The customer's quote page, where the balance is paid. */
  payUrl: string;
}

const dayOf = (d: Date, timeZone: string) =>
  d.toLocaleDateString("en-US", { timeZone, weekday: "short", month: "short", day: "numeric", year: "numeric" });

/**
 * @example
 * completionMail(facts).subject; // "Done: your wheels and tires at Shop A (quote Q-1003)"
 */
export function completionMail(f: CompletionFacts): OutgoingMail {
  const sections = workSummary(f.order);
  const invoice = invoiceLines(f.invoice);
  const what = f.order.beadlock ? "lug nuts and beadlock ring bolts" : "lug nuts";
  const lead = `The work on your ${f.order.vehicleDescription} for quote Q-${f.order.quoteNumber} was finished on ${formatInstant(f.doneAt, f.timeZone)}. Here is what was done and your invoice.`;
  const recheck = `Please come back around ${dayOf(f.recheckDueAt, f.timeZone)} to have the ${what} re-checked to the maker's torque. ${RECHECK_NOTE}`;
  const pay = f.invoice.paid
    ? "Your invoice is paid. Thank you."
    : `Pay the balance of ${formatUsd(f.invoice.outstandingCents)} here: ${f.payUrl}`;
  const contact = [f.shop.name, f.shop.address, f.shop.phone].filter(Boolean).join(" · ");
  const text = [
    `Hello ${f.customer.name},`,
    lead,
    ...sections.map((s) => [s.heading, ...s.lines.map((l) => `- ${l}`)].join("\n")),
    ["Invoice", ...invoice].join("\n"),
    pay,
    recheck,
    contact,
  ].join("\n\n");
  const html = [
    `<p>Hello ${escapeHtml(f.customer.name)},</p>`,
    `<p>${escapeHtml(lead)}</p>`,
    ...sections.map((s) => `<h3>${escapeHtml(s.heading)}</h3><ul>${s.lines.map((l) => `<li>${escapeHtml(l)}</li>`).join("")}</ul>`),
    `<h3>Invoice</h3><p>${invoice.map(escapeHtml).join("<br>")}</p>`,
    f.invoice.paid
      ? `<p>${escapeHtml(pay)}</p>`
      : `<p><a href="${escapeHtml(f.payUrl)}">Pay the balance of ${escapeHtml(formatUsd(f.invoice.outstandingCents))}</a></p>`,
    `<p>${escapeHtml(recheck)}</p>`,
    `<p>${escapeHtml(contact)}</p>`,
  ].join("");
  return {
    to: f.customer.email,
    subject: `Done: your wheels and tires at ${f.shop.name} (quote Q-${f.order.quoteNumber})`,
    text: `${text}\n`,
    html,
  };
}
