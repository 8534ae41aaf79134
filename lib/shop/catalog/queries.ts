import "server-only";
import type { Knex } from "knex";
import type { CatalogImportRow, CatalogItemRow, CatalogKind } from "@/lib/platform/db/types";
import { type CatalogPage, catalogItemDto } from "@/lib/shop/catalog/api";
import { boltPatternQuery, equivalentBoltPatterns } from "@/lib/shop/catalog/boltPatternSearch";
import { type CatalogInput, type CsvReport, IMPORTED_FIELDS, importChanges } from "@/lib/shop/catalog/csv";
import { containsPattern, searchKey } from "@/lib/platform/search/normalize";
import { withoutSearchKey } from "../../platform/search/searchKeyColumn";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, NotFoundError } from "@/lib/platform/errors";
import { assertOnHandCoversHeld } from "@/lib/shop/catalog/stockQueries";

export const CATALOG_SORTS = ["sku", "description", "price_cents", "qty_on_hand", "kind", "tire_diameter_mm", "updated_at"] as const;
export type CatalogSort = (typeof CATALOG_SORTS)[number];

export interface CatalogQuery {
  kind?: CatalogKind;
  q?: string;
  sort?: CatalogSort;
  dir?: "asc" | "desc";
  /** The archived items only (the owner finds one to bring it back); otherwise only the live ones. */
  archived?: boolean;
  page?: number;
  pageSize?: number;
}

/**
 * One page of the shop's catalog, filtered and sorted in PostgreSQL, with the total matched.
 * The search looks for the query's search key (lib/platform/search/normalize: × and x alike, 12.5 = 12.50,
 * accents folded) in the stored key of SKU, description, tire size and bolt pattern, and finds a
 * bolt pattern by either spelling (6x5.5 = 6x139.7).
 */
export async function listCatalog(db: Knex, shopId: string, q: CatalogQuery = {}): Promise<CatalogPage> {
  const pageSize = Math.min(Math.max(q.pageSize ?? 25, 1), 200);
  const page = Math.max(q.page ?? 1, 1);
  // Archived items leave the lists and pickers (quote lines keep their own copy); the owner lists them apart.
  const base = db<CatalogItemRow>("catalog_items").where({ shop_id: shopId });
  if (q.archived) base.whereNotNull("archived_at");
  else base.whereNull("archived_at");
  if (q.kind) base.andWhere({ kind: q.kind });
  const text = q.q?.trim() ?? "";
  if (text) {
    const samePattern = boltPatternQuery(text) ? equivalentBoltPatterns(text, await storedBoltPatterns(db, shopId)) : [];
    base.andWhere((w) => {
      w.whereLike("search_key", containsPattern(searchKey(text)));
      if (samePattern.length) w.orWhereIn("bolt_pattern", samePattern);
    });
  }
  const [{ count }] = (await base.clone().count<{ count: string }[]>({ count: "*" })) as [{ count: string }];
  const sort = q.sort ?? "sku";
  const items = await base
    .clone()
    .orderBy([
      { column: sort, order: q.dir ?? "asc", nulls: "last" },
      { column: "sku", order: "asc" },
    ])
    .limit(pageSize)
    .offset((page - 1) * pageSize)
    .select("*");
  return { items: items.map(catalogItemDto), total: Number(count), page, pageSize };
}

/** The bolt patterns the shop's catalog holds, each once (a few dozen at most). */
async function storedBoltPatterns(db: Knex, shopId: string): Promise<string[]> {
  return db("catalog_items").where({ shop_id: shopId }).whereNotNull("bolt_pattern").distinct("bolt_pattern").pluck("bolt_pattern");
}

const FITMENT_COLUMNS = [
  "id",
  "sku",
  "description",
  "price_cents",
  "qty_on_hand",
  "tire_size",
  "wheel_diameter_in",
  "wheel_width_in",
  "wheel_offset_mm",
  "bolt_pattern",
  "center_bore_mm",
  "beadlock",
] as const;

/** The shop's wheels, and its tires for those wheels' diameters: what the fitment finder ranks. */
export async function fitmentStock(db: Knex, shopId: string): Promise<{ wheels: CatalogItemRow[]; tires: CatalogItemRow[] }> {
  const wheels = (await db<CatalogItemRow>("catalog_items")
    .where({ shop_id: shopId, kind: "wheel" })
    .whereNull("archived_at")
    .select(FITMENT_COLUMNS)) as CatalogItemRow[];
  const diameters = [...new Set(wheels.map((w) => w.wheel_diameter_in!))];
  const tires = (await db<CatalogItemRow>("catalog_items")
    .where({ shop_id: shopId, kind: "tire" })
    .whereIn("tire_rim_in", diameters)
    .whereNull("archived_at")
    .select(FITMENT_COLUMNS)) as CatalogItemRow[];
  return { wheels, tires };
}

