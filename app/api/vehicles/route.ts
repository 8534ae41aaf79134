import { GARAGE_ACCESS } from "@/lib/garage/access";
import { json, route } from "@/lib/platform/http/route";
import { garageQueries } from "@/lib/garage/queries";
import { garageVehicleSchema } from "@/lib/garage/schema";

export const GET = route({ access: GARAGE_ACCESS }, async ({ caller }) => ({ vehicles: await garageQueries.listVehicles(caller.userId) }));

export const POST = route({ access: GARAGE_ACCESS, body: garageVehicleSchema, idempotent: true }, async ({ caller, body }) => {
  const vehicle = await garageQueries.createVehicle(caller.userId, body);
  return json({ vehicle }, 201);
});
