/**
 * The words and defaults of install bookings, said once: forms, pages, e-mails, the calendar
 * and the server's messages all read them from here. Plain data, safe for the browser.
 */
import { BAY_KINDS, type BayKind, type BookingKind, type BookingStatus, type ServiceType, type ServiceUnit } from "@/lib/platform/db/types";

export { BAY_KINDS };

export const BAY_KIND_LABEL: Record<BayKind, string> = {
  lift_bay: "Lift bay",
  alignment_rack: "Alignment rack",
  fabrication_bay: "Fabrication bay",
};

/**
 * The order a job moves through the kinds of bay: cutting first so the new tires clear, then
 * mounting on the lift, the alignment last with the new tires on the ground (common practice,
 * no source). A job takes one bay of each kind it needs, one after the other.
 */
export const BAY_KIND_SEQUENCE: readonly BayKind[] = ["fabrication_bay", "lift_bay", "alignment_rack"];

export const BOOKING_STATUS_LABEL: Record<BookingStatus, string> = { booked: "Booked", cancelled: "Cancelled" };
export const BOOKING_STATUS_TONE: Record<BookingStatus, "steel" | "contact"> = { booked: "steel", cancelled: "contact" };

/** ISO 8601 weekdays, Monday first. */
export const WEEKDAYS = [1, 2, 3, 4, 5, 6, 7] as const;
export const WEEKDAY_LABEL: Record<number, string> = {
  1: "Monday",
  2: "Tuesday",
  3: "Wednesday",
  4: "Thursday",
  5: "Friday",
  6: "Saturday",
  7: "Sunday",
};

/** What the shop's calendar is kept in until the owner picks another zone. */
export const DEFAULT_TIME_ZONE = "America/Denver";
export const SLOT_STEPS = [15, 30, 60] as const;
export type SlotStep = (typeof SLOT_STEPS)[number];
export const DEFAULT_SLOT_STEP: SlotStep = 30;

/** How many days ahead a customer may book, and the most a slot list covers in one answer. */
export const BOOKING_HORIZON_DAYS = 60;
export const MAX_SLOT_DAYS = 14;

/** The unit a catalog service is sold in, as the bay-time table says it ("20 min per wheel"). */
export const SERVICE_UNIT_WORD: Record<ServiceUnit, string> = { per_wheel: "wheel", per_vehicle: "vehicle", per_hour: "quoted hour" };

/**
 * Bay time per unit sold when the owner has set none (common practice, no source: shop
 * rules of thumb, to be replaced by the shop's own times). An hourly service keeps the truck
 * for the hours quoted.
 */
export const SERVICE_TIME_DEFAULTS: Record<ServiceType, { minutes: number; bayKind: BayKind }> = {
  mount_balance: { minutes: 20, bayKind: "lift_bay" },
  beadlock_assembly: { minutes: 30, bayKind: "lift_bay" },
  valve_stem: { minutes: 5, bayKind: "lift_bay" },
  tpms: { minutes: 10, bayKind: "lift_bay" },
  alignment: { minutes: 60, bayKind: "alignment_rack" },
  fender_trim: { minutes: 60, bayKind: "lift_bay" },
  disposal: { minutes: 0, bayKind: "lift_bay" },
  other: { minutes: 30, bayKind: "lift_bay" },
};

/**
 * @example
 * defaultServiceTime("mount_balance", "per_wheel"); // { minutes: 20, bayKind: "lift_bay" }
 * defaultServiceTime("other", "per_hour"); // { minutes: 60, bayKind: "lift_bay" }
 */
export function defaultServiceTime(type: ServiceType | null, unit: ServiceUnit | null): { minutes: number; bayKind: BayKind } {
  const base = SERVICE_TIME_DEFAULTS[type ?? "other"];
  return unit === "per_hour" ? { minutes: 60, bayKind: base.bayKind } : base;
}

/** Hourly labour written on a quote by hand (no catalog item): the hours quoted, on a lift. */
export const HAND_WRITTEN_HOURS_BAY: BayKind = "lift_bay";

/**
 * How the field that carries the chosen time reads on the screens, per kind of booking: the
 * slot picker's legend and every message about the chosen time (schema, slot check, the race
 * lost) read it from here, so the re-check page never speaks of an install.
 */
export const START_FIELD_LABELS: Record<BookingKind, string> = { install: "Install time", recheck: "Re-check time" };

/** What a booking is for, as the staff calendar names it. */
export const BOOKING_KIND_LABEL: Record<BookingKind, string> = { install: "Install", recheck: "Lug and ring re-check" };

/** The day-before reminder goes out from this hour on the shop's clock (not at midnight). */
export const REMINDER_FROM_HOUR = 9;
