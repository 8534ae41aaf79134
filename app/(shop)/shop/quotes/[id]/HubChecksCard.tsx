"use client";
import { HubChecksList } from "@/components/quotes/HubChecksList";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import type { HubCheck } from "@/lib/shop/quotes/document";
import { ringLineDescription } from "@/lib/shop/quotes/hubFit";

/**
 * The saved wheel lines against the vehicle's bolt pattern and hub bore. Where a bore is larger
 * than the hub, the counter can add a line for the hub-centric rings (price to be entered).
 */
export function HubChecksCard({
  checks,
  hubBoreMm,
  boltPattern,
  haveLine,
  onAddRings,
}: {
  checks: HubCheck[];
  hubBoreMm: number | null;
  boltPattern: string;
  haveLine: (description: string) => boolean;
  onAddRings?: (description: string, quantity: number) => void;
}) {
  const rings = checks.flatMap((c) =>
    c.findings.flatMap((f) => (f.rings ? [{ description: ringLineDescription(f.rings), quantity: c.quantity }] : [])),
  );
  return (
    <Card>
      <h2 className="text-lg font-semibold">Wheel on the hub</h2>
      <p className="mt-1 text-sm text-basalt-600">
        Vehicle: bolt pattern {boltPattern}, hub bore {hubBoreMm === null ? "not recorded" : `${hubBoreMm} mm`}.
      </p>
      <HubChecksList checks={checks} />
      {onAddRings &&
        rings
          .filter((r) => !haveLine(r.description))
          .map((r) => (
            <Button key={r.description} variant="secondary" className="mt-3" onClick={() => onAddRings(r.description, r.quantity)}>
              Add a line for the rings ({r.quantity})
            </Button>
          ))}
    </Card>
  );
}