/** Every item, for export, in SKU order. */
export async function allCatalogItems(db: Knex, shopId: string): Promise<CatalogItemRow[]> {
  return (
    await db<CatalogItemRow>("catalog_items")
      .where({ shop_id: shopId })
      .orderBy([{ column: "kind" }, { column: "sku" }])
  ).map(withoutSearchKey);
}

/** Keeps the validated rows of a previewed file until the owner confirms (or not). */
export async function stageImport(db: Knex, shopId: string, userId: string, filename: string, report: CsvReport) {
  // Which SKUs already exist, and with what, decides "new", "updated" or "unchanged" in the preview.
  const stored = new Map<string, Record<string, unknown>>();
  for (let i = 0; i < report.items.length; i += 5000) {
    const chunk = report.items.slice(i, i + 5000).map((item) => item.sku);
    const rows = (await db("catalog_items")
      .where({ shop_id: shopId })
      .whereIn("sku", chunk)
      .select("sku", ...IMPORTED_FIELDS)) as (Record<string, unknown> & { sku: string })[];
    for (const r of rows) stored.set(r.sku, r);
  }
  const existing = report.items.filter((item) => stored.has(item.sku));
  const changed = existing.filter((item) => importChanges(item, stored.get(item.sku)!)).length;
  const [row] = await db<CatalogImportRow>("catalog_imports")
    .insert({
      shop_id: shopId,
      created_by: userId,
      filename: filename.slice(0, 200),
      rows: JSON.stringify(report.items.map(({ row: _row, ...item }) => item)) as unknown as CatalogImportRow["rows"],
      row_count: report.items.length,
      // Rows left out, not problems: a row with two problems is one row skipped.
      error_count: report.skippedRows,
    })
    .returning(["id"]);
  return {
    id: (row as { id: string }).id,
    newItems: report.items.length - existing.length,
    updatedItems: changed,
    unchangedItems: existing.length - changed,
  };
}

/** How long a preview may wait for confirmation. */
export const STAGED_IMPORT_TTL_MINUTES = 60;

const ALREADY_CONFIRMED = "This import was already confirmed.";

/** The shop's preview, if it is younger than STAGED_IMPORT_TTL_MINUTES (confirmed or not). */
async function findStagedImport(db: Knex, shopId: string, id: string) {
  return db<CatalogImportRow>("catalog_imports")
    .where({ id, shop_id: shopId })
    .andWhere("created_at", ">", db.raw("now() - make_interval(mins => ?)", [STAGED_IMPORT_TTL_MINUTES]))
    .first("id", "status", "row_count");
}

/** A preview still waiting for confirmation: NotFoundError when missing or too old, ConflictError when already confirmed. */
export async function getStagedImport(db: Knex, shopId: string, id: string) {
  const staged = await findStagedImport(db, shopId, id);
  if (!staged) throw new NotFoundError("That import preview");
  if (staged.status !== "staged") throw new ConflictError(ALREADY_CONFIRMED);
  return staged;
}

export const IMPORT_BATCH = 500;

/**
 * Upserts a staged import by SKU in one transaction: every row or none. `onProgress` is called
 * after each batch. ConflictError when the import is not (or no longer) staged — a second
 * confirmation waits on the row lock and then finds it committed.
 */
export async function commitImport(
  db: Knex,
  shopId: string,
  id: string,
  onProgress: (done: number, total: number) => void = () => {},
): Promise<{ imported: number }> {
  return db.transaction(async (trx) => {
    const [staged] = (await trx("catalog_imports")
      .where({ id, shop_id: shopId, status: "staged" })
      .update({ status: "committed", committed_at: trx.fn.now() })
      .returning(["rows"])) as { rows: CatalogInput[] }[];
    if (!staged) throw new ConflictError(ALREADY_CONFIRMED);
    const rows = staged.rows;
    await assertOnHandCoversHeld(trx, shopId, rows);
    onProgress(0, rows.length);
    for (let i = 0; i < rows.length; i += IMPORT_BATCH) {
      const batch = rows.slice(i, i + IMPORT_BATCH).map((r) => ({ ...r, shop_id: shopId, updated_at: trx.fn.now() }));
      await trx("catalog_items")
        .insert(batch)
        .onConflict(["shop_id", "sku"])
        .merge([...IMPORTED_FIELDS, "updated_at"])
        // A row equal to the stored item (counted "unchanged" in the preview) leaves it untouched, updated_at too.
        .whereRaw(IMPORTED_FIELDS.map((f) => `catalog_items.${f} is distinct from excluded.${f}`).join(" or "));
      onProgress(Math.min(i + IMPORT_BATCH, rows.length), rows.length);
    }
    // The staged copy has done its job; keep the record, drop the bulk.
    await trx("catalog_imports")
      .where({ id })
      .update({ rows: JSON.stringify([]) });
    return { imported: rows.length };
  });
}

/** These queries on the app's database handle, for pages and route handlers. */
export const catalogQueries = bindAppDb({ allCatalogItems, commitImport, fitmentStock, getStagedImport, listCatalog, stageImport });
