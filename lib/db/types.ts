/** Row types, one place for every table. Column names are snake_case as stored. */

export const ROLES = ["member", "shop_staff", "shop_owner", "admin"] as const;
export type Role = (typeof ROLES)[number];
export const SHOP_ROLES: readonly Role[] = ["shop_staff", "shop_owner"];

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
  created_at: Date;
  updated_at: Date;
}

export type PublicUser = Omit<UserRow, "password_hash">;

export interface PasswordResetRow {
  id: string;
  user_id: string;
  token_hash: string;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

export interface SignInThrottleRow {
  key: string;
  failures: number;
  window_started_at: Date;
  locked_until: Date | null;
}

/* ---- shop counter (shops settings, staff invitations, catalog, customers, quotes, payments) ---- */

export interface ShopSettingsRow extends ShopRow {
  address: string;
  phone: string;
  tax_rate_bp: number;
  labour_rate_cents: number;
  fabrication_rate_cents: number;
  quote_validity_days: number;
  deposit_pct: number;
  currency: "USD";
  updated_at: Date;
}

export interface StaffInviteRow {
  id: string;
  shop_id: string;
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
export const SERVICE_TYPES = ["mount_balance", "beadlock_assembly", "valve_stem", "tpms", "alignment", "fender_trim", "disposal", "other"] as const;
export type ServiceType = (typeof SERVICE_TYPES)[number];
export const SERVICE_UNITS = ["per_wheel", "per_vehicle", "per_hour"] as const;
export type ServiceUnit = (typeof SERVICE_UNITS)[number];

export interface CatalogItemRow {
  id: string;
  shop_id: string;
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
  wheel_backspacing_ref: "bead-seat" | "flange" | null;
  bolt_pattern: string | null;
  center_bore_mm: number | null;
  beadlock: boolean;
  service_type: ServiceType | null;
  service_unit: ServiceUnit | null;
  created_at: Date;
  updated_at: Date;
}

export interface CatalogImportRow {
  id: string;
  shop_id: string;
  created_by: string | null;
  filename: string;
  rows: unknown;
  row_count: number;
  error_count: number;
  status: "staged" | "committed";
  created_at: Date;
  committed_at: Date | null;
}
