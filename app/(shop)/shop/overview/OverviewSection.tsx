import type { ReactNode } from "react";
import { Card } from "@/components/ui/Card";

/** One block of the overview: a region named by its heading, a line that sums it up, then its table (scrolled sideways on a narrow screen rather than widening the page). */
export function OverviewSection({ id, title, lead, children }: { id: string; title: string; lead: ReactNode; children: ReactNode }) {
  return (
    <Card role="region" aria-labelledby={id}>
      <h2 id={id} className="text-lg font-semibold">
        {title}
      </h2>
      <p className="text-sm text-basalt-600">{lead}</p>
      {/* Focusable, so a keyboard can scroll it too (axe: scrollable-region-focusable). */}
      <div
        className="scroll-cue relative mt-3 overflow-x-auto"
        tabIndex={0}
        role="region"
        aria-label={`${title} (scrolls sideways on narrow screens)`}
      >
        {children}
      </div>
    </Card>
  );
}
