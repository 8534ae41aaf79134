/**
 * Removes photo objects that no row points to. A photo is stored objects first, row after
 * (lib/garage/queries.ts addPhoto), so a server killed between the two — or between deleting a
 * vehicle's rows and its objects — leaves objects without a row, never a row without its
 * object; this sweep, run on the queue every few minutes (lib/platform/jobs/workers.ts), deletes them.
 * Only objects older than the grace period are touched: an upload in flight has written its
 * objects a moment before its row.
 *
 * Plain Node (no "server-only"): the job workers run it outside Next.
 */
import type { Knex } from "knex";
import type { PhotoStore } from "./s3";
import { referencedPhotoKeys } from "@/lib/garage/queries";

/** Photo objects all live under this prefix (garage.ts builds `vehicles/<vehicle>/<photo>…`). */
export const PHOTO_PREFIX = "vehicles/";
/** Far longer than storing two objects and one row takes, even for a 10 MB photo on a slow store. */
export const ORPHAN_GRACE_MINUTES = 30;

export interface SweepResult {
  scanned: number;
  deleted: string[];
}

export async function sweepOrphanPhotos(
  db: Knex,
  store: PhotoStore,
  opts: { graceMinutes?: number; now?: Date } = {},
): Promise<SweepResult> {
  const cutoff = (opts.now ?? new Date()).getTime() - (opts.graceMinutes ?? ORPHAN_GRACE_MINUTES) * 60_000;
  const result: SweepResult = { scanned: 0, deleted: [] };
  for await (const page of store.list(PHOTO_PREFIX)) {
    result.scanned += page.length;
    const old = page.filter((o) => o.lastModified.getTime() < cutoff).map((o) => o.key);
    if (!old.length) continue;
    const referenced = await referencedPhotoKeys(db, old);
    const orphans = old.filter((k) => !referenced.has(k));
    if (!orphans.length) continue;
    await store.deleteMany(orphans);
    result.deleted.push(...orphans);
  }
  return result;
}
