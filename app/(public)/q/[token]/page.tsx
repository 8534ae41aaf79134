import type { Metadata } from "next";
import { FitmentSummaryCard } from "@/components/quotes/FitmentSummaryCard";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { db } from "@/lib/db";
import type { QuoteLineRow } from "@/lib/db/types";
import type { FitmentSummary } from "@/lib/quotes/fitment";
import { formatBp, formatUsd } from "@/lib/quotes/money";
import { STATUS_LABEL, expireDue, findByToken } from "@/lib/server/quotes";
import { getShop } from "@/lib/server/shops";
import { PublicQuoteActions } from "./PublicQuoteActions";

export const metadata: Metadata = { title: "Your quote", robots: { index: false } };
export const dynamic = "force-dynamic";

export default async function PublicQuotePage({ params, searchParams }: { params: Promise<{ token: string }>; searchParams: Promise<{ paid?: string }> }) {
  const { token } = await params;
  const { paid } = await searchParams;
  await expireDue(db);
  const quote = await findByToken(db, token);
  if (!quote) {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl font-bold">Quote not available</h1>
        <Alert tone="warning" className="mt-3">This link is not valid or has been replaced by a newer one. Ask the shop to send the quote again.</Alert>
      </Card>
    );
  }
  const [shop, customer, lines] = await Promise.all([
    getShop(db, quote.shop_id),
    db("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("name"),
    db<QuoteLineRow>("quote_lines").where({ quote_id: quote.id }).orderBy("position"),
  ]);
  const fit = quote.fitment as FitmentSummary;
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-5">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-basalt-600">{shop?.name}</p>
        <h1 className="text-3xl font-bold">Quote Q-{quote.number} for {customer?.name}</h1>
        <p className="mt-1 text-basalt-700">
          <Badge tone={quote.status === "deposit_paid" || quote.status === "installed" ? "clear" : quote.status === "expired" || quote.status === "declined" ? "contact" : "steel"}>
            <span data-testid="public-status">{STATUS_LABEL[quote.status]}</span>
          </Badge>{" "}
          {quote.vehicle_description}
          {quote.valid_until && quote.status !== "expired" && ` · valid until ${new Date(quote.valid_until).toLocaleDateString("en-US", { year: "numeric", month: "long", day: "numeric" })}`}
        </p>
        <p className="text-sm text-basalt-600">{[shop?.address, shop?.phone].filter(Boolean).join(" · ")}</p>
      </header>
      {paid && quote.status === "accepted" && <Alert tone="info">Payment received by the provider; waiting for its confirmation. Refresh in a moment.</Alert>}
      {quote.status === "deposit_paid" && <Alert tone="success" title="Deposit paid">Thank you. {shop?.name} will call you to book the fitting.</Alert>}
      {quote.status === "expired" && <Alert tone="warning">This quote has expired. Ask the shop for a new one.</Alert>}
      <Card className="overflow-x-auto" tabIndex={0} role="region" aria-label="Quote lines">
        <h2 className="text-lg font-semibold">What is included</h2>
        <table className="mt-3 w-full min-w-[520px] text-left text-sm">
          <thead className="text-xs uppercase tracking-wide text-basalt-600">
            <tr><th className="py-1">Item</th><th className="text-right">Qty</th><th className="text-right">Unit</th><th className="text-right">Amount</th></tr>
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {lines.map((l) => (
              <tr key={l.id}>
                <td className="py-1">{l.description}{l.discount_cents > 0 && <span className="text-basalt-600"> (less {formatUsd(l.discount_cents)})</span>}</td>
                <td className="text-right tabular-nums">{l.quantity}</td>
                <td className="text-right tabular-nums">{formatUsd(l.unit_price_cents)}</td>
                <td className="text-right tabular-nums">{formatUsd(l.line_total_cents)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <dl className="ml-auto mt-4 grid max-w-xs grid-cols-[1fr_auto] gap-y-1 text-sm tabular-nums">
          <dt>Subtotal</dt><dd className="text-right">{formatUsd(quote.subtotal_cents)}</dd>
          {quote.discount_cents > 0 && (<><dt>Discount</dt><dd className="text-right">−{formatUsd(quote.discount_cents)}</dd></>)}
          <dt>Tax ({formatBp(quote.tax_rate_bp)} %)</dt><dd className="text-right">{formatUsd(quote.tax_cents)}</dd>
          <dt className="font-semibold">Total</dt><dd className="text-right font-semibold">{formatUsd(quote.total_cents)}</dd>
          <dt>Deposit ({quote.deposit_pct} %)</dt><dd className="text-right" data-testid="public-deposit">{formatUsd(quote.deposit_cents)}</dd>
        </dl>
        {quote.notes && <p className="mt-3 text-sm text-basalt-700">{quote.notes}</p>}
      </Card>
      <PublicQuoteActions token={token} status={quote.status} deposit={formatUsd(quote.deposit_cents)} />
      <FitmentSummaryCard fit={fit} />
    </div>
  );
}
