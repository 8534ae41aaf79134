import type { Metadata } from "next";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/auth/session";
import { db } from "@/lib/db";

export const metadata: Metadata = { title: "Your shop" };

export default async function ShopPage() {
  const caller = await requirePageCaller("/shop", ["shop_staff", "shop_owner"]);
  // Scoped by the session's shop id: nobody sees another shop's people.
  const shop = await db("shops").where({ id: caller.shopId }).first("id", "name");
  const people = await db("users").where({ shop_id: caller.shopId }).orderBy("role", "desc").select("id", "name", "email", "role");
  return (
    <>
      <PageHeader title={shop?.name ?? "Your shop"} lead="The people who work the counter with you." />
      <Card>
        <h2 className="text-lg font-semibold">Team</h2>
        <ul className="mt-3 divide-y divide-basalt-100">
          {people.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <span>
                <span className="font-medium">{p.name}</span>
                {caller.role === "shop_owner" && <span className="ml-2 text-basalt-500">{p.email}</span>}
              </span>
              <Badge tone={p.role === "shop_owner" ? "ember" : "steel"}>{p.role === "shop_owner" ? "Owner" : "Staff"}</Badge>
            </li>
          ))}
        </ul>
      </Card>
    </>
  );
}
