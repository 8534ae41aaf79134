import "server-only";
import { STATUS_LABEL } from "@/lib/shop/quotes/status";
import type { Knex } from "knex";
import type { z } from "zod";
import type { CatalogItemRow, QuoteEventRow, QuoteLineRow, QuoteRow, QuoteStatus, ServiceType } from "@/lib/platform/db/types";
import { ConflictError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import { type QuoteListItem, type QuoteListRow, type QuotePage, quoteListItemDto } from "@/lib/shop/quotes/api";
import { QUOTE_EXPORT_MAX, QUOTE_PAGE_SIZE, type QuoteListQuery, type QuoteSort } from "@/lib/shop/quotes/listQuery";
import { containsPattern, searchKey } from "@/lib/platform/search/normalize";
import { insertVehicle, phoneDigits, updateVehicle } from "@/lib/shop/customers/queries";
import { type HubCheck, type QuoteDocument, buildQuoteDocument, hubChecksOf } from "@/lib/shop/quotes/document";
import { type FitmentSummary, summarize } from "@/lib/shop/quotes/fitment";
import { checkWheelOnHub, hubRefusal } from "@/lib/shop/quotes/hubFit";
import { formatQuantity } from "@/lib/shop/quotes/quantity";
import type { updateQuoteSchema } from "@/lib/shop/quotes/schema";
import { TotalsError, computeTotals } from "@/lib/shop/quotes/totals";
import { type CounterPlacard, quotePressure } from "@/lib/shop/customers/counterPlacard";
import { type CounterBodyPoints, quoteAngles } from "@/lib/shop/customers/counterBodyPoints";
import { type CounterVehicle, type CounterVehicleForEngine, counterVehicleForEngine } from "@/lib/shop/customers/schema";
import type { Setup } from "@/lib/setup/model";
import { bindAppDb } from "@/lib/platform/db/bind";
import { type LineDraft, catalogLine, fromCatalog } from "@/lib/shop/quotes/catalogLine";
import { queueShopNotice } from "@/lib/shop/notices/noticeQueries";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { stockFollowsQuote } from "@/lib/shop/catalog/stockQueries";
import { releaseInstallTime } from "@/lib/shop/bookings/releaseQueries";
import { assertNoOpenWorkOrder } from "@/lib/shop/workOrders/openOrderQueries";
import { DEPOSIT_REFUNDED_NOT_INSTALLED } from "@/lib/shop/payments/depositBack";
import { depositRefundedInFull } from "@/lib/shop/payments/depositQueries";
import { isLinkToken } from "@/lib/platform/tokenFormat";
import { hashToken, randomToken } from "@/lib/platform/tokens";

/** Whose quotes a caller sees: owners the whole shop's, staff the ones they wrote. */
export interface QuoteScope {
  shopId: string;
  createdBy?: string;
}
export function quoteScopeOf(caller: { shopId: string | null; role: string; userId: string }): QuoteScope {
  if (!caller.shopId) throw new Error("quote scope without a shop");
  return { shopId: caller.shopId, createdBy: caller.role === "shop_owner" ? undefined : caller.userId };
}

export interface Actor {
  userId: string | null;
  label: string;
}

/** Allowed moves; anything else is a ConflictError. */
const TRANSITIONS: Record<QuoteStatus, QuoteStatus[]> = {
  draft: ["sent"],
  sent: ["sent", "draft", "accepted", "declined", "expired"],
  accepted: ["deposit_paid", "declined", "expired"],
  deposit_paid: ["installed"],
  installed: [],
  declined: [],
  expired: [],
};

export { STATUS_LABEL };

/** Moves a quote (locked by the caller's transaction) to `to`, recording who and when. */
export async function transition(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "id" | "status">,
  to: QuoteStatus,
  actor: Actor,
  note = "",
  extra: Partial<QuoteRow> = {},
) {
  if (!TRANSITIONS[quote.status].includes(to)) {
    throw new ConflictError(`A quote that is ${STATUS_LABEL[quote.status].toLowerCase()} cannot become ${STATUS_LABEL[to].toLowerCase()}.`);
  }
  await moveQuote(trx, quote, to, actor, note, extra);
}

/**
 * A deposit refunded in full ends its quote: deposit paid → declined, which releases the stock it
 * held and takes it off the paid quotes. Not in TRANSITIONS, because neither staff nor the
 * customer may decline a quote whose deposit the shop still holds; only the confirmation of the
 * last refund calls this (lib/shop/payments/ledgerQueries.ts). Returns whether the quote moved.
 */
export async function declineOnDepositRefunded(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "id" | "status">,
  actor: Actor,
  note: string,
): Promise<boolean> {
  if (quote.status !== "deposit_paid") return false;
  await moveQuote(trx, quote, "declined", actor, note);
  return true;
}

/** Writes a move checked by the caller: the status, the stock that follows it, and the history line. */
async function moveQuote(
  trx: Knex.Transaction,
  quote: Pick<QuoteRow, "id" | "status">,
  to: QuoteStatus,
  actor: Actor,
  note: string,
  extra: Partial<QuoteRow> = {},
) {
  await trx("quotes")
    .where({ id: quote.id })
    .update({ ...extra, status: to, updated_at: trx.fn.now() });
  await stockFollowsQuote(trx, quote.id, to);
  await trx("quote_events").insert({
    quote_id: quote.id,
    from_status: quote.status,
    to_status: to,
    actor_user_id: actor.userId,
    actor: actor.label,
    note,
  });
}

/** Statuses that lapse when the validity date passes. */
const LAPSING: readonly QuoteStatus[] = ["sent", "accepted"];

/**
 * The status a quote has now: a sent or accepted quote past its `valid_until` is expired even
 * before the scheduled job (lib/platform/jobs/workers.ts, every 15 minutes) has written that down, so
 * no page or action ever treats it as still open. Computed, never written on a read.
 */
export function effectiveStatus(quote: Pick<QuoteRow, "status" | "valid_until">, now: Date = new Date()): QuoteStatus {
  if (LAPSING.includes(quote.status) && quote.valid_until && new Date(quote.valid_until).getTime() < now.getTime()) return "expired";
  return quote.status;
}

function withEffectiveStatus<T extends QuoteRow | undefined>(row: T): T {
  if (!row) return row;
  const status = effectiveStatus(row);
  return status === row.status ? row : { ...row, status };
}

/** The same rule in SQL, for lists and filters. */
const EFFECTIVE_STATUS_SQL =
  "case when quotes.status in ('sent', 'accepted') and quotes.valid_until < now() then 'expired' else quotes.status::text end";

/**
 * Writes the lapse down: sent or accepted quotes past their validity become expired, recorded
 * as done by the system. Run by the scheduled job, not by page reads.
 */
export async function expireDue(db: Knex, shopId?: string): Promise<number> {
  return db.transaction(async (trx) => {
    const q = trx("quotes").whereIn("status", LAPSING).andWhere("valid_until", "<", trx.fn.now()).forUpdate().select("id", "status");
    if (shopId) q.andWhere({ shop_id: shopId });
    const due = (await q) as Pick<QuoteRow, "id" | "status">[];
    for (const d of due) await transition(trx, d, "expired", { userId: null, label: "system" }, "validity ended");
    return due.length;
  });
}

function scoped(db: Knex | Knex.Transaction, scope: QuoteScope) {
  const q = db<QuoteRow>("quotes").where("quotes.shop_id", scope.shopId);
  if (scope.createdBy) q.andWhere("quotes.created_by", scope.createdBy);
  return q;
}

/** A quote in the caller's scope (locked when asked, inside a transaction); NotFoundError outside it. */
export async function getQuote(db: Knex | Knex.Transaction, scope: QuoteScope, id: string, lock = false): Promise<QuoteRow> {
  const q = scoped(db, scope).andWhere("quotes.id", id).first();
  if (lock) q.forUpdate();
  const row = (await q) as QuoteRow | undefined;
  if (!row) throw new NotFoundError("That quote");
  return withEffectiveStatus(row);
}

/** Whether the caller may open the quote (owners every quote of the shop, staff the ones they wrote), for links to it. */
export async function canOpenQuote(db: Knex, scope: QuoteScope, id: string): Promise<boolean> {
  return Boolean(await scoped(db, scope).andWhere("quotes.id", id).first("quotes.id"));
}

/** A quote with its lines, history and customer, as rows (lib/shop/quotes/api.ts quoteDetailDto makes it the API shape). */
export interface QuoteRecord {
  /** The quote without its link's token hash. */
  quote: Omit<QuoteRow, "public_token_hash">;
  lines: QuoteLineRow[];
  events: QuoteEventRow[];
  customer: { id: string; name: string; phone: string; email: string };
  createdByName: string | null;
  /** Each wheel line checked against the quoted vehicle's bolt pattern and hub bore. */
  hubChecks: HubCheck[];
  /** The shop's time zone (IANA): the editor shows the validity day and the history on the shop's clock. */
  timeZone: string;
}

/** A quote's lines in order; pg reads numeric(8,2) as text, so the quantity is made a number here. */
export async function readLines(db: Knex | Knex.Transaction, quoteId: string): Promise<QuoteLineRow[]> {
  const rows = await db<QuoteLineRow>("quote_lines").where({ quote_id: quoteId }).orderBy("position");
  return rows.map((l) => ({ ...l, quantity: Number(l.quantity) }));
}

/** What a quote document needs besides the quote: its lines, its customer and who prepared it. */
export async function quoteParties(db: Knex, quote: QuoteRow): Promise<Pick<QuoteRecord, "lines" | "customer" | "createdByName">> {
  const [lines, customer, author] = await Promise.all([
    readLines(db, quote.id),
    db("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("id", "name", "phone", "email"),
    quote.created_by ? db("users").where({ id: quote.created_by }).first("name") : null,
  ]);
  return { lines, customer, createdByName: author?.name ?? null };
}

export async function quoteDetail(db: Knex, quote: QuoteRow): Promise<QuoteRecord> {
  const [parties, events, timeZone] = await Promise.all([
    quoteParties(db, quote),
    db<QuoteEventRow>("quote_events").where({ quote_id: quote.id }).orderBy("id"),
    shopTimeZone(db, quote.shop_id),
  ]);
  const { public_token_hash: _hidden, ...shown } = quote;
  return { quote: shown, events, ...parties, hubChecks: hubChecksOf(quote, parties.lines), timeZone };
}

export async function getQuoteDetail(db: Knex, scope: QuoteScope, id: string): Promise<QuoteRecord> {
  return quoteDetail(db, await getQuote(db, scope, id));
}

/** The caller's quotes with the customer's and the author's names, as the list and the export read them. */
function listRows(db: Knex, scope: QuoteScope) {
  return scoped(db, scope)
    .join("customers as c", "c.id", "quotes.customer_id")
    .leftJoin("users as u", "u.id", "quotes.created_by")
    .select(
      "quotes.id",
      "quotes.number",
      db.raw(`${EFFECTIVE_STATUS_SQL} as status`),
      "quotes.total_cents",
      "quotes.deposit_cents",
      "quotes.vehicle_description",
      "quotes.created_at",
      "quotes.valid_until",
      "c.name as customer_name",
      "c.phone as customer_phone",
      "u.name as created_by_name",
    );
}

export async function listQuotes(
  db: Knex,
  scope: QuoteScope,
  opts: { status?: QuoteStatus; limit?: number } = {},
): Promise<QuoteListItem[]> {
  const q = listRows(db, scope)
    .orderBy("quotes.created_at", "desc")
    .limit(opts.limit ?? 200);
  if (opts.status) q.andWhereRaw(`${EFFECTIVE_STATUS_SQL} = ?`, [opts.status]);
  return ((await q) as unknown as QuoteListRow[]).map(quoteListItemDto);
}

/** Each order of the list in SQL; the quote number last, so rows with equal keys keep one order across pages. */
const SORT_SQL: Record<QuoteSort, string> = {
  newest: "quotes.created_at desc",
  oldest: "quotes.created_at asc",
  number: "quotes.number desc",
  customer: "lower(c.name) asc",
  total: "quotes.total_cents desc",
  validUntil: "quotes.valid_until asc nulls last",
};

/**
 * The list narrowed to a search and a status. The search finds a quote by its number ("1042",
 * "Q-1042"), the customer's name or the part of their e-mail before the @ (accents folded, as the
 * customer search does), a phone number by its digits (four or more), a whole e-mail address, or
 * words of the vehicle's description.
 */
function matching(db: Knex, scope: QuoteScope, query: Pick<QuoteListQuery, "q" | "status" | "sort">) {
  const q = listRows(db, scope).orderByRaw(`${SORT_SQL[query.sort]}, quotes.number desc`);
  if (query.status) q.andWhereRaw(`${EFFECTIVE_STATUS_SQL} = ?`, [query.status]);
  const text = query.q?.trim() ?? "";
  if (!text) return q;
  const number = /^q?-?\s*(\d{1,9})$/i.exec(text)?.[1];
  const digits = phoneDigits(text);
  const key = searchKey(text);
  // Nothing left to look for (only accents or punctuation): nothing matches, rather than everything.
  if (!number && digits.length < 4 && !key && !text.includes("@")) return q.andWhereRaw("false");
  return q.andWhere((w) => {
    if (number) w.orWhere("quotes.number", Number(number));
    if (digits.length >= 4) w.orWhereLike("c.phone_digits", containsPattern(digits));
    if (key) {
      w.orWhereLike("c.search_key", containsPattern(key));
      w.orWhereRaw("hubface_search_key(quotes.vehicle_description) like ?", [containsPattern(key)]);
    }
    if (text.includes("@")) w.orWhereRaw("lower(c.email) like ?", [containsPattern(text.toLowerCase())]);
  });
}

/** One page of the list for the list's search, status and order, with the number of matches. */
export async function pageQuotes(db: Knex, scope: QuoteScope, query: QuoteListQuery): Promise<QuotePage> {
  const page = query.page ?? 1;
  const pageSize = query.pageSize ?? QUOTE_PAGE_SIZE;
  const base = matching(db, scope, query);
  const [counted] = await base.clone().clearSelect().clearOrder().count({ n: "*" });
  const rows = (await base.limit(pageSize).offset((page - 1) * pageSize)) as unknown as QuoteListRow[];
  return { quotes: rows.map(quoteListItemDto), total: Number(counted?.n ?? 0), page, pageSize };
}

/** Every match of the list's search, status and order, for the CSV export (at most QUOTE_EXPORT_MAX). */
export async function exportQuotes(db: Knex, scope: QuoteScope, query: QuoteListQuery): Promise<QuoteListItem[]> {
  const rows = (await matching(db, scope, query).limit(QUOTE_EXPORT_MAX)) as unknown as QuoteListRow[];
  return rows.map(quoteListItemDto);
}

/** The services the pick calls for, from the shop's own service items (names and prices the shop set). */
export function suggestedServiceLines(
  services: CatalogItemRow[],
  wheel: CatalogItemRow,
  qty: number,
  fit: FitmentSummary,
  fabricationRateCents = 0,
): LineDraft[] {
  const first = (t: ServiceType) => services.find((s) => s.service_type === t);
  const out: LineDraft[] = [];
  const add = (item: CatalogItemRow | undefined, quantity: number) => {
    if (item) out.push(catalogLine(item, quantity, false));
  };
  add(first("mount_balance"), qty);
  if (wheel.beadlock) add(first("beadlock_assembly"), qty);
  add(first("valve_stem") ?? first("tpms"), qty);
  if (fit.alignmentSuggested) add(first("alignment"), 1);
  if (fit.findings?.some((f) => f.kind === "outer-reach")) {
    const trim = first("fender_trim");
    if (trim) add(trim, 1);
    // No trimming item in the catalog: one hour at the shop's fabrication rate.
    else if (fabricationRateCents > 0) {
      out.push({
        kind: "custom",
        unit: "hour",
        catalog_item_id: null,
        sku: "",
        description: "Fender trimming labour",
        quantity: 1,
        unit_price_cents: fabricationRateCents,
        discount_cents: 0,
        taxable: false,
        wheel_bolt_pattern: null,
        wheel_center_bore_mm: null,
      });
    }
  }
  add(first("disposal"), qty);
  return out;
}

function totalsOf(lines: LineDraft[], discountCents: number, taxRateBp: number, depositPct: number) {
  try {
    return computeTotals({
      lines: lines.map((l) => ({
        quantity: l.quantity,
        unitPriceCents: l.unit_price_cents,
        discountCents: l.discount_cents,
        taxable: l.taxable,
      })),
      discountCents,
      taxRateBp,
      depositPct,
    });
  } catch (e) {
    // The error's field is the request's own path (lines.3.discountCents), so the screen can name it.
    if (e instanceof TotalsError) throw new InvalidError(e.message, { [e.field]: [e.message] });
    throw e;
  }
}

async function writeLines(trx: Knex.Transaction, quoteId: string, lines: LineDraft[], totals: ReturnType<typeof computeTotals>) {
  await trx("quote_lines").where({ quote_id: quoteId }).delete();
  if (lines.length) {
    await trx("quote_lines").insert(
      lines.map((l, i) => ({ ...l, quote_id: quoteId, position: i + 1, line_total_cents: totals.lines[i]!.netCents })),
    );
  }
  await trx("quotes").where({ id: quoteId }).update({
    subtotal_cents: totals.subtotalCents,
    discount_cents: totals.discountCents,
    taxable_cents: totals.taxableCents,
    tax_cents: totals.taxCents,
    total_cents: totals.totalCents,
    deposit_cents: totals.depositCents,
    updated_at: trx.fn.now(),
  });
}

export interface CreateQuote {
  customerId: string;
  vehicleId?: string;
  vehicle?: CounterVehicle;
  saveVehicle?: boolean;
  tireItemId: string;
  wheelItemId: string;
  quantity: 4 | 5;
}

/** A new draft: the vehicle snapshot, the fitment summary from the engine, lines and server totals. */
export async function createQuote(db: Knex, shopId: string, actor: Actor & { userId: string }, input: CreateQuote): Promise<string> {
  return db.transaction(async (trx) => {
    const shop = await trx("shops").where({ id: shopId }).forUpdate().first("tax_rate_bp", "deposit_pct", "fabrication_rate_cents");
    const customer = await trx("customers").where({ id: input.customerId, shop_id: shopId }).first("id");
    if (!customer) throw InvalidError.fields({ customerId: ["That customer was not found."] });
    let vehicleId: string | null = input.vehicleId ?? null;
    let v: CounterVehicleForEngine;
    const saved = input.vehicleId
      ? await trx("customer_vehicles").where({ id: input.vehicleId, shop_id: shopId, customer_id: input.customerId }).first()
      : undefined;
    if (input.vehicleId && !saved) throw InvalidError.fields({ vehicleId: ["That vehicle was not found."] });
    if (input.vehicle) {
      // Typed, or a saved vehicle the counter changed (its placard re-typed): with the box ticked,
      // the saved one is written over rather than a second copy added.
      v = counterVehicleForEngine(input.vehicle);
      if (input.saveVehicle && vehicleId) await updateVehicle(trx, shopId, input.customerId, vehicleId, v);
      else if (input.saveVehicle) vehicleId = await insertVehicle(trx, shopId, input.customerId, v);
    } else {
      v = counterVehicleForEngine({
        description: saved.description,
        boltPattern: saved.bolt_pattern,
        hubBoreMm: saved.hub_bore_mm,
        axleRatio: saved.axle_ratio,
        currentSetup: saved.current_setup as Setup,
        placard: saved.load_placard as CounterPlacard | null,
        bodyPoints: saved.body_points as CounterBodyPoints | null,
      });
    }
    const items = await trx<CatalogItemRow>("catalog_items")
      .where({ shop_id: shopId })
      .whereNull("archived_at")
      .whereIn("id", [input.tireItemId, input.wheelItemId]);
    const tire = items.find((i) => i.id === input.tireItemId && i.kind === "tire");
    const wheel = items.find((i) => i.id === input.wheelItemId && i.kind === "wheel");
    const fe: Record<string, string[]> = {};
    if (!tire) fe.tireItemId = ["That tire is not in your catalog."];
    if (!wheel) fe.wheelItemId = ["That wheel is not in your catalog."];
    if (!tire || !wheel) throw InvalidError.fields(fe);
    if (tire.tire_rim_in !== wheel.wheel_diameter_in)
      throw new InvalidError(`${tire.tire_size} does not mount on a ${wheel.wheel_diameter_in} in wheel.`, {
        wheelItemId: ["Pick a wheel of the tire's rim diameter."],
      });
    const refusal = hubRefusal(
      checkWheelOnHub(
        { boltPattern: v.boltPattern, hubBoreMm: v.hubBoreMm },
        { boltPattern: wheel.bolt_pattern, centerBoreMm: wheel.center_bore_mm },
      ),
    );
    if (refusal) throw new InvalidError(refusal, { wheelItemId: [`${refusal} Pick another wheel.`] });

    const fit = summarize({ boltPattern: v.boltPattern, tireSize: v.tireSize, wheel: v.wheel, axleRatio: v.axleRatio }, tire.tire_size!, {
      diameterIn: wheel.wheel_diameter_in!,
      widthIn: wheel.wheel_width_in!,
      offsetMm: wheel.wheel_offset_mm!,
      beadlock: wheel.beadlock,
    });
    if (v.placard) fit.pressure = quotePressure(v.placard, v.currentSetup, fit.setups.planned);
    if (v.bodyPoints) fit.angles = quoteAngles(v.bodyPoints, v.currentSetup, fit.setups.planned);
    const services = await trx<CatalogItemRow>("catalog_items")
      .where({ shop_id: shopId, kind: "service" })
      .whereNull("archived_at")
      .orderBy("sku");
    const lines: LineDraft[] = [
      catalogLine(tire, input.quantity, true),
      catalogLine(wheel, input.quantity, true),
      ...suggestedServiceLines(services, wheel, input.quantity, fit, shop.fabrication_rate_cents),
    ];
    const totals = totalsOf(lines, 0, shop.tax_rate_bp, shop.deposit_pct);
    const [{ next }] = (await trx("quotes").where({ shop_id: shopId }).max<{ next: number | null }[]>({ next: "number" })) as [
      { next: number | null },
    ];
    const [row] = await trx("quotes")
      .insert({
        shop_id: shopId,
        number: (next ?? 1000) + 1,
        customer_id: input.customerId,
        vehicle_id: vehicleId,
        created_by: actor.userId,
        status: "draft",
        vehicle_description: v.description,
        bolt_pattern: v.boltPattern,
        current_setup: JSON.stringify(v.currentSetup),
        axle_ratio: v.axleRatio,
        hub_bore_mm: v.hubBoreMm,
        tire_item_id: tire.id,
        wheel_item_id: wheel.id,
        wheel_qty: input.quantity,
        fitment: JSON.stringify(fit),
        tax_rate_bp: shop.tax_rate_bp,
        deposit_pct: shop.deposit_pct,
      })
      .returning(["id"]);
    const id = (row as { id: string }).id;
    await writeLines(trx, id, lines, totals);
    await trx("quote_events").insert({
      quote_id: id,
      from_status: null,
      to_status: "draft",
      actor_user_id: actor.userId,
      actor: actor.label,
      note: "created",
    });
    return id;
  });
}

/** A draft's new lines, discount and notes, as the route's schema reads them (quantities already numbers). */
export type UpdateQuote = z.output<typeof updateQuoteSchema>;

/**
 * Replaces a draft's lines and discount; totals are recomputed here, never taken from the client.
 * Any item of the shop's catalog may be a line: its kind, unit, and a wheel's drilling and bore
 * come from the catalog. A wheel that does not go on the quoted vehicle's hub is refused, and
 * only hourly lines may be part hours. Problems are keyed by the line's path (lines.2.quantity).
 */
/**
 * Refuses (409) a write based on a version of the quote older than the stored one: `seen` is the
 * `updatedAt` the person's screen was showing. Without `seen` (API callers that do not send it) the
 * write goes ahead, last one wins.
 */
function assertUnchangedSince(quote: Pick<QuoteRow, "updated_at">, seen: string | undefined, message: string): void {
  if (seen && new Date(quote.updated_at).getTime() !== new Date(seen).getTime()) throw new ConflictError(message);
}

export async function updateDraft(db: Knex, scope: QuoteScope, id: string, input: UpdateQuote): Promise<void> {
  await db.transaction(async (trx) => {
    const quote = await getQuote(trx, scope, id, true);
    if (quote.status !== "draft") throw new ConflictError("Only a draft can be edited. Take the quote back to draft first.");
    assertUnchangedSince(
      quote,
      input.seenUpdatedAt,
      "Not saved: this quote was saved from another window or by a colleague after you opened it, and saving would undo their changes. Your changes are still on this screen: note them, reload the quote, and enter them again.",
    );
    const ids = [...new Set(input.lines.map((l) => l.catalogItemId).filter((x): x is string => !!x))];
    const items = new Map<string, CatalogItemRow>();
    if (ids.length)
      for (const it of await trx<CatalogItemRow>("catalog_items").where({ shop_id: scope.shopId }).whereIn("id", ids)) items.set(it.id, it);
    const fe: Record<string, string[]> = {};
    const lines: LineDraft[] = input.lines.map((l, i) => {
      const item = l.catalogItemId ? items.get(l.catalogItemId) : undefined;
      if (l.catalogItemId && !item)
        fe[`lines.${i}.catalogItemId`] = ["That item is not in your catalog (any more): remove the line or add the item again."];
      const own = item ? fromCatalog(item) : { kind: l.kind, unit: l.unit, wheel_bolt_pattern: null, wheel_center_bore_mm: null };
      if (own.unit === "each" && !Number.isInteger(l.quantity)) {
        fe[`lines.${i}.quantity`] = [
          `Count whole items: ${formatQuantity(l.quantity, "each")} is not a whole number (only hourly labour takes part hours).`,
        ];
      }
      if (item?.kind === "wheel") {
        const refusal = hubRefusal(
          checkWheelOnHub(
            { boltPattern: quote.bolt_pattern, hubBoreMm: quote.hub_bore_mm },
            { boltPattern: item.bolt_pattern, centerBoreMm: item.center_bore_mm },
          ),
        );
        if (refusal) fe[`lines.${i}.catalogItemId`] = [refusal];
      }
      return {
        ...own,
        catalog_item_id: item?.id ?? null,
        sku: item ? item.sku : l.sku,
        description: l.description,
        quantity: l.quantity,
        unit_price_cents: l.unitPriceCents,
        discount_cents: l.discountCents,
        taxable: l.taxable,
      };
    });
    if (Object.keys(fe).length) throw new InvalidError("Some lines need attention.", fe);
    const totals = totalsOf(lines, input.discountCents, quote.tax_rate_bp, quote.deposit_pct);
    await writeLines(trx, id, lines, totals);
    await trx("quotes").where({ id }).update({ notes: input.notes });
  });
}

/**
 * Marks the quote sent with a fresh public token (256 bits; only its hash is stored) valid for
 * the shop's validity period, and stores the document as sent (shop details, lines, totals) so
 * the PDF and the customer's page keep showing it. `seenUpdatedAt`: the version the sender was
 * looking at; if the quote changed since, nothing is sent (409). Returns the token for the link.
 */
export async function markSent(
  db: Knex,
  scope: QuoteScope,
  id: string,
  actor: Actor,
  seenUpdatedAt?: string,
): Promise<{ token: string; document: QuoteDocument }> {
  const token = randomToken();
  const document = await db.transaction(async (trx) => {
    const quote = await getQuote(trx, scope, id, true);
    assertUnchangedSince(
      quote,
      seenUpdatedAt,
      "This quote changed after you opened it (saved from another window or by a colleague). Reload it, check the lines, and send again.",
    );
    const customer = await trx("customers").where({ id: quote.customer_id, shop_id: scope.shopId }).first("name", "phone", "email");
    if (!customer?.email) throw new InvalidError("The customer has no e-mail address. Add one before sending.");
    const shop = await trx("shops").where({ id: scope.shopId }).first("name", "address", "phone", "quote_validity_days");
    await transition(trx, quote, "sent", actor, quote.status === "sent" ? "sent again" : "", {
      public_token_hash: hashToken(token),
      valid_until: trx.raw("now() + make_interval(days => ?)", [shop.quote_validity_days]) as unknown as Date,
    });
    // One after another: the transaction is one connection.
    const now = await getQuote(trx, scope, id);
    const lines = await readLines(trx, id);
    const author = quote.created_by ? await trx("users").where({ id: quote.created_by }).first("name") : null;
    const doc = buildQuoteDocument({ shop, quote: now, customer, lines, preparedBy: author?.name ?? null, sentAt: new Date() });
    await trx("quote_documents").insert({ quote_id: id, sent_by: actor.userId, document: JSON.stringify(doc) });
    return doc;
  });
  return { token, document };
}

/** The document a customer has for a quote: the latest one sent, or null when none was. */
export async function latestSentDocument(db: Knex | Knex.Transaction, quoteId: string): Promise<QuoteDocument | null> {
  const row = await db("quote_documents").where({ quote_id: quoteId }).orderBy("id", "desc").first("document");
  return row ? (row.document as QuoteDocument) : null;
}

/**
 * Staff moves: back to draft (the link stops working), declined, installed. Installed from here
 * is for a job without a work order (one with a sheet is installed by its "done"); the install's
 * bay time still ahead is given back then.
 */
export async function staffTransition(
  db: Knex,
  scope: QuoteScope,
  id: string,
  to: "draft" | "declined" | "installed",
  actor: Actor,
  note = "",
  now = new Date(),
) {
  await db.transaction(async (trx) => {
    const quote = await getQuote(trx, scope, id, true);
    // A deposit asked back in full (confirmed or on its way) means the job is off: nothing to install.
    if (to === "installed" && quote.status === "deposit_paid" && (await depositRefundedInFull(trx, quote.id))) {
      throw new ConflictError(DEPOSIT_REFUNDED_NOT_INSTALLED);
    }
    if (to === "installed") await assertNoOpenWorkOrder(trx, quote.shop_id, quote.id);
    await transition(trx, quote, to, actor, note, to === "draft" ? { public_token_hash: null } : {});
    if (to === "installed") await releaseInstallTime(trx, quote, now);
  });
}

/**
 * The customer's answer on their link, in one transaction with the quote locked. NotFoundError
 * when the link names no quote (nothing is written then).
 */
export async function answerByToken(db: Knex, token: string, to: "accepted" | "declined", actor: Actor): Promise<void> {
  await db.transaction(async (trx) => {
    const quote = await findByToken(trx, token, true);
    if (!quote) throw new NotFoundError("That quote");
    await transition(trx, quote, to, actor);
    if (to === "accepted") await queueShopNotice(trx, quote, { kind: "accepted" });
  });
}

/** A quote by its public token (the customer's link), or undefined. */
export async function findByToken(db: Knex | Knex.Transaction, token: string, lock = false): Promise<QuoteRow | undefined> {
  if (!isLinkToken(token)) return undefined;
  const q = db<QuoteRow>("quotes")
    .where({ public_token_hash: hashToken(token) })
    .first();
  if (lock) q.forUpdate();
  return withEffectiveStatus((await q) as QuoteRow | undefined);
}

/** These queries on the app's database handle, for pages and route handlers. */
export const quoteQueries = bindAppDb({
  answerByToken,
  canOpenQuote,
  createQuote,
  expireDue,
  exportQuotes,
  findByToken,
  getQuoteDetail,
  latestSentDocument,
  listQuotes,
  pageQuotes,
  staffTransition,
  updateDraft,
});
