import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { SHOP_ANY } from "@/lib/shop/queries";
import { QuoteBuilder } from "./QuoteBuilder";

export const metadata: Metadata = { title: "New quote" };

export default async function NewQuotePage() {
  await requirePageCaller("/shop/quotes/new", SHOP_ANY);
  return (
    <>
      <PageHeader title="New quote" lead="Find the customer, enter the vehicle as it is now, and pick a tire and wheel from the catalog." />
      <QuoteBuilder />
    </>
  );
}
