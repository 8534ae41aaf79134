import "server-only";
import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";
import { type Access, type Caller, admits, currentCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "./pageGuard";

/**
 * The layout of one record's pages (a vehicle, a quote, a work order): a record that is missing
 * or not the caller's answers HTTP 404. The check runs in the layout, above the segment's
 * loading.tsx: below a loading boundary the page shell has already gone out with status 200 when
 * a page calls notFound(). No loading boundary may sit above such a layout
 * (tests/integration/page-guard-tree.test.ts holds that).
 *
 * Signing in and the role stay the pages' own check (requirePageCaller knows the page to come
 * back to after sign-in): here only an admitted caller's record is looked up.
 *
 * @example
 * // app/(shop)/shop/quotes/[id]/layout.tsx
 * export default guardLayout(SHOP_ANY, (caller, id) => quoteQueries.getQuoteDetail(quoteScopeOf(caller), id));
 */
export function guardLayout(access: Exclude<Access, "public">, load: (caller: Caller, id: string) => Promise<unknown>) {
  return async function GuardLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
    const { id } = await params;
    const caller = await currentCaller();
    if (caller && admits(access, caller)) {
      if (!z.uuid().safeParse(id).success) notFound();
      await pageGuard(load(caller, id));
    }
    return children;
  };
}
