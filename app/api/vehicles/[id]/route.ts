import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
import { garageQueries } from "@/lib/garage/queries";
import { garageVehicleSchema } from "@/lib/garage/schema";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });

export const GET = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  return garageQueries.getVehicleDetail(caller.userId, params.id);
});

export const PATCH = route({ access: GARAGE_ACCESS, params, body: garageVehicleSchema }, async ({ caller, params, body }) => {
  return { vehicle: await garageQueries.updateVehicle(caller.userId, params.id, body) };
});

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  await garageQueries.deleteVehicle(photoStore(), caller.userId, params.id);
  return { ok: true };
});
