/**
 * The words of the work order, said once: the sheet, the forms, the server's messages and the
 * re-check mail read them from here. Plain data, safe for the browser.
 */
import { WHEEL_POSITIONS, WORK_ORDER_STATUSES, type StepPosition, type WheelPosition, type WorkOrderStatus } from "@/lib/platform/db/types";

export { WHEEL_POSITIONS, WORK_ORDER_STATUSES };

export const WORK_ORDER_STATUS_LABEL: Record<WorkOrderStatus, string> = { booked: "Booked", in_bay: "In the bay", done: "Done" };
export const WORK_ORDER_STATUS_TONE: Record<WorkOrderStatus, "steel" | "ember" | "clear"> = {
  booked: "steel",
  in_bay: "ember",
  done: "clear",
};

export const POSITION_LABEL: Record<StepPosition, string> = {
  LF: "Left front",
  RF: "Right front",
  LR: "Left rear",
  RR: "Right rear",
  spare: "Spare",
  vehicle: "Vehicle",
};

/** The steps of one wheel, in the order they are done. */
export const WHEEL_STEPS = ["fitted", "match_mount", "beadlock", "bead_seat", "pressure", "balance", "lug_torque"] as const;
export type WheelStep = (typeof WHEEL_STEPS)[number];
/** The steps of the vehicle as a whole. */
export const VEHICLE_STEPS = ["alignment", "trimming"] as const;
export type VehicleStep = (typeof VEHICLE_STEPS)[number];
export type StepKind = WheelStep | VehicleStep;

export const STEP_LABEL: Record<StepKind, string> = {
  fitted: "Tire and wheel as fitted",
  match_mount: "Match-mounting",
  beadlock: "Beadlock ring bolts",
  bead_seat: "Bead seating",
  pressure: "Cold pressure set",
  balance: "Balance weights",
  lug_torque: "Lug nuts torqued",
  alignment: "Alignment readings",
  trimming: "Trimming",
};

/**
 * Which mark goes where when mounting (common practice, no source): a tire with a uniformity
 * mark (usually red, the high point of its radial force variation) goes to the wheel's low-point
 * mark (a dot or notch); without that, the tire's light-point mark (usually yellow) goes to the
 * valve stem, the wheel's heavy side. The technician says which was done.
 */
export const MATCH_MOUNT_METHODS = ["uniformity_to_low_point", "light_point_to_valve", "no_marks"] as const;
export type MatchMountMethod = (typeof MATCH_MOUNT_METHODS)[number];
export const MATCH_MOUNT_LABEL: Record<MatchMountMethod, string> = {
  uniformity_to_low_point: "Uniformity mark to the wheel's low-point mark",
  light_point_to_valve: "Light-point mark to the valve stem",
  no_marks: "No marks on tire or wheel: mounted and balanced as is",
};
export const MATCH_MOUNT_NOTE =
  "Common practice, no source: with a uniformity mark on the tire and a low-point mark on the wheel, line those up; otherwise put the tire's light-point mark at the valve stem. The tire and wheel makers' instructions come first.";

export const BEAD_SEAT_CAUTION = [
  "Seat beads in a safety cage, or with a clip-on air chuck and an in-line gauge while you stand clear; never lean over a tire being inflated.",
  "Never exceed the bead-seating pressure on the sidewall. If a bead will not seat at that pressure, deflate and find out why.",
  "Lubricate both beads with mounting paste; check the bead is seated evenly all round (the moulded ring line) before setting the pressure.",
] as const;

/** Lug nuts go on in a star: the engine's crisscross order, in passes to the vehicle maker's figure (common practice, no source). */
export const LUG_NOTE =
  "Common practice, no source: run every nut down by hand, then torque in the star order shown, in passes, to the vehicle maker's figure. Re-check after the first 50–100 miles.";

export const PRESSURE_UNITS = ["psi", "kPa"] as const;
export type PressureEntryUnit = (typeof PRESSURE_UNITS)[number];

/** Field labels as the sheet shows them; server messages name fields by these. */
export const FIELD_LABEL = {
  dotCode: "DOT date code",
  tire: "Tire fitted",
  wheel: "Wheel fitted",
  method: "Marks lined up",
  ringBolts: "Bolts on the ring",
  torque: "Maker's torque",
  unit: "Torque unit",
  passesDone: "All passes done in the order shown",
  acknowledged: "Beads seated following the cautions above",
  pressure: "Cold pressure set",
  pressureUnit: "Pressure unit",
  makerTable: "Below the road minimum: the tire maker's load table gives this pressure for this load",
  innerGrams: "Inner plane weight (g)",
  outerGrams: "Outer plane weight (g)",
  lugCount: "Lug nuts",
  camberLeft: "Camber left (°)",
  camberRight: "Camber right (°)",
  casterLeft: "Caster left (°)",
  casterRight: "Caster right (°)",
  toeTotal: "Total toe (°)",
  trimmed: "Trimming done",
  note: "Note",
} as const;

/**
 * Days after the work is done that the customer is asked back to have lug nuts and ring bolts
 * re-checked: the usual advice is after the first 50–100 miles (common practice, no source);
 * a week is this app's stand-in for those miles until the shop sets its own number. The column
 * default of shops.recheck_after_days (migration 20261206090000_work_orders) holds the same 7.
 * @public
 */
export const DEFAULT_RECHECK_DAYS = 7;
export const RECHECK_DAYS_LIMITS = { min: 1, max: 90 } as const;
export const RECHECK_NOTE =
  "Common practice, no source: have lug nuts and beadlock ring bolts re-checked after the first 50–100 miles. The makers' intervals come first.";

/** The steps a sheet has for a position, from what the work order covers. */
export function stepsFor(
  position: StepPosition,
  covers: { beadlock: boolean; alignment: boolean; trimming: boolean },
): readonly StepKind[] {
  if (position === "vehicle") return VEHICLE_STEPS.filter((s) => (s === "alignment" ? covers.alignment : covers.trimming));
  // The spare is carried, not bolted on: no lug torque.
  return WHEEL_STEPS.filter((s) => (s === "beadlock" ? covers.beadlock : s === "lug_torque" ? position !== "spare" : true));
}

/** The wheel positions on a sheet. */
export const positionsFor = (spare: boolean): readonly WheelPosition[] => WHEEL_POSITIONS.filter((p) => p !== "spare" || spare);

/**
 * Asked before a quote with no work order is marked installed: then nothing records the lug
 * torque, the pressures or the bead seating, and the customer is mailed that the work is done.
 */
export const INSTALL_WITHOUT_SHEET =
  "No work order was opened for this job, so no torque, pressure or bead-seating sign-off is on record, and the customer is told the work is done. Mark it installed anyway? (Cancel, then “Open the work order” to have each step signed.)";
