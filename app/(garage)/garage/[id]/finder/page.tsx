import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { garageQueries } from "@/lib/garage/queries";
import { FinderPanel } from "./FinderPanel";

export const metadata: Metadata = { title: "Fitment finder" };

export default async function FinderPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/garage/${id}/finder`, GARAGE_ACCESS);
  if (!z.uuid().safeParse(id).success) notFound();
  const detail = await pageGuard(garageQueries.getVehicleDetail(caller.userId, id));
  return <FinderPanel vehicle={detail.vehicle} clearances={detail.clearances} />;
}
