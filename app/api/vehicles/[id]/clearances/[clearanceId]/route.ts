import { z } from "zod";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { photoStore } from "@/lib/photos/s3";
import { garageQueries } from "@/lib/server/garage";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid(), clearanceId: z.uuid() });

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  if (!(await garageQueries.deleteClearance(photoStore(), caller.userId, params.id, params.clearanceId))) throw notFound("That clearance point");
  return { ok: true };
});
