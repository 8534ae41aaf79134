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

/** A saved comparison: the validated input (JSONB) and the key figures computed from it on the server. */
export interface ComparisonRow {
  id: string;
  owner_id: string;
  /** The garage vehicle it belongs to; no foreign key until the vehicles table exists. */
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
