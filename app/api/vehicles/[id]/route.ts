import { z } from "zod";
import { notFound } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
import { garageQueries } from "@/lib/garage/queries";
import { garageVehicleSchema } from "@/lib/garage/schema";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });

export const GET = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  const detail = await garageQueries.vehicleDetail(caller.userId, params.id);
  if (!detail) throw notFound("That vehicle");
  return detail;
});

export const PATCH = route({ access: GARAGE_ACCESS, params, body: garageVehicleSchema }, async ({ caller, params, body }) => {
  const vehicle = await garageQueries.updateVehicle(caller.userId, params.id, body);
  if (!vehicle) throw notFound("That vehicle");
  return { vehicle };
});

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  if (!(await garageQueries.deleteVehicle(photoStore(), caller.userId, params.id))) throw notFound("That vehicle");
  return { ok: true };
});
