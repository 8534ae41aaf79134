import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";
import { admits, currentCaller } from "@/lib/platform/auth/session";
import { pageGuard } from "@/lib/platform/http/pageGuard";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { garageQueries } from "@/lib/garage/queries";

/**
 * The pages of one vehicle (plan, edit, finder, checklist) answer a vehicle that is missing or
 * someone else's with HTTP 404. The check runs here, above this segment's loading.tsx: below a
 * loading boundary the page shell has already gone out with status 200 when a page calls
 * notFound(), so the reader got a not-found page that said "200". No loading boundary may sit
 * above this layout (tests/integration/vehicle-page-guard.test.ts holds that).
 *
 * Signing in and the role stay the pages' own check (requirePageCaller knows the page to come
 * back to after sign-in); here only an admitted caller's vehicle is looked up.
 */
export default async function VehicleLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await currentCaller();
  if (caller && admits(GARAGE_ACCESS, caller)) {
    if (!z.uuid().safeParse(id).success) notFound();
    await pageGuard(garageQueries.findVehicle(caller.userId, id));
  }
  return children;
}
