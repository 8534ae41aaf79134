import type { ReactNode } from "react";

export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-3xl font-bold text-basalt-950">{title}</h1>
        {lead && <p className="mt-1 max-w-2xl text-basalt-600">{lead}</p>}
      </div>
      {actions}
    </div>
  );
}
