import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { shopQueries, SHOP_ANY } from "@/lib/shop/queries";
import { canBook } from "@/lib/shop/bookings/bookable";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { CounterBooking } from "./CounterBooking";
import { OpenWorkOrder } from "./OpenWorkOrder";
import { PaymentsCard } from "./PaymentsCard";
import { ledgerQueries } from "@/lib/shop/payments/ledgerQueries";
import { DEPOSIT_REFUNDED, invoiceDepositGivenBack } from "@/lib/shop/payments/depositBack";
import { Alert } from "@/components/ui/Alert";
import { QuoteEditor } from "./QuoteEditor";

export const metadata: Metadata = { title: "Quote" };

export default async function QuotePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/shop/quotes/${id}`, SHOP_ANY);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const detail = await pageGuard(quoteQueries.getQuoteDetail(quoteScopeOf(caller), id));
  const shop = await shopQueries.findShop(detail.quote.shop_id);
  const q = detail.quote;
  const payments = await ledgerQueries.quotePayments(quoteScopeOf(caller), q.id);
  const givenBack = invoiceDepositGivenBack(payments.invoice);
  const [booking, setup] =
    canBook(q) && !givenBack ? await Promise.all([bookingQueries.liveBooking(q), bookingQueries.getSetup(q.shop_id)]) : [null, null];
  const workOrder = (await workOrderQueries.findWorkOrderOfQuote(q.shop_id, q.id)) ?? null;
  const workOrderId = workOrder?.id ?? null;
  return (
    <>
      <QuoteEditor
        initial={quoteDetailDto(detail)}
        labourRateCents={shop?.labour_rate_cents ?? 0}
        workOrder={workOrder}
        depositGivenBack={givenBack}
      />
      {givenBack && (q.status === "deposit_paid" || q.status === "declined") && (
        <Alert tone="info" className="mt-5">
          {DEPOSIT_REFUNDED}
        </Alert>
      )}
      {setup && <CounterBooking quoteId={q.id} initial={booking} bays={setup.bays} />}
      {(booking || workOrderId) && <OpenWorkOrder quoteId={q.id} workOrderId={workOrderId} />}
      {(payments.payments.length > 0 || payments.invoiceOpen) && (
        <PaymentsCard quoteId={q.id} payments={payments} owner={caller.role === "shop_owner"} />
      )}
    </>
  );
}
