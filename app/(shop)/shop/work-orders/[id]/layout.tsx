import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";
import { admits, currentCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";

/** A work order that is missing or another shop's answers HTTP 404 before anything streams (see the quote's layout). */
export default async function WorkOrderLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await currentCaller();
  if (caller && admits(SHOP_ANY, caller)) {
    if (!z.uuid().safeParse(id).success) notFound();
    await pageGuard(workOrderQueries.getWorkOrder(shopIdOf(caller), id));
  }
  return children;
}
