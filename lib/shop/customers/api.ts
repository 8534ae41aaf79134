/**
 * What the customers API returns (camelCase, ISO dates) and the row → API mappers; shared by
 * server and client. The shop id and the phone digits kept for searching stay on the server.
 */
import type { CustomerRow, CustomerVehicleRow } from "@/lib/platform/db/types";
import { iso, rowTimes } from "@/lib/platform/http/isoDates";
import type { Setup } from "@/lib/setup/model";
import type { CounterBodyPoints } from "./counterBodyPoints";
import type { CounterPlacard } from "./counterPlacard";

export interface Customer {
  id: string;
  name: string;
  phone: string;
  email: string;
  createdAt: string;
  updatedAt: string;
}

/** A customer's vehicle as the shop counter saved it (lib/shop/customers/schema.ts). */
export interface CustomerVehicle {
  id: string;
  customerId: string;
  description: string;
  boltPattern: string;
  /** The setup it runs, as the workspace and the garage describe one. */
  currentSetup: Setup;
  axleRatio: number | null;
  hubBoreMm: number | null;
  /** The door placard and axle loads, when the counter took them (SI). */
  placard: CounterPlacard | null;
  /** The body points, when the counter measured them (mm). */
  bodyPoints: CounterBodyPoints | null;
  createdAt: string;
}

/**
 * @example
 * customerDto({ id: "c", shop_id: "s", name: "Ann", phone: "555 0100", phone_digits: "5550100", email: "", … });
 * // { id: "c", name: "Ann", phone: "555 0100", email: "", createdAt: "…Z", updatedAt: "…Z" }
 */
export function customerDto(r: CustomerRow): Customer {
  return {
    id: r.id,
    name: r.name,
    phone: r.phone,
    email: r.email,
    ...rowTimes(r),
  };
}

export function customerVehicleDto(r: CustomerVehicleRow): CustomerVehicle {
  return {
    id: r.id,
    customerId: r.customer_id,
    description: r.description,
    boltPattern: r.bolt_pattern,
    currentSetup: r.current_setup as Setup,
    axleRatio: r.axle_ratio,
    hubBoreMm: r.hub_bore_mm,
    placard: (r.load_placard ?? null) as CounterPlacard | null,
    bodyPoints: (r.body_points ?? null) as CounterBodyPoints | null,
    createdAt: iso(r.created_at),
  };
}
