"use client";
import { useQuery } from "@tanstack/react-query";
import { Alert } from "@/components/ui/Alert";
import { Table, type TableColumn } from "@/components/ui/Table";
import { useSortedRows } from "@/components/ui/useSortedRows";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { ProblemJob } from "@/lib/platform/jobs/problemJob";
import { JobRow } from "./JobRow";

/** The headers; JobRow draws each row's cells in this order (a row holds its retry's state). */
const COLUMNS: TableColumn<ProblemJob>[] = [
  { id: "job", header: "Job", sortable: true, sortValue: (j) => j.queue },
  { id: "state", header: "State", sortable: true, sortValue: (j) => j.state },
  { id: "error", header: "Last error" },
  { id: "attempts", header: "Attempts", sortable: true, sortValue: (j) => j.attempts },
  { id: "created", header: "Created", sortable: true, sortValue: (j) => j.createdAt },
  { id: "last", header: "Last attempt", sortable: true, sortValue: (j) => j.lastAttemptAt },
  { id: "action", header: <span className="sr-only">Action</span> },
];

/** The list refreshes every 10 s, so a retried job is seen leaving it; the order chosen stays. */
export function JobsTable({ initial }: { initial: ProblemJob[] }) {
  const { data } = useQuery({
    queryKey: queryKeys.admin.jobs.all,
    queryFn: () => api<{ jobs: ProblemJob[] }>("/api/admin/jobs").then((r) => r.jobs),
    initialData: initial,
    refetchInterval: 10_000,
  });
  const sorted = useSortedRows(data, COLUMNS);
  if (data.length === 0) return <Alert>No failed jobs. Every e-mail left and every scheduled job ran.</Alert>;
  return (
    <Table
      testId="jobs-table"
      caption="Jobs that failed or wait for a retry; column headers sort"
      headClassName="max-md:hidden"
      columns={COLUMNS}
      {...sorted}
      rowKey={(j) => j.id}
      renderRow={(j) => <JobRow key={j.id} job={j} />}
    />
  );
}
