import { Card } from "@/components/ui/Card";
import { QuoteTotalsList } from "@/components/quotes/QuoteTotalsList";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";

/** The saved totals (computed by the server), the deposit and what is left to pay after it. */
export function QuoteTotalsCard({ quote: q, stale }: { quote: Detail["quote"]; stale: boolean }) {
  return (
    <Card>
      <h2 className="text-lg font-semibold">Totals</h2>
      {stale && <p className="mt-1 text-sm text-tight-800">These are the saved totals; save the lines to update them.</p>}
      <QuoteTotalsList
        totals={{ ...q, balanceCents: q.totalCents - q.depositCents }}
        className="mt-3 gap-x-3"
        testIds={{ list: "quote-totals", balance: "quote-balance" }}
      />
    </Card>
  );
}
