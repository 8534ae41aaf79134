import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { VehicleForm } from "../_components/VehicleForm";

export const metadata: Metadata = { title: "Add a vehicle" };

export default async function NewVehiclePage() {
  await requirePageCaller("/garage/new", GARAGE_ACCESS);
  return (
    <>
      <PageHeader
        title="Add a vehicle"
        lead="Its stock and current setups are the starting point for predictions, the finder and the checklist."
      />
      <VehicleForm vehicle={null} />
    </>
  );
}
