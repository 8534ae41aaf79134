import type { Knex } from "knex";
import { createdAt, instant, requiredRef, statusColumn, uuidId } from "../lib/columns";

/**
 * Stock: what accepted quotes hold of the shelf.
 *
 * `catalog_items` gains `qty_reserved` (units held by open reservations), `low_stock_at` (the
 * available count at or under which the counter is warned; null = never; 4 by default, one set
 * of four — common practice, no source) and `archived_at` (an archived item leaves the pickers
 * and lists; quote lines keep their own copy of SKU, description and price).
 *
 * `stock_reservations`: one row per quote line of a tracked tire or wheel, written when the quote
 * is accepted, closed as consumed (the work is done: the units leave the shelf) or released
 * (expired, declined). `qty_reserved` is kept by the same transaction that writes the row, under
 * the item's row lock, and the CHECK `catalog_stock_never_below_zero` is the last word: two
 * acceptances of the last units can never both commit.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("catalog_items", (t) => {
    t.integer("qty_reserved").notNullable().defaultTo(0);
    t.integer("low_stock_at").nullable().defaultTo(4);
    instant(t, "archived_at").nullable();
    t.check("qty_reserved >= 0 and (qty_on_hand is null or qty_reserved <= qty_on_hand)", [], "catalog_stock_never_below_zero");
    t.check("low_stock_at is null or low_stock_at >= 0", [], "catalog_low_stock_non_negative");
  });
  await knex.schema.createTable("stock_reservations", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    requiredRef(t, "quote_id", "quotes");
    requiredRef(t, "quote_line_id", "quote_lines");
    requiredRef(t, "catalog_item_id", "catalog_items");
    t.integer("quantity").notNullable();
    statusColumn(t, "stock_reservations", ["reserved", "consumed", "released"], "reserved");
    createdAt(t, knex);
    instant(t, "closed_at").nullable();
    t.unique(["quote_line_id"]);
    t.index(["quote_id"]);
    t.index(["catalog_item_id"]);
    t.check("quantity > 0", [], "stock_reservations_quantity_positive");
    t.check("(status = 'reserved') = (closed_at is null)", [], "stock_reservations_closed_when_done");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("stock_reservations");
  await knex.schema.alterTable("catalog_items", (t) => {
    t.dropChecks(["catalog_stock_never_below_zero", "catalog_low_stock_non_negative"]);
    t.dropColumn("archived_at");
    t.dropColumn("low_stock_at");
    t.dropColumn("qty_reserved");
  });
}
