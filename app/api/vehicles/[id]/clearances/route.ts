import { z } from "zod";
import { NotFoundError } from "@/lib/platform/errors";
import { json, route } from "@/lib/platform/http/route";
import { garageQueries } from "@/lib/garage/queries";
import { clearanceSchema } from "@/lib/garage/schema";
import type { Setup } from "@/lib/setup/model";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });

export const POST = route({ access: GARAGE_ACCESS, params, body: clearanceSchema, idempotent: true }, async ({ caller, params, body }) => {
  const vehicle = await garageQueries.findVehicle(caller.userId, params.id);
  if (!vehicle) throw new NotFoundError("That vehicle");
  const clearance = await garageQueries.addClearance(vehicle.id, body, body.measuredSetup ?? (vehicle.current_setup as Setup));
  return json({ clearance }, 201);
});
