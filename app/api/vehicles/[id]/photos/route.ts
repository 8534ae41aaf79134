import { z } from "zod";
import { isDatabaseUnavailable } from "@/lib/platform/db";
import { readCappedBytes } from "@/lib/platform/http/body";
import { HttpError } from "@/lib/platform/http/errors";
import { DomainError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import { json, route } from "@/lib/platform/http/route";
import { ImageRejected, MAX_PHOTO_BYTES, processImage, safeDisplayName } from "@/lib/garage/photos/image";
import { photoStore } from "@/lib/garage/photos/s3";
import { garageQueries } from "@/lib/garage/queries";
import { GARAGE_ACCESS } from "@/lib/garage/access";

const params = z.object({ id: z.uuid() });
/** Room for the multipart boundaries and the other fields around a file at the limit. */
const FORM_OVERHEAD = 64 * 1024;
const TOO_BIG = "That file is larger than 10 MB. Resize it or pick a smaller one.";
const tooBig = () => new HttpError(413, TOO_BIG);

/**
 * Multipart upload: `file` (JPEG, PNG or WebP, ≤ 10 MB) and optionally `clearanceId`. The size
 * is refused from Content-Length before anything is read, and while reading when no length was
 * declared; the type is taken from the bytes.
 */
export const POST = route(
  { access: GARAGE_ACCESS, params, idempotent: true, maxBytes: MAX_PHOTO_BYTES + FORM_OVERHEAD, tooLarge: TOO_BIG },
  async ({ caller, params, req }) => {
    const declared = Number(req.headers.get("content-length") ?? "0");
    if (declared > MAX_PHOTO_BYTES + FORM_OVERHEAD) throw tooBig();
    const vehicle = await garageQueries.findVehicle(caller.userId, params.id);
    if (!vehicle) throw new NotFoundError("That vehicle");
    if (!(req.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data")) {
      throw new HttpError(415, "Send the photo as multipart/form-data with a field named file.");
    }
    // Read with a byte cap before parsing: a body sent without Content-Length (chunked) is cut
    // off at the limit instead of being buffered whole by formData().
    const bytes = await readCappedBytes(req, MAX_PHOTO_BYTES + FORM_OVERHEAD, TOO_BIG);
    let form: FormData;
    try {
      form = await new Response(bytes as BodyInit, { headers: { "content-type": req.headers.get("content-type")! } }).formData();
    } catch {
      throw new HttpError(400, "The upload could not be read as a form. Try again.");
    }
    const file = form.get("file");
    if (!(file instanceof File)) throw new InvalidError("Choose a photo to upload.", { file: ["Choose a photo to upload."] });
    if (file.size > MAX_PHOTO_BYTES) throw tooBig();
    if (file.size === 0) throw new InvalidError("That file is empty.", { file: ["That file is empty."] });
    const name = safeDisplayName(file.name);
    if (name === null) {
      throw new InvalidError('The file name must not contain folders, ".." or control characters.', {
        file: ['Rename the file without slashes or "..".'],
      });
    }
    const rawClearance = form.get("clearanceId");
    let clearanceId: string | null = null;
    if (typeof rawClearance === "string" && rawClearance !== "") {
      if (!z.uuid().safeParse(rawClearance).success || !(await garageQueries.clearanceBelongs(vehicle.id, rawClearance)))
        throw new NotFoundError("That clearance point");
      clearanceId = rawClearance;
    }
    let image;
    try {
      image = await processImage(Buffer.from(await file.arrayBuffer()));
    } catch (e) {
      if (e instanceof ImageRejected) throw new HttpError(415, e.message, { file: [e.message] });
      throw e;
    }
    try {
      const photo = await garageQueries.addPhoto(photoStore(), { vehicleId: vehicle.id, clearanceId, image, name });
      return json({ photo }, 201);
    } catch (e) {
      if (e instanceof HttpError || e instanceof DomainError || isDatabaseUnavailable(e)) throw e;
      console.error("photo upload: storing failed, nothing kept:", e);
      throw new HttpError(503, "The photo store did not answer; nothing was saved. Try again in a moment.");
    }
  },
);
