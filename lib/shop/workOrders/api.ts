/**
 * What the work order routes answer (camelCase, ISO instants) and the row → API mappers, shared
 * by server and browser.
 */
import type { StepPosition, WorkOrderRow, WorkOrderStatus, WorkOrderStepPhotoRow, WorkOrderStepRow } from "@/lib/platform/db/types";
import type { QuotePressure } from "@/lib/shop/customers/counterPlacard";
import { type TirePressureLimits, tirePressureLimits, withPressureToSet } from "./pressureLimit";
import type { WorkOrderTrailAngles } from "./trailAngles";
import { type StepKind, positionsFor, stepsFor } from "./vocabulary";

const iso = (d: Date | string | null) => (d === null ? null : new Date(d).toISOString());

export interface SignedOff {
  position: StepPosition;
  step: StepKind;
  /** What was recorded (schema.ts's output: torque in N·m, pressure in kPa, weights in grams). */
  data: Record<string, unknown>;
  signedBy: string;
  signedAt: string;
}

/** A photo of one step of the sheet; the URLs answer the shop's staff only. */
export interface StepPhoto {
  id: string;
  position: StepPosition;
  step: StepKind;
  name: string;
  contentType: string;
  width: number;
  height: number;
  bytes: number;
  takenBy: string;
  createdAt: string;
  url: string;
  thumbUrl: string;
}

export const stepPhotoDto = (r: WorkOrderStepPhotoRow): StepPhoto => {
  const url = `/api/shop/work-orders/${r.work_order_id}/photos/${r.id}`;
  return {
    id: r.id,
    position: r.position,
    step: r.step as StepKind,
    name: r.original_name,
    contentType: r.content_type,
    width: r.width,
    height: r.height,
    bytes: r.bytes,
    takenBy: r.taken_by,
    createdAt: new Date(r.created_at).toISOString(),
    url,
    thumbUrl: `${url}?variant=thumb`,
  };
};

export interface WorkOrder {
  id: string;
  quoteId: string;
  quoteNumber: number;
  customerName: string;
  vehicleDescription: string;
  boltPattern: string;
  status: WorkOrderStatus;
  tireDescription: string;
  wheelDescription: string;
  spare: boolean;
  beadlock: boolean;
  alignment: boolean;
  trimming: boolean;
  lugCount: number;
  startedAt: string | null;
  startedBy: string | null;
  doneAt: string | null;
  doneBy: string | null;
  recheckDueAt: string | null;
  /** The booked install, on the shop's clock, e.g. "Mon, Mar 15, 2027, 9:00 AM MDT – 11:30 AM". */
  bookedFor: string | null;
  /** The shop's time zone (IANA), so every time on the sheet reads on the shop's clock, not the device's. */
  timeZone: string;
  /** The quoted tire's highest pressure and road minimum, when its size says them (pressureLimit.ts). */
  pressureLimits: TirePressureLimits | null;
  /** The quote's trail angles now → with these tires, when the counter measured body points (trailAngles.ts). */
  trailAngles: WorkOrderTrailAngles | null;
  steps: SignedOff[];
  /** Every step's photos, oldest first (photoQueries.ts). */
  photos: StepPhoto[];
}

export const signedOffDto = (r: WorkOrderStepRow): SignedOff => ({
  position: r.position,
  step: r.step as StepKind,
  data: (r.data ?? {}) as Record<string, unknown>,
  signedBy: r.signed_by,
  signedAt: new Date(r.signed_at).toISOString(),
});

export function workOrderDto(
  r: WorkOrderRow,
  quote: {
    number: number;
    customerName: string;
    vehicleDescription: string;
    boltPattern: string;
    plannedTire?: string | null;
    pressure?: QuotePressure | null;
    trailAngles?: WorkOrderTrailAngles | null;
  },
  steps: WorkOrderStepRow[],
  bookedFor: string | null,
  photos: WorkOrderStepPhotoRow[],
  timeZone: string,
): WorkOrder {
  return {
    id: r.id,
    quoteId: r.quote_id,
    quoteNumber: quote.number,
    customerName: quote.customerName,
    vehicleDescription: quote.vehicleDescription,
    boltPattern: quote.boltPattern,
    status: r.status,
    tireDescription: r.tire_description,
    wheelDescription: r.wheel_description,
    spare: r.spare,
    beadlock: r.beadlock,
    alignment: r.alignment,
    trimming: r.trimming,
    lugCount: r.lug_count,
    startedAt: iso(r.started_at),
    startedBy: r.started_by,
    doneAt: iso(r.done_at),
    doneBy: r.done_by,
    recheckDueAt: iso(r.recheck_due_at),
    bookedFor,
    timeZone,
    pressureLimits: withPressureToSet(tirePressureLimits(quote.plannedTire), quote.pressure ?? null),
    trailAngles: quote.trailAngles ?? null,
    steps: steps.map(signedOffDto),
    photos: photos.map(stepPhotoDto),
  };
}

/** Every step the sheet has, in order: each wheel's, then the vehicle's. */
export function requiredSteps(
  w: Pick<WorkOrder, "spare" | "beadlock" | "alignment" | "trimming">,
): { position: StepPosition; step: StepKind }[] {
  const out: { position: StepPosition; step: StepKind }[] = [];
  for (const position of [...positionsFor(w.spare), "vehicle" as const])
    for (const step of stepsFor(position, w)) out.push({ position, step });
  return out;
}

/** The steps not signed yet. */
export function unsignedSteps(w: Pick<WorkOrder, "spare" | "beadlock" | "alignment" | "trimming" | "steps">) {
  const signed = new Set(w.steps.map((s) => `${s.position}|${s.step}`));
  return requiredSteps(w).filter((s) => !signed.has(`${s.position}|${s.step}`));
}

/** One entry of the counter's "due for re-check" list. */
export interface RecheckDue {
  workOrderId: string;
  quoteId: string;
  quoteNumber: number;
  customerName: string;
  customerPhone: string;
  vehicleDescription: string;
  doneAt: string;
  recheckDueAt: string;
  /** The due day on the shop's clock, e.g. "Thursday, December 3, 2026" (a server renders in UTC). */
  dueOn: string;
  /** When the reminder mail was queued, or null (no e-mail address, or not due yet). */
  remindedAt: string | null;
}
