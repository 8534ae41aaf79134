import type { PhotoStore } from "./s3";

export type PhotoVariant = "full" | "thumb";

/**
 * The bytes of a photo row the caller may see (the route checked that), as the answer every
 * photo route gives; null when the object is gone. Clients name a photo by id; object keys
 * never leave the server and are never taken from a request.
 */
export async function photoResponse(
  store: PhotoStore,
  photo: { object_key: string; thumb_key: string; content_type: string },
  variant: PhotoVariant,
): Promise<Response | null> {
  const obj = await store.get(variant === "thumb" ? photo.thumb_key : photo.object_key);
  if (!obj) return null;
  return new Response(Buffer.from(obj.body), {
    headers: {
      "Content-Type": variant === "thumb" ? "image/webp" : photo.content_type,
      "Cache-Control": "private, max-age=300",
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": "inline",
    },
  });
}
