import type { ReactNode } from "react";

/** One headline figure: its name, the change large, and a line that says what it means. */
export function ChangeStat({ label, value, sub, testId }: { label: string; value: string; sub?: ReactNode; testId?: string }) {
  return (
    <div className="flex min-h-24 flex-col rounded-lg bg-white px-3 py-2.5 ring-1 ring-basalt-100" data-testid={testId}>
      <dt className="text-xs font-semibold uppercase tracking-wide text-basalt-500">{label}</dt>
      <dd className="mt-0.5 font-display text-xl font-bold tabular-nums text-basalt-950">{value}</dd>
      {sub && <dd className="mt-auto text-xs tabular-nums text-basalt-600">{sub}</dd>}
    </div>
  );
}
