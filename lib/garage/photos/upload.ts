import "server-only";
import type { NextRequest } from "next/server";
import { isDatabaseUnavailable } from "@/lib/platform/db";
import { readCappedBytes } from "@/lib/platform/http/body";
import { HttpError } from "@/lib/platform/http/errors";
import { DomainError, InvalidError } from "@/lib/platform/errors";
import { ImageRejected, type ProcessedImage, processImage, safeDisplayName } from "./image";
import { MAX_PHOTO_BYTES, PHOTO_TOO_BIG } from "./limits";

/**
 * One photo sent as multipart/form-data, read the same way by every upload route (a garage
 * vehicle's, a work order step's): the size refused from Content-Length before anything is read
 * and while reading when no length was declared, the type taken from the bytes, the name made
 * safe to show, the image re-encoded without its metadata.
 */

/** Room for the multipart boundaries and the other fields around a file at the limit. */
const FORM_OVERHEAD = 64 * 1024;
const MAX_FORM_BYTES = MAX_PHOTO_BYTES + FORM_OVERHEAD;
const tooBig = () => new HttpError(413, PHOTO_TOO_BIG);

/** route() options every photo upload shares: a retried upload is answered once, the body capped. */
export const PHOTO_UPLOAD_ROUTE = { idempotent: true, maxBytes: MAX_FORM_BYTES, tooLarge: PHOTO_TOO_BIG } as const;

/** 413 from the declared length alone: called before any lookup, so a huge body costs nothing. */
export function refuseDeclaredTooBig(req: NextRequest): void {
  if (Number(req.headers.get("content-length") ?? "0") > MAX_FORM_BYTES) throw tooBig();
}

/** The form with its `file`: present, not empty, not over the limit, with a name that is not a path. */
export async function readPhotoForm(req: NextRequest): Promise<{ form: FormData; file: File; name: string }> {
  if (!(req.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data")) {
    throw new HttpError(415, "Send the photo as multipart/form-data with a field named file.");
  }
  // Read with a byte cap before parsing: a body sent without Content-Length (chunked) is cut
  // off at the limit instead of being buffered whole by formData().
  const bytes = await readCappedBytes(req, MAX_FORM_BYTES, PHOTO_TOO_BIG);
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
  return { form, file, name };
}

/** The checked, re-encoded image; 415 with the person's message when it is not one we keep. */
export async function processUploadedPhoto(file: File): Promise<ProcessedImage> {
  try {
    return await processImage(Buffer.from(await file.arrayBuffer()));
  } catch (e) {
    if (e instanceof ImageRejected) throw new HttpError(415, e.message, { file: [e.message] });
    throw e;
  }
}

/**
 * Runs the store-then-row write; a failure that is not a refusal or the database being down is
 * the photo store's, answered 503 (the write removed what it had stored, so nothing was kept).
 */
export async function storingPhoto<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (e) {
    if (e instanceof HttpError || e instanceof DomainError || isDatabaseUnavailable(e)) throw e;
    console.error("photo upload: storing failed, nothing kept:", e);
    throw new HttpError(503, "The photo store did not answer; nothing was saved. Try again in a moment.");
  }
}
