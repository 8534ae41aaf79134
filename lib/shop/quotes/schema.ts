import { z } from "zod";
import { QuantityError, parseQuantity } from "@/lib/shop/quotes/quantity";
import { emailField } from "../../accounts/schema";
import { counterVehicleSchema } from "@/lib/shop/customers/schema";
import { requiredText } from "@/lib/platform/validation/requiredText";

export const customerSchema = z
  .object({
    name: requiredText("Enter the customer's name.").max(120, "Use at most 120 characters."),
    phone: z
      .string({ error: "Enter the phone number as text." })
      .trim()
      .max(40, "Use at most 40 characters.")
      .regex(/^[0-9+()\-.\s]*$/, "Use digits, spaces and + ( ) - . only."),
    email: z.union([z.literal(""), emailField]),
  })
  .refine((c) => c.phone.replace(/\D/g, "").length >= 7 || c.email !== "", {
    path: ["phone"],
    message: "Enter a phone number (7 digits or more) or an e-mail address.",
  });
export type CustomerInput = z.infer<typeof customerSchema>;

export const customerSearchSchema = z.object({
  q: requiredText("Type a phone number, e-mail or name.").max(120, "Use at most 120 characters."),
});

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
      vehicle: counterVehicleSchema.optional(),
      saveVehicle: z.boolean({ error: "Say whether to save the vehicle (tick the box or not)." }).optional(),
      tireItemId: uuidField("Pick a tire."),
      wheelItemId: uuidField("Pick a wheel."),
      quantity: z.union([z.literal(4), z.literal(5)], { error: "Quote 4 tires and wheels, or 5 with a spare." }),
    },
    { error: "Send the quote as a form." },
  )
  // Both: a saved vehicle the counter changed; `saveVehicle` then writes the changes over it.
  .refine((q) => !!q.vehicle || !!q.vehicleId, { path: ["vehicle"], message: "Enter the vehicle or pick a saved one." });

export const QUOTE_LINE_KINDS = ["tire", "wheel", "service", "custom"] as const;
export const QUOTE_LINE_UNITS = ["each", "hour"] as const;

/**
 * A quantity as a number or as typed ("1 1/2", "1:30"); read as hours here, the most a line
 * can take. Whether the line may be a part hour is the server's call: it knows from the catalog
 * which items are sold by the hour (lib/shop/quotes/queries.ts).
 */
const quantityField = z.union([z.number(), z.string()], { error: "Enter a quantity, e.g. 4, or 1.5 for hours." }).transform((v, ctx) => {
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
    lines: z
      .array(quoteLineSchema, { error: "A quote needs at least one line." })
      .min(1, "A quote needs at least one line.")
      .max(60, "At most 60 lines."),
    discountCents: centsField("the quote discount"),
    notes: z.string({ error: "Enter the notes as text." }).max(2000, "Use at most 2000 characters.").default(""),
    /** The version the editor was showing: a quote saved since (another window, a colleague) is not overwritten. */
    seenUpdatedAt: z.iso.datetime({ offset: true, error: "Reload the quote and save again." }).optional(),
  },
  { error: "Send the lines, the quote discount and the notes." },
);

/** Sending: the version of the quote the sender was looking at, so an unseen change is not sent. */
export const sendQuoteSchema = z.object(
  { seenUpdatedAt: z.iso.datetime({ offset: true, error: "Reload the quote and send it again." }).optional() },
  { error: "Reload the quote and send it again." },
);

export const quoteStatusSchema = z.object(
  {
    to: z.enum(["draft", "declined", "installed"], { error: "Pick back to draft, declined or installed." }),
    note: z.string({ error: "Enter the note as text." }).max(500, "Use at most 500 characters.").optional(),
  },
  { error: "Pick back to draft, declined or installed." },
);

export const publicQuoteActionSchema = z.object(
  { action: z.enum(["accept", "decline", "pay"], { error: "Choose accept, decline or pay." }) },
  { error: "Choose accept, decline or pay." },
);
