import type { Metadata } from "next";
import { FitmentSummaryCard } from "@/components/quotes/FitmentSummaryCard";
import { HubChecksList } from "@/components/quotes/HubChecksList";
import { QuoteDocumentLines } from "@/components/quotes/QuoteDocumentLines";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { formatUsd } from "@/lib/shop/quotes/money";
import { STATUS_LABEL } from "@/lib/shop/quotes/queries";
import { quoteSendQueries } from "@/lib/shop/quotes/send";
import { canBook } from "@/lib/shop/bookings/bookable";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { InstallBooking } from "./InstallBooking";
import { PublicQuoteActions } from "./PublicQuoteActions";
import { BalancePanel } from "./BalancePanel";
import { ledgerQueries } from "@/lib/shop/payments/ledgerQueries";
import { DEPOSIT_REFUNDED, invoiceDepositGivenBack } from "@/lib/shop/payments/depositBack";

export const metadata: Metadata = { title: "Your quote", robots: { index: false } };
export const dynamic = "force-dynamic";

/** The customer's link: the quote as it was sent to them, with its live status. */
export default async function PublicQuotePage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ paid?: string; checkout?: string }>;
}) {
  const { token } = await params;
  const { paid, checkout } = await searchParams;
  const view = await quoteSendQueries.findPublicQuoteView(token);
  if (!view) {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl font-bold">Quote not available</h1>
        <Alert tone="warning" className="mt-3">
          This link is not valid or has been replaced by a newer one. Ask the shop to send the quote again.
        </Alert>
      </Card>
    );
  }
  const { quote, document: d } = view;
  const t = d.totals;
  const paidUp = quote.status === "deposit_paid" || quote.status === "installed";
  const payments = await ledgerQueries.publicPayments(token);
  const givenBack = invoiceDepositGivenBack(payments.invoice);
  const bookable = canBook(quote) && !givenBack;
  const booking = bookable ? await bookingQueries.liveBooking(quote) : null;
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-5">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-basalt-600">{d.shop.name}</p>
        <h1 className="text-3xl font-bold">
          Quote Q-{d.number} for {d.customer.name}
        </h1>
        <p className="mt-1 text-basalt-700">
          <Badge tone={paidUp ? "clear" : quote.status === "expired" || quote.status === "declined" ? "contact" : "steel"}>
            <span data-testid="public-status">{STATUS_LABEL[quote.status]}</span>
          </Badge>{" "}
          {d.vehicle.description}
          {view.validUntilDay && quote.status !== "expired" && ` · valid until ${view.validUntilDay}`}
        </p>
        <p className="text-sm text-basalt-600">{[d.shop.address, d.shop.phone].filter(Boolean).join(" · ")}</p>
      </header>
      {paid && quote.status === "accepted" && (
        <Alert tone="info">Payment received by the provider; waiting for its confirmation. Refresh in a moment.</Alert>
      )}
      {givenBack && (quote.status === "deposit_paid" || quote.status === "declined") && <Alert tone="info">{DEPOSIT_REFUNDED}</Alert>}
      {quote.status === "deposit_paid" && !givenBack && (
        <Alert tone="success" title="Deposit paid">
          Thank you. {booking ? "Your install time is below." : "Pick your install time below."} Still to pay at the fitting:{" "}
          <span data-testid="public-balance-after-paid">{formatUsd(payments.invoice.outstandingCents)}</span>.
        </Alert>
      )}
      {quote.status === "expired" && <Alert tone="warning">This quote has expired. Ask the shop for a new one.</Alert>}
      <Card className="min-w-0" role="region" aria-label="What is included">
        <h2 className="text-lg font-semibold">What is included</h2>
        <QuoteDocumentLines document={d} />
        {d.notes && <p className="mt-3 text-sm text-basalt-700">{d.notes}</p>}
      </Card>
      {(payments.invoiceOpen || payments.payments.length > 0) && (
        <BalancePanel token={token} payments={payments} justPaid={paid === "balance"} returned={checkout === "balance"} />
      )}
      {bookable && <InstallBooking token={token} booking={booking} shopName={d.shop.name} />}
      <PublicQuoteActions token={token} status={quote.status} deposit={formatUsd(t.depositCents)} balance={formatUsd(t.balanceCents)} />
      {d.hubChecks.some((c) => c.findings.some((f) => f.level !== "ok")) && (
        <Card>
          <h2 className="text-lg font-semibold">Wheels on your hubs</h2>
          <HubChecksList checks={d.hubChecks} />
        </Card>
      )}
      <FitmentSummaryCard fit={d.fitment} />
    </div>
  );
}
