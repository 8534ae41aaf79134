import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { setupGeometry } from "@/lib/fitment";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { bothUnits } from "@/lib/garage/format";
import { garageQueries } from "@/lib/garage/queries";
import { FRONT_SUSPENSION_LABEL } from "@/lib/garage/schema";
import { toEngineSetup } from "@/lib/setup/model";

export const metadata: Metadata = { title: "Your garage" };

export default async function GaragePage() {
  const caller = await requirePageCaller("/garage", GARAGE_ACCESS);
  const vehicles = await garageQueries.listVehicles(caller.userId);
  const counts = await garageQueries.clearanceCounts(vehicles.map((v) => v.id));
  return (
    <>
      <PageHeader
        title="Your garage"
        lead="Your vehicles with the clearances you measured: plan a setup and see what it will touch before you buy."
        actions={<LinkButton href="/garage/new">Add a vehicle</LinkButton>}
      />
      {vehicles.length === 0 ? (
        <Card className="text-center">
          <p className="text-basalt-700">No vehicles yet. Add one with its stock and current setup to start.</p>
        </Card>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {vehicles.map((v) => {
            const g = setupGeometry(toEngineSetup(v.currentSetup));
            return (
              <li key={v.id}>
                <Card className="h-full">
                  <h2 className="text-lg font-semibold">
                    <Link href={`/garage/${v.id}`} className="text-ember-700 underline-offset-2 hover:underline">
                      {v.name}
                    </Link>
                  </h2>
                  <p className="text-sm text-basalt-600">
                    {[v.year, v.make, v.model, v.trim].filter(Boolean).join(" ") || "No description"}
                  </p>
                  <p className="mt-2 flex flex-wrap gap-2">
                    <Badge tone="neutral">{FRONT_SUSPENSION_LABEL[v.frontSuspension]}</Badge>
                    <Badge tone="neutral">{v.boltPattern}</Badge>
                    <Badge tone="steel">{counts.get(v.id) ?? 0} measured points</Badge>
                  </p>
                  <p className="mt-3 text-sm text-basalt-700">
                    Now on {g.tire.text}, {bothUnits(g.overallDiameterMm)} tall
                  </p>
                </Card>
              </li>
            );
          })}
        </ul>
      )}
    </>
  );
}
