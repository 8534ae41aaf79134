import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { Pagination } from "@/components/ui/Pagination";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { SHOP_ANY } from "@/lib/shop/queries";
import { fieldErrorsOf } from "@/lib/platform/http/route";
import { type QuoteListQuery, quoteListQuerySchema, quoteListSearch } from "@/lib/shop/quotes/listQuery";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { QuoteListFilters } from "./QuoteListFilters";
import { QuotesTable } from "./QuotesTable";

export const metadata: Metadata = { title: "Quotes" };

type Params = Record<string, string | string[] | undefined>;

/**
 * The address's search, status, order and page. A value the form could not have sent (typed into
 * the address, or a link from an older version) is left out and named beside its control, and
 * the list shows as if it were empty, rather than an error page.
 */
function readQuery(params: Params): { query: QuoteListQuery; errors: Record<string, string> } {
  const raw = Object.fromEntries(Object.entries(params).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = quoteListQuerySchema.safeParse(raw);
  if (parsed.success) return { query: parsed.data, errors: {} };
  const fieldErrors = fieldErrorsOf(parsed.error);
  const kept = Object.fromEntries(Object.entries(raw).filter(([k]) => !fieldErrors[k]));
  const errors = Object.fromEntries(Object.entries(fieldErrors).map(([k, m]) => [k, m[0] ?? ""]));
  return { query: quoteListQuerySchema.parse(kept), errors };
}

export default async function QuotesPage({ searchParams }: { searchParams: Promise<Params> }) {
  const caller = await requirePageCaller("/shop/quotes", SHOP_ANY);
  const { query, errors } = readQuery(await searchParams);
  const list = await quoteQueries.pageQuotes(quoteScopeOf(caller), query);
  const pageCount = Math.max(1, Math.ceil(list.total / list.pageSize));
  const filtered = Boolean(query.q || query.status);
  const search = quoteListSearch({ ...query, page: undefined });
  return (
    <>
      <PageHeader
        title="Quotes"
        lead={caller.role === "shop_owner" ? "Every quote of the shop." : "The quotes you wrote."}
        actions={
          <div className="flex flex-wrap gap-2">
            <a href={`/api/shop/quotes/export${search ? `?${search}` : ""}`} className={buttonClass("secondary")} download>
              Export CSV
            </a>
            <Link href="/shop/quotes/new" className={buttonClass("primary")}>
              New quote
            </Link>
          </div>
        }
      />
      <QuoteListFilters query={query} errors={errors} />
      <p className="mb-2 text-sm text-basalt-600" aria-live="polite">
        {list.total === 1 ? "1 quote" : `${list.total.toLocaleString("en-US")} quotes`}
        {filtered ? (list.total === 1 ? " matches" : " match") : ""}
      </p>
      <Card className="scroll-cue relative overflow-x-auto" tabIndex={0} role="region" aria-label="Quotes">
        {list.total === 0 ? (
          <p className="text-basalt-600">{filtered ? "No quote matches. Try fewer words, or clear the search." : "No quotes yet."}</p>
        ) : (
          <QuotesTable quotes={list.quotes} firstPageHref={`/shop/quotes${search ? `?${search}` : ""}`} />
        )}
      </Card>
      {pageCount > 1 && (
        <div className="mt-4">
          <Pagination
            label="Pages of quotes"
            pageIndex={list.page - 1}
            pageCount={pageCount}
            hrefFor={(i) => `/shop/quotes?${quoteListSearch({ ...query, page: i + 1 })}`}
          />
        </div>
      )}
    </>
  );
}
