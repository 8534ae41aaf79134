import { z } from "zod";
import { NotFoundError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
import { photoResponse } from "@/lib/garage/photos/serve";
import { garageQueries } from "@/lib/garage/queries";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });
const query = z.object({ variant: z.enum(["full", "thumb"]).default("full") });

/**
 * The image bytes, for the owner (and admins) only. Clients name a photo by id; object keys never
 * leave the server and are never taken from a request.
 */
export const GET = route({ access: GARAGE_ACCESS, params, query }, async ({ caller, params, query }) => {
  const photo = await garageQueries.findVisiblePhoto(caller, params.id);
  const res = photo && (await photoResponse(photoStore(), photo, query.variant));
  if (!res) throw new NotFoundError("That photo");
  return res;
});

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  await garageQueries.deletePhoto(photoStore(), caller.userId, params.id);
  return { ok: true };
});
