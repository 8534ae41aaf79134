import "server-only";
import type { Knex } from "knex";
import { appOrigin, sendMail } from "@/lib/mail";
import { formatUsd } from "@/lib/quotes/money";
import { quotePdf } from "@/lib/quotes/pdf";
import { type QuoteDetail, type QuoteScope, type Actor, getQuoteDetail, markSent } from "./quotes";
import { getShop } from "./shops";

export async function renderQuotePdf(db: Knex, detail: QuoteDetail): Promise<Buffer> {
  const shop = await getShop(db, detail.quote.shop_id);
  return quotePdf({ shop: shop!, quote: detail.quote, customer: detail.customer, lines: detail.lines, preparedBy: detail.createdByName });
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** Marks the quote sent (fresh link) and e-mails the customer the PDF and the link. */
export async function sendQuote(db: Knex, scope: QuoteScope, id: string, actor: Actor): Promise<QuoteDetail> {
  const { token } = await markSent(db, scope, id, actor);
  const detail = await getQuoteDetail(db, scope, id);
  const shop = await getShop(db, scope.shopId);
  const pdf = await renderQuotePdf(db, detail);
  const q = detail.quote;
  const link = `${appOrigin()}/q/${token}`;
  const until = q.valid_until ? new Date(q.valid_until).toLocaleDateString("en-US", { year: "numeric", month: "long", day: "numeric" }) : "";
  await sendMail({
    to: detail.customer.email,
    subject: `Your quote Q-${q.number} from ${shop!.name}`,
    text:
      `Hello ${detail.customer.name},\n\nHere is your quote Q-${q.number} for ${q.vehicle_description}: total ${formatUsd(q.total_cents)}, ` +
      `deposit ${formatUsd(q.deposit_cents)}. The PDF is attached.\n\nView it, accept it and pay the deposit here (valid until ${until}):\n${link}\n\n` +
      `${shop!.name}${shop!.phone ? ` · ${shop!.phone}` : ""}\n`,
    html:
      `<p>Hello ${esc(detail.customer.name)},</p><p>Here is your quote Q-${q.number} for ${esc(q.vehicle_description)}: total <strong>${formatUsd(q.total_cents)}</strong>, ` +
      `deposit ${formatUsd(q.deposit_cents)}. The PDF is attached.</p><p><a href="${link}">View, accept and pay the deposit</a> (valid until ${until}).</p>` +
      `<p>${esc(shop!.name)}${shop!.phone ? ` · ${esc(shop!.phone)}` : ""}</p>`,
    attachments: [{ filename: `quote-Q-${q.number}.pdf`, content: pdf, contentType: "application/pdf" }],
  });
  return detail;
}
