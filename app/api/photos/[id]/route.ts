import { z } from "zod";
import { NotFoundError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
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
  if (!photo) throw new NotFoundError("That photo");
  const obj = await photoStore().get(query.variant === "thumb" ? photo.thumb_key : photo.object_key);
  if (!obj) throw new NotFoundError("That photo");
  return new Response(Buffer.from(obj.body), {
    headers: {
      "Content-Type": query.variant === "thumb" ? "image/webp" : photo.content_type,
      "Cache-Control": "private, max-age=300",
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": "inline",
    },
  });
});

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  await garageQueries.deletePhoto(photoStore(), caller.userId, params.id);
  return { ok: true };
});
