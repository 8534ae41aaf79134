import "server-only";
import type { Knex } from "knex";
import type { CatalogItemRow } from "@/lib/platform/db/types";
import { InvalidError, NotFoundError } from "@/lib/platform/errors";
import { bindAppDb } from "@/lib/platform/db/bind";
import { withoutSearchKey } from "@/lib/platform/search/searchKeyColumn";
import type { CatalogItemSave } from "@/lib/shop/catalog/itemSchema";

/**
 * One catalog item at a time: the owner's single-item editor (add, edit, archive) and the
 * dashboard's low-stock count. Every query is scoped to the caller's shop; another shop's item is
 * a NotFoundError, never "forbidden".
 */

const ITEM = "That catalog item";

const duplicateSku = (sku: string) => InvalidError.fields({ sku: [`SKU ${sku} is already in the catalog. Edit that item instead.`] });
const isUniqueViolation = (e: unknown) => (e as { code?: string }).code === "23505";

async function assertSkuFree(trx: Knex.Transaction, shopId: string, sku: string): Promise<void> {
  if (await trx("catalog_items").where({ shop_id: shopId, sku }).first("id")) throw duplicateSku(sku);
}

/**
 * Runs one item's write in a transaction and answers the row it returns. Two writes of one SKU at
 * once both pass assertSkuFree: the unique index decides, and the loser hears it on the SKU field too.
 */
async function savingSku(db: Knex, sku: string, write: (trx: Knex.Transaction) => Promise<CatalogItemRow>): Promise<CatalogItemRow> {
  try {
    return withoutSearchKey(await db.transaction(write));
  } catch (e) {
    if (isUniqueViolation(e)) throw duplicateSku(sku);
    throw e;
  }
}

/** One item of the shop (archived or not). NotFoundError when missing or another shop's. */
export async function getCatalogItem(db: Knex | Knex.Transaction, shopId: string, id: string, lock = false): Promise<CatalogItemRow> {
  const q = db<CatalogItemRow>("catalog_items").where({ shop_id: shopId, id }).first();
  if (lock) q.forUpdate();
  const row = (await q) as CatalogItemRow | undefined;
  if (!row) throw new NotFoundError(ITEM);
  return withoutSearchKey(row);
}

/** Adds one item; a SKU the shop already has is refused on the SKU field. */
export async function addCatalogItem(db: Knex, shopId: string, save: CatalogItemSave): Promise<CatalogItemRow> {
  return savingSku(db, save.item.sku, async (trx) => {
    await assertSkuFree(trx, shopId, save.item.sku);
    const [row] = await trx("catalog_items")
      .insert({ ...save.item, low_stock_at: save.lowStockAt, shop_id: shopId })
      .returning("*");
    return row as CatalogItemRow;
  });
}

/**
 * Replaces one item's fields, under its row lock. What accepted quotes hold stays held: on hand
 * cannot go under it (nor the item stop being counted while units are held).
 */
export async function updateCatalogItem(db: Knex, shopId: string, id: string, save: CatalogItemSave): Promise<CatalogItemRow> {
  return savingSku(db, save.item.sku, async (trx) => {
    const current = await getCatalogItem(trx, shopId, id, true);
    const held = current.qty_reserved;
    if (held > 0 && (save.item.qty_on_hand === null || save.item.qty_on_hand < held)) {
      throw InvalidError.fields({
        qtyOnHand: [
          `Accepted quotes hold ${held} of this item: on hand cannot be less than ${held} until their work is done or they lapse.`,
        ],
      });
    }
    if (save.item.sku !== current.sku) await assertSkuFree(trx, shopId, save.item.sku);
    const [row] = await trx("catalog_items")
      .where({ id, shop_id: shopId })
      .update({ ...save.item, low_stock_at: save.lowStockAt, updated_at: trx.fn.now() })
      .returning("*");
    return row as CatalogItemRow;
  });
}

/**
 * Archives an item (it leaves the catalog's lists and pickers; quotes keep their own copy of it)
 * or brings it back. Units already held stay held until their quotes move on.
 */
export async function setCatalogItemArchived(db: Knex, shopId: string, id: string, archived: boolean): Promise<CatalogItemRow> {
  const [row] = await db("catalog_items")
    .where({ id, shop_id: shopId })
    .update({ archived_at: archived ? db.fn.now() : null, updated_at: db.fn.now() })
    .returning("*");
  if (!row) throw new NotFoundError(ITEM);
  return withoutSearchKey(row as CatalogItemRow);
}

/** The shop's counted, listed items at or under their low-stock mark (what is left after holds). */
export async function countLowStock(db: Knex, shopId: string): Promise<number> {
  const [{ n }] = (await db("catalog_items")
    .where({ shop_id: shopId })
    .whereNull("archived_at")
    .whereNotNull("qty_on_hand")
    .whereNotNull("low_stock_at")
    .whereRaw("qty_on_hand - qty_reserved <= low_stock_at")
    .count<{ n: string }[]>({ n: "*" })) as [{ n: string }];
  return Number(n);
}

/** These queries on the app's database handle, for pages and route handlers. */
export const catalogItemQueries = bindAppDb({ addCatalogItem, countLowStock, getCatalogItem, setCatalogItemArchived, updateCatalogItem });
