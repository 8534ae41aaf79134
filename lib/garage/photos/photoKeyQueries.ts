import type { Knex } from "knex";

/** The tables whose rows name photo objects, each by `object_key` and `thumb_key`. */
export type PhotoTable = "vehicle_photos" | "work_order_step_photos";

/**
 * Of these object keys, the ones a row of `table` still names (as the photo or its thumbnail):
 * what the orphan sweep (sweep.ts) must keep. Plain Node, no "server-only": the workers call it.
 */
export async function referencedKeysIn(db: Knex, table: PhotoTable, keys: string[]): Promise<Set<string>> {
  const rows = (await db(table).whereIn("object_key", keys).orWhereIn("thumb_key", keys).select("object_key", "thumb_key")) as {
    object_key: string;
    thumb_key: string;
  }[];
  return new Set(rows.flatMap((r) => [r.object_key, r.thumb_key]));
}
