import type { Metadata } from "next";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { setupFromQuery } from "@/lib/setup/urlRead";
import { garageQueries } from "@/lib/garage/queries";
import { VehicleView } from "./VehicleView";
import { type VehiclePageProps, vehiclePageCaller } from "./vehiclePage";

export const metadata: Metadata = { title: "Vehicle" };

export default async function VehiclePage({ params, searchParams }: VehiclePageProps) {
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const caller = await vehiclePageCaller(id);
  // layout.tsx answered a missing vehicle with 404 before anything streamed; this covers a delete in between.
  const detail = await pageGuard(garageQueries.getVehicleDetail(caller.userId, id));
  return <VehicleView initial={detail} initialPlanned={setupFromQuery("p", sp)} />;
}
