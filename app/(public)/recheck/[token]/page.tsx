import type { Metadata } from "next";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { recheckBookingQueries } from "@/lib/shop/workOrders/recheckBookingQueries";
import { RECHECK_NOTE } from "@/lib/shop/workOrders/vocabulary";
import { RecheckBooking } from "./RecheckBooking";

export const metadata: Metadata = { title: "Book your re-check", robots: { index: false } };
export const dynamic = "force-dynamic";

/** The re-check e-mail's link: the customer books a short slot for the lug and ring re-check. */
export default async function RecheckPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const page = await recheckBookingQueries.recheckPageByLink(token);
  if (page.state === "refused") {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl font-bold">{page.title}</h1>
        <Alert tone="warning" className="mt-3">
          {page.message}
        </Alert>
      </Card>
    );
  }
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-5">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-basalt-600">{page.shopName}</p>
        <h1 className="text-3xl font-bold">Lug and ring re-check</h1>
        <p className="mt-1 text-basalt-700">
          Quote Q-{page.quoteNumber} · {page.vehicle}
        </p>
      </header>
      <Alert tone="warning">{RECHECK_NOTE}</Alert>
      <RecheckBooking
        token={token}
        booking={page.booking}
        shopName={page.shopName}
        shopPhone={page.shopPhone}
        slotMinutes={page.slotMinutes}
      />
    </div>
  );
}
