import type { ReactNode } from "react";
import QueryLayout from "@/app/QueryLayout";
import { currentCaller } from "@/lib/platform/auth/session";
import { ShopTabs, type Tab } from "./ShopTabs";

export default async function ShopLayout({ children }: { children: ReactNode }) {
  const caller = await currentCaller().catch(() => null);
  const owner = caller?.role === "shop_owner";
  const tabs: Tab[] = [
    { href: "/shop", label: "Counter" },
    { href: "/shop/quotes", label: "Quotes" },
    { href: "/shop/catalog", label: "Catalog" },
    { href: "/shop/calendar", label: "Calendar" },
    { href: "/shop/rechecks", label: "Re-checks" },
    ...(owner
      ? [
          { href: "/shop/overview", label: "Overview" },
          { href: "/shop/staff", label: "Staff" },
          { href: "/shop/bays", label: "Bays and hours" },
          { href: "/shop/settings", label: "Settings" },
        ]
      : []),
  ];
  return (
    <QueryLayout>
      {caller && (caller.role === "shop_staff" || owner) && <ShopTabs tabs={tabs} />}
      {children}
    </QueryLayout>
  );
}
