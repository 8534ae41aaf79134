import type { ProcessedImage } from "./image";
import { extensionOf } from "./image";
import type { PhotoStore } from "./s3";

/** The columns every photo table has (db/migrations: vehicle_photos, work_order_step_photos), as stored. */
export interface StoredPhotoColumns {
  /** The image and its WebP thumbnail, keyed from ids only. */
  object_key: string;
  thumb_key: string;
  content_type: ProcessedImage["type"];
  width: number;
  height: number;
  bytes: number;
  original_name: string;
}

/**
 * Stores both objects under `base` (e.g. `vehicles/<vehicle>/<photo>`), then writes the row
 * (`writeRow` gets the photo's columns to insert with its own).
 * If anything fails, the objects already written are removed again, so nothing is left
 * half-written. The order is the crash-safe one: a server killed in between leaves objects
 * without a row (never a row without its image), and the photo sweep (sweep.ts) deletes those.
 */
export async function storePhotoObjects<T>(
  store: PhotoStore,
  base: string,
  image: ProcessedImage,
  name: string,
  writeRow: (columns: StoredPhotoColumns) => Promise<T>,
): Promise<T> {
  const columns: StoredPhotoColumns = {
    object_key: `${base}.${extensionOf(image.type)}`,
    thumb_key: `${base}-thumb.webp`,
    content_type: image.type,
    width: image.width,
    height: image.height,
    bytes: image.full.length,
    original_name: name,
  };
  const written: string[] = [];
  try {
    await store.put(columns.object_key, image.full, image.type);
    written.push(columns.object_key);
    await store.put(columns.thumb_key, image.thumb, "image/webp");
    written.push(columns.thumb_key);
    return await writeRow(columns);
  } catch (e) {
    await store.deleteMany(written).catch(() => undefined);
    throw e;
  }
}
