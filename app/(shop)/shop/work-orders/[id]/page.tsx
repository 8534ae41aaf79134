import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { shopIdOf, SHOP_ANY } from "@/lib/shop/queries";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { WorkOrderSheet } from "./WorkOrderSheet";

export const metadata: Metadata = { title: "Work order" };

/** The technician's sheet for one booked job: on a phone in the bay, or printed. Any of the shop's staff may open it. */
export default async function WorkOrderPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/shop/work-orders/${id}`, SHOP_ANY);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const workOrder = await pageGuard(workOrderQueries.getWorkOrder(shopIdOf(caller), id));
  const quoteOpen = await quoteQueries.canOpenQuote(quoteScopeOf(caller), workOrder.quoteId);
  return <WorkOrderSheet initial={workOrder} role={caller.role} quoteOpen={quoteOpen} />;
}
