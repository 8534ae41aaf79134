import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { shopIdOf, shopQueries, SHOP_ANY } from "@/lib/shop/queries";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { LowStockNote } from "@/components/catalog/LowStockNote";

export const metadata: Metadata = { title: "Your shop" };

export default async function ShopPage() {
  const caller = await requirePageCaller("/shop", SHOP_ANY);
  // Scoped by the session's shop id: nobody sees another shop's people.
  const shopId = shopIdOf(caller);
  const [shop, people, lowStock] = await Promise.all([
    shopQueries.findShop(shopId),
    shopQueries.listTeam(shopId),
    catalogItemQueries.countLowStock(shopId),
  ]);
  return (
    <>
      <PageHeader
        title={shop?.name ?? "Your shop"}
        lead="Quote a fitment for the customer at the counter, send it, and take the deposit."
        actions={<LinkButton href="/shop/quotes/new">New quote</LinkButton>}
      />
      <div className="grid gap-5 md:grid-cols-2">
        <Card>
          <h2 className="text-lg font-semibold">Team</h2>
          <ul className="mt-3 divide-y divide-basalt-100">
            {people.map((p) => (
              <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
                <span>
                  <span className="font-medium">{p.name}</span>
                  {caller.role === "shop_owner" && <span className="ml-2 text-basalt-600">{p.email}</span>}
                </span>
                <Badge tone={p.role === "shop_owner" ? "ember" : "steel"}>{p.role === "shop_owner" ? "Owner" : "Staff"}</Badge>
              </li>
            ))}
          </ul>
        </Card>
        <Card>
          <h2 className="text-lg font-semibold">At the counter</h2>
          <ul className="mt-3 flex flex-col gap-2 text-sm">
            <li>
              <Link className="font-medium text-ember-700 underline" href="/shop/quotes/new">
                Start a quote
              </Link>{" "}
              — find the customer, enter the vehicle, pick tire and wheel.
            </li>
            <li>
              <Link className="font-medium text-ember-700 underline" href="/shop/quotes">
                Open quotes
              </Link>{" "}
              — drafts, sent, accepted and paid.
            </li>
            <li>
              <Link className="font-medium text-ember-700 underline" href="/shop/catalog">
                Catalog
              </Link>{" "}
              — tires, wheels and services with stock.
              <LowStockNote count={lowStock} />
            </li>
          </ul>
        </Card>
      </div>
    </>
  );
}
