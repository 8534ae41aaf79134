import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { GARAGE_ACCESS } from "@/lib/garage/access";

/** What Next hands a page of one vehicle that reads its query (the plan's setup, a comparison). */
export interface VehiclePageProps {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

/**
 * The caller of a page of one vehicle: signed in with garage access (coming back to `/garage/{id}{page}`
 * after signing in), and a 404 for an id that is not a uuid. layout.tsx answers a missing vehicle.
 * @example const caller = await vehiclePageCaller(id, "/checklist");
 */
export async function vehiclePageCaller(id: string, page: "" | "/checklist" | "/edit" | "/finder" = "") {
  const caller = await requirePageCaller(`/garage/${id}${page}`, GARAGE_ACCESS);
  if (!z.uuid().safeParse(id).success) notFound();
  return caller;
}
