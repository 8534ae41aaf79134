import { Badge } from "@/components/ui/Badge";
import type { CatalogItem } from "@/lib/shop/catalog/api";

/**
 * What is left to sell of an item (on hand less what accepted quotes hold), with a "Low stock"
 * badge at or under the item's mark: the catalog table and the quote's item picker show the same.
 * Items that are not counted (services, untracked) say so instead of a number.
 */
export function StockLevel({ item }: { item: Pick<CatalogItem, "qtyAvailable" | "qtyReserved" | "lowStock"> }) {
  if (item.qtyAvailable === null) return <span className="text-basalt-600">not counted</span>;
  return (
    <span className="inline-flex flex-wrap items-center justify-end gap-1.5">
      <span>{item.qtyAvailable} available</span>
      {item.lowStock && <Badge tone="tight">Low stock</Badge>}
    </span>
  );
}
