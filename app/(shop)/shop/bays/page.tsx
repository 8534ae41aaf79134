import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { shopIdOf, SHOP_OWNER } from "@/lib/shop/queries";
import { BaysForm } from "./BaysForm";

export const metadata: Metadata = { title: "Bays and hours" };

/** Owner only: the week, the closed dates, the bays and the service times that install bookings follow. */
export default async function BaysPage() {
  const caller = await requirePageCaller("/shop/bays", SHOP_OWNER);
  const setup = await bookingQueries.getSetup(shopIdOf(caller));
  return (
    <>
      <PageHeader
        title="Bays and hours"
        lead="When customers may book an install, in which bays, and how long each service keeps a truck there."
      />
      <div className="max-w-4xl">
        <BaysForm initial={setup} />
      </div>
    </>
  );
}
