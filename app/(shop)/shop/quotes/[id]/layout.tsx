import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";
import { admits, currentCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { SHOP_ANY } from "@/lib/shop/queries";

/**
 * A quote that is missing or another shop's answers HTTP 404, checked here above this segment's
 * loading.tsx (below a loading boundary the shell has gone out with 200 before the page could
 * say "not found"). Signing in stays the page's own check, which knows where to come back to.
 */
export default async function QuoteLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await currentCaller();
  if (caller && admits(SHOP_ANY, caller)) {
    if (!z.uuid().safeParse(id).success) notFound();
    await pageGuard(quoteQueries.getQuoteDetail(quoteScopeOf(caller), id));
  }
  return children;
}
