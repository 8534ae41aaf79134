/**
 * What the shop's settings and staff API returns (camelCase, ISO dates) and the row → API
 * mappers; shared by server and client. Invitation token hashes stay on the server.
 */
import type { Role, ShopSettingsRow, StaffInviteRow } from "@/lib/platform/db/types";

/** The shop's settings: what every quote carries. */
export interface Shop {
  id: string;
  name: string;
  address: string;
  phone: string;
  taxRateBp: number;
  labourRateCents: number;
  fabricationRateCents: number;
  quoteValidityDays: number;
  depositPct: number;
  currency: "USD";
  noticeEmail: string;
  createdAt: string;
  updatedAt: string;
}

export interface TeamMember {
  id: string;
  name: string;
  email: string;
  role: Role;
}

/** An invitation still open. */
export interface StaffInvite {
  id: string;
  email: string;
  expiresAt: string;
  createdAt: string;
}

/** GET /api/shop/staff, and what the staff page hands its panel. */
export interface StaffData {
  team: TeamMember[];
  invites: StaffInvite[];
  /** The shop's time zone (IANA): an invitation's expiry reads on the shop's clock, not the device's. */
  timeZone: string;
}

const iso = (d: Date | string) => new Date(d).toISOString();

/**
 * @example
 * shopDto(row).taxRateBp === row.tax_rate_bp; // 825 for 8.25 %
 */
export function shopDto(r: ShopSettingsRow): Shop {
  return {
    id: r.id,
    name: r.name,
    address: r.address,
    phone: r.phone,
    taxRateBp: r.tax_rate_bp,
    labourRateCents: r.labour_rate_cents,
    fabricationRateCents: r.fabrication_rate_cents,
    quoteValidityDays: r.quote_validity_days,
    depositPct: r.deposit_pct,
    currency: r.currency,
    noticeEmail: r.notice_email,
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
  };
}

export function staffInviteDto(r: Pick<StaffInviteRow, "id" | "email" | "expires_at" | "created_at">): StaffInvite {
  return { id: r.id, email: r.email, expiresAt: iso(r.expires_at), createdAt: iso(r.created_at) };
}
