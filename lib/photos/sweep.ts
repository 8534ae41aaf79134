/**
 * Removes photo objects that no row points to. A photo is stored objects first, row after
 * (lib/server/garage.ts addPhoto), so a server killed between the two — or between deleting a
 * vehicle's rows and its objects — leaves objects without a row, never a row without its
 * object; this sweep, run on the queue every few minutes (lib/jobs/workers.ts), deletes them.
 * Only objects older than the grace period are touched: an upload in flight has written its
 * objects a moment before its row.
 *
 * Plain Node (no "server-only"): the job workers run it outside Next.
 */
import type { Knex } from "knex";
import type { PhotoStore } from "./s3";

/** Photo objects all live under this prefix (garage.ts builds `vehicles/<vehicle>/<photo>…`). */
export const PHOTO_PREFIX = "vehicles/";
/** Far longer than storing two objects and one row takes, even for a 10 MB photo on a slow store. */
export const ORPHAN_GRACE_MINUTES = 30;

export interface SweepResult {
  scanned: number;
  deleted: string[];
}

export async function sweepOrphanPhotos(db: Knex, store: PhotoStore, opts: { graceMinutes?: number; now?: Date } = {}): Promise<SweepResult> {
  const cutoff = (opts.now ?? new Date()).getTime() - (opts.graceMinutes ?? ORPHAN_GRACE_MINUTES) * 60_000;
  const result: SweepResult = { scanned: 0, deleted: [] };
  for await (const page of store.list(PHOTO_PREFIX)) {
    result.scanned += page.length;
    const old = page.filter((o) => o.lastModified.getTime() < cutoff).map((o) => o.key);
    if (!old.length) continue;
    const rows = (await db("vehicle_photos")
      .whereIn("object_key", old)
      .orWhereIn("thumb_key", old)
      .select("object_key", "thumb_key")) as { object_key: string; thumb_key: string }[];
    const referenced = new Set(rows.flatMap((r) => [r.object_key, r.thumb_key]));
    const orphans = old.filter((k) => !referenced.has(k));
    if (!orphans.length) continue;
    await store.deleteMany(orphans);
    result.deleted.push(...orphans);
  }
  return result;
}
