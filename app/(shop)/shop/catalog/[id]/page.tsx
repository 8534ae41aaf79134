import type { Metadata } from "next";
import { StockLevel } from "@/components/catalog/StockLevel";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { catalogItemDto } from "@/lib/shop/catalog/api";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { catalogItemFormValues } from "@/lib/shop/catalog/itemSchema";
import { shopIdOf, SHOP_OWNER } from "@/lib/shop/queries";
import { CatalogItemForm } from "../CatalogItemForm";
import { ArchiveItemButton } from "./ArchiveItemButton";

export const metadata: Metadata = { title: "Edit catalog item" };

/** The owner's editor for one item, with what is on the shelf, held by accepted quotes and left to sell. */
export default async function CatalogItemPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/shop/catalog/${id}`, SHOP_OWNER);
  const item = catalogItemDto(await pageGuard(catalogItemQueries.getCatalogItem(shopIdOf(caller), id)));
  return (
    <>
      <PageHeader title={`${item.sku}`} lead={item.description} />
      {item.archivedAt && (
        <Alert tone="info" className="mb-4">
          Archived: this item is not offered in the catalog or on new quotes. Quotes that have it keep it.
        </Alert>
      )}
      <div className="grid gap-5 lg:grid-cols-[2fr_1fr]">
        <Card>
          <CatalogItemForm itemId={item.id} initial={catalogItemFormValues(item)} />
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">Stock</h2>
          <dl className="mt-3 grid grid-cols-2 gap-2 text-sm" data-testid="stock-figures">
            <dt>On hand</dt>
            <dd className="text-right">{item.qtyOnHand ?? "not counted"}</dd>
            <dt>Held by accepted quotes</dt>
            <dd className="text-right">{item.qtyOnHand === null ? "—" : item.qtyReserved}</dd>
            <dt>Available</dt>
            <dd className="text-right">
              <StockLevel item={item} />
            </dd>
          </dl>
          <div className="mt-5">
            <ArchiveItemButton itemId={item.id} archived={item.archivedAt !== null} />
          </div>
        </Card>
      </div>
    </>
  );
}
