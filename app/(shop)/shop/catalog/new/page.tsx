import type { Metadata } from "next";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { SHOP_OWNER } from "@/lib/shop/queries";
import { EMPTY_CATALOG_ITEM } from "@/lib/shop/catalog/itemSchema";
import { CatalogItemForm } from "../CatalogItemForm";

export const metadata: Metadata = { title: "Add a catalog item" };

export default async function NewCatalogItemPage() {
  await requirePageCaller("/shop/catalog/new", SHOP_OWNER);
  return (
    <>
      <PageHeader title="Add a catalog item" lead="One tire, wheel or service, checked by the same rules as a CSV row." />
      <Card>
        <CatalogItemForm initial={EMPTY_CATALOG_ITEM} />
      </Card>
    </>
  );
}
