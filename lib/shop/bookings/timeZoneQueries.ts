import "server-only";
import type { Knex } from "knex";
import { DEFAULT_TIME_ZONE } from "./vocabulary";

/**
 * The shop's time zone alone (IANA), for screens, documents and mail that only show times: the
 * quote modules read it here, as readSchedule (bookings/queries.ts) imports the quote queries.
 *
 * @example
 * await shopTimeZone(db, shopId); // "America/Denver" for a shop that never saved its calendar
 */
export async function shopTimeZone(db: Knex | Knex.Transaction, shopId: string): Promise<string> {
  const row = (await db("shop_schedules").where({ shop_id: shopId }).first("time_zone")) as { time_zone: string } | undefined;
  return row?.time_zone ?? DEFAULT_TIME_ZONE;
}
