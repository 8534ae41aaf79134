/**
 * Removes photo objects that no row points to. A photo is stored objects first, row after
 * (objects.ts), so a server killed between the two — or between deleting rows and their objects,
 * or a work order deleted with its photo rows by cascade — leaves objects without a row, never a
 * row without its object; this sweep, run on the queue every few minutes
 * (lib/platform/jobs/workers.ts), deletes them. Only objects older than the grace period are
 * touched: an upload in flight has written its objects a moment before its row.
 *
 * The store holds every kind of photo, each under its own prefix with the table that names its
 * objects; the sweep walks them all.
 *
 * Plain Node (no "server-only"): the job workers run it outside Next.
 */
import type { Knex } from "knex";
import type { PhotoStore } from "./s3";
import { type PhotoTable, referencedKeysIn } from "./photoKeyQueries";

/** Garage photos live under this prefix (garage queries build `vehicles/<vehicle>/<photo>…`). */
export const PHOTO_PREFIX = "vehicles/";
/** Work order step photos (lib/shop/workOrders/photoQueries.ts builds `work-orders/<work order>/<photo>…`). */
export const STEP_PHOTO_PREFIX = "work-orders/";
/** Far longer than storing two objects and one row takes, even for a 10 MB photo on a slow store. */
export const ORPHAN_GRACE_MINUTES = 30;

/** Each kind of photo: where its objects live and the table whose rows name them. */
const PHOTO_KINDS: readonly { prefix: string; table: PhotoTable }[] = [
  { prefix: PHOTO_PREFIX, table: "vehicle_photos" },
  { prefix: STEP_PHOTO_PREFIX, table: "work_order_step_photos" },
];

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
  for (const kind of PHOTO_KINDS) {
    for await (const page of store.list(kind.prefix)) {
      result.scanned += page.length;
      const old = page.filter((o) => o.lastModified.getTime() < cutoff).map((o) => o.key);
      if (!old.length) continue;
      const referenced = await referencedKeysIn(db, kind.table, old);
      const orphans = old.filter((k) => !referenced.has(k));
      if (!orphans.length) continue;
      await store.deleteMany(orphans);
      result.deleted.push(...orphans);
    }
  }
  return result;
}
