"use client";
import { useState } from "react";
import { PaymentHistory } from "@/components/payments/PaymentHistory";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import type { QuotePayments } from "@/lib/shop/payments/api";
import { BALANCE_ALREADY_PAID } from "@/lib/shop/payments/labels";
import { formatUsd } from "@/lib/shop/quotes/money";

/**
 * The customer's invoice once the work is done, their payments, and the way to pay the balance on the provider's page.
 * `justPaid`: back from that page paid; `returned`: back from it without paying (left it, or it was closed because the
 * balance was taken at the counter meanwhile).
 */
export function BalancePanel({
  token,
  payments,
  justPaid,
  returned = false,
}: {
  token: string;
  payments: QuotePayments;
  justPaid: boolean;
  returned?: boolean;
}) {
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const { invoice } = payments;
  const pay = async () => {
    setFailure(null);
    setBusy(true);
    try {
      const r = await api<{ url: string }>(`/api/q/${token}/balance`, { body: {} });
      // The provider's hosted page; it sends the customer back here when paid.
      window.location.assign(r.url);
    } catch (e) {
      setFailure((e as Error).message);
      setBusy(false);
    }
  };
  return (
    <Card className="flex flex-col gap-3" role="region" aria-label="Invoice and payments">
      <h2 className="text-lg font-semibold">Invoice and payments</h2>
      {justPaid && !invoice.paid && (
        <Alert tone="info">Payment received by the provider; waiting for its confirmation. Refresh in a moment.</Alert>
      )}
      {(justPaid || returned) && invoice.paid && <Alert tone="success">{BALANCE_ALREADY_PAID}</Alert>}
      <PaymentHistory payments={payments} />
      {payments.invoiceOpen && !invoice.paid && (
        <Button className="self-start" pending={busy} onClick={() => void pay()}>
          Pay the {formatUsd(invoice.outstandingCents)} balance
        </Button>
      )}
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
    </Card>
  );
}
