/**
 * What the bays-and-hours form and the booking routes accept, shared by the browser and the
 * route handlers. Messages name the field as the screen labels it.
 */
import { z } from "zod";
import { BAY_KINDS, type BookingKind } from "@/lib/platform/db/types";
import { BAY_KIND_LABEL, MAX_SLOT_DAYS, SLOT_STEPS, START_FIELD_LABELS, WEEKDAY_LABEL } from "./vocabulary";
import { hhmmToMinute, isTimeZone } from "./zoned";

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const isRealDate = (s: string) => {
  if (!DATE.test(s)) return false;
  const d = new Date(`${s}T12:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
};

const bayKindField = (what: string) =>
  z.enum(BAY_KINDS, { error: `Pick the kind of bay for ${what}: ${BAY_KINDS.map((k) => BAY_KIND_LABEL[k].toLowerCase()).join(", ")}.` });

const dayHours = z.object({
  weekday: z.number().int().min(1).max(7),
  open: z.boolean({ error: "Say whether the shop opens that day." }),
  opens: z.string().trim(),
  closes: z.string().trim(),
});

/** The bays-and-hours form: the text as typed; the output has minutes and numbers. */
export const baysSetupSchema = z
  .object({
    timeZone: z
      .string({ error: "Enter the shop's time zone." })
      .trim()
      .min(1, "Enter the shop's time zone, e.g. America/Denver.")
      .refine(isTimeZone, "Enter a time zone by its IANA name, e.g. America/Denver or America/Chicago."),
    slotStepMinutes: z.coerce
      .number({ error: "Pick how often a start time is offered." })
      .refine((n) => (SLOT_STEPS as readonly number[]).includes(n), "Offer start times every 15, 30 or 60 minutes."),
    weekdays: z.array(dayHours).length(7, "Give the hours of all seven weekdays."),
    closedDays: z
      .array(
        z.object({
          day: z.string().trim().refine(isRealDate, "Enter the closed date as a calendar date (YYYY-MM-DD)."),
          note: z.string().trim().max(80, "Use at most 80 characters."),
        }),
      )
      .max(366, "List at most 366 closed dates."),
    bays: z
      .array(
        z.object({
          id: z.union([z.literal(""), z.uuid()], { error: "Reload the page: this bay is not known." }).optional(),
          name: z.string({ error: "Name the bay." }).trim().min(1, "Name the bay, e.g. Lift 1.").max(40, "Use at most 40 characters."),
          kind: bayKindField("this bay"),
        }),
      )
      .max(30, "Set up at most 30 bays."),
    serviceTimes: z
      .array(
        z.object({
          catalogItemId: z.uuid({ error: "Reload the page: this service is not known." }),
          minutes: z.coerce
            .number({ error: "Enter the minutes as a number." })
            .int("Use whole minutes.")
            .min(0, "Use 0 to 600 minutes.")
            .max(600, "Use 0 to 600 minutes."),
          bayKind: bayKindField("this service"),
        }),
      )
      .max(200, "At most 200 services."),
  })
  .superRefine((v, ctx) => {
    const seenWeekdays = new Set<number>();
    v.weekdays.forEach((h, i) => {
      const name = WEEKDAY_LABEL[h.weekday] ?? "That day";
      if (seenWeekdays.has(h.weekday))
        ctx.addIssue({ code: "custom", path: ["weekdays", i, "weekday"], message: `${name} is listed twice.` });
      seenWeekdays.add(h.weekday);
      if (!h.open) return;
      const opens = hhmmToMinute(h.opens);
      const closes = hhmmToMinute(h.closes);
      if (opens === null || opens >= 1440)
        ctx.addIssue({ code: "custom", path: ["weekdays", i, "opens"], message: `Enter ${name}'s opening time as HH:MM, e.g. 08:00.` });
      if (closes === null)
        ctx.addIssue({
          code: "custom",
          path: ["weekdays", i, "closes"],
          message: `Enter ${name}'s closing time as HH:MM, e.g. 17:00 (24:00 for midnight).`,
        });
      else if (opens !== null && closes <= opens)
        ctx.addIssue({
          code: "custom",
          path: ["weekdays", i, "closes"],
          message: `${name} closes before it opens: enter a closing time after ${h.opens}.`,
        });
    });
    const days = new Set<string>();
    v.closedDays.forEach((d, i) => {
      if (days.has(d.day)) ctx.addIssue({ code: "custom", path: ["closedDays", i, "day"], message: `${d.day} is listed twice.` });
      days.add(d.day);
    });
    const names = new Set<string>();
    v.bays.forEach((b, i) => {
      const key = b.name.toLowerCase();
      if (names.has(key))
        ctx.addIssue({ code: "custom", path: ["bays", i, "name"], message: `Two bays are called “${b.name}”: give each its own name.` });
      names.add(key);
    });
    const services = new Set<string>();
    v.serviceTimes.forEach((s, i) => {
      if (services.has(s.catalogItemId))
        ctx.addIssue({ code: "custom", path: ["serviceTimes", i, "catalogItemId"], message: "This service is listed twice." });
      services.add(s.catalogItemId);
    });
  });
