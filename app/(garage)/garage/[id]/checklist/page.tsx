import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { Alert } from "@/components/ui/Alert";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { workspaceUrl } from "@/lib/comparisons/url";
import { bothUnits, setupLine } from "@/lib/garage/format";
import { setupQuery } from "@/lib/setup/url";
import { setupFromQuery } from "@/lib/setup/urlRead";
import { checklistQueries } from "@/lib/garage/checklistQueries";
import { marginMmParam } from "@/lib/garage/schema";
import { type VehiclePageProps, vehiclePageCaller } from "../vehiclePage";
import { ChecklistView } from "./ChecklistView";
import { Card } from "@/components/ui/Card";
import { loadQueries } from "@/lib/garage/loadQueries";
import { PlannedLoadTrail } from "../PlannedLoadTrail";

export const metadata: Metadata = { title: "Install checklist" };

const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function ChecklistPage({ params, searchParams }: VehiclePageProps) {
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const caller = await vehiclePageCaller(id, "/checklist");
  const rawComparison = first(sp.comparison);
  const comparisonId = z.uuid().safeParse(rawComparison).data;
  if (rawComparison !== undefined && !comparisonId) notFound();
  const r = await pageGuard(
    checklistQueries.resolveChecklist(caller.userId, id, {
      comparisonId,
      planned: setupFromQuery("p", sp),
      marginMm: marginMmParam.parse(first(sp.m)),
    }),
  );
  if (!r.ok) {
    return (
      <>
        <PageHeader title="Install checklist" />
        <Alert tone="info">
          Plan a setup on the{" "}
          <Link className="underline" href={`/garage/${id}`}>
            vehicle page
          </Link>
          , or open a saved comparison tied to this vehicle from{" "}
          <Link className="underline" href="/comparisons">
            your comparisons
          </Link>
          ; their checklist links open this page for that setup.
        </Alert>
      </>
    );
  }
  const { vehicle } = r.detail;
  const [ticked, loadProfile] = await Promise.all([checklistQueries.checklistTicks(r), loadQueries.getLoadProfile(caller.userId, id)]);
  const marginNote = `Margin ${bothUnits(r.marginMm)}${r.marginMm === vehicle.clearanceMarginMm ? " (this vehicle's)" : " (tried instead of this vehicle's)"}.`;
  const backHref = r.comparison
    ? workspaceUrl({ input: r.comparison.input, savedId: r.comparison.id, vehicleId: vehicle.id })
    : `/garage/${id}?${setupQuery("p", r.planned)}`;
  const currentDiffers = r.comparison !== null && setupQuery("c", r.comparison.input.current) !== setupQuery("c", vehicle.currentSetup);
  return (
    <>
      <PageHeader
        title={`Install checklist — ${vehicle.name}`}
        lead={`${r.comparison ? `From the saved comparison “${r.comparison.name}”: ` : ""}${setupLine(vehicle.currentSetup)} to ${setupLine(r.planned)}. ${marginNote}`}
        actions={
          <div className="no-print flex gap-2">
            <LinkButton href={backHref} variant="secondary">
              {r.comparison ? "Back to the comparison" : "Back to the plan"}
            </LinkButton>
          </div>
        }
      />
      {currentDiffers && (
        <Alert tone="info" className="mb-4">
          The comparison starts from {setupLine(r.comparison!.input.current)}, but the vehicle&apos;s current setup is{" "}
          {setupLine(vehicle.currentSetup)}. The checklist works from the vehicle&apos;s, the setup its points were measured against.
        </Alert>
      )}
      <Card className="mb-5 print:shadow-none print:ring-0">
        <h2 className="text-lg font-semibold">Cold pressure and trail angles</h2>
        <PlannedLoadTrail vehicle={vehicle} planned={r.planned} profile={loadProfile} toggle />
      </Card>
      <ChecklistView
        vehicleId={id}
        source={r.comparison ? { comparisonId: r.comparison.id, marginMm: r.marginMm } : { planned: r.planned, marginMm: r.marginMm }}
        items={r.checklist.items}
        initialTicked={ticked}
      />
    </>
  );
}
