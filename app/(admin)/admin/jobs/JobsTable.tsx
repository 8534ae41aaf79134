"use client";
import { useQuery } from "@tanstack/react-query";
import { Alert } from "@/components/ui/Alert";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { ProblemJob } from "@/lib/platform/jobs/problemJob";
import { JobRow } from "./JobRow";

/** The list refreshes every 10 s, so a retried job is seen leaving it. */
export function JobsTable({ initial }: { initial: ProblemJob[] }) {
  const { data } = useQuery({
    queryKey: queryKeys.admin.jobs.all,
    queryFn: () => api<{ jobs: ProblemJob[] }>("/api/admin/jobs").then((r) => r.jobs),
    initialData: initial,
    refetchInterval: 10_000,
  });
  if (data.length === 0) return <Alert>No failed jobs. Every e-mail left and every scheduled job ran.</Alert>;
  return (
    <table className="w-full text-left text-sm" data-testid="jobs-table">
      <thead className="max-md:hidden">
        <tr className="border-b border-basalt-200">
          <th className="py-2 pr-2">Job</th>
          <th className="pr-2">State</th>
          <th className="pr-2">Last error</th>
          <th className="pr-2">Attempts</th>
          <th className="pr-2">Created</th>
          <th className="pr-2">Last attempt</th>
          <th><span className="sr-only">Action</span></th>
        </tr>
      </thead>
      <tbody>{data.map((j) => <JobRow key={j.id} job={j} />)}</tbody>
    </table>
  );
}
