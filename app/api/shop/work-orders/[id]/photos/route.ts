import { z } from "zod";
import { InvalidError } from "@/lib/platform/errors";
import { fieldErrorsOf, json, route } from "@/lib/platform/http/route";
import { PHOTO_UPLOAD_ROUTE, processUploadedPhoto, readPhotoForm, refuseDeclaredTooBig, storingPhoto } from "@/lib/garage/photos/upload";
import { photoStore } from "@/lib/garage/photos/s3";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { stepPhotoQueries } from "@/lib/shop/workOrders/photoQueries";
import { stepPhotoFieldsSchema } from "@/lib/shop/workOrders/photoSchema";

const params = z.object({ id: z.uuid() });

/** Every photo of the work order's steps, oldest first; another shop's work order is not found. */
export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => ({
  photos: await stepPhotoQueries.listStepPhotos(shopIdOf(caller), params.id),
}));

/**
 * Multipart upload of one photo of one step: `file` (JPEG, PNG or WebP, ≤ 10 MB, read and
 * checked as the garage's uploads are: lib/garage/photos/upload.ts), `position` and `step`.
 * The work order must be in the bay and have that step; who took it comes from the session.
 */
export const POST = route({ access: SHOP_ANY, params, ...PHOTO_UPLOAD_ROUTE }, async ({ caller, params, req }) => {
  refuseDeclaredTooBig(req);
  const { form, file, name } = await readPhotoForm(req);
  const fields = stepPhotoFieldsSchema.safeParse({ position: form.get("position"), step: form.get("step") });
  if (!fields.success) throw InvalidError.fields(fieldErrorsOf(fields.error));
  // Another shop's work order, or one that cannot take the photo now, is refused before the image is decoded.
  await stepPhotoQueries.checkStepTakesPhoto(shopIdOf(caller), params.id, fields.data);
  const image = await processUploadedPhoto(file);
  const photo = await storingPhoto(() =>
    stepPhotoQueries.addStepPhoto(
      photoStore(),
      shopIdOf(caller),
      params.id,
      { ...fields.data, image, name },
      { userId: caller.userId, label: caller.name || caller.email },
    ),
  );
  return json({ photo }, 201);
});
