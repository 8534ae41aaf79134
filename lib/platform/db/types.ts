/** Row types, one place for every table. Column names are snake_case as stored. */
import type { BackspacingReference, ClearanceDirection, SuspensionState } from "@/lib/fitment";

export const ROLES = ["member", "shop_staff", "shop_owner", "admin"] as const;
export type Role = (typeof ROLES)[number];

export interface ShopRow {
  id: string;
  name: string;
  created_at: Date;
}

export interface UserRow {
  id: string;
  email: string;
  name: string;
  password_hash: string;
  role: Role;
  shop_id: string | null;
  /** Raised to end every session of the user at once (see lib/accounts/sessionQueries.ts). */
  session_version: number;
  created_at: Date;
  updated_at: Date;
}

export type PublicUser = Omit<UserRow, "password_hash" | "session_version">;

export interface PasswordResetRow {
  id: string;
  user_id: string;
  token_hash: string;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

/** A sign-up waiting for its e-mail confirmation (lib/accounts/signUpQueries.ts). */
export interface PendingSignUpRow {
  id: string;
  email: string;
  name: string;
  password_hash: string;
  token_hash: string;
  created_at: Date;
  expires_at: Date;
}

/* ---- shop counter (shops settings, staff invitations, catalog, customers, quotes, payments) ---- */

/** The key of every table a shop owns: the row's id and its shop, which each query scopes by. */
interface ShopOwnedRow {
  id: string;
  shop_id: string;
}

export interface ShopSettingsRow extends ShopRow {
  address: string;
  phone: string;
  tax_rate_bp: number;
  labour_rate_cents: number;
  fabrication_rate_cents: number;
  quote_validity_days: number;
  deposit_pct: number;
  currency: "USD";
  /** Days after a job is done that the customer is asked back for the lug and ring re-check. */
  recheck_after_days: number;
  /** How long the re-check slot keeps the truck on a lift, 10–120 minutes (default 30). */
  recheck_slot_minutes: number;
  /** Where the shop's notices go; "" for its owners' addresses. */
  notice_email: string;
  updated_at: Date;
}

export interface StaffInviteRow extends ShopOwnedRow {
  email: string;
  token_hash: string;
  invited_by: string | null;
  expires_at: Date;
  used_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

export const CATALOG_KINDS = ["tire", "wheel", "service"] as const;
export type CatalogKind = (typeof CATALOG_KINDS)[number];
export const SERVICE_TYPES = [
  "mount_balance",
  "beadlock_assembly",
  "valve_stem",
  "tpms",
  "alignment",
  "fender_trim",
  "disposal",
  "other",
] as const;
export type ServiceType = (typeof SERVICE_TYPES)[number];
export const SERVICE_UNITS = ["per_wheel", "per_vehicle", "per_hour"] as const;
export type ServiceUnit = (typeof SERVICE_UNITS)[number];

export interface CatalogItemRow extends ShopOwnedRow {
  kind: CatalogKind;
  sku: string;
  description: string;
  price_cents: number;
  qty_on_hand: number | null;
  tire_size: string | null;
  tire_rim_in: number | null;
  tire_diameter_mm: number | null;
  wheel_diameter_in: number | null;
  wheel_width_in: number | null;
  wheel_offset_mm: number | null;
  wheel_backspacing_in: number | null;
  wheel_backspacing_reference: BackspacingReference | null;
  bolt_pattern: string | null;
  center_bore_mm: number | null;
  beadlock: boolean;
  service_type: ServiceType | null;
  service_unit: ServiceUnit | null;
  /** Units held by open stock reservations (db/migrations/20261208090000_stock_reservations.ts). */
  qty_reserved: number;
  /** Available count at or under which the counter shows "low stock"; null = never. */
  low_stock_at: number | null;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export type StockReservationStatus = "reserved" | "consumed" | "released";

/** Units of one quote line held for the quote from its acceptance until the work is done or the quote lapses. */
export interface StockReservationRow extends ShopOwnedRow {
  quote_id: string;
  quote_line_id: string;
  catalog_item_id: string;
  quantity: number;
  status: StockReservationStatus;
  created_at: Date;
  closed_at: Date | null;
}

export interface CatalogImportRow extends ShopOwnedRow {
  created_by: string | null;
  filename: string;
  rows: unknown;
  row_count: number;
  error_count: number;
  status: "staged" | "committed";
  created_at: Date;
  committed_at: Date | null;
}

export const QUOTE_STATUSES = ["draft", "sent", "accepted", "deposit_paid", "installed", "declined", "expired"] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export interface CustomerRow extends ShopOwnedRow {
  name: string;
  phone: string;
  phone_digits: string;
  email: string;
  created_at: Date;
  updated_at: Date;
}

/** A customer's vehicle as the shop counter keeps it (table customer_vehicles). */
export interface CustomerVehicleRow extends ShopOwnedRow {
  customer_id: string;
  description: string;
  bolt_pattern: string;
  /** The setup it runs now, a lib/setup Setup (JSONB). */
  current_setup: unknown;
  axle_ratio: number | null;
  /** The hub's pilot diameter, when the counter measured or looked it up. */
  hub_bore_mm: number | null;
  /** The door placard and axle loads, a lib/shop/customers/counterPlacard CounterPlacard (JSONB), or null. */
  load_placard: unknown;
  /** The body points, a lib/shop/customers/counterBodyPoints CounterBodyPoints (JSONB), or null. */
  body_points: unknown;
  created_at: Date;
}

export interface QuoteRow extends ShopOwnedRow {
  number: number;
  customer_id: string;
  vehicle_id: string | null;
  created_by: string | null;
  status: QuoteStatus;
  vehicle_description: string;
  bolt_pattern: string;
  /** The vehicle's setup as quoted, a lib/setup Setup (JSONB). */
  current_setup: unknown;
  axle_ratio: number | null;
  hub_bore_mm: number | null;
  tire_item_id: string | null;
  wheel_item_id: string | null;
  wheel_qty: 4 | 5;
  /** A FitmentSummary (lib/shop/quotes/fitment.ts). */
  fitment: unknown;
  discount_cents: number;
  tax_rate_bp: number;
  deposit_pct: number;
  subtotal_cents: number;
  taxable_cents: number;
  tax_cents: number;
  total_cents: number;
  deposit_cents: number;
  notes: string;
  public_token_hash: string | null;
  valid_until: Date | null;
  created_at: Date;
  updated_at: Date;
}

export type QuoteLineKind = "tire" | "wheel" | "service" | "custom";
/** "hour" lines may be fractional (hundredths of an hour); "each" lines are whole. */
export type QuoteLineUnit = "each" | "hour";

export interface QuoteLineRow {
  id: string;
  quote_id: string;
  position: number;
  kind: QuoteLineKind;
  catalog_item_id: string | null;
  sku: string;
  description: string;
  /** numeric(8,2) in PostgreSQL (read as text by pg): converted to a number where lines are read. */
  quantity: number;
  unit: QuoteLineUnit;
  unit_price_cents: number;
  discount_cents: number;
  taxable: boolean;
  line_total_cents: number;
  /** Wheel lines: the wheel's bolt pattern and centre bore as quoted. */
  wheel_bolt_pattern: string | null;
  wheel_center_bore_mm: number | null;
}

/** A quote's document as sent (lib/shop/quotes/document.ts), one row per sending. Kept with the other tables' rows though read as JSON only. @public */
export interface QuoteDocumentRow {
  id: string;
  quote_id: string;
  sent_at: Date;
  sent_by: string | null;
  document: unknown;
}

export interface QuoteEventRow {
  id: string;
  quote_id: string;
  from_status: QuoteStatus | null;
  to_status: QuoteStatus;
  actor_user_id: string | null;
  actor: string;
  note: string;
  at: Date;
}

export const PAYMENT_KINDS = ["deposit", "balance"] as const;
export type PaymentKind = (typeof PAYMENT_KINDS)[number];
/** How a payment was taken: the provider's hosted page, or at the counter. */
export const PAYMENT_METHODS = ["provider", "cash", "card"] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];

export interface PaymentRow extends ShopOwnedRow {
  quote_id: string;
  /** The provider's checkout session; null for a payment taken at the counter. */
  provider_session_id: string | null;
  /** The provider's payment, named by its refunds; set when its webhook arrives. */
  provider_payment_intent: string | null;
  kind: PaymentKind;
  method: PaymentMethod;
  amount_cents: number;
  currency: string;
  /** "expired": a provider session replaced before it was paid. */
  status: "open" | "paid" | "expired";
  recorded_by_user_id: string | null;
  recorded_by: string;
  created_at: Date;
  paid_at: Date | null;
}

export interface PaymentRefundRow extends ShopOwnedRow {
  quote_id: string;
  payment_id: string;
  provider_refund_id: string | null;
  amount_cents: number;
  status: "pending" | "succeeded" | "failed";
  requested_by_user_id: string | null;
  requested_by: string;
  created_at: Date;
  succeeded_at: Date | null;
  failed_at: Date | null;
}

/* ---- install bookings (lib/shop/bookings) ---- */

export const BAY_KINDS = ["lift_bay", "alignment_rack", "fabrication_bay"] as const;
export type BayKind = (typeof BAY_KINDS)[number];

/** The table's row as stored; the booking queries read it through joins. @public */
export interface ShopScheduleRow {
  shop_id: string;
  /** IANA time zone name; opening hours and closed days are wall-clock in it. */
  time_zone: string;
  slot_step_minutes: 15 | 30 | 60;
  updated_at: Date;
}

/** The table's row as stored; the booking queries read it through joins. @public */
export interface OpeningHoursRow {
  shop_id: string;
  /** ISO 8601: 1 = Monday … 7 = Sunday. */
  weekday: number;
  opens_minute: number;
  closes_minute: number;
}

/** The table's row as stored; the booking queries read it through joins. @public */
export interface ClosedDayRow {
  shop_id: string;
  /** A calendar date; read as "YYYY-MM-DD" (lib/shop/bookings/queries.ts asks pg for text). */
  day: string;
  note: string;
}

export interface BayRow extends ShopOwnedRow {
  name: string;
  kind: BayKind;
  position: number;
  archived_at: Date | null;
  created_at: Date;
}

export interface ServiceTimeRow {
  shop_id: string;
  catalog_item_id: string;
  minutes_per_unit: number;
  bay_kind: BayKind;
}

export const BOOKING_STATUSES = ["booked", "cancelled"] as const;
export type BookingStatus = (typeof BOOKING_STATUSES)[number];
/** What a booking is for: the install of a quote, or the lug and ring re-check after it. */
export const BOOKING_KINDS = ["install", "recheck"] as const;
export type BookingKind = (typeof BOOKING_KINDS)[number];

export interface BookingRow extends ShopOwnedRow {
  quote_id: string;
  kind: BookingKind;
  status: BookingStatus;
  starts_at: Date;
  ends_at: Date;
  sequence: number;
  booked_by_user_id: string | null;
  booked_by: string;
  reminder_queued_at: Date | null;
  cancelled_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export const WORK_ORDER_STATUSES = ["booked", "in_bay", "done"] as const;
export type WorkOrderStatus = (typeof WORK_ORDER_STATUSES)[number];
export const WHEEL_POSITIONS = ["LF", "RF", "LR", "RR", "spare"] as const;
export type WheelPosition = (typeof WHEEL_POSITIONS)[number];
/** A step's place on the sheet: a wheel, or the vehicle as a whole (alignment, trimming). */
export type StepPosition = WheelPosition | "vehicle";

export interface WorkOrderRow extends ShopOwnedRow {
  quote_id: string;
  status: WorkOrderStatus;
  tire_description: string;
  wheel_description: string;
  spare: boolean;
  beadlock: boolean;
  alignment: boolean;
  trimming: boolean;
  lug_count: number;
  started_at: Date | null;
  started_by: string | null;
  done_at: Date | null;
  done_by: string | null;
  recheck_due_at: Date | null;
  recheck_queued_at: Date | null;
  recheck_link_hash: string | null;
  recheck_link_expires_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/**
 * The columns that tie a row to one step of a work order's sheet (db/lib/workOrderSteps.ts
 * `workOrderStepColumns`).
 */
interface WorkOrderStepColumns {
  work_order_id: string;
  shop_id: string;
  position: StepPosition;
  step: string;
}

export interface WorkOrderStepRow extends WorkOrderStepColumns {
  id: string;
  /** What was recorded, as lib/shop/workOrders/schema.ts stores it (JSONB). */
  data: unknown;
  signed_by_user_id: string | null;
  signed_by: string;
  signed_at: Date;
}

/** A photo of one step of a work order; its image and thumbnail are objects in the photo store. */
export interface WorkOrderStepPhotoRow extends WorkOrderStepColumns, StoredPhotoColumns {
  id: string;
  taken_by_user_id: string | null;
  taken_by: string;
  created_at: Date;
}

/** A bay held by a booking; `during` is a tstzrange, read through lower()/upper() as starts_at/ends_at. */
/** The table's row as stored; the booking queries read it through joins. @public */
export interface BayReservationRow extends ShopOwnedRow {
  booking_id: string;
  bay_id: string;
  starts_at: Date;
  ends_at: Date;
}

// --- garage ---------------------------------------------------------------------------------
// Setups are stored as lib/setup's Setup (the output of checkSetup).

export const FRONT_SUSPENSIONS = ["independent", "solid-axle"] as const;
export type FrontSuspension = (typeof FRONT_SUSPENSIONS)[number];

export interface VehicleRow {
  id: string;
  user_id: string;
  name: string;
  year: number | null;
  make: string | null;
  model: string | null;
  trim: string | null;
  front_suspension: FrontSuspension;
  bolt_pattern: string;
  bolt_pcd_mm: number;
  bolt_count: number;
  hub_bore_mm: number | null;
  stock_setup: unknown;
  current_setup: unknown;
  lift_height_mm: number | null;
  kingpin_inclination_deg: number | null;
  axle_ratio: number | null;
  transmission_ratio: number | null;
  /** Margin the measured points are classed against (default 1/2 in). */
  clearance_margin_mm: number;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

/** A vehicle's placard, scale weights and body points (db/migrations/20261208090000); SI throughout. */
export interface VehicleLoadProfileRow {
  vehicle_id: string;
  units: "imperial" | "metric";
  vehicle_kind: "light-truck" | "passenger-car";
  placard_tire: string | null;
  placard_front_kpa: number | null;
  placard_rear_kpa: number | null;
  front_gawr_kg: number | null;
  rear_gawr_kg: number | null;
  front_axle_kg: number | null;
  rear_axle_kg: number | null;
  front_corner_height_mm: number | null;
  front_corner_ahead_mm: number | null;
  rear_corner_height_mm: number | null;
  rear_corner_behind_mm: number | null;
  mid_height_mm: number | null;
  wheelbase_mm: number | null;
  updated_at: Date;
}

export interface VehicleClearanceRow {
  id: string;
  vehicle_id: string;
  label: string;
  direction: ClearanceDirection;
  distance_mm: number;
  distance_text: string;
  suspension_state: SuspensionState;
  measured_setup: unknown;
  created_at: Date;
}

/** The columns of a stored photo (db/lib/columns.ts `storedPhotoColumns`). */
interface StoredPhotoColumns {
  object_key: string;
  thumb_key: string;
  content_type: "image/jpeg" | "image/png" | "image/webp";
  width: number;
  height: number;
  bytes: number;
  original_name: string;
}

export interface VehiclePhotoRow extends StoredPhotoColumns {
  id: string;
  vehicle_id: string;
  clearance_id: string | null;
  created_at: Date;
}

export interface InstallChecklistRow {
  id: string;
  vehicle_id: string;
  planned_key: string;
  planned_setup: unknown;
  comparison_id: string | null;
  ticked: string[];
  created_at: Date;
  updated_at: Date;
}

/** A saved comparison: the validated input (JSONB) and the key figures computed from it on the server. */
export interface ComparisonRow {
  id: string;
  owner_id: string;
  /** The garage vehicle it belongs to (foreign key added by 20261202006000). */
  vehicle_id: string | null;
  name: string;
  input: unknown;
  current_tire: string;
  planned_tire: string;
  diameter_change_mm: number;
  ground_clearance_change_mm: number;
  poke_change_mm: number;
  scrub_change_mm: number;
  speedometer_error_pct: number;
  suggested_ratio: number;
  warning_count: number;
  created_at: Date;
  updated_at: Date;
}

/** A public link to a comparison; revoked links keep their row so the slug stays dead. */
export interface ComparisonShareRow {
  id: string;
  comparison_id: string;
  slug: string;
  created_at: Date;
  revoked_at: Date | null;
}
