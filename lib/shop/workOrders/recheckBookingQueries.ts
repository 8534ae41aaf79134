/**
 * The customer books the lug and ring re-check on the link in the re-check e-mail. The booking is
 * a booking of the job's quote with kind "recheck" (migration 20261209090000_recheck_bookings):
 * the same bay_reservations and exclusion constraint keep it off every install, the day-before
 * reminder and the calendar take it as they are, and the install's "one live booking" stays one
 * per quote and kind. Only the token's SHA-256 is kept on the work order, with an expiry. Its
 * length is the shop's (recheckSlotQueries.ts); its placing, mails, the shop's notice and the
 * counter's moves and cancels are the install's own code in lib/shop/bookings/queries.ts.
 */
import "server-only";
import type { Knex } from "knex";
import type { BookingRow, QuoteRow, WorkOrderRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, GoneError, NotFoundError } from "@/lib/platform/errors";
import { isLinkToken } from "@/lib/platform/tokenFormat";
import { hashToken } from "@/lib/platform/tokens";
import type { Booking, SlotsAnswer } from "@/lib/shop/bookings/api";
import { type SlotWindow, answer, place, readSchedule, reserve, slotsForJob } from "@/lib/shop/bookings/queries";
import { mailCustomer } from "@/lib/shop/bookings/customerMailQueries";
import type { BookingRequest } from "@/lib/shop/bookings/schema";
import { formatInstant } from "@/lib/shop/bookings/zoned";
import { queueShopNotice } from "@/lib/shop/notices/noticeQueries";
import { RECHECK_BOOKING_DAYS, recheckLinkLive } from "./recheckLink";
import { recheckSlotMinutes } from "./recheckSlotQueries";

type Db = Knex | Knex.Transaction;

const UNKNOWN = "That re-check link";

/** The work order and quote behind a live link; 404 for an unknown one, 410 naming the shop's phone for an expired one. */
async function byLink(db: Db, token: string, now: Date, lock = false): Promise<{ order: WorkOrderRow; quote: QuoteRow }> {
  if (!isLinkToken(token)) throw new NotFoundError(UNKNOWN);
  const q = db<WorkOrderRow>("work_orders")
    .where({ recheck_link_hash: hashToken(token) })
    .first();
  if (lock) q.forUpdate();
  const order = (await q) as WorkOrderRow | undefined;
  if (!order) throw new NotFoundError(UNKNOWN);
  if (!recheckLinkLive(order.recheck_link_expires_at, now)) {
    const shop = await db("shops").where({ id: order.shop_id }).first("name", "phone");
    throw new GoneError(
      `This re-check link has expired. ${shop?.phone ? `Call ${shop.name} on ${shop.phone}` : `Contact ${shop?.name ?? "the shop"}`} to book your re-check.`,
    );
  }
  const quote = (await db<QuoteRow>("quotes").where({ id: order.quote_id, shop_id: order.shop_id }).first()) as QuoteRow;
  return { order, quote };
}

async function liveRecheck(db: Db, quoteId: string): Promise<BookingRow | undefined> {
  return (await db<BookingRow>("bookings").where({ quote_id: quoteId, kind: "recheck", status: "booked" }).first()) as
    BookingRow | undefined;
}

/** The free re-check starts (the shop's re-check length) of the next RECHECK_BOOKING_DAYS days on the link, with the re-check already booked (if any). */
export async function recheckSlotsByLink(db: Knex, token: string, opts: SlotWindow = {}): Promise<SlotsAnswer> {
  const now = opts.now ?? new Date();
  const { quote } = await byLink(db, token, now);
  return slotsForJob(db, quote, "recheck", await liveRecheck(db, quote.id), { ...opts, now }, RECHECK_BOOKING_DAYS);
}

/**
 * Books the re-check at the chosen start: the work order locked (so two tabs cannot both book),
 * no live re-check yet, the start within the shop's hours, the next RECHECK_BOOKING_DAYS days and
 * a free lift bay for the shop's re-check length — then the booking, its bay time, the
 * confirmation with its calendar file and the shop's notice, in one transaction; any refusal
 * writes nothing.
 */
export async function bookRecheck(db: Knex, token: string, request: Pick<BookingRequest, "start">, now = new Date()): Promise<Booking> {
  return db.transaction(async (trx) => {
    const { quote } = await byLink(trx, token, now, true);
    const live = await liveRecheck(trx, quote.id);
    if (live) {
      const { timeZone } = await readSchedule(trx, quote.shop_id);
      throw new ConflictError(`Your re-check is already booked for ${formatInstant(live.starts_at, timeZone)}. Call the shop to move it.`);
    }
    const row = await place(trx, { quote, request, now, job: "recheck", horizonDays: RECHECK_BOOKING_DAYS }, async (sp, slot) => {
      const [b] = (await sp("bookings")
        .insert({
          shop_id: quote.shop_id,
          quote_id: quote.id,
          kind: "recheck",
          status: "booked",
          starts_at: slot.start,
          ends_at: slot.end,
          booked_by_user_id: null,
          booked_by: "customer",
        })
        .returning("*")) as BookingRow[];
      await reserve(sp, b!.id, quote.shop_id, slot);
      return b!;
    });
    await mailCustomer(trx, quote, row, "confirmed");
    await queueShopNotice(trx, quote, { kind: "booked", job: "recheck", start: row.starts_at, end: row.ends_at, by: "customer" });
    return answer(trx, row);
  });
}

/** What the customer's page shows: the job and the re-check booked, or why the link does not work. */
export type RecheckPage =
  | {
      state: "open";
      shopName: string;
      shopPhone: string;
      quoteNumber: number;
      vehicle: string;
      /** The shop's re-check length, for the page's "takes about" line. */
      slotMinutes: number;
      booking: Booking | null;
    }
  | { state: "refused"; title: string; message: string };

export async function recheckPageByLink(db: Knex, token: string, now = new Date()): Promise<RecheckPage> {
  try {
    const { quote } = await byLink(db, token, now);
    const [shop, live, slotMinutes] = await Promise.all([
      db("shops").where({ id: quote.shop_id }).first("name", "phone"),
      liveRecheck(db, quote.id),
      recheckSlotMinutes(db, quote.shop_id),
    ]);
    return {
      state: "open",
      shopName: shop.name,
      shopPhone: shop.phone,
      quoteNumber: quote.number,
      vehicle: quote.vehicle_description,
      slotMinutes,
      booking: live ? await answer(db, live) : null,
    };
  } catch (e) {
    if (e instanceof GoneError) return { state: "refused", title: "Link expired", message: e.message };
    if (e instanceof NotFoundError)
      return {
        state: "refused",
        title: "Link not valid",
        message: "This re-check link is not valid. Use the link in your latest re-check e-mail, or call the shop.",
      };
    throw e;
  }
}

/** These queries on the app's database handle, for pages and route handlers. */
export const recheckBookingQueries = bindAppDb({ bookRecheck, recheckPageByLink, recheckSlotsByLink });
