/**
 * Field errors as a person reads them. The server keys errors by the request's path
 * (`lines.8.discountCents`, zero-based); the quote screens show "Line 9 — discount", so every
 * message is turned into the screen's own words before it is shown.
 */
import { SETUP_FIELD_LABEL, type SetupFieldPath } from "@/lib/setup/fields";

const LINE_FIELDS: Record<string, string> = {
  kind: "kind",
  unit: "unit",
  catalogItemId: "catalog item",
  sku: "SKU",
  description: "description",
  quantity: "quantity",
  unitPriceCents: "unit price",
  discountCents: "discount",
  taxable: "tax",
};

const QUOTE_FIELDS: Record<string, string> = {
  lines: "Lines",
  discountCents: "Quote discount",
  notes: "Notes for the customer",
  customerId: "Customer",
  vehicleId: "Saved vehicle",
  vehicle: "Vehicle",
  saveVehicle: "Save this vehicle",
  tireItemId: "Tire",
  wheelItemId: "Wheel",
  quantity: "Quantity",
  to: "Status",
  note: "Note",
  seenUpdatedAt: "Quote",
  _: "Quote",
};

const VEHICLE_FIELDS: Record<string, string> = {
  description: "Vehicle",
  boltPattern: "Bolt pattern",
  hubBoreMm: "Hub bore (mm)",
  axleRatio: "Axle ratio",
  // The flat vehicle of older clients (lib/shop/customers/schema.ts reads it still).
  tireSize: SETUP_FIELD_LABEL.tire,
  wheelDiameterIn: SETUP_FIELD_LABEL.wheelDiameterIn,
  wheelWidthIn: SETUP_FIELD_LABEL.wheelWidthIn,
  offsetMode: "Wheel position given as",
  offsetMm: SETUP_FIELD_LABEL["position.offsetMm"],
  backspacingIn: SETUP_FIELD_LABEL["position.backspacingIn"],
  backspacingFrom: SETUP_FIELD_LABEL["position.reference"],
};

/** A field of the vehicle's setup (`currentSetup.position.offsetMm`) as the setup's fields are labelled. */
const setupFieldLabel = (path: string[]): string => SETUP_FIELD_LABEL[path.join(".") as SetupFieldPath] ?? "Tires and wheels on it now";

/**
 * @example
 * fieldLabel("lines.8.discountCents"); // "Line 9 — discount"
 * fieldLabel("discountCents");         // "Quote discount"
 */
export function fieldLabel(path: string): string {
  const parts = path.split(".");
  if (parts[0] === "lines" && parts.length >= 2 && /^\d+$/.test(parts[1]!)) {
    const n = Number(parts[1]) + 1;
    const f = parts[2];
    return f ? `Line ${n} — ${LINE_FIELDS[f] ?? f}` : `Line ${n}`;
  }
  if (parts[0] === "vehicle" && parts[1] === "currentSetup") return setupFieldLabel(parts.slice(2));
  if (parts[0] === "vehicle" && parts[1]) return VEHICLE_FIELDS[parts[1]] ?? "Vehicle";
  return QUOTE_FIELDS[parts[0]!] ?? VEHICLE_FIELDS[parts[0]!] ?? "Quote";
}

/**
 * One line per field, in the order lines appear on the screen.
 *
 * @example
 * describeFieldErrors({ "lines.8.discountCents": ["A line's discount cannot exceed the line's amount."] });
 * // ["Line 9 — discount: A line's discount cannot exceed the line's amount."]
 */
export function describeFieldErrors(fieldErrors: Record<string, string[]> | undefined): string[] {
  if (!fieldErrors) return [];
  const order = (k: string) => {
    const m = /^lines\.(\d+)/.exec(k);
    return m ? Number(m[1]) : -1;
  };
  return (
    Object.entries(fieldErrors)
      .sort(([a], [b]) => order(a) - order(b))
      // A setup's messages name their field already ("Tire size: …"): not twice.
      .flatMap(([k, v]) => (v[0] ? [v[0].startsWith(`${fieldLabel(k)}:`) ? v[0] : `${fieldLabel(k)}: ${v[0]}`] : []))
  );
}
