import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/Badge";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { formatUsd } from "@/lib/shop/quotes/money";
import { quoteQueries, quoteScopeOf, STATUS_LABEL } from "@/lib/shop/quotes/queries";
import { statusTone } from "./statusTone";

export const metadata: Metadata = { title: "Quotes" };

export default async function QuotesPage() {
  const caller = await requirePageCaller("/shop/quotes", ["shop_staff", "shop_owner"]);
  const quotes = await quoteQueries.listQuotes(quoteScopeOf(caller));
  return (
    <>
      <PageHeader
        title="Quotes"
        lead={caller.role === "shop_owner" ? "Every quote of the shop." : "The quotes you wrote."}
        actions={<Link href="/shop/quotes/new" className={buttonClass("primary")}>New quote</Link>}
      />
      <Card className="overflow-x-auto" tabIndex={0} role="region" aria-label="Quotes">
        {quotes.length === 0 ? (
          <p className="text-basalt-600">No quotes yet.</p>
        ) : (
          <table className="w-full min-w-[720px] text-left text-sm">
            <thead className="text-xs uppercase tracking-wide text-basalt-600">
              <tr><th className="py-2">Quote</th><th>Customer</th><th>Vehicle</th><th>Status</th><th className="text-right">Total</th><th className="text-right">Deposit</th><th>By</th></tr>
            </thead>
            <tbody className="divide-y divide-basalt-100">
              {quotes.map((q) => (
                <tr key={q.id}>
                  <td className="py-2"><Link className="font-medium text-ember-700 underline" href={`/shop/quotes/${q.id}`}>Q-{q.number}</Link></td>
                  <td>{q.customerName}</td>
                  <td>{q.vehicleDescription}</td>
                  <td><Badge tone={statusTone(q.status)}>{STATUS_LABEL[q.status]}</Badge></td>
                  <td className="text-right tabular-nums">{formatUsd(q.totalCents)}</td>
                  <td className="text-right tabular-nums">{formatUsd(q.depositCents)}</td>
                  <td className="pl-3 text-basalt-600">{q.createdByName ?? "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Card>
    </>
  );
}
