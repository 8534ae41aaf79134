import { z } from "zod";
import { FitmentInputError, checkOffsetMm, checkWheelWidthIn, offsetFromBackspacing, parseBoltPattern, parseTireSize } from "@/lib/fitment";
import { QuantityError, parseQuantity } from "@/lib/shop/quotes/quantity";
import { emailField } from "../../accounts/schema";
import { optionalLengthField } from "../../setup/schema";

const engineMessage = (e: unknown, fallback: string) => (e instanceof FitmentInputError ? e.message : fallback);

export const customerSchema = z
  .object({
    name: z.string({ error: "Enter the customer's name." }).trim().min(1, "Enter the customer's name.").max(120, "Use at most 120 characters."),
    phone: z.string({ error: "Enter the phone number as text." }).trim().max(40, "Use at most 40 characters.").regex(/^[0-9+()\-.\s]*$/, "Use digits, spaces and + ( ) - . only."),
    email: z.union([z.literal(""), emailField]),
  })
  .refine((c) => c.phone.replace(/\D/g, "").length >= 7 || c.email !== "", { path: ["phone"], message: "Enter a phone number (7 digits or more) or an e-mail address." });
export type CustomerInput = z.infer<typeof customerSchema>;

export const customerSearchSchema = z.object({ q: z.string({ error: "Type a phone number, e-mail or name." }).trim().min(1, "Type a phone number, e-mail or name.").max(120, "Use at most 120 characters.") });

/** Quick entry of the vehicle as it is now: bolt pattern and current setup. */
export const vehicleSchema = z
  .object({
    description: z.string({ error: "Describe the vehicle, e.g. 2016 half-ton pickup." }).trim().min(1, "Describe the vehicle, e.g. 2016 half-ton pickup.").max(120, "Use at most 120 characters."),
    boltPattern: z.string({ error: "Enter the bolt pattern, e.g. 6x5.5." }).trim().min(1, "Enter the bolt pattern, e.g. 6x5.5."),
    // The hub's pilot diameter: the counter checks each wheel's centre bore against it.
    hubBoreMm: optionalLengthField("the hub bore", "mm", { min: 30, max: 250 }, "108"),
    tireSize: z.string({ error: "Enter the current tire size, e.g. 265/70R17." }).trim().min(1, "Enter the current tire size, e.g. 265/70R17."),
    wheelDiameterIn: z.coerce.number({ message: "Enter the wheel diameter in inches." }).min(8, "8 to 30 in.").max(30, "8 to 30 in."),
    wheelWidthIn: z.coerce.number({ message: "Enter the wheel width in inches." }),
    offsetMode: z.enum(["offset", "backspacing"], { error: "Say whether the wheel position is an offset or a backspacing." }),
    offsetMm: z.coerce.number({ message: "Enter the offset in mm." }).optional(),
    backspacingIn: z.coerce.number({ message: "Enter the backspacing in inches." }).optional(),
    backspacingFrom: z.enum(["bead-seat", "flange"], { error: "Say where the backspacing was measured to: bead seat or flange edge." }).optional(),
    axleRatio: z
      .union([z.literal("").transform(() => undefined), z.coerce.number().min(1).max(10)], { error: "Enter the axle ratio as a number from 1 to 10, e.g. 3.73, or leave it empty." })
      .optional(),
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
    hubBoreMm: v.hubBoreMm ?? null,
    wheel: { diameterIn: v.wheelDiameterIn, widthIn: v.wheelWidthIn, offsetMm },
    axleRatio: v.axleRatio ?? null,
  };
}

const uuidField = (message: string) => z.uuid({ error: message });
const centsField = (what: string) =>
  z
    .number({ error: `Enter ${what} in dollars, like 129.50.` })
    .int(`${what[0]!.toUpperCase()}${what.slice(1)} is whole cents.`)
    .min(0, `${what[0]!.toUpperCase()}${what.slice(1)} cannot be negative.`);

