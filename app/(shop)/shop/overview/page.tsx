import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { overviewQueries } from "@/lib/shop/overviewQueries";
import { shopIdOf, SHOP_OWNER } from "@/lib/shop/queries";
import { ShopOverviewView } from "./ShopOverviewView";

export const metadata: Metadata = { title: "Overview" };

/** Owner only: this week's bookings per bay, the deposits held and the takings by day. */
export default async function OverviewPage() {
  const caller = await requirePageCaller("/shop/overview", SHOP_OWNER);
  const overview = await overviewQueries.shopOverview(shopIdOf(caller));
  return (
    <>
      <PageHeader title="Overview" lead="The week in the bays, the deposits you hold, and what came in over the last two weeks." />
      <ShopOverviewView overview={overview} />
    </>
  );
}