export type BaysSetupInput = z.input<typeof baysSetupSchema>;
export type BaysSetupValues = z.output<typeof baysSetupSchema>;

/** Opening hours as stored: minutes after local midnight, closed days left out. */
export function openingHoursOf(v: BaysSetupValues): { weekday: number; opens: number; closes: number }[] {
  return v.weekdays
    .filter((h) => h.open)
    .map((h) => ({ weekday: h.weekday, opens: hhmmToMinute(h.opens)!, closes: hhmmToMinute(h.closes)! }));
}

/**
 * A start the customer or the counter picked for a booking of `job`; `bayId` pins the stretch of
 * that bay's kind (counter only). The messages name the time field as that job's screens label it.
 */
export const bookingRequestSchemaFor = (job: BookingKind) =>
  z.object(
    {
      start: z.iso.datetime({ offset: true, error: `${START_FIELD_LABELS[job]}: pick one of the offered times.` }),
      bayId: z.uuid({ error: "Bay: pick one of the shop's bays, or leave it to the calendar." }).optional(),
    },
    { error: `${START_FIELD_LABELS[job]}: pick one of the offered times.` },
  );

/** The install's request (the quote's booking routes). */
export const bookingRequestSchema = bookingRequestSchemaFor("install");
export type BookingRequest = z.infer<typeof bookingRequestSchema>;

/** The customer's request: no bay choice on the public page. */
export const publicBookingSchema = bookingRequestSchema.pick({ start: true });

/** The customer's request on the re-check link. */
export const recheckBookingSchema = bookingRequestSchemaFor("recheck").pick({ start: true });

/**
 * What a route that acts on a booking of either kind takes before it knows the kind: any JSON
 * object, checked against bookingRequestSchemaFor(the booking's kind) by the query.
 */
export const anyBookingRequestSchema = z.record(z.string(), z.unknown(), { error: "Send the new time as a JSON object." });

/** Which days of free slots to list: from a date in the shop's calendar, up to two weeks. */
export const slotsQuerySchema = z.object({
  from: z.string().refine(isRealDate, "From: enter a date as YYYY-MM-DD.").optional(),
  days: z.coerce
    .number({ error: `Days: use 1 to ${MAX_SLOT_DAYS}.` })
    .int(`Days: use 1 to ${MAX_SLOT_DAYS}.`)
    .min(1, `Days: use 1 to ${MAX_SLOT_DAYS}.`)
    .max(MAX_SLOT_DAYS, `Days: use 1 to ${MAX_SLOT_DAYS}.`)
    .optional(),
});

/** The staff calendar's range: a day or a week from a date. */
export const calendarQuerySchema = z.object({
  from: z.string().refine(isRealDate, "From: enter a date as YYYY-MM-DD.").optional(),
  days: z.coerce
    .number({ error: "Days: use 1 or 7." })
    .refine((n) => n === 1 || n === 7, "Days: use 1 or 7.")
    .optional(),
});
