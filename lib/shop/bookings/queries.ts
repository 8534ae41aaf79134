import "server-only";
import type { Knex } from "knex";
import type { BayKind, BayRow, BookingKind, BookingRow, CatalogItemRow, QuoteRow, ServiceTimeRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import { type Actor, type QuoteScope, findByToken, getQuote, readLines } from "@/lib/shop/quotes/queries";
import { STATUS_LABEL } from "@/lib/shop/quotes/status";
import {
  type BaysSetup,
  type BookedBay,
  type Booking,
  type CalendarAnswer,
  type CalendarBooking,
  type ServiceTime,
  type SlotsAnswer,
  bayDto,
  bookingDto,
  weekdaysDto,
  lengthLabel,
  slotDayOption,
} from "./api";
import { queueShopNotice } from "@/lib/shop/notices/noticeQueries";
import { assertDepositHeld } from "@/lib/shop/payments/depositQueries";
import { canBook } from "./bookable";
import { mailCustomer } from "./customerMailQueries";
import { type BaysSetupValues, type BookingRequest, bookingRequestSchemaFor, openingHoursOf } from "./schema";
import { type BayLite, type Held, type Schedule, type Slot, type SlotProblem, cannotBook, checkStart, freeSlots } from "./slots";
import {
  BAY_KIND_LABEL,
  BOOKING_HORIZON_DAYS,
  DEFAULT_SLOT_STEP,
  DEFAULT_TIME_ZONE,
  REMINDER_FROM_HOUR,
  START_FIELD_LABELS,
  defaultServiceTime,
} from "./vocabulary";
import { type Workload, workloadOf } from "./workload";
import { addDays, formatInstant, wallTime, weekdayOf, zonedInstant } from "./zoned";
import { recheckWork } from "@/lib/shop/workOrders/recheckLink";
import { recheckSlotMinutes } from "@/lib/shop/workOrders/recheckSlotQueries";
import { readTogether } from "@/lib/platform/db/readTogether";
import { countOf } from "@/lib/platform/text";

type Db = Knex | Knex.Transaction;

/* ---------------------------------------------------------------- the shop's week and bays */

/** The shop's calendar rules; a shop that never saved them has none open (and the default zone). */
export async function readSchedule(db: Db, shopId: string): Promise<Schedule> {
  const row = await db("shop_schedules").where({ shop_id: shopId }).first("time_zone", "slot_step_minutes");
  const hours = await db("shop_opening_hours").where({ shop_id: shopId }).select("weekday", "opens_minute", "closes_minute");
  const closed = await db("shop_closed_days").where({ shop_id: shopId }).select(db.raw("to_char(day, 'YYYY-MM-DD') as day"), "note");
  return {
    timeZone: row?.time_zone ?? DEFAULT_TIME_ZONE,
    stepMinutes: row?.slot_step_minutes ?? DEFAULT_SLOT_STEP,
    hours: Object.fromEntries(
      hours.map((h: { weekday: number; opens_minute: number; closes_minute: number }) => [
        h.weekday,
        { opens: h.opens_minute, closes: h.closes_minute },
      ]),
    ),
    closedDays: new Map(closed.map((c: { day: string; note: string }) => [c.day, c.note])),
  };
}

/** Bays that take work, in the owner's order (the order slots try them). */
export async function activeBays(db: Db, shopId: string): Promise<BayRow[]> {
  return db<BayRow>("bays")
    .where({ shop_id: shopId })
    .whereNull("archived_at")
    .orderBy([{ column: "position" }, { column: "name" }]);
}

/** The shop's catalog services with their bay time: the owner's, or the default for the service type and unit. */
export async function serviceTimes(db: Db, shopId: string): Promise<ServiceTime[]> {
  const rows = (await db("catalog_items as c")
    .leftJoin("service_times as t", function () {
      this.on("t.catalog_item_id", "c.id").andOn("t.shop_id", "c.shop_id");
    })
    .where({ "c.shop_id": shopId, "c.kind": "service" })
    .orderBy("c.sku")
    .select("c.id", "c.sku", "c.description", "c.service_type", "c.service_unit", "t.minutes_per_unit", "t.bay_kind")) as (Pick<
    CatalogItemRow,
    "id" | "sku" | "description" | "service_type" | "service_unit"
  > & {
    minutes_per_unit: number | null;
    bay_kind: BayKind | null;
  })[];
  return rows.map((r) => {
    const d = defaultServiceTime(r.service_type, r.service_unit);
    const set = r.minutes_per_unit !== null && r.bay_kind !== null;
    return {
      catalogItemId: r.id,
      sku: r.sku,
      description: r.description,
      serviceType: r.service_type,
      unit: r.service_unit,
      minutes: set ? r.minutes_per_unit! : d.minutes,
      bayKind: set ? r.bay_kind! : d.bayKind,
      isDefault: !set,
    };
  });
}

export async function getSetup(db: Knex, shopId: string): Promise<BaysSetup> {
  const [schedule, hours, closed, bays, services] = await Promise.all([
    db("shop_schedules").where({ shop_id: shopId }).first("time_zone", "slot_step_minutes"),
    db("shop_opening_hours").where({ shop_id: shopId }).select("weekday", "opens_minute", "closes_minute"),
    db("shop_closed_days").where({ shop_id: shopId }).orderBy("day").select(db.raw("to_char(day, 'YYYY-MM-DD') as day"), "note"),
    activeBays(db, shopId),
    serviceTimes(db, shopId),
  ]);
  return {
    timeZone: schedule?.time_zone ?? DEFAULT_TIME_ZONE,
    slotStepMinutes: schedule?.slot_step_minutes ?? DEFAULT_SLOT_STEP,
    weekdays: weekdaysDto(hours),
    closedDays: closed,
    bays: bays.map(bayDto),
    serviceTimes: services,
  };
}

/** A refusal of fields whose first message is the answer's message (as the forms show it above the fields). */
const invalid = (fieldErrors: Record<string, string[]>) =>
  new InvalidError(Object.values(fieldErrors)[0]?.[0] ?? "Some fields need attention.", fieldErrors);

/** Bay time held from now on, per bay. */
async function futureHolds(db: Db, bayIds: string[]): Promise<Map<string, number>> {
  if (!bayIds.length) return new Map();
  const rows = await db("bay_reservations")
    .whereIn("bay_id", bayIds)
    .whereRaw("upper(during) > now()")
    .groupBy("bay_id")
    .select("bay_id", db.raw("count(*)::int as n"));
  return new Map(rows.map((r: { bay_id: string; n: number }) => [r.bay_id, r.n]));
}

/**
 * Saves the owner's whole bays-and-hours form in one transaction. Bays left out are archived
 * (past bookings keep them); a bay with bookings ahead is neither removed nor given another kind
 * (409/422 naming it), and ids or services of another shop are refused with the row named.
 */
export async function saveSetup(db: Knex, shopId: string, v: BaysSetupValues): Promise<BaysSetup> {
  await db.transaction(async (trx) => {
    // One owner's save at a time per shop.
    await trx("shops").where({ id: shopId }).forUpdate().first("id");
    const existing = await activeBays(trx, shopId);
    const byId = new Map(existing.map((b) => [b.id, b]));
    const fe: Record<string, string[]> = {};
    v.bays.forEach((b, i) => {
      if (b.id && !byId.has(b.id))
        fe[`bays.${i}.id`] = [`Bay ${i + 1}: this bay is not one of your shop's bays (any more). Reload the page.`];
    });
    const services = new Set(
      (
        await trx("catalog_items")
          .where({ shop_id: shopId, kind: "service" })
          .whereIn(
            "id",
            v.serviceTimes.map((s) => s.catalogItemId),
          )
          .select("id")
      ).map((r: { id: string }) => r.id),
    );
    v.serviceTimes.forEach((s, i) => {
      if (!services.has(s.catalogItemId))
        fe[`serviceTimes.${i}.catalogItemId`] = [
          `Service time ${i + 1}: this is not a service in your catalog (any more). Reload the page.`,
        ];
    });
    const kept = new Set(v.bays.map((b) => b.id).filter((id): id is string => !!id));
    const holds = await futureHolds(
      trx,
      existing.map((b) => b.id),
    );
    // "1 booking … move or cancel it", "2 bookings … move or cancel them".
    const ahead = (n: number) => `${countOf(n, "booking")} from now on`;
    const them = (n: number) => (n === 1 ? "it" : "them");
    v.bays.forEach((b, i) => {
      const was = b.id ? byId.get(b.id) : undefined;
      const n = was ? (holds.get(was.id) ?? 0) : 0;
      if (was && was.kind !== b.kind && n)
        fe[`bays.${i}.kind`] = [`${was.name} has ${ahead(n)}: move or cancel ${them(n)} before changing its kind.`];
    });
    if (Object.keys(fe).length) throw invalid(fe);
    const removed = existing.filter((b) => !kept.has(b.id));
    const busy = removed.filter((b) => holds.get(b.id));
    if (busy.length) {
      throw new ConflictError(
        `${busy.map((b) => `${b.name} has ${ahead(holds.get(b.id) ?? 0)}`).join("; ")}: move or cancel ${them(busy.reduce((sum, b) => sum + (holds.get(b.id) ?? 0), 0))} before removing ${busy.length > 1 ? "those bays" : "the bay"}.`,
      );
    }

    await trx("shop_schedules")
      .insert({ shop_id: shopId, time_zone: v.timeZone, slot_step_minutes: v.slotStepMinutes, updated_at: trx.fn.now() })
      .onConflict("shop_id")
      .merge();
    await trx("shop_opening_hours").where({ shop_id: shopId }).delete();
    const hours = openingHoursOf(v);
    if (hours.length)
      await trx("shop_opening_hours").insert(
        hours.map((h) => ({ shop_id: shopId, weekday: h.weekday, opens_minute: h.opens, closes_minute: h.closes })),
      );
    await trx("shop_closed_days").where({ shop_id: shopId }).delete();
    if (v.closedDays.length) await trx("shop_closed_days").insert(v.closedDays.map((d) => ({ shop_id: shopId, day: d.day, note: d.note })));

    if (removed.length)
      await trx("bays")
        .whereIn(
          "id",
          removed.map((b) => b.id),
        )
        .update({ archived_at: trx.fn.now() });
    // Names are unique among a shop's bays: park the kept ones on their ids first, so swapping two names is one save.
    if (kept.size)
      await trx("bays")
        .whereIn("id", [...kept])
        .update({ name: trx.raw("id::text") });
    for (const [i, b] of v.bays.entries()) {
      if (b.id) await trx("bays").where({ id: b.id, shop_id: shopId }).update({ name: b.name, kind: b.kind, position: i });
      else await trx("bays").insert({ shop_id: shopId, name: b.name, kind: b.kind, position: i });
    }

    await trx("service_times").where({ shop_id: shopId }).delete();
    if (v.serviceTimes.length) {
      await trx("service_times").insert(
        v.serviceTimes.map((s) => ({
          shop_id: shopId,
          catalog_item_id: s.catalogItemId,
          minutes_per_unit: s.minutes,
          bay_kind: s.bayKind,
        })),
      );
    }
  });
  return getSetup(db, shopId);
}

/* ---------------------------------------------------------------- a quote's work and slots */

/** How long the quote's work keeps the truck, per kind of bay, from its lines and the shop's service times. */
export async function quoteWork(db: Db, quote: Pick<QuoteRow, "id" | "shop_id">): Promise<Workload> {
  const lines = await readLines(db, quote.id);
  const ids = [...new Set(lines.map((l) => l.catalog_item_id).filter((x): x is string => !!x))];
  const items = ids.length
    ? ((await db("catalog_items as c")
        .leftJoin("service_times as t", function () {
          this.on("t.catalog_item_id", "c.id").andOn("t.shop_id", "c.shop_id");
        })
        .where({ "c.shop_id": quote.shop_id, "c.kind": "service" })
        .whereIn("c.id", ids)
        .select("c.id", "c.service_type", "c.service_unit", "t.minutes_per_unit", "t.bay_kind")) as (Pick<
        CatalogItemRow,
        "id" | "service_type" | "service_unit"
      > &
        Partial<Pick<ServiceTimeRow, "minutes_per_unit" | "bay_kind">>)[])
    : [];
  const times = new Map(
    items.map((i) => {
      const d = defaultServiceTime(i.service_type, i.service_unit);
      return [
        i.id,
        i.minutes_per_unit != null && i.bay_kind
          ? { minutesPerUnit: i.minutes_per_unit, bayKind: i.bay_kind }
          : { minutesPerUnit: d.minutes, bayKind: d.bayKind },
      ];
    }),
  );
  return workloadOf(
    lines.map((l) => ({
      kind: l.kind,
      unit: l.unit,
      quantity: l.quantity,
      description: l.description,
      time: l.catalog_item_id ? (times.get(l.catalog_item_id) ?? null) : null,
    })),
  );
}

/** Bay time held by the shop's bookings between two instants, leaving out one booking (the one being moved). */
async function heldBetween(db: Db, shopId: string, from: Date, to: Date, exceptBookingId?: string): Promise<Held[]> {
  const q = db("bay_reservations")
    .where({ shop_id: shopId })
    .whereRaw("during && tstzrange(?, ?, '[)')", [from.toISOString(), to.toISOString()])
    .select("bay_id", db.raw("lower(during) as starts_at"), db.raw("upper(during) as ends_at"));
  if (exceptBookingId) q.whereNot({ booking_id: exceptBookingId });
  const rows = (await q) as { bay_id: string; starts_at: Date; ends_at: Date }[];
  return rows.map((r) => ({ bayId: r.bay_id, start: new Date(r.starts_at).getTime(), end: new Date(r.ends_at).getTime() }));
}

const lite = (b: BayRow): BayLite => ({ id: b.id, name: b.name, kind: b.kind });

async function bookedBays(db: Db, bookingIds: string[]): Promise<Map<string, BookedBay[]>> {
  const out = new Map<string, BookedBay[]>();
  if (!bookingIds.length) return out;
  const rows = (await db("bay_reservations as r")
    .join("bays as b", "b.id", "r.bay_id")
    .whereIn("r.booking_id", bookingIds)
    .orderByRaw("lower(r.during)")
    .select(
      "r.booking_id",
      "r.bay_id",
      "b.name",
      "b.kind",
      db.raw("lower(r.during) as starts_at"),
      db.raw("upper(r.during) as ends_at"),
    )) as {
    booking_id: string;
    bay_id: string;
    name: string;
    kind: BayKind;
    starts_at: Date;
    ends_at: Date;
  }[];
  for (const r of rows) {
    const list = out.get(r.booking_id) ?? [];
    list.push({
      bayId: r.bay_id,
      bayName: r.name,
      bayKind: r.kind,
      startsAt: new Date(r.starts_at).toISOString(),
      endsAt: new Date(r.ends_at).toISOString(),
    });
    out.set(r.booking_id, list);
  }
  return out;
}

async function liveBookingRow(db: Db, quoteId: string, lock = false, job: BookingKind = "install"): Promise<BookingRow | undefined> {
  const q = db<BookingRow>("bookings").where({ quote_id: quoteId, kind: job, status: "booked" }).first();
  if (lock) q.forUpdate();
  return (await q) as BookingRow | undefined;
}

/** The quote's live booking as the API shows it, or null. */
export async function liveBooking(db: Db, quote: Pick<QuoteRow, "id" | "shop_id">): Promise<Booking | null> {
  const row = await liveBookingRow(db, quote.id);
  return row ? answer(db, row) : null;
}

/**
 * The job's stretches per kind of bay: the quote's install work from its lines, or the re-check
 * as one stretch of the shop's re-check length on a lift. Every slot list, booking and move of
 * either kind reads its length here.
 */
export async function workFor(
  db: Db,
  quote: Pick<QuoteRow, "id" | "shop_id">,
  job: BookingKind,
): Promise<Pick<Workload, "segments" | "minutes">> {
  return job === "recheck" ? recheckWork(await recheckSlotMinutes(db, quote.shop_id)) : quoteWork(db, quote);
}

/** Which days a slot list covers: `days` days from `from` (the shop's dates), seen at `now`. */
export interface SlotWindow {
  from?: string;
  days?: number;
  now?: Date;
}

/**
 * The free starts for the quote's work over `days` days from `from` (the shop's dates; never
 * before today), with the job's length and the live booking (whose own bay time counts as free,
 * so the counter can move it to a neighbouring time).
 */
export async function slotsForQuote(db: Db, quote: Pick<QuoteRow, "id" | "shop_id">, opts: SlotWindow = {}): Promise<SlotsAnswer> {
  return slotsForJob(db, quote, "install", await liveBookingRow(db, quote.id), opts);
}

/**
 * The free starts for one of the quote's jobs (its install, or the short re-check), with `live`
 * (whose own bay time counts as free) as the booking shown; `horizonDays` caps how far ahead a
 * start may lie.
 */
export async function slotsForJob(
  db: Db,
  quote: Pick<QuoteRow, "id" | "shop_id">,
  job: BookingKind,
  live: BookingRow | undefined,
  opts: SlotWindow,
  horizonDays: number = BOOKING_HORIZON_DAYS,
): Promise<SlotsAnswer> {
  const shopId = quote.shop_id;
  const now = opts.now ?? new Date();
  const [work, schedule, bays] = await readTogether(
    db,
    () => workFor(db, quote, job),
    () => readSchedule(db, shopId),
    () => activeBays(db, shopId),
  );
  const today = wallTime(now, schedule.timeZone).date;
  const from = opts.from && opts.from > today ? opts.from : today;
  const days = opts.days ?? 7;
  const held = await heldBetween(
    db,
    shopId,
    zonedInstant(from, 0, schedule.timeZone),
    zonedInstant(addDays(from, days), 0, schedule.timeZone),
    live?.id,
  );
  const ctx = { schedule, bays: bays.map(lite), held, segments: work.segments, now, horizonDays, job };
  const cannot = cannotBook(ctx);
  const booked = live ? bookingDto(live, (await bookedBays(db, [live.id])).get(live.id) ?? [], schedule.timeZone) : null;
  return {
    kind: job,
    timeZone: schedule.timeZone,
    today,
    minutes: work.minutes,
    length: lengthLabel(work.minutes),
    segments: work.segments,
    unavailable: cannot ? cannot.message : null,
    days: freeSlots({ ...ctx, fromDate: from, days }).map((d) => slotDayOption(d, schedule.timeZone)),
    booking: booked,
  };
}

/** The customer's free starts on their link: only once the deposit is paid (409 before, 404 for an unknown link). */
export async function slotsByToken(db: Knex, token: string, opts: SlotWindow = {}): Promise<SlotsAnswer> {
  const quote = await findByToken(db, token);
  if (!quote) throw new NotFoundError("That quote");
  await assertReadyToBook(db, quote, "customer");
  return slotsForQuote(db, quote, opts);
}

/** The counter's free starts for a quote in the caller's scope. */
export async function slotsForStaff(db: Knex, scope: QuoteScope, quoteId: string, opts: SlotWindow = {}): Promise<SlotsAnswer> {
  const quote = await getQuote(db, scope, quoteId);
  await assertReadyToBook(db, quote, "staff");
  return slotsForQuote(db, quote, opts);
}

/**
 * The counter's free starts for moving one booking of either kind (the calendar's Move…), its
 * own bay time counted as free; a booking of a quote outside the caller's scope is not found.
 */
export async function slotsForBooking(db: Knex, scope: QuoteScope, bookingId: string, opts: SlotWindow = {}): Promise<SlotsAnswer> {
  const found = (await db<BookingRow>("bookings").where({ id: bookingId, shop_id: scope.shopId }).first()) as BookingRow | undefined;
  if (!found) throw new NotFoundError("That booking");
  const quote = await getQuote(db, scope, found.quote_id);
  if (found.kind === "install") await assertReadyToBook(db, quote, "staff");
  return slotsForJob(db, quote, found.kind, found.status === "booked" ? found : undefined, opts);
}

/* ---------------------------------------------------------------- booking, moving, cancelling */

/** Whose request: the customer's link, or the counter within the caller's quote scope. */
export type BookingTarget = { by: "customer"; token: string } | { by: "staff"; scope: QuoteScope; quoteId: string };

async function lockQuote(trx: Knex.Transaction, target: BookingTarget): Promise<QuoteRow> {
  if (target.by === "staff") return getQuote(trx, target.scope, target.quoteId, true);
  const quote = await findByToken(trx, target.token, true);
  if (!quote) throw new NotFoundError("That quote");
  return quote;
}

/** Booking needs the deposit paid (or a quote accepted that asks none); nothing is written otherwise. */
function assertBookable(quote: QuoteRow, by: BookingTarget["by"]): void {
  if (canBook(quote)) return;
  if (quote.status === "accepted") {
    throw new ConflictError(
      by === "customer"
        ? "Pay the deposit before booking an install time."
        : "The deposit is not paid yet: book an install time once the customer has paid it.",
    );
  }
  throw new ConflictError(
    `A quote that is ${STATUS_LABEL[quote.status].toLowerCase()} cannot be booked: only a quote with its deposit paid can.`,
  );
}

/** Bookable, and its deposit not refunded in full: what the install's slot lists and its booking check first. */
async function assertReadyToBook(db: Db, quote: QuoteRow, by: BookingTarget["by"]): Promise<void> {
  assertBookable(quote, by);
  await assertDepositHeld(db, quote);
}

/** A start the slot check refused: taken is a conflict (409), every other reason an invalid time (422); both beside the time field. */
function refusal(p: SlotProblem): ConflictError | InvalidError {
  return p.code === "taken" ? ConflictError.onField("start", p.message) : new InvalidError(p.message, { start: [p.message] });
}

const isOverlap = (e: unknown) => (e as { code?: string; constraint?: string }).code === "23P01";
const takenMessage = (job: BookingKind) =>
  `${START_FIELD_LABELS[job]}: that time was taken a moment ago by another booking. Pick another time.`;

interface Placing {
  quote: QuoteRow;
  request: BookingRequest;
  now: Date;
  /** The booking being moved: its own bay time counts as free. */
  exceptBookingId?: string;
  /** What is booked: its work (workFor) and the field its messages name; an install when left out. */
  job?: BookingKind;
  /** How far ahead a start may lie; the install's horizon when left out. */
  horizonDays?: number;
}

/**
 * Checks the start against the shop's rules and the bay time held, then lets `write` record the
 * booking in a savepoint. When PostgreSQL's exclusion constraint refuses the bay time (another
 * transaction took it after we read), the check runs again on what is now committed — another
 * bay of the kind may still be free — up to three times; then the answer is a 409.
 */
export async function place<T>(trx: Knex.Transaction, p: Placing, write: (sp: Knex.Transaction, slot: Slot) => Promise<T>): Promise<T> {
  const shopId = p.quote.shop_id;
  const job = p.job ?? "install";
  // One after another: the transaction is one connection.
  const schedule = await readSchedule(trx, shopId);
  const bays = await activeBays(trx, shopId);
  const work = await workFor(trx, p.quote, job);
  if (p.request.bayId) {
    const pinned = bays.find((b) => b.id === p.request.bayId);
    if (!pinned) throw invalid({ bayId: ["Bay: that is not one of your shop's bays."] });
    if (!work.segments.some((s) => s.bayKind === pinned.kind)) {
      throw invalid({
        bayId: [
          `Bay: this work needs no ${BAY_KIND_LABEL[pinned.kind].toLowerCase()}; pick a bay of the kind it needs, or leave the bay to the calendar.`,
        ],
      });
    }
  }
  const start = new Date(p.request.start);
  const DAY = 86_400_000;
  for (let attempt = 1; ; attempt++) {
    const held = await heldBetween(trx, shopId, new Date(start.getTime() - DAY), new Date(start.getTime() + 2 * DAY), p.exceptBookingId);
    const r = checkStart(start, {
      schedule,
      bays: bays.map(lite),
      held,
      segments: work.segments,
      now: p.now,
      horizonDays: p.horizonDays ?? BOOKING_HORIZON_DAYS,
      pinnedBayId: p.request.bayId,
      job,
    });
    if (!r.ok) throw refusal(r.problem);
    try {
      return await trx.transaction((sp) => write(sp, r.slot));
    } catch (e) {
      if (!isOverlap(e)) throw e;
      if (attempt >= 3) throw ConflictError.onField("start", takenMessage(job));
    }
  }
}

export async function reserve(sp: Knex.Transaction, bookingId: string, shopId: string, slot: Slot): Promise<void> {
  await sp("bay_reservations").insert(
    slot.placements.map((pl) => ({
      booking_id: bookingId,
      shop_id: shopId,
      bay_id: pl.bayId,
      during: sp.raw("tstzrange(?, ?, '[)')", [pl.start.toISOString(), pl.end.toISOString()]),
    })),
  );
}

export async function answer(db: Db, row: BookingRow): Promise<Booking> {
  const [schedule, bays] = await readTogether(
    db,
    () => readSchedule(db, row.shop_id),
    () => bookedBays(db, [row.id]),
  );
  return bookingDto(row, bays.get(row.id) ?? [], schedule.timeZone);
}

/**
 * Books the install at the chosen start: the quote locked, its deposit paid, no live booking
 * yet, the start inside the shop's rules and its bays free — then the booking, its bay time and
 * the confirmation e-mail, all in one transaction.
 */
export async function bookInstall(
  db: Knex,
  target: BookingTarget,
  request: BookingRequest,
  actor: Actor,
  now = new Date(),
): Promise<Booking> {
  return db.transaction(async (trx) => {
    const quote = await lockQuote(trx, target);
    await assertReadyToBook(trx, quote, target.by);
    const live = await liveBookingRow(trx, quote.id);
    if (live) {
      const { timeZone } = await readSchedule(trx, quote.shop_id);
      throw new ConflictError(
        `This quote is already booked for ${formatInstant(live.starts_at, timeZone)}. ${target.by === "customer" ? "Call the shop to move it." : "Move that booking instead."}`,
      );
    }
    const row = await place(trx, { quote, request, now }, async (sp, slot) => {
      const [b] = (await sp("bookings")
        .insert({
          shop_id: quote.shop_id,
          quote_id: quote.id,
          status: "booked",
          starts_at: slot.start,
          ends_at: slot.end,
          booked_by_user_id: actor.userId,
          booked_by: actor.label,
        })
        .returning("*")) as BookingRow[];
      await reserve(sp, b!.id, quote.shop_id, slot);
      return b!;
    });
    await mailCustomer(trx, quote, row, "confirmed");
    await queueShopNotice(trx, quote, { kind: "booked", start: row.starts_at, end: row.ends_at, by: actor.label });
    return answer(trx, row);
  });
}

/** Which live booking the counter acts on: the quote's install (the quote page), or any booking by its id (the calendar). */
type LiveTarget = { quoteId: string } | { bookingId: string };

/**
 * Locks the quote (in the caller's scope: another's booking is not found) and then its live
 * booking, in that order, as every booking change does; a cancelled or missing booking is a 409.
 */
async function lockLive(
  trx: Knex.Transaction,
  scope: QuoteScope,
  target: LiveTarget,
  noneMessage: string,
): Promise<{ quote: QuoteRow; live: BookingRow }> {
  if ("quoteId" in target) {
    const quote = await lockQuote(trx, { by: "staff", scope, quoteId: target.quoteId });
    const live = await liveBookingRow(trx, quote.id, true);
    if (!live) throw new ConflictError(noneMessage);
    return { quote, live };
  }
  const found = (await trx<BookingRow>("bookings").where({ id: target.bookingId, shop_id: scope.shopId }).first("quote_id")) as
    Pick<BookingRow, "quote_id"> | undefined;
  if (!found) throw new NotFoundError("That booking");
  const quote = await getQuote(trx, scope, found.quote_id, true);
  const live = (await trx<BookingRow>("bookings").where({ id: target.bookingId }).forUpdate().first()) as BookingRow | undefined;
  if (!live || live.status !== "booked") throw new ConflictError("This booking is cancelled: there is nothing to move or cancel.");
  return { quote, live };
}

/** The request checked against the booking's kind, so its messages name the time field as that kind's screens do. */
function requestFor(job: BookingKind, raw: unknown): BookingRequest {
  const r = bookingRequestSchemaFor(job).safeParse(raw);
  if (r.success) return r.data;
  const fe: Record<string, string[]> = {};
  for (const issue of r.error.issues) (fe[issue.path.length ? issue.path.join(".") : "start"] ??= []).push(issue.message);
  throw InvalidError.fields(fe);
}

/**
 * Moves a live booking of either kind (counter only): the start checked again against the
 * shop's rules and the bay time held now (its own counted as free), the same calendar entry with
 * its SEQUENCE raised e-mailed to the customer, the reminder due again and the shop told.
 */
async function moveLive(
  db: Knex,
  scope: QuoteScope,
  target: LiveTarget,
  requestOf: (job: BookingKind) => BookingRequest,
  actor: Actor,
  now: Date,
): Promise<Booking> {
  return db.transaction(async (trx) => {
    const { quote, live } = await lockLive(trx, scope, target, "This quote has no booking to move: book an install time first.");
    // An install moves while its quote may be booked; a re-check follows work already done.
    if (live.kind === "install") assertBookable(quote, "staff");
    const request = requestOf(live.kind);
    const row = await place(trx, { quote, request, now, exceptBookingId: live.id, job: live.kind }, async (sp, slot) => {
      await sp("bay_reservations").where({ booking_id: live.id }).delete();
      const [b] = (await sp("bookings")
        .where({ id: live.id })
        .update({
          starts_at: slot.start,
          ends_at: slot.end,
          sequence: live.sequence + 1,
          reminder_queued_at: null,
          updated_at: sp.fn.now(),
        })
        .returning("*")) as BookingRow[];
      await reserve(sp, live.id, quote.shop_id, slot);
      return b!;
    });
    await mailCustomer(trx, quote, row, "moved", new Date(live.starts_at));
    await queueShopNotice(trx, quote, {
      kind: "moved",
      job: live.kind,
      start: row.starts_at,
      end: row.ends_at,
      by: actor.label,
      previousStart: live.starts_at,
    });
    return answer(trx, row);
  });
}

/** Cancels a live booking of either kind (counter only): its bay time freed, the customer's calendar entry withdrawn, the shop told. */
async function cancelLive(db: Knex, scope: QuoteScope, target: LiveTarget, actor: Actor): Promise<Booking> {
  return db.transaction(async (trx) => {
    const { quote, live } = await lockLive(trx, scope, target, "This quote has no booking to cancel.");
    // The bays it held are listed in the answer before they are freed.
    const held = (await bookedBays(trx, [live.id])).get(live.id) ?? [];
    await trx("bay_reservations").where({ booking_id: live.id }).delete();
    const [row] = (await trx("bookings")
      .where({ id: live.id })
      .update({ status: "cancelled", cancelled_at: trx.fn.now(), sequence: live.sequence + 1, updated_at: trx.fn.now() })
      .returning("*")) as BookingRow[];
    await mailCustomer(trx, quote, row!, "cancelled");
    await queueShopNotice(trx, quote, { kind: "cancelled", job: live.kind, start: row!.starts_at, end: row!.ends_at, by: actor.label });
    const { timeZone } = await readSchedule(trx, quote.shop_id);
    return bookingDto(row!, held, timeZone);
  });
}

/** Moves the quote's live install booking (the quote page): the same calendar entry with its SEQUENCE raised, and the reminder due again. */
export async function moveInstall(
  db: Knex,
  scope: QuoteScope,
  quoteId: string,
  request: BookingRequest,
  actor: Actor,
  now = new Date(),
): Promise<Booking> {
  return moveLive(db, scope, { quoteId }, () => request, actor, now);
}

/** Cancels the quote's live install booking (the quote page): its bay time is freed and the customer's calendar entry withdrawn. */
export async function cancelInstall(db: Knex, scope: QuoteScope, quoteId: string, actor: Actor): Promise<Booking> {
  return cancelLive(db, scope, { quoteId }, actor);
}

/** Moves a booking of either kind by its id (the calendar's drag and Move…); `raw` is checked against the booking's kind. */
export async function moveBooking(
  db: Knex,
  scope: QuoteScope,
  bookingId: string,
  raw: unknown,
  actor: Actor,
  now = new Date(),
): Promise<Booking> {
  return moveLive(db, scope, { bookingId }, (job) => requestFor(job, raw), actor, now);
}

/** Cancels a booking of either kind by its id (the calendar). */
export async function cancelBooking(db: Knex, scope: QuoteScope, bookingId: string, actor: Actor): Promise<Booking> {
  return cancelLive(db, scope, { bookingId }, actor);
}

/**
 * The day-before reminders: every live booking whose day (on its shop's clock) is tomorrow,
 * once the shop's clock reads REMINDER_FROM_HOUR or later, not reminded yet. Each is marked in
 * the transaction that queues its mail, and rows are taken with SKIP LOCKED, so two workers or a
 * retried job never remind twice. Returns how many were queued.
 */
export async function queueDueReminders(db: Knex, now = new Date()): Promise<number> {
  return db.transaction(async (trx) => {
    const zone = "coalesce(s.time_zone, ?)";
    const due = (await trx("bookings as b")
      .leftJoin("shop_schedules as s", "s.shop_id", "b.shop_id")
      .where("b.status", "booked")
      .whereNull("b.reminder_queued_at")
      .andWhere("b.starts_at", ">", now)
      .whereRaw(`(b.starts_at at time zone ${zone})::date = (?::timestamptz at time zone ${zone})::date + 1`, [
        DEFAULT_TIME_ZONE,
        now.toISOString(),
        DEFAULT_TIME_ZONE,
      ])
      .whereRaw(`extract(hour from ?::timestamptz at time zone ${zone}) >= ?`, [now.toISOString(), DEFAULT_TIME_ZONE, REMINDER_FROM_HOUR])
      .forUpdate("b")
      .skipLocked()
      .select("b.*")) as BookingRow[];
    for (const b of due) {
      const quote = (await trx<QuoteRow>("quotes").where({ id: b.quote_id }).first())!;
      await mailCustomer(trx, quote, b, "reminder");
      await trx("bookings").where({ id: b.id }).update({ reminder_queued_at: now });
    }
    return due.length;
  });
}

/* ---------------------------------------------------------------- the staff calendar */

/**
 * A day or a week of the shop's live bookings per bay, on the shop's clock. `quotesOf` is the
 * staff member whose quotes the caller may open (quoteScopeOf's createdBy; none for an owner):
 * the others' bookings still show, linked to their work order rather than to a quote that would
 * answer "not found".
 */
export async function calendar(
  db: Knex,
  shopId: string,
  opts: { from?: string; days: number; now?: Date; quotesOf?: string },
): Promise<CalendarAnswer> {
  const schedule = await readSchedule(db, shopId);
  const from = opts.from ?? wallTime(opts.now ?? new Date(), schedule.timeZone).date;
  const start = zonedInstant(from, 0, schedule.timeZone);
  const end = zonedInstant(addDays(from, opts.days), 0, schedule.timeZone);
  const rows = (await db("bookings as b")
    .join("quotes as q", "q.id", "b.quote_id")
    .join("customers as c", "c.id", "q.customer_id")
    .leftJoin("work_orders as w", "w.quote_id", "q.id")
    .where({ "b.shop_id": shopId, "b.status": "booked" })
    .andWhere("b.starts_at", "<", end)
    .andWhere("b.ends_at", ">", start)
    .orderBy("b.starts_at")
    .select(
      "b.*",
      "q.number as quote_number",
      "q.vehicle_description",
      "q.created_by as quote_created_by",
      "c.name as customer_name",
      "w.id as work_order_id",
    )) as (BookingRow & {
    quote_number: number;
    vehicle_description: string;
    quote_created_by: string | null;
    customer_name: string;
    work_order_id: string | null;
  })[];
  const held = await bookedBays(
    db,
    rows.map((r) => r.id),
  );
  const bays = await activeBays(db, shopId);
  // A bay archived after it was booked still shows its bookings.
  const extra = [...new Set([...held.values()].flat().map((h) => h.bayId))].filter((id) => !bays.some((b) => b.id === id));
  const archived = extra.length ? await db<BayRow>("bays").where({ shop_id: shopId }).whereIn("id", extra) : [];
  const days = Array.from({ length: opts.days }, (_, i) => addDays(from, i));
  const bookings: CalendarBooking[] = rows.map((r) => ({
    ...bookingDto(r, held.get(r.id) ?? [], schedule.timeZone),
    quoteNumber: r.quote_number,
    customerName: r.customer_name,
    vehicleDescription: r.vehicle_description,
    workOrderId: r.work_order_id,
    quoteOpen: opts.quotesOf === undefined || r.quote_created_by === opts.quotesOf,
  }));
  return {
    timeZone: schedule.timeZone,
    from,
    days,
    hours: Object.fromEntries(days.map((d) => [d, schedule.closedDays.has(d) ? null : (schedule.hours[weekdayOf(d)] ?? null)])),
    bays: [...bays, ...archived].map(bayDto),
    bookings,
  };
}

/** These queries on the app's database handle, for pages and route handlers. */
export const bookingQueries = bindAppDb({
  bookInstall,
  calendar,
  cancelBooking,
  cancelInstall,
  getSetup,
  liveBooking,
  moveBooking,
  moveInstall,
  queueDueReminders,
  saveSetup,
  slotsByToken,
  slotsForBooking,
  slotsForStaff,
});
