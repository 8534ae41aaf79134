import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { garageQueries, vehicleDto } from "@/lib/garage/queries";
import { VehicleForm } from "../../_components/VehicleForm";

export const metadata: Metadata = { title: "Edit vehicle" };

export default async function EditVehiclePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/garage/${id}/edit`, GARAGE_ACCESS);
  if (!z.uuid().safeParse(id).success) notFound();
  const vehicle = vehicleDto(await pageGuard(garageQueries.findVehicle(caller.userId, id)));
  return (
    <>
      <PageHeader title={`Edit ${vehicle.name}`} />
      <VehicleForm vehicle={vehicle} />
    </>
  );
}
