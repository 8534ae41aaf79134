import { z } from "zod";
import { FitmentInputError, checkOffsetMm, checkWheelWidthIn, offsetFromBackspacing, parseBoltPattern, parseTireSize } from "@/lib/fitment";
import { emailField } from "./account";

const engineMessage = (e: unknown, fallback: string) => (e instanceof FitmentInputError ? e.message : fallback);

export const customerSchema = z
  .object({
    name: z.string().trim().min(1, "Enter the customer's name.").max(120, "Use at most 120 characters."),
    phone: z.string().trim().max(40, "Use at most 40 characters.").regex(/^[0-9+()\-.\s]*$/, "Use digits, spaces and + ( ) - . only."),
    email: z.union([z.literal(""), emailField]),
  })
  .refine((c) => c.phone.replace(/\D/g, "").length >= 7 || c.email !== "", { path: ["phone"], message: "Enter a phone number (7 digits or more) or an e-mail address." });
export type CustomerInput = z.infer<typeof customerSchema>;

export const customerSearchSchema = z.object({
  q: z.string({ message: "Type a phone number, e-mail or name." }).trim().min(1, "Type a phone number, e-mail or name.").max(120, "Use at most 120 characters."),
});

/** Quick entry of the vehicle as it is now: bolt pattern and current setup. */
export const vehicleSchema = z
  .object({
    description: z.string().trim().min(1, "Describe the vehicle, e.g. 2016 half-ton pickup.").max(120, "Use at most 120 characters."),
    boltPattern: z.string().trim().min(1, "Enter the bolt pattern, e.g. 6x5.5."),
    tireSize: z.string().trim().min(1, "Enter the current tire size."),
    wheelDiameterIn: z.coerce.number({ message: "Enter the wheel diameter in inches." }).min(8, "8 to 30 in.").max(30, "8 to 30 in."),
    wheelWidthIn: z.coerce.number({ message: "Enter the wheel width in inches." }),
    offsetMode: z.enum(["offset", "backspacing"]),
    offsetMm: z.coerce.number({ message: "Enter the offset in mm." }).optional(),
    backspacingIn: z.coerce.number({ message: "Enter the backspacing in inches." }).optional(),
    backspacingFrom: z.enum(["bead-seat", "flange"]).optional(),
    axleRatio: z.union([z.literal("").transform(() => undefined), z.coerce.number().min(1, "1 to 10.").max(10, "1 to 10.")]).optional(),
  })
  .superRefine((v, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
    try {
      parseBoltPattern(v.boltPattern);
    } catch (e) {
      issue("boltPattern", engineMessage(e, "Enter a bolt pattern like 6x5.5."));
    }
    try {
      const t = parseTireSize(v.tireSize);
      if (t.rimDiameterIn !== v.wheelDiameterIn) issue("wheelDiameterIn", `${t.text} mounts on a ${t.rimDiameterIn} in wheel.`);
    } catch (e) {
      issue("tireSize", engineMessage(e, "Enter a tire size like 265/70R17."));
    }
    try {
      checkWheelWidthIn(v.wheelWidthIn, "wheelWidthIn");
    } catch (e) {
      issue("wheelWidthIn", engineMessage(e, "Enter the wheel width."));
      return;
    }
    try {
      if (v.offsetMode === "offset") {
        if (v.offsetMm === undefined) issue("offsetMm", "Enter the offset in mm.");
        else checkOffsetMm(v.offsetMm, v.wheelWidthIn, "offsetMm");
      } else if (v.backspacingIn === undefined) issue("backspacingIn", "Enter the backspacing in inches.");
      else if (!v.backspacingFrom) issue("backspacingFrom", "Say where the backspacing was measured to.");
      else offsetFromBackspacing({ widthIn: v.wheelWidthIn, backspacingIn: v.backspacingIn, measuredFrom: v.backspacingFrom });
    } catch (e) {
      issue(v.offsetMode === "offset" ? "offsetMm" : "backspacingIn", engineMessage(e, "Check the offset."));
    }
  });
export type VehicleInput = z.input<typeof vehicleSchema>;
export type Vehicle = z.output<typeof vehicleSchema>;

/** The vehicle in the engine's terms (the offset computed from backspacing when that was given). */
export function resolveVehicle(v: Vehicle) {
  const offsetMm =
    v.offsetMode === "offset"
      ? v.offsetMm!
      : offsetFromBackspacing({ widthIn: v.wheelWidthIn, backspacingIn: v.backspacingIn!, measuredFrom: v.backspacingFrom! });
  return {
    description: v.description,
    boltPattern: parseBoltPattern(v.boltPattern).text,
    tireSize: parseTireSize(v.tireSize).text,
    wheel: { diameterIn: v.wheelDiameterIn, widthIn: v.wheelWidthIn, offsetMm },
    axleRatio: v.axleRatio ?? null,
  };
}

export const createQuoteSchema = z
  .object({
    customerId: z.uuid("Pick a customer."),
    vehicleId: z.uuid().optional(),
    vehicle: vehicleSchema.optional(),
    saveVehicle: z.boolean().optional(),
    tireItemId: z.uuid("Pick a tire."),
    wheelItemId: z.uuid("Pick a wheel."),
    quantity: z.union([z.literal(4), z.literal(5)], "Quote 4 tires and wheels, or 5 with a spare."),
  })
  .refine((q) => !!q.vehicle !== !!q.vehicleId, { path: ["vehicle"], message: "Enter the vehicle or pick a saved one." });
export type CreateQuoteInput = z.input<typeof createQuoteSchema>;

export const quoteLineSchema = z.object({
  kind: z.enum(["tire", "wheel", "service", "custom"]),
  catalogItemId: z.uuid().nullable().optional(),
  sku: z.string().trim().max(64).default(""),
  description: z.string().trim().min(1, "Describe the line.").max(200, "Use at most 200 characters."),
  quantity: z.number({ message: "Enter a quantity." }).int("Use a whole number.").min(1, "Quantity must be at least 1.").max(999, "At most 999."),
  unitPriceCents: z.number().int("Prices are whole cents.").min(0, "Prices cannot be negative.").max(100_000_000, "At most 1,000,000."),
  discountCents: z.number().int("Discounts are whole cents.").min(0, "Discounts cannot be negative.").default(0),
  taxable: z.boolean().default(true),
});
export type QuoteLineInput = z.input<typeof quoteLineSchema>;

export const updateQuoteSchema = z.object({
  lines: z.array(quoteLineSchema).min(1, "A quote needs at least one line.").max(60, "At most 60 lines."),
  discountCents: z.number().int("Discounts are whole cents.").min(0, "Discounts cannot be negative."),
  notes: z.string().max(2000, "Use at most 2000 characters.").default(""),
});
export type UpdateQuoteInput = z.input<typeof updateQuoteSchema>;

export const quoteStatusSchema = z.object({ to: z.enum(["draft", "declined", "installed"]), note: z.string().max(500).optional() });

export const publicQuoteActionSchema = z.object({ action: z.enum(["accept", "decline", "pay"]) });