export const createQuoteSchema = z
  .object(
    {
      customerId: uuidField("Pick a customer."),
      vehicleId: uuidField("Pick one of the customer's saved vehicles.").optional(),
      vehicle: vehicleSchema.optional(),
      saveVehicle: z.boolean({ error: "Say whether to save the vehicle (tick the box or not)." }).optional(),
      tireItemId: uuidField("Pick a tire."),
      wheelItemId: uuidField("Pick a wheel."),
      quantity: z.union([z.literal(4), z.literal(5)], { error: "Quote 4 tires and wheels, or 5 with a spare." }),
    },
    { error: "Send the quote as a form." },
  )
  .refine((q) => !!q.vehicle !== !!q.vehicleId, { path: ["vehicle"], message: "Enter the vehicle or pick a saved one." });

export const QUOTE_LINE_KINDS = ["tire", "wheel", "service", "custom"] as const;
export const QUOTE_LINE_UNITS = ["each", "hour"] as const;

/**
 * A quantity as a number or as typed ("1 1/2", "1:30"); read as hours here, the most a line
 * can take. Whether the line may be a part hour is the server's call: it knows from the catalog
 * which items are sold by the hour (lib/shop/quotes/queries.ts).
 */
const quantityField = z
  .union([z.number(), z.string()], { error: "Enter a quantity, e.g. 4, or 1.5 for hours." })
  .transform((v, ctx) => {
    try {
      return parseQuantity(v, "hour");
    } catch (e) {
      ctx.addIssue({ code: "custom", message: e instanceof QuantityError ? e.message : "Enter a quantity, e.g. 4, or 1.5 for hours." });
      return z.NEVER;
    }
  });

export const quoteLineSchema = z.object(
  {
    kind: z.enum(QUOTE_LINE_KINDS, { error: "Pick the line's kind: tire, wheel, service or custom." }),
    unit: z.enum(QUOTE_LINE_UNITS, { error: "Say whether the line counts items or hours." }).default("each"),
    // "" (an empty picker) means no catalog item, the same as null.
    catalogItemId: z.preprocess((v) => (v === "" ? null : v), uuidField("Pick the item from the catalog again.").nullable().optional()),
    sku: z.string({ error: "Enter the SKU as text." }).trim().max(64, "Use at most 64 characters.").default(""),
    description: z.string({ error: "Describe the line." }).trim().min(1, "Describe the line.").max(200, "Use at most 200 characters."),
    quantity: quantityField,
    unitPriceCents: centsField("the unit price").max(100_000_000, "The unit price is at most 1,000,000.00."),
    discountCents: centsField("the discount").default(0),
    taxable: z.boolean({ error: "Tick the box or not: taxed or not taxed." }).default(true),
  },
  { error: "Each line needs a description, quantity and price." },
);

export const updateQuoteSchema = z.object(
  {
    lines: z.array(quoteLineSchema, { error: "A quote needs at least one line." }).min(1, "A quote needs at least one line.").max(60, "At most 60 lines."),
    discountCents: centsField("the quote discount"),
    notes: z.string({ error: "Enter the notes as text." }).max(2000, "Use at most 2000 characters.").default(""),
  },
  { error: "Send the lines, the quote discount and the notes." },
);

/** Sending: the version of the quote the sender was looking at, so an unseen change is not sent. */
export const sendQuoteSchema = z.object({ seenUpdatedAt: z.iso.datetime({ offset: true, error: "Reload the quote and send it again." }).optional() }, { error: "Reload the quote and send it again." });

export const quoteStatusSchema = z.object(
  {
    to: z.enum(["draft", "declined", "installed"], { error: "Pick back to draft, declined or installed." }),
    note: z.string({ error: "Enter the note as text." }).max(500, "Use at most 500 characters.").optional(),
  },
  { error: "Pick back to draft, declined or installed." },
);

export const publicQuoteActionSchema = z.object({ action: z.enum(["accept", "decline", "pay"], { error: "Choose accept, decline or pay." }) }, { error: "Choose accept, decline or pay." });
