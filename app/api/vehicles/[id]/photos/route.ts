import { z } from "zod";
import { NotFoundError } from "@/lib/platform/errors";
import { json, route } from "@/lib/platform/http/route";
import { PHOTO_UPLOAD_ROUTE, processUploadedPhoto, readPhotoForm, refuseDeclaredTooBig, storingPhoto } from "@/lib/garage/photos/upload";
import { photoStore } from "@/lib/garage/photos/s3";
import { garageQueries } from "@/lib/garage/queries";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });

/**
 * Multipart upload: `file` (JPEG, PNG or WebP, ≤ 10 MB) and optionally `clearanceId`. The size
 * is refused from Content-Length before anything is read, and while reading when no length was
 * declared; the type is taken from the bytes (lib/garage/photos/upload.ts).
 */
export const POST = route({ access: GARAGE_ACCESS, params, ...PHOTO_UPLOAD_ROUTE }, async ({ caller, params, req }) => {
  refuseDeclaredTooBig(req);
  const vehicle = await garageQueries.findVehicle(caller.userId, params.id);
  if (!vehicle) throw new NotFoundError("That vehicle");
  const { form, file, name } = await readPhotoForm(req);
  const rawClearance = form.get("clearanceId");
  let clearanceId: string | null = null;
  if (typeof rawClearance === "string" && rawClearance !== "") {
    if (!z.uuid().safeParse(rawClearance).success || !(await garageQueries.clearanceBelongs(vehicle.id, rawClearance)))
      throw new NotFoundError("That clearance point");
    clearanceId = rawClearance;
  }
  const image = await processUploadedPhoto(file);
  const photo = await storingPhoto(() => garageQueries.addPhoto(photoStore(), { vehicleId: vehicle.id, clearanceId, image, name }));
  return json({ photo }, 201);
});
