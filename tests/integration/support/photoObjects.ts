import { readdirSync, utimesSync } from "node:fs";
import { join } from "node:path";
import { setPhotoStore } from "@/lib/garage/photos/s3";
import type { TestPhotoStore } from "./photoStore";

/** Backdates an object in the fake store (its LastModified is the file's mtime), as the orphan sweep sees it. */
export function ageObject(photos: TestPhotoStore, key: string, minutes: number): void {
  const parts = key.split("/");
  const folder = join(photos.dir, photos.bucket, ...parts.slice(0, -1));
  const file = readdirSync(folder).find((f) => f === `${parts.at(-1)}._S3rver_object`);
  if (!file) throw new Error(`no stored object for ${key}`);
  const t = new Date(Date.now() - minutes * 60_000);
  utimesSync(join(folder, file), t, t);
}

/**
 * Runs `body` with the app's store failing at its second write (the thumbnail, after the
 * photo itself was stored), then sets the working store back.
 */
export async function withStoreFailingHalfway(photos: TestPhotoStore, body: () => Promise<void>): Promise<void> {
  let puts = 0;
  setPhotoStore({
    ...photos.store,
    async put(key, bytes, type) {
      if (++puts === 2) throw new Error("store went away");
      return photos.store.put(key, bytes, type);
    },
  });
  try {
    await body();
  } finally {
    setPhotoStore(photos.store);
  }
}
