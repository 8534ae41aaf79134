import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { QuotesTable } from "./QuotesTable";

export const metadata: Metadata = { title: "Quotes" };

export default async function QuotesPage() {
  const caller = await requirePageCaller("/shop/quotes", ["shop_staff", "shop_owner"]);
  const quotes = await quoteQueries.listQuotes(quoteScopeOf(caller));
  return (
    <>
      <PageHeader
        title="Quotes"
        lead={caller.role === "shop_owner" ? "Every quote of the shop." : "The quotes you wrote."}
        actions={
          <Link href="/shop/quotes/new" className={buttonClass("primary")}>
            New quote
          </Link>
        }
      />
      <Card className="overflow-x-auto" tabIndex={0} role="region" aria-label="Quotes">
        {quotes.length === 0 ? <p className="text-basalt-600">No quotes yet.</p> : <QuotesTable quotes={quotes} />}
      </Card>
    </>
  );
}
