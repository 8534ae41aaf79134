import "server-only";
import type { Knex } from "knex";
import type { CatalogItemRow, QuoteStatus, StockReservationRow, StockReservationStatus } from "@/lib/platform/db/types";
import { ConflictError } from "@/lib/platform/errors";

/**
 * Stock held by quotes. A quote's acceptance reserves its tracked tires and wheels, the work done
 * consumes them (they leave the shelf), a lapse or a decline releases them. Untracked items
 * (qty_on_hand null) and services are never held or limited.
 *
 * Every function runs inside the transaction that moves the quote (the quote row already locked),
 * locks the catalog items it touches in id order (so two quotes never wait on each other in a
 * cycle) and keeps `catalog_items.qty_reserved` in step with the open reservations; the CHECK
 * `catalog_stock_never_below_zero` refuses any commit that would hold more than is on hand.
 */

type Need = Pick<CatalogItemRow, "id" | "sku" | "description" | "qty_on_hand" | "qty_reserved"> & { needed: number };

/** The quote's tire and wheel lines on tracked items, one entry per item with the units the quote needs. */
async function trackedLines(trx: Knex.Transaction, quoteId: string) {
  return (await trx("quote_lines as l")
    .join("catalog_items as c", "c.id", "l.catalog_item_id")
    .where("l.quote_id", quoteId)
    .whereIn("l.kind", ["tire", "wheel"])
    .whereIn("c.kind", ["tire", "wheel"])
    .whereNotNull("c.qty_on_hand")
    .select("l.id as lineId", "c.id as itemId", "c.shop_id as shopId", "l.quantity")) as {
    lineId: string;
    itemId: string;
    shopId: string;
    quantity: string | number;
  }[];
}

/** The items, locked in id order, with their counts as of now. */
async function lockItems(trx: Knex.Transaction, ids: string[]) {
  const sorted = [...new Set(ids)].sort();
  if (!sorted.length) return new Map<string, Need>();
  const rows = (await trx("catalog_items")
    .whereIn("id", sorted)
    .orderBy("id")
    .forUpdate()
    .select("id", "sku", "description", "qty_on_hand", "qty_reserved")) as Need[];
  return new Map(rows.map((r) => [r.id, { ...r, needed: 0 }]));
}

/** The message a refused acceptance gives: which item and how many are left to hold. */
export function shortMessage(item: Pick<Need, "sku" | "description" | "needed">, available: number): string {
  const left = available <= 0 ? "none are left" : available === 1 ? "only 1 is left" : `only ${available} are left`;
  return `Not enough stock of ${item.sku} (${item.description}): this quote needs ${item.needed} and ${left} to hold.`;
}

/**
 * Holds the quote's tracked tires and wheels. ConflictError naming the first item short (with how
 * many are left) and nothing written when any is; lines already held are left as they are.
 */
export async function reserveForQuote(trx: Knex.Transaction, quoteId: string): Promise<void> {
  const held = new Set((await trx("stock_reservations").where({ quote_id: quoteId }).pluck("quote_line_id")) as string[]);
  const lines = (await trackedLines(trx, quoteId)).filter((l) => !held.has(l.lineId));
  // Items are counted whole; a part unit (never quoted for a tire or wheel) still takes a whole one.
  const units = lines.map((l) => ({ ...l, units: Math.ceil(Number(l.quantity)) })).filter((l) => l.units > 0);
  const items = await lockItems(
    trx,
    units.map((l) => l.itemId),
  );
  for (const l of units) items.get(l.itemId)!.needed += l.units;
  for (const item of items.values()) {
    const available = (item.qty_on_hand ?? 0) - item.qty_reserved;
    // Tracked when the lines were read; the lock makes the count current.
    if (item.qty_on_hand !== null && item.needed > available) {
      throw new ConflictError(shortMessage(item, available), { sku: item.sku, available: Math.max(available, 0), needed: item.needed });
    }
  }
  if (!units.length) return;
  await trx("stock_reservations").insert(
    units.map((l) => ({ shop_id: l.shopId, quote_id: quoteId, quote_line_id: l.lineId, catalog_item_id: l.itemId, quantity: l.units })),
  );
  for (const item of items.values()) {
    await trx("catalog_items")
      .where({ id: item.id })
      .update({ qty_reserved: trx.raw("qty_reserved + ?", [item.needed]) });
  }
}

/**
 * Closes the quote's open reservations: "consumed" takes the units off the shelf (on hand and held
 * both fall), "released" gives them back to what is available (held falls). Returns the units closed.
 */
export async function closeReservations(
  trx: Knex.Transaction,
  quoteId: string,
  as: Exclude<StockReservationStatus, "reserved">,
): Promise<number> {
  const open = (await trx<StockReservationRow>("stock_reservations")
    .where({ quote_id: quoteId, status: "reserved" })
    .select("catalog_item_id", "quantity")) as Pick<StockReservationRow, "catalog_item_id" | "quantity">[];
  if (!open.length) return 0;
  const perItem = new Map<string, number>();
  for (const r of open) perItem.set(r.catalog_item_id, (perItem.get(r.catalog_item_id) ?? 0) + r.quantity);
  await lockItems(trx, [...perItem.keys()]);
  await trx("stock_reservations").where({ quote_id: quoteId, status: "reserved" }).update({ status: as, closed_at: trx.fn.now() });
  for (const [id, n] of [...perItem].sort(([a], [b]) => a.localeCompare(b))) {
    await trx("catalog_items")
      .where({ id })
      .update({
        qty_reserved: trx.raw("qty_reserved - ?", [n]),
        // An item made untracked while held stays untracked (null − n is null).
        ...(as === "consumed" ? { qty_on_hand: trx.raw("qty_on_hand - ?", [n]) } : {}),
      });
  }
  return [...perItem.values()].reduce((a, b) => a + b, 0);
}

/**
 * Refuses new counts on hand under what accepted quotes hold (a CSV import), naming each SKU;
 * locks the held items until the caller's transaction ends, so no acceptance slips in between.
 */
export async function assertOnHandCoversHeld(
  trx: Knex.Transaction,
  shopId: string,
  counts: readonly { sku: string; qty_on_hand: number | null }[],
): Promise<void> {
  const held = (await trx("catalog_items")
    .where({ shop_id: shopId })
    .andWhere("qty_reserved", ">", 0)
    .orderBy("id")
    .forUpdate()
    .select("sku", "qty_reserved")) as { sku: string; qty_reserved: number }[];
  const bySku = new Map(counts.map((c) => [c.sku, c.qty_on_hand]));
  const short = held.filter((h) => bySku.has(h.sku) && (bySku.get(h.sku) ?? -1) < h.qty_reserved);
  if (short.length)
    throw new ConflictError(
      `Accepted quotes hold more than the file puts on hand: ${short
        .slice(0, 5)
        .map((h) => `${h.sku} (${h.qty_reserved} held, file says ${bySku.get(h.sku) ?? "not counted"})`)
        .join("; ")}${short.length > 5 ? ` and ${short.length - 5} more` : ""}. Nothing was imported.`,
    );
}

/** What a quote's new status does to the stock it holds; called by the quote's own transition. */
export async function stockFollowsQuote(trx: Knex.Transaction, quoteId: string, to: QuoteStatus): Promise<void> {
  if (to === "accepted") await reserveForQuote(trx, quoteId);
  else if (to === "installed") await closeReservations(trx, quoteId, "consumed");
  else if (to === "declined" || to === "expired") await closeReservations(trx, quoteId, "released");
}
