/**
 * The shop's re-check slot length (shops.recheck_slot_minutes): read by the re-check link's
 * slots and booking and by the counter's moves (lib/shop/bookings/queries.ts), set by the owner.
 * Imports nothing of the booking queries, so they can read it without a cycle.
 */
import "server-only";
import type { Knex } from "knex";
import { bindAppDb } from "@/lib/platform/db/bind";
import { NotFoundError } from "@/lib/platform/errors";

type Db = Knex | Knex.Transaction;

/** How long the shop's re-check keeps the truck, in minutes. */
export async function recheckSlotMinutes(db: Db, shopId: string): Promise<number> {
  const row = (await db("shops").where({ id: shopId }).first("recheck_slot_minutes")) as { recheck_slot_minutes: number } | undefined;
  if (!row) throw new NotFoundError("That shop");
  return row.recheck_slot_minutes;
}

/** Sets the shop's re-check length; re-checks already booked keep the time they hold until they are moved. */
export async function setRecheckSlotMinutes(db: Knex, shopId: string, minutes: number): Promise<number> {
  const n = await db("shops").where({ id: shopId }).update({ recheck_slot_minutes: minutes, updated_at: db.fn.now() });
  if (!n) throw new NotFoundError("That shop");
  return minutes;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const recheckSlotQueries = bindAppDb({ recheckSlotMinutes, setRecheckSlotMinutes });
