import { z } from "zod";
import { NotFoundError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { photoStore } from "@/lib/garage/photos/s3";
import { photoResponse } from "@/lib/garage/photos/serve";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { stepPhotoQueries } from "@/lib/shop/workOrders/photoQueries";

const params = z.object({ id: z.uuid(), photoId: z.uuid() });
const query = z.object({ variant: z.enum(["full", "thumb"]).default("full") });

/** The image bytes (or its thumbnail), for the staff of the work order's shop only. */
export const GET = route({ access: SHOP_ANY, params, query }, async ({ caller, params, query }) => {
  const photo = await stepPhotoQueries.findStepPhoto(shopIdOf(caller), params.id, params.photoId);
  const res = photo && (await photoResponse(photoStore(), photo, query.variant));
  if (!res) throw new NotFoundError("That photo");
  return res;
});

/** Removes the photo with its objects: any staff before the step is signed off, the owner after (photoSchema.ts). */
export const DELETE = route({ access: SHOP_ANY, params }, async ({ caller, params }) => {
  await stepPhotoQueries.deleteStepPhoto(photoStore(), { shopId: shopIdOf(caller), role: caller.role }, params.id, params.photoId);
  return { ok: true };
});
