import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { Alert } from "@/components/ui/Alert";
import { buttonClass } from "@/components/ui/Button";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { DEFAULT_CLEARANCE_MARGIN_MM } from "@/lib/fitment";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { buildChecklist } from "@/lib/garage/checklist";
import { setupLine } from "@/lib/garage/format";
import { setupFromQuery, setupQuery } from "@/lib/garage/links";
import { findChecklist, vehicleDetail } from "@/lib/server/garage";
import { ChecklistView } from "./ChecklistView";

export const metadata: Metadata = { title: "Install checklist" };

export default async function ChecklistPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const caller = await requirePageCaller(`/garage/${id}/checklist`, GARAGE_ACCESS);
  if (!z.uuid().safeParse(id).success) notFound();
  const detail = await vehicleDetail(db, caller.userId, id);
  if (!detail) notFound();
  const planned = setupFromQuery("p", sp);
  if (!planned) {
    return (
      <>
        <PageHeader title={`Install checklist — ${detail.vehicle.name}`} />
        <Alert tone="info">
          Plan a setup on the <Link className="underline" href={`/garage/${id}`}>vehicle page</Link> first; its checklist link opens this page for that setup.
        </Alert>
      </>
    );
  }
  const checklist = buildChecklist({ ...detail, planned, marginMm: DEFAULT_CLEARANCE_MARGIN_MM });
  const row = await findChecklist(db, id, setupQuery("p", planned));
  return (
    <>
      <PageHeader
        title={`Install checklist — ${detail.vehicle.name}`}
        lead={`From ${setupLine(detail.vehicle.currentSetup)} to ${setupLine(planned)}. Margin 1/2 in (common practice).`}
        actions={
          <div className="no-print flex gap-2">
            <Link href={`/garage/${id}?${setupQuery("p", planned)}`} className={buttonClass("secondary")}>Back to the plan</Link>
          </div>
        }
      />
      <ChecklistView vehicleId={id} planned={planned} items={checklist.items} initialTicked={row?.ticked ?? []} />
    </>
  );
}
