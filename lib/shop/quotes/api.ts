/**
 * What the shop's quote API returns (camelCase, ISO dates) and the row → API mappers; shared by
 * server and client. The shop id and the customer link's token hash stay on the server.
 */
import type { QuoteEventRow, QuoteLineRow, QuoteRow, QuoteStatus } from "@/lib/platform/db/types";
import { iso, isoOrNull } from "@/lib/platform/http/isoDates";
import type { Setup } from "@/lib/setup/model";
import { type HubCheck, type QuoteDocumentLine, documentLineDto } from "./document";
import type { FitmentSummary } from "./fitment";

export interface Quote {
  id: string;
  number: number;
  customerId: string;
  vehicleId: string | null;
  createdBy: string | null;
  status: QuoteStatus;
  vehicleDescription: string;
  boltPattern: string;
  /** The vehicle's setup as quoted, as the workspace and the garage describe one. */
  currentSetup: Setup;
  axleRatio: number | null;
  hubBoreMm: number | null;
  tireItemId: string | null;
  wheelItemId: string | null;
  wheelQty: 4 | 5;
  fitment: FitmentSummary;
  discountCents: number;
  taxRateBp: number;
  depositPct: number;
  subtotalCents: number;
  taxableCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  notes: string;
  validUntil: string | null;
  createdAt: string;
  updatedAt: string;
}

/** A line as the editor and the counter read it: the document's line plus what ties it to the catalog. */
export interface QuoteLine extends QuoteDocumentLine {
  id: string;
  position: number;
  catalogItemId: string | null;
  wheelBoltPattern: string | null;
  wheelCenterBoreMm: number | null;
}

export interface QuoteEvent {
  id: string;
  fromStatus: QuoteStatus | null;
  toStatus: QuoteStatus;
  actorUserId: string | null;
  actor: string;
  note: string;
  at: string;
}

/** The quote detail the editor receives from its page and from every mutation. */
export interface QuoteDetail {
  quote: Quote;
  lines: QuoteLine[];
  events: QuoteEvent[];
  customer: { id: string; name: string; phone: string; email: string };
  createdByName: string | null;
  /** Each wheel line checked against the quoted vehicle's bolt pattern and hub bore. */
  hubChecks: HubCheck[];
  /** The shop's time zone (IANA), so the validity day and the history read on the shop's clock, not the device's. */
  timeZone: string;
}

/** One row of the quotes list. */
export interface QuoteListItem {
  id: string;
  number: number;
  status: QuoteStatus;
  totalCents: number;
  depositCents: number;
  vehicleDescription: string;
  customerName: string;
  customerPhone: string;
  createdByName: string | null;
  validUntil: string | null;
  createdAt: string;
}

/** One page of the quotes list and how many quotes match in all. */
export interface QuotePage {
  quotes: QuoteListItem[];
  total: number;
  page: number;
  pageSize: number;
}

/**
 * @example
 * quoteDto(row).totalCents === row.total_cents; // and no shop_id, no public_token_hash
 */
export function quoteDto(r: Omit<QuoteRow, "public_token_hash">): Quote {
  return {
    id: r.id,
    number: r.number,
    customerId: r.customer_id,
    vehicleId: r.vehicle_id,
    createdBy: r.created_by,
    status: r.status,
    vehicleDescription: r.vehicle_description,
    boltPattern: r.bolt_pattern,
    currentSetup: r.current_setup as Setup,
    axleRatio: r.axle_ratio,
    hubBoreMm: r.hub_bore_mm,
    tireItemId: r.tire_item_id,
    wheelItemId: r.wheel_item_id,
    wheelQty: r.wheel_qty,
    fitment: r.fitment as FitmentSummary,
    discountCents: r.discount_cents,
    taxRateBp: r.tax_rate_bp,
    depositPct: r.deposit_pct,
    subtotalCents: r.subtotal_cents,
    taxableCents: r.taxable_cents,
    taxCents: r.tax_cents,
    totalCents: r.total_cents,
    depositCents: r.deposit_cents,
    notes: r.notes,
    validUntil: isoOrNull(r.valid_until),
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
  };
}

export function quoteLineDto(l: QuoteLineRow): QuoteLine {
  return {
    id: l.id,
    position: l.position,
    ...documentLineDto(l),
    catalogItemId: l.catalog_item_id,
    wheelBoltPattern: l.wheel_bolt_pattern,
    wheelCenterBoreMm: l.wheel_center_bore_mm,
  };
}

export function quoteEventDto(e: QuoteEventRow): QuoteEvent {
  return {
    id: String(e.id),
    fromStatus: e.from_status,
    toStatus: e.to_status,
    actorUserId: e.actor_user_id,
    actor: e.actor,
    note: e.note,
    at: iso(e.at),
  };
}

/** A quote's detail as read on the server (rows) → what the browser receives. */
export function quoteDetailDto(d: {
  quote: Omit<QuoteRow, "public_token_hash">;
  lines: QuoteLineRow[];
  events: QuoteEventRow[];
  customer: QuoteDetail["customer"];
  createdByName: string | null;
  hubChecks: HubCheck[];
  timeZone: string;
}): QuoteDetail {
  return {
    quote: quoteDto(d.quote),
    lines: d.lines.map(quoteLineDto),
    events: d.events.map(quoteEventDto),
    customer: { id: d.customer.id, name: d.customer.name, phone: d.customer.phone, email: d.customer.email },
    createdByName: d.createdByName,
    hubChecks: d.hubChecks,
    timeZone: d.timeZone,
  };
}

/** A row of listQuotes (quotes joined with the customer's and the author's names). */
export interface QuoteListRow {
  id: string;
  number: number;
  status: QuoteStatus;
  total_cents: number;
  deposit_cents: number;
  vehicle_description: string;
  created_at: Date;
  valid_until: Date | null;
  customer_name: string;
  customer_phone: string;
  created_by_name: string | null;
}

export function quoteListItemDto(r: QuoteListRow): QuoteListItem {
  return {
    id: r.id,
    number: r.number,
    status: r.status,
    totalCents: r.total_cents,
    depositCents: r.deposit_cents,
    vehicleDescription: r.vehicle_description,
    customerName: r.customer_name,
    customerPhone: r.customer_phone,
    createdByName: r.created_by_name,
    validUntil: isoOrNull(r.valid_until),
    createdAt: iso(r.created_at),
  };
}
