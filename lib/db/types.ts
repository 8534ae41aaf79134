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

// --- garage ---------------------------------------------------------------------------------
// Setups are stored as the output of lib/validation/setup.ts (SetupValues).

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
  notes: string;
  created_at: Date;
  updated_at: Date;
}

export interface VehicleClearanceRow {
  id: string;
  vehicle_id: string;
  label: string;
  direction: "inboard" | "outboard" | "upward" | "fore-aft";
  distance_mm: number;
  distance_text: string;
  suspension_state: "ride-height" | "full-stuff" | "full-lock";
  measured_setup: unknown;
  created_at: Date;
}

export interface VehiclePhotoRow {
  id: string;
  vehicle_id: string;
  clearance_id: string | null;
  object_key: string;
  thumb_key: string;
  content_type: "image/jpeg" | "image/png" | "image/webp";
  width: number;
  height: number;
  bytes: number;
  original_name: string;
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
