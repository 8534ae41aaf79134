import type { Metadata } from "next";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { ComparisonList } from "./ComparisonList";

export const metadata: Metadata = { title: "My comparisons" };

export default async function ComparisonsPage() {
  const caller = await requirePageCaller("/comparisons");
  const initial = await comparisonQueries.listComparisons(caller.userId, { sort: "updated" });
  return (
    <>
      <PageHeader
        title="My comparisons"
        lead="The comparisons you saved from the workspace. Open one to keep working on it, or share a read-only link for a forum thread."
        actions={<LinkButton href="/workspace">New comparison</LinkButton>}
      />
      <ComparisonList initial={initial} />
    </>
  );
}
