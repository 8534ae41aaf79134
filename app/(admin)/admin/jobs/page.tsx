import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { jobQueries } from "@/lib/platform/jobs/queries";
import { JobsTable } from "./JobsTable";

export const metadata: Metadata = { title: "Background jobs" };
export const dynamic = "force-dynamic";

export default async function AdminJobsPage() {
  await requirePageCaller("/admin/jobs", ["admin"]);
  const jobs = await jobQueries.listProblemJobs();
  return (
    <>
      <PageHeader
        title="Background jobs"
        lead="E-mails and scheduled work that failed. Jobs waiting for a retry run again by themselves after a growing pause; failed ones ran out of attempts. Retry runs one now."
      />
      <JobsTable initial={jobs} />
    </>
  );
}
