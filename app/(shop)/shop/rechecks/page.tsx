import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { shopIdOf, SHOP_ANY } from "@/lib/shop/queries";
import { RECHECK_NOTE } from "@/lib/shop/workOrders/vocabulary";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { recheckSlotQueries } from "@/lib/shop/workOrders/recheckSlotQueries";
import { RecheckDaysForm } from "./RecheckDaysForm";
import { RecheckSlotForm } from "./RecheckSlotForm";

export const metadata: Metadata = { title: "Re-checks" };

/** The counter's "due for re-check" list: finished jobs whose customers are due back for the lug and ring re-check. */
export default async function RechecksPage() {
  const caller = await requirePageCaller("/shop/rechecks", SHOP_ANY);
  const shopId = shopIdOf(caller);
  const [days, due, slotMinutes] = await Promise.all([
    workOrderQueries.recheckDays(shopId),
    workOrderQueries.dueForRecheck(shopId),
    recheckSlotQueries.recheckSlotMinutes(shopId),
  ]);
  return (
    <>
      <PageHeader
        title="Due for re-check"
        lead={`Customers are e-mailed ${days} days after their work is done and book a ${slotMinutes}-minute re-check slot. ${RECHECK_NOTE}`}
      />
      {caller.role === "shop_owner" && (
        <>
          <RecheckDaysForm days={days} />
          <RecheckSlotForm minutes={slotMinutes} />
        </>
      )}
      <Card className="mt-5">
        {due.length === 0 ? (
          <p className="text-sm text-basalt-600">No one is due for a re-check.</p>
        ) : (
          <ul className="flex flex-col divide-y divide-basalt-200" aria-label="Due for re-check">
            {due.map((d) => (
              <li key={d.workOrderId} className="flex flex-wrap justify-between gap-2 py-2 text-sm">
                <span>
                  <Link className="font-semibold underline" href={`/shop/work-orders/${d.workOrderId}`}>
                    Q-{d.quoteNumber}
                  </Link>{" "}
                  {d.customerName} · {d.customerPhone || "no phone"} · {d.vehicleDescription}
                </span>
                <span className="text-basalt-600">
                  Due {d.dueOn} · {d.remindedAt ? "e-mailed" : "not e-mailed (no address): call"}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </>
  );
}
