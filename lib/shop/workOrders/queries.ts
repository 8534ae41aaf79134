import "server-only";
import type { Knex } from "knex";
import { parseBoltPattern } from "@/lib/fitment";
import type { CatalogItemRow, QuoteRow, WorkOrderRow, WorkOrderStatus, WorkOrderStepRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import { iso, isoOrNull } from "@/lib/platform/http/isoDates";
import { canBook } from "@/lib/shop/bookings/bookable";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { formatClock, formatDayOf, formatInstant } from "@/lib/shop/bookings/zoned";
import { type Actor, readLines, transition } from "@/lib/shop/quotes/queries";
import { appOrigin } from "@/lib/platform/mail";
import { queueMailIn } from "@/lib/platform/mail/transactional";
import { hashToken, randomToken } from "@/lib/platform/tokens";
import { type RecheckDue, type WorkOrder, requiredSteps, unsignedSteps, workOrderDto } from "./api";
import { queueCompletionMail } from "./completionQueries";
import { findWorkOrderOfQuote } from "./openOrderQueries";
import { releaseInstallTime } from "@/lib/shop/bookings/releaseQueries";
import { stepPhotoRows } from "./photoQueries";
import type { FitmentSummary } from "@/lib/shop/quotes/fitment";
import { recheckMail } from "./recheckMail";
import { trailAnglesOf } from "./trailAngles";
import { recheckLinkExpiry, recheckUrl } from "./recheckLink";
import { isBelowRoadMinimum, pressureRefusal, tirePressureLimits } from "./pressureLimit";
import { type SignedStep, pressureFieldLabel } from "./schema";
import { POSITION_LABEL, STEP_LABEL, WORK_ORDER_STATUS_LABEL } from "./vocabulary";

/** The planned tire of a quote's stored fitment summary (lib/shop/quotes/fitment.ts), when it has one. */
function plannedTireOf(fitment: unknown): string | null {
  const tire = (fitment as { planned?: { tire?: unknown } } | null)?.planned?.tire;
  return typeof tire === "string" ? tire : null;
}

/** The pressures to set of a quote's stored fitment summary, when it was drawn up with the door placard. */
const pressureToSetOf = (fitment: unknown) => (fitment as Pick<FitmentSummary, "pressure"> | null)?.pressure ?? null;

type Db = Knex | Knex.Transaction;

const NOT_FOUND = "That work order";

/** A work order of the caller's shop (any of its staff work in the bay); NotFoundError for another shop's. */
async function lockedOrder(trx: Knex.Transaction, shopId: string, id: string): Promise<WorkOrderRow> {
  const row = (await trx<WorkOrderRow>("work_orders").where({ id, shop_id: shopId }).forUpdate().first()) as WorkOrderRow | undefined;
  if (!row) throw new NotFoundError(NOT_FOUND);
  return row;
}

/** What the sheet covers, read off the quote: its tire and wheel, a spare, beadlock wheels, alignment and trimming. */
async function coverOf(db: Db, quote: QuoteRow) {
  const lines = await readLines(db, quote.id);
  const ids = lines.map((l) => l.catalog_item_id).filter((x): x is string => !!x);
  const items = ids.length
    ? ((await db("catalog_items")
        .where({ shop_id: quote.shop_id })
        .whereIn("id", ids)
        .select("id", "kind", "beadlock", "service_type")) as Pick<CatalogItemRow, "id" | "kind" | "beadlock" | "service_type">[])
    : [];
  const byId = new Map(items.map((i) => [i.id, i]));
  const services = new Set(items.map((i) => i.service_type).filter(Boolean));
  const tire = lines.find((l) => l.kind === "tire");
  const wheel = lines.find((l) => l.kind === "wheel");
  let lugCount: number;
  try {
    lugCount = parseBoltPattern(quote.bolt_pattern).count;
  } catch {
    throw new ConflictError(`The quote's bolt pattern “${quote.bolt_pattern}” cannot be read: correct the vehicle on the quote first.`);
  }
  return {
    tire_description: tire?.description ?? "",
    wheel_description: wheel?.description ?? "",
    spare: quote.wheel_qty === 5,
    beadlock: services.has("beadlock_assembly") || !!(wheel?.catalog_item_id && byId.get(wheel.catalog_item_id)?.beadlock),
    alignment: services.has("alignment"),
    trimming: services.has("fender_trim"),
    lug_count: lugCount,
  };
}

/**
 * The work order of a booked quote of the shop: made on first ask (the quote locked, its deposit
 * paid and its install booked), the same one after. Returns its id.
 */
export async function openWorkOrder(db: Knex, shopId: string, quoteId: string): Promise<string> {
  return db.transaction(async (trx) => {
    const quote = (await trx<QuoteRow>("quotes").where({ id: quoteId, shop_id: shopId }).forUpdate().first()) as QuoteRow | undefined;
    if (!quote) throw new NotFoundError("That quote");
    const existing = await trx("work_orders").where({ quote_id: quote.id }).first("id");
    if (existing) return existing.id as string;
    const booked = await trx("bookings").where({ quote_id: quote.id, status: "booked" }).first("id");
    if (!canBook(quote) || !booked) throw new ConflictError("Book the install first: a work order is made from a booked quote.");
    const [row] = (await trx("work_orders")
      .insert({ shop_id: shopId, quote_id: quote.id, status: "booked", ...(await coverOf(trx, quote)) })
      .returning("id")) as { id: string }[];
    return row!.id;
  });
}

/** The work order as the sheet shows it; NotFoundError outside the caller's shop. */
export async function getWorkOrder(db: Db, shopId: string, id: string): Promise<WorkOrder> {
  const row = (await db<WorkOrderRow>("work_orders").where({ id, shop_id: shopId }).first()) as WorkOrderRow | undefined;
  if (!row) throw new NotFoundError(NOT_FOUND);
  const quote = (await db("quotes as q")
    .join("customers as c", "c.id", "q.customer_id")
    .where({ "q.id": row.quote_id })
    .first("q.number", "q.vehicle_description", "q.bolt_pattern", "q.fitment", "c.name as customer_name")) as {
    number: number;
    vehicle_description: string;
    bolt_pattern: string;
    fitment: unknown;
    customer_name: string;
  };
  const steps = (await db<WorkOrderStepRow>("work_order_steps").where({ work_order_id: id }).orderBy("signed_at")) as WorkOrderStepRow[];
  const booking = await db("bookings").where({ quote_id: row.quote_id, kind: "install", status: "booked" }).first("starts_at", "ends_at");
  const timeZone = await shopTimeZone(db, shopId);
  const bookedFor = booking ? `${formatInstant(booking.starts_at, timeZone)} – ${formatClock(booking.ends_at, timeZone)}` : null;
  return workOrderDto(
    row,
    {
      number: quote.number,
      customerName: quote.customer_name,
      vehicleDescription: quote.vehicle_description,
      boltPattern: quote.bolt_pattern,
      plannedTire: plannedTireOf(quote.fitment),
      pressure: pressureToSetOf(quote.fitment),
      trailAngles: trailAnglesOf(quote.fitment),
    },
    steps,
    bookedFor,
    await stepPhotoRows(db, id),
    timeZone,
  );
}

/**
 * Signs one step off as the caller: the work order must be in the bay and have that step. A step
 * signed again is replaced (who and when are the latest). Nothing is written when refused.
 */
export async function signStep(db: Knex, shopId: string, id: string, signed: SignedStep, actor: Actor): Promise<WorkOrder> {
  return db.transaction(async (trx) => {
    const row = await lockedOrder(trx, shopId, id);
    const what = `${POSITION_LABEL[signed.position]}: ${STEP_LABEL[signed.step].toLowerCase()}`;
    if (row.status !== "in_bay") {
      throw new ConflictError(
        row.status === "done"
          ? `This work order is done: ${what} can no longer be signed.`
          : `Mark the work order “${WORK_ORDER_STATUS_LABEL.in_bay}” before signing steps off.`,
      );
    }
    if (!requiredSteps(row).some((s) => s.position === signed.position && s.step === signed.step)) {
      throw InvalidError.fields({ position: [`${what} is not on this work order.`] });
    }
    let data: object = signed.data;
    if (signed.step === "pressure") {
      // Held to the quoted tire's limits by the rule the sheet's form applies (pressureRefusal): never
      // above the maximum, below the road minimum only on the technician's word for the maker's table.
      const q = (await trx("quotes").where({ id: row.quote_id }).first("fitment")) as { fitment: unknown } | undefined;
      const limits = tirePressureLimits(plannedTireOf(q?.fitment));
      const d = signed.data;
      const refused = pressureRefusal(d.pressureKpa, d.unit, limits, pressureFieldLabel(d.unit), d.makerTable);
      if (refused) throw InvalidError.fields({ pressure: [refused] });
      data = { ...d, makerTable: d.makerTable && isBelowRoadMinimum(d.pressureKpa, d.unit, limits) };
    }
    await trx("work_order_steps")
      .insert({
        work_order_id: id,
        shop_id: shopId,
        position: signed.position,
        step: signed.step,
        data: JSON.stringify(data),
        signed_by_user_id: actor.userId,
        signed_by: actor.label,
        signed_at: trx.fn.now(),
      })
      .onConflict(["work_order_id", "position", "step"])
      .merge(["data", "signed_by_user_id", "signed_by", "signed_at"]);
    await trx("work_orders").where({ id }).update({ updated_at: trx.fn.now() });
    return getWorkOrder(trx, shopId, id);
  });
}

/**
 * booked → in the bay → done. Done needs every step signed; it marks the quote installed (unless
 * it already is), gives back the install's bay time still ahead, sets the re-check date from the
 * shop's number of days and queues the completion mail with the invoice.
 */
export async function moveWorkOrder(
  db: Knex,
  shopId: string,
  id: string,
  to: WorkOrderStatus,
  actor: Actor,
  now = new Date(),
): Promise<WorkOrder> {
  return db.transaction(async (trx) => {
    const row = await lockedOrder(trx, shopId, id);
    const from = row.status;
    if (from === "booked" && to === "in_bay") {
      await trx("work_orders")
        .where({ id })
        .update({ status: "in_bay", started_at: now, started_by: actor.label, updated_at: trx.fn.now() });
    } else if (from === "in_bay" && to === "done") {
      const current = await getWorkOrder(trx, shopId, id);
      const missing = unsignedSteps(current);
      if (missing.length) {
        const list = missing.map((s) => `${s.position === "vehicle" ? "vehicle" : s.position} ${STEP_LABEL[s.step].toLowerCase()}`);
        throw new ConflictError(`Sign every step off before marking the work order done. Still open: ${list.join("; ")}.`);
      }
      const quote = (await trx<QuoteRow>("quotes").where({ id: row.quote_id, shop_id: shopId }).forUpdate().first())!;
      // A quote already marked installed (from its page, before that was refused while a work order is open)
      // stays so: the work order still closes, or it would sit in the bay for good.
      if (quote.status !== "installed") await transition(trx, quote, "installed", actor, `work order done`);
      await releaseInstallTime(trx, quote, now);
      const shop = await trx("shops").where({ id: shopId }).first("recheck_after_days");
      const due = new Date(now.getTime() + (shop?.recheck_after_days ?? 7) * 86_400_000);
      await trx("work_orders")
        .where({ id })
        .update({ status: "done", done_at: now, done_by: actor.label, recheck_due_at: due, updated_at: trx.fn.now() });
      await queueCompletionMail(trx, shopId, id);
    } else if (from === to) {
      throw new ConflictError(`The work order is already “${WORK_ORDER_STATUS_LABEL[to]}”.`);
    } else {
      throw new ConflictError(
        `A work order that is “${WORK_ORDER_STATUS_LABEL[from]}” cannot become “${WORK_ORDER_STATUS_LABEL[to]}”: it goes booked → in the bay → done.`,
      );
    }
    return getWorkOrder(trx, shopId, id);
  });
}

/* ---------------------------------------------------------------- the re-check after the first miles */

/** The owner's number of days between the work done and the re-check. */
export async function recheckDays(db: Db, shopId: string): Promise<number> {
  const row = await db("shops").where({ id: shopId }).first("recheck_after_days");
  if (!row) throw new NotFoundError("That shop");
  return row.recheck_after_days as number;
}

/** Sets the shop's number of days; work orders already done keep the date they were given. */
export async function setRecheckDays(db: Knex, shopId: string, days: number): Promise<number> {
  const n = await db("shops").where({ id: shopId }).update({ recheck_after_days: days, updated_at: db.fn.now() });
  if (!n) throw new NotFoundError("That shop");
  return days;
}

/** How long a work order stays on the counter's list after its re-check date. */
export const RECHECK_LIST_DAYS = 30;

/** The counter's "due for re-check" list: jobs whose re-check date has come, up to RECHECK_LIST_DAYS ago, oldest first. */
export async function dueForRecheck(db: Db, shopId: string, now = new Date()): Promise<RecheckDue[]> {
  const rows = (await db("work_orders as w")
    .join("quotes as q", "q.id", "w.quote_id")
    .join("customers as c", "c.id", "q.customer_id")
    .where({ "w.shop_id": shopId, "w.status": "done" })
    .andWhere("w.recheck_due_at", "<=", now)
    .andWhere("w.recheck_due_at", ">", new Date(now.getTime() - RECHECK_LIST_DAYS * 86_400_000))
    .orderBy("w.recheck_due_at")
    .select(
      "w.id",
      "w.quote_id",
      "w.done_at",
      "w.recheck_due_at",
      "w.recheck_queued_at",
      "q.number",
      "q.vehicle_description",
      "c.name",
      "c.phone",
    )) as {
    id: string;
    quote_id: string;
    done_at: Date;
    recheck_due_at: Date;
    recheck_queued_at: Date | null;
    number: number;
    vehicle_description: string;
    name: string;
    phone: string;
  }[];
  const timeZone = await shopTimeZone(db, shopId);
  return rows.map((r) => ({
    workOrderId: r.id,
    quoteId: r.quote_id,
    quoteNumber: r.number,
    customerName: r.name,
    customerPhone: r.phone,
    vehicleDescription: r.vehicle_description,
    doneAt: iso(r.done_at),
    recheckDueAt: iso(r.recheck_due_at),
    dueOn: formatDayOf(r.recheck_due_at, timeZone),
    remindedAt: isoOrNull(r.recheck_queued_at),
  }));
}

/**
 * The re-check mails due: every done work order whose date has come and whose mail was not
 * queued. Each is marked in the transaction that queues its mail, rows taken with SKIP LOCKED,
 * so two workers or a retried job never mail twice; a customer without an address is marked
 * too (the counter's list shows who to call). Returns how many mails were queued.
 */
export async function queueDueRechecks(db: Knex, now = new Date()): Promise<number> {
  return db.transaction(async (trx) => {
    const due = (await trx("work_orders as w")
      .join("quotes as q", "q.id", "w.quote_id")
      .join("customers as c", "c.id", "q.customer_id")
      .join("shops as s", "s.id", "w.shop_id")
      .where("w.status", "done")
      .whereNull("w.recheck_queued_at")
      .andWhere("w.recheck_due_at", "<=", now)
      .forUpdate("w")
      .skipLocked()
      .select(
        "w.id",
        "w.beadlock",
        "q.number",
        "q.vehicle_description",
        "c.name as customer_name",
        "c.email",
        "s.name as shop_name",
        "s.address",
        "s.phone",
        "s.recheck_slot_minutes",
      )) as {
      id: string;
      beadlock: boolean;
      number: number;
      vehicle_description: string;
      customer_name: string;
      email: string | null;
      shop_name: string;
      address: string;
      phone: string;
      recheck_slot_minutes: number;
    }[];
    let queued = 0;
    for (const d of due) {
      if (d.email) {
        // The booking link's token goes in the mail only; the work order keeps its hash.
        const token = randomToken();
        await trx("work_orders")
          .where({ id: d.id })
          .update({ recheck_link_hash: hashToken(token), recheck_link_expires_at: recheckLinkExpiry(now) });
        await queueMailIn(
          trx,
          recheckMail({
            customer: { name: d.customer_name, email: d.email },
            shop: { name: d.shop_name, address: d.address, phone: d.phone },
            quoteNumber: d.number,
            vehicle: d.vehicle_description,
            beadlock: d.beadlock,
            bookUrl: recheckUrl(appOrigin(), token),
            slotMinutes: d.recheck_slot_minutes,
          }),
        );
        queued++;
      }
      await trx("work_orders").where({ id: d.id }).update({ recheck_queued_at: now });
    }
    return queued;
  });
}

/** These queries on the app's database handle, for pages and route handlers. */
export const workOrderQueries = bindAppDb({
  dueForRecheck,
  findWorkOrderOfQuote,
  getWorkOrder,
  moveWorkOrder,
  openWorkOrder,
  queueDueRechecks,
  recheckDays,
  setRecheckDays,
  signStep,
});
