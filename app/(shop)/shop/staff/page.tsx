import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { shopIdOf, shopQueries, SHOP_OWNER } from "@/lib/shop/queries";
import { StaffPanel } from "./StaffPanel";

export const metadata: Metadata = { title: "Staff" };

export default async function StaffPage() {
  const caller = await requirePageCaller("/shop/staff", SHOP_OWNER);
  const data = await shopQueries.staffData(shopIdOf(caller));
  return (
    <>
      <PageHeader
        title="Staff"
        lead="Invite counter staff by e-mail. The link works once and expires after three days. Staff can do everything a member can: the garage and saved comparisons they keep are their own, the shop does not see them, and they keep them if they leave the shop."
      />
      <StaffPanel selfId={caller.userId} initial={data} />
    </>
  );
}
