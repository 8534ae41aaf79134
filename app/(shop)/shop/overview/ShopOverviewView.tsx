import type { ShopOverview } from "@/lib/shop/overview";
import { BaysWeekCard } from "./BaysWeekCard";
import { DepositsHeldCard } from "./DepositsHeldCard";
import { TakingsCard } from "./TakingsCard";

/** The owner's overview: the week in the bays, the deposits held, the takings by day. */
export function ShopOverviewView({ overview }: { overview: ShopOverview }) {
  return (
    <div className="flex flex-col gap-5">
      <p className="text-sm text-basalt-600">Times and days on the shop&apos;s clock ({overview.timeZone}).</p>
      <BaysWeekCard week={overview.week} />
      <DepositsHeldCard deposits={overview.deposits} timeZone={overview.timeZone} />
      <TakingsCard takings={overview.takings} />
    </div>
  );
}
