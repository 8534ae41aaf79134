"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/Button";
import { ApiError, api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { ProblemJob } from "@/lib/platform/jobs/problemJob";

const QUEUE_LABEL: Record<string, string> = { "mail.send": "E-mail", "quotes.expire": "Quote expiry" };
const when = (iso: string | null) => (iso ? `${new Date(iso).toLocaleString("en-US", { timeZone: "UTC" })} UTC` : "—");

export function JobRow({ job }: { job: ProblemJob }) {
  const qc = useQueryClient();
  const retry = useMutation({
    mutationFn: () => api(`/api/admin/jobs/${job.id}/retry`, { method: "POST", body: {} }),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.admin.jobs.all }),
  });
  return (
    <tr className="align-top max-md:flex max-md:flex-col max-md:gap-1 max-md:py-3" data-testid="job-row">
      <td className="py-2 pr-2 font-medium">
        {QUEUE_LABEL[job.queue] ?? job.queue}
        <span className="block font-mono text-xs text-basalt-500">{job.id}</span>
      </td>
      <td className="pr-2">{job.state === "failed" ? "Failed" : `Waiting for retry (next ${when(job.nextAttemptAt)})`}</td>
      <td className="pr-2 wrap-anywhere">{job.lastError ?? "—"}</td>
      <td className="pr-2">
        {job.attempts} of {job.maxAttempts}
      </td>
      <td className="pr-2">{when(job.createdAt)}</td>
      <td className="pr-2">{when(job.lastAttemptAt)}</td>
      <td className="py-2">
        <Button
          onClick={() => retry.mutate()}
          disabled={retry.isPending || retry.isSuccess}
          aria-describedby={retry.isError ? `${job.id}-err` : undefined}
        >
          {retry.isSuccess ? "Queued" : "Retry now"}
        </Button>
        <span id={`${job.id}-err`} aria-live="polite" className="block text-xs text-red-700">
          {retry.isError ? (retry.error instanceof ApiError ? retry.error.message : "The retry was not saved. Try again.") : ""}
        </span>
      </td>
    </tr>
  );
}
