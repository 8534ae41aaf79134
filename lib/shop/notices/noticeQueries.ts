import "server-only";
import type { Knex } from "knex";
import type { QuoteRow } from "@/lib/platform/db/types";
import { appOrigin } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { type ShopNoticeEvent, shopNoticeMail } from "./mail";

/** Who hears of the shop's news: the address in the shop's settings, or else its owners' addresses. */
async function shopRecipients(trx: Knex.Transaction, shopId: string): Promise<string[]> {
  const set = (await trx("shops").where({ id: shopId }).first("notice_email")) as { notice_email: string } | undefined;
  if (set?.notice_email) return [set.notice_email];
  const owners = (await trx("users").where({ shop_id: shopId, role: "shop_owner" }).orderBy("email").select("email")) as {
    email: string;
  }[];
  return owners.map((o) => o.email).filter(Boolean);
}

/**
 * Queues the shop's notice of `event` on `quote` in the caller's transaction, so it is sent if
 * and only if the change commits. One mail to all the shop's recipients; none when the shop has
 * nobody to tell. Returns whether one was queued.
 */
export async function queueShopNotice(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "id" | "shop_id" | "customer_id" | "number" | "vehicle_description" | "total_cents" | "deposit_cents">,
  event: ShopNoticeEvent,
): Promise<boolean> {
  const to = await shopRecipients(trx, quote.shop_id);
  if (!to.length) return false;
  // One after another: the transaction is one connection.
  const shop = await trx("shops").where({ id: quote.shop_id }).first("name");
  const customer = await trx("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("name", "phone", "email");
  const timeZone = await shopTimeZone(trx, quote.shop_id);
  await queueMailIn(
    trx,
    shopNoticeMail({
      event,
      to: to.join(", "),
      shopName: shop?.name ?? "",
      quoteNumber: quote.number,
      customer: { name: customer?.name ?? "", phone: customer?.phone ?? "", email: customer?.email ?? "" },
      vehicle: quote.vehicle_description,
      totalCents: quote.total_cents,
      depositCents: quote.deposit_cents,
      link: `${appOrigin()}/shop/quotes/${quote.id}`,
      timeZone,
    }),
  );
  return true;
}
