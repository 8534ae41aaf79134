import { db } from "@/lib/db";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { json, route } from "@/lib/http/route";
import { createVehicle, listVehicles } from "@/lib/server/garage";
import { vehicleSchema } from "@/lib/validation/garage";


export const GET = route({ access: GARAGE_ACCESS }, async ({ caller }) => ({ vehicles: await listVehicles(db, caller.userId) }));

export const POST = route({ access: GARAGE_ACCESS, body: vehicleSchema }, async ({ caller, body }) => {
  const vehicle = await createVehicle(db, caller.userId, body);
  return json({ vehicle }, 201);
});
