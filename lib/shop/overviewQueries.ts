import "server-only";
import type { Knex } from "knex";
import type { BayKind, PaymentKind } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { activeBays, readSchedule } from "@/lib/shop/bookings/queries";
import { addDays, wallTime, zonedInstant } from "@/lib/shop/bookings/zoned";
import {
  type BayWeek,
  type DayAmount,
  type DepositHeld,
  type ShopOverview,
  TAKINGS_DAYS,
  openMinutes,
  takingsByDay,
  weekOf,
} from "./overview";

const iso = (d: Date | string) => new Date(d).toISOString();

/** Each active bay's live bookings and booked minutes between two instants (bay time cut to the window). */
async function bayWeeks(db: Knex, shopId: string, start: Date, end: Date, open: number): Promise<BayWeek[]> {
  const bays = await activeBays(db, shopId);
  const window = db.raw("tstzrange(?, ?, '[)')", [start.toISOString(), end.toISOString()]);
  const rows = (await db("bay_reservations")
    .where({ shop_id: shopId })
    .whereRaw("during && ?", [window])
    .groupBy("bay_id")
    .select(
      "bay_id",
      db.raw("count(distinct booking_id)::int as bookings"),
      db.raw("round(sum(extract(epoch from upper(during * ?) - lower(during * ?))) / 60)::int as minutes", [window, window]),
    )) as { bay_id: string; bookings: number; minutes: number }[];
  const byBay = new Map(rows.map((r) => [r.bay_id, r]));
  return bays.map((b) => ({
    bayId: b.id,
    bayName: b.name,
    bayKind: b.kind as BayKind,
    bookings: byBay.get(b.id)?.bookings ?? 0,
    bookedMinutes: byBay.get(b.id)?.minutes ?? 0,
    openMinutes: open,
  }));
}

/** Paid deposits on the shop's quotes not installed yet, less what was refunded; a deposit refunded in full is not held. */
async function depositsHeld(db: Knex, shopId: string): Promise<DepositHeld[]> {
  const rows = (await db("quotes as q")
    .join("customers as c", "c.id", "q.customer_id")
    .join("payments as p", function () {
      this.on("p.quote_id", "q.id").andOnVal("p.kind", "deposit").andOnVal("p.status", "paid");
    })
    .where("q.shop_id", shopId)
    .whereNot("q.status", "installed")
    .groupBy("q.id", "c.name")
    .orderByRaw("max(p.paid_at), q.number")
    .select(
      "q.id",
      "q.number",
      "q.vehicle_description",
      "c.name as customer_name",
      db.raw("sum(p.amount_cents)::bigint as paid"),
      db.raw("max(p.paid_at) as paid_at"),
      db.raw(
        "(select coalesce(sum(r.amount_cents), 0) from payment_refunds r where r.quote_id = q.id and r.status = 'succeeded')::bigint as refunded",
      ),
      db.raw("(select min(b.starts_at) from bookings b where b.quote_id = q.id and b.status = 'booked') as install_at"),
    )) as {
    id: string;
    number: number;
    vehicle_description: string;
    customer_name: string;
    paid: string;
    refunded: string;
    paid_at: Date;
    install_at: Date | null;
  }[];
  return rows
    .map((r) => ({
      quoteId: r.id,
      quoteNumber: r.number,
      customerName: r.customer_name,
      vehicle: r.vehicle_description,
      heldCents: Number(r.paid) - Number(r.refunded),
      paidAt: iso(r.paid_at),
      installAt: r.install_at ? iso(r.install_at) : null,
    }))
    .filter((d) => d.heldCents > 0);
}

/** Payments received (by kind) and refunds given back, summed per day of the shop's clock between two instants. */
async function dayAmounts(db: Knex, shopId: string, timeZone: string, start: Date, end: Date): Promise<DayAmount[]> {
  const day = (column: string) => db.raw(`to_char((${column} at time zone ?)::date, 'YYYY-MM-DD') as date`, [timeZone]);
  const [payments, refunds] = [
    (await db("payments")
      .where({ shop_id: shopId, status: "paid" })
      .andWhere("paid_at", ">=", start)
      .andWhere("paid_at", "<", end)
      .groupByRaw("1, 2")
      .select(day("paid_at"), "kind as what", db.raw("sum(amount_cents)::bigint as cents"))) as {
      date: string;
      what: PaymentKind;
      cents: string;
    }[],
    (await db("payment_refunds")
      .where({ shop_id: shopId, status: "succeeded" })
      .andWhere("succeeded_at", ">=", start)
      .andWhere("succeeded_at", "<", end)
      .groupByRaw("1")
      .select(day("succeeded_at"), db.raw("sum(amount_cents)::bigint as cents"))) as { date: string; cents: string }[],
  ];
  return [
    ...payments.map((p) => ({ date: p.date, what: p.what, cents: Number(p.cents) })),
    ...refunds.map((r) => ({ date: r.date, what: "refund" as const, cents: Number(r.cents) })),
  ];
}

/**
 * The owner's overview of the shop, on the shop's clock at `now`: this week's bookings per bay
 * against its open hours, the deposits held, and the takings of the last TAKINGS_DAYS days.
 */
export async function shopOverview(db: Knex, shopId: string, now = new Date()): Promise<ShopOverview> {
  const schedule = await readSchedule(db, shopId);
  const tz = schedule.timeZone;
  const today = wallTime(now, tz).date;
  const week = weekOf(today);
  const weekEnd = addDays(week.from, 7);
  const takingsFrom = addDays(today, 1 - TAKINGS_DAYS);
  const bays = await bayWeeks(db, shopId, zonedInstant(week.from, 0, tz), zonedInstant(weekEnd, 0, tz), openMinutes(schedule, week.days));
  const items = await depositsHeld(db, shopId);
  const amounts = await dayAmounts(db, shopId, tz, zonedInstant(takingsFrom, 0, tz), zonedInstant(addDays(today, 1), 0, tz));
  const days = takingsByDay(takingsFrom, today, amounts);
  return {
    timeZone: tz,
    week: { from: week.from, to: week.days.at(-1)!, bays },
    deposits: { items, totalCents: items.reduce((n, d) => n + d.heldCents, 0) },
    takings: { from: takingsFrom, to: today, days, totalCents: days.reduce((n, d) => n + d.netCents, 0) },
  };
}

/** These queries on the app's database handle, for pages and route handlers. */
export const overviewQueries = bindAppDb({ shopOverview });
