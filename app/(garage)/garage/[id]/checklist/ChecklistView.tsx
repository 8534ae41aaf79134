"use client";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import { type ChecklistGroup, type ChecklistItem, GROUP_TITLE } from "@/lib/garage/checklist";
import type { Setup } from "@/lib/setup/model";

/** What the checklist was built from, sent back with the ticks so the server rebuilds the same list. */
export type ChecklistSourceBody = { planned: Setup; marginMm: number } | { comparisonId: string; marginMm: number };

export function ChecklistView({
  vehicleId,
  source,
  items,
  initialTicked,
}: {
  vehicleId: string;
  source: ChecklistSourceBody;
  items: ChecklistItem[];
  initialTicked: string[];
}) {
  const [ticked, setTicked] = useState<Set<string>>(new Set(initialTicked));
  const save = useMutation({
    mutationFn: (next: string[]) =>
      api<{ ticked: string[] }>(`/api/vehicles/${vehicleId}/checklist`, { method: "PUT", body: { ...source, ticked: next } }),
  });
  const toggle = (id: string) => {
    const next = new Set(ticked);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    setTicked(next);
    save.mutate([...next], { onError: () => setTicked(ticked) });
  };
  const groups = Object.keys(GROUP_TITLE) as ChecklistGroup[];
  return (
    <div className="flex flex-col gap-5">
      <Alert tone="warning" title="Before you start">
        This list is a planning aid built from your measurements. The vehicle maker&apos;s, wheel maker&apos;s and tire maker&apos;s
        instructions, local rules and licensed practice come first; have steering, suspension and brake work done or checked by a qualified
        technician.
      </Alert>
      <div className="no-print flex flex-wrap items-center gap-3">
        <Button type="button" onClick={() => window.print()}>
          Print the checklist
        </Button>
        <span className="text-sm text-basalt-600" aria-live="polite" data-testid="checklist-status">
          {save.isPending ? "Saving…" : save.isError ? "Not saved — try again." : `${ticked.size} of ${items.length} done`}
        </span>
      </div>
      {groups.map((g) => {
        const list = items.filter((i) => i.group === g);
        if (list.length === 0) return null;
        return (
          <Card key={g} className="print:shadow-none print:ring-0">
            <h2 className="text-lg font-semibold">{GROUP_TITLE[g]}</h2>
            <ul className="mt-3 flex flex-col gap-3">
              {list.map((i) => (
                <li key={i.id} className="break-inside-avoid">
                  <label className="flex items-start gap-3">
                    <input
                      type="checkbox"
                      className="mt-1 size-4"
                      checked={ticked.has(i.id)}
                      onChange={() => toggle(i.id)}
                      data-item={i.id}
                    />
                    <span>
                      <span className={`font-medium ${ticked.has(i.id) ? "text-basalt-500 line-through" : ""}`}>{i.title}</span>
                      <span className="block text-sm text-basalt-700">{i.detail}</span>
                      {i.caution && <span className="mt-1 block text-sm font-medium text-tight-800">Caution: {i.caution}</span>}
                    </span>
                  </label>
                </li>
              ))}
            </ul>
          </Card>
        );
      })}
    </div>
  );
}
