import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { setupFromQuery } from "@/lib/setup/url";
import { garageQueries } from "@/lib/garage/queries";
import { VehicleView } from "./VehicleView";

export const metadata: Metadata = { title: "Vehicle" };

export default async function VehiclePage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const caller = await requirePageCaller(`/garage/${id}`, GARAGE_ACCESS);
  if (!z.uuid().safeParse(id).success) notFound();
  // layout.tsx answered a missing vehicle with 404 before anything streamed; this covers a delete in between.
  const detail = await pageGuard(garageQueries.getVehicleDetail(caller.userId, id));
  return <VehicleView initial={detail} initialPlanned={setupFromQuery("p", sp)} />;
}
