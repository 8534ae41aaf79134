import "server-only";
import type { Knex } from "knex";
import type { QuoteRow } from "@/lib/platform/db/types";
import { appOrigin, queueMail } from "@/lib/platform/mail";
import { type QuoteDocument, buildQuoteDocument, hubCautions } from "@/lib/shop/quotes/document";
import { formatUsd } from "@/lib/shop/quotes/money";
import { quotePdf } from "@/lib/shop/quotes/pdf";
import {
  type QuoteRecord,
  type QuoteScope,
  type Actor,
  findByToken,
  getQuoteDetail,
  latestSentDocument,
  markSent,
  quoteParties,
} from "./queries";
import { getShop } from "../queries";
import { bindAppDb } from "@/lib/platform/db/bind";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { formatDayOf } from "@/lib/shop/bookings/zoned";
import { escapeHtml as esc } from "@/lib/platform/text";

/**
 * The quote as a document: a draft from its live rows; any other quote as it was last sent
 * (a quote sent before documents were stored falls back to its rows).
 */
export async function documentFor(
  db: Knex,
  detail: Pick<QuoteRecord, "quote" | "customer" | "lines" | "createdByName">,
): Promise<QuoteDocument> {
  if (detail.quote.status !== "draft") {
    const sent = await latestSentDocument(db, detail.quote.id);
    if (sent) return sent;
  }
  const shop = await getShop(db, detail.quote.shop_id);
  return buildQuoteDocument({
    shop: shop!,
    quote: detail.quote,
    customer: detail.customer,
    lines: detail.lines,
    preparedBy: detail.createdByName,
    sentAt: null,
  });
}

export async function renderQuotePdf(db: Knex, detail: QuoteRecord): Promise<Buffer> {
  return quotePdf(await documentFor(db, detail), detail.timeZone);
}

/** What the customer's link shows: the live status, the document as sent and its validity day on the shop's clock. */
export interface PublicQuoteView {
  quote: QuoteRow;
  document: QuoteDocument;
  /** The day the quote is valid until, on the shop's clock (the page renders on a UTC server), e.g. "Thursday, December 3, 2026". */
  validUntilDay: string | null;
}

export async function findPublicQuoteView(db: Knex, token: string): Promise<PublicQuoteView | undefined> {
  const quote = await findByToken(db, token);
  if (!quote) return undefined;
  const [document, timeZone] = await Promise.all([
    documentFor(db, { quote, ...(await quoteParties(db, quote)) }),
    shopTimeZone(db, quote.shop_id),
  ]);
  return { quote, document, validUntilDay: document.validUntil ? formatDayOf(document.validUntil, timeZone) : null };
}

/**
 * Marks the quote sent (fresh link, document frozen as sent) and e-mails the customer the PDF and
 * the link (queued: a worker sends it, retrying while the mail server is away). `seenUpdatedAt`: the version the sender saw; a quote changed since is not sent.
 */
export async function sendQuote(db: Knex, scope: QuoteScope, id: string, actor: Actor, seenUpdatedAt?: string): Promise<QuoteRecord> {
  const { token, document: d } = await markSent(db, scope, id, actor, seenUpdatedAt);
  const detail = await getQuoteDetail(db, scope, id);
  const pdf = await quotePdf(d, detail.timeZone);
  const t = d.totals;
  const link = `${appOrigin()}/q/${token}`;
  // The day on the shop's clock: the server's is UTC, a day ahead of Denver's every evening.
  const until = d.validUntil ? formatDayOf(d.validUntil, detail.timeZone) : "";
  const hub = hubCautions(d);
  await queueMail({
    to: d.customer.email,
    subject: `Your quote Q-${d.number} from ${d.shop.name}`,
    text:
      `Hello ${d.customer.name},\n\nHere is your quote Q-${d.number} for ${d.vehicle.description}: total ${formatUsd(t.totalCents)}, ` +
      `deposit ${formatUsd(t.depositCents)}, balance due after the deposit ${formatUsd(t.balanceCents)}. The PDF is attached.\n\n` +
      (hub.length ? `About the wheels on your hubs:\n${hub.map((h) => `- ${h}`).join("\n")}\n\n` : "") +
      `View it, accept it and pay the deposit here (valid until ${until}):\n${link}\n\n` +
      `${d.shop.name}${d.shop.phone ? ` · ${d.shop.phone}` : ""}\n`,
    html:
      `<p>Hello ${esc(d.customer.name)},</p><p>Here is your quote Q-${d.number} for ${esc(d.vehicle.description)}: total <strong>${formatUsd(t.totalCents)}</strong>, ` +
      `deposit ${formatUsd(t.depositCents)}, balance due after the deposit ${formatUsd(t.balanceCents)}. The PDF is attached.</p>` +
      (hub.length ? `<p>About the wheels on your hubs:</p><ul>${hub.map((h) => `<li>${esc(h)}</li>`).join("")}</ul>` : "") +
      `<p><a href="${link}">View, accept and pay the deposit</a> (valid until ${until}).</p>` +
      `<p>${esc(d.shop.name)}${d.shop.phone ? ` · ${esc(d.shop.phone)}` : ""}</p>`,
    attachments: [{ filename: `quote-Q-${d.number}.pdf`, content: pdf, contentType: "application/pdf" }],
  });
  return detail;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const quoteSendQueries = bindAppDb({ findPublicQuoteView, renderQuotePdf, sendQuote });
