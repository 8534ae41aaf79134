import type { Metadata } from "next";
import { buttonClass } from "@/components/ui/Button";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { SHOP_ANY } from "@/lib/shop/queries";
import { CatalogTable } from "../CatalogTable";

export const metadata: Metadata = { title: "Catalog" };

export default async function CatalogPage() {
  const caller = await requirePageCaller("/shop/catalog", SHOP_ANY);
  const owner = caller.role === "shop_owner";
  return (
    <>
      <PageHeader
        title="Catalog"
        lead="Tires, wheels and services with prices and stock. Accepted quotes hold their tires and wheels until the work is done; quotes pick from here."
        actions={
          <div className="flex flex-wrap gap-2">
            <a href="/api/shop/catalog/export" className={buttonClass("secondary")} download>
              Export CSV
            </a>
            <a href="/api/shop/catalog/template" className={buttonClass("secondary")} download>
              CSV template
            </a>
            {owner && (
              <>
                <LinkButton href="/shop/catalog/import" variant="secondary">
                  Import CSV
                </LinkButton>
                <LinkButton href="/shop/catalog/new">Add an item</LinkButton>
              </>
            )}
          </div>
        }
      />
      <CatalogTable canEdit={owner} />
    </>
  );
}
