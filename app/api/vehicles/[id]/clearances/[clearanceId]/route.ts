import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
import { garageQueries } from "@/lib/garage/queries";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid(), clearanceId: z.uuid() });

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  await garageQueries.deleteClearance(photoStore(), caller.userId, params.id, params.clearanceId);
  return { ok: true };
});
