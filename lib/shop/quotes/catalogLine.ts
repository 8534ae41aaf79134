import type { CatalogItemRow, QuoteLineRow, QuoteLineUnit } from "@/lib/platform/db/types";

/** A quote line before it is stored: what the quote, its position and its total add come later. */
export type LineDraft = Omit<QuoteLineRow, "id" | "quote_id" | "position" | "line_total_cents">;

/** Hourly services may be quoted in part hours; everything else from the catalog is counted. */
const unitOf = (item: Pick<CatalogItemRow, "kind" | "service_unit">): QuoteLineUnit =>
  item.kind === "service" && item.service_unit === "per_hour" ? "hour" : "each";

/** What a line copies from its catalog item: the item's own kind and unit, and a wheel's drilling and bore. */
export function fromCatalog(item: CatalogItemRow): Pick<LineDraft, "kind" | "unit" | "wheel_bolt_pattern" | "wheel_center_bore_mm"> {
  return {
    kind: item.kind,
    unit: unitOf(item),
    wheel_bolt_pattern: item.kind === "wheel" ? item.bolt_pattern : null,
    wheel_center_bore_mm: item.kind === "wheel" ? item.center_bore_mm : null,
  };
}

/**
 * A quote line sold from a catalog item at its price with no discount: the item's kind, unit, SKU and
 * description, and a wheel's drilling and bore (the hub check reads them from the line). The counter
 * and the demo seed build their lines with it, so a seeded quote reads as one the counter wrote.
 *
 * @example
 * catalogLine(wheelItem, 4, true);
 * // { kind: "wheel", unit: "each", sku: "WH-…", quantity: 4, discount_cents: 0, taxable: true, wheel_bolt_pattern: "6x139.7", … }
 */
export function catalogLine(item: CatalogItemRow, quantity: number, taxable: boolean): LineDraft {
  return {
    ...fromCatalog(item),
    catalog_item_id: item.id,
    sku: item.sku,
    description: item.description,
    quantity,
    unit_price_cents: item.price_cents,
    discount_cents: 0,
    taxable,
  };
}
