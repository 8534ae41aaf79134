/**
 * The booking e-mails: confirmation, move, cancellation and the day-before reminder, each with
 * the calendar file (ics.ts) that keeps the customer's calendar in step. Pure composition: the
 * queries queue what this returns in their own transaction.
 */
import type { BookingKind } from "@/lib/platform/db/types";
import type { OutgoingMail } from "@/lib/platform/mail";
import { bookingCalendar, bookingUid } from "./ics";
import { formatClock, formatDuration, formatInstant } from "./zoned";

export type BookingMailKind = "confirmed" | "moved" | "cancelled" | "released" | "reminder";

/** The kinds that take the entry off the customer's calendar. */
const WITHDRAWN: readonly BookingMailKind[] = ["cancelled", "released"];

export interface BookingMailFacts {
  kind: BookingMailKind;
  /** What the booking is for; an install when left out. */
  job?: BookingKind;
  bookingId: string;
  sequence: number;
  start: Date;
  end: Date;
  timeZone: string;
  quoteNumber: number;
  vehicle: string;
  customer: { name: string; email: string };
  shop: { name: string; address: string; phone: string };
  /** The app's public origin, for the calendar UID's host. */
  origin: string;
  /** The sender address the calendar names as organizer. */
  organizerEmail: string;
  /** The time before a move, for the "moved from" line. */
  previousStart?: Date;
}

/** How each kind of booking is named in the mail, the calendar entry and the file. */
const JOB_WORDS: Record<BookingKind, { word: string; title: string; file: string }> = {
  install: { word: "install", title: "Tire and wheel install", file: "install" },
  recheck: { word: "lug and ring re-check", title: "Lug and ring re-check", file: "recheck" },
};

const wordsOf = (f: BookingMailFacts) => JOB_WORDS[f.job ?? "install"];

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The address part of "Name <address>", or the text itself. */
export function addressOf(from: string): string {
  return /<([^>]+)>/.exec(from)?.[1]?.trim() ?? from.trim();
}

function subjectOf(f: BookingMailFacts, when: string): string {
  switch (f.kind) {
    case "confirmed":
      return `Booked: your ${wordsOf(f).word} at ${f.shop.name}, ${when}`;
    case "moved":
      return `Moved: your ${wordsOf(f).word} at ${f.shop.name} is now ${when}`;
    case "cancelled":
      return `Cancelled: your ${wordsOf(f).word} at ${f.shop.name}, ${when}`;
    case "released":
      return `No longer needed: your ${wordsOf(f).word} at ${f.shop.name}, ${when}`;
    case "reminder":
      return `Reminder: your ${wordsOf(f).word} at ${f.shop.name} tomorrow, ${formatClock(f.start, f.timeZone)}`;
  }
}

function leadOf(f: BookingMailFacts, when: string): string {
  switch (f.kind) {
    case "confirmed":
      return `Your ${wordsOf(f).word} for quote Q-${f.quoteNumber} (${f.vehicle}) is booked for ${when}.`;
    case "moved":
      return `Your ${wordsOf(f).word} for quote Q-${f.quoteNumber} (${f.vehicle}) has moved${f.previousStart ? ` from ${formatInstant(f.previousStart, f.timeZone)}` : ""} to ${when}.`;
    case "cancelled":
      return `Your ${wordsOf(f).word} for quote Q-${f.quoteNumber} (${f.vehicle}) on ${when} is cancelled. Call the shop to book another time.`;
    case "released":
      return `The work on quote Q-${f.quoteNumber} (${f.vehicle}) is done, so the ${wordsOf(f).word} booked for ${when} is no longer needed and comes off your calendar.`;
    case "reminder":
      return `A reminder that your ${wordsOf(f).word} for quote Q-${f.quoteNumber} (${f.vehicle}) is tomorrow, ${when}.`;
  }
}

/**
 * @example
 * bookingMail({ kind: "confirmed", ... }).attachments[0].filename; // "install-Q-1001.ics"
 */
export function bookingMail(f: BookingMailFacts): OutgoingMail {
  const minutes = Math.round((f.end.getTime() - f.start.getTime()) / 60_000);
  const when = `${formatInstant(f.start, f.timeZone)} – ${formatClock(f.end, f.timeZone)}`;
  const place = [f.shop.name, f.shop.address].filter(Boolean).join(", ");
  const withdrawn = WITHDRAWN.includes(f.kind);
  const stay = withdrawn ? "" : `Plan on the truck staying ${formatDuration(minutes)}. Bring the lug lock key if your wheels have one.`;
  const calendar = bookingCalendar({
    uid: bookingUid(f.bookingId, f.origin),
    sequence: f.sequence,
    cancelled: withdrawn,
    start: f.start,
    end: f.end,
    title: `${wordsOf(f).title}, ${f.shop.name} (Q-${f.quoteNumber})`,
    location: place,
    description: `Quote Q-${f.quoteNumber}: ${f.vehicle}.${stay ? ` ${stay}` : ""}${f.shop.phone ? ` Shop phone: ${f.shop.phone}.` : ""}`,
    organizer: { name: f.shop.name, email: f.organizerEmail },
    attendee: f.customer,
  });
  const lead = leadOf(f, when);
  const contact = `${f.shop.name}${f.shop.address ? ` · ${f.shop.address}` : ""}${f.shop.phone ? ` · ${f.shop.phone}` : ""}`;
  return {
    to: f.customer.email,
    subject: subjectOf(f, when),
    text: `Hello ${f.customer.name},\n\n${lead}\n\n${stay ? `${stay}\n\n` : ""}The calendar file is attached.\n\n${contact}\n`,
    html: `<p>Hello ${esc(f.customer.name)},</p><p>${esc(lead)}</p>${stay ? `<p>${esc(stay)}</p>` : ""}<p>The calendar file is attached.</p><p>${esc(contact)}</p>`,
    attachments: [
      {
        filename: `${wordsOf(f).file}-Q-${f.quoteNumber}.ics`,
        content: Buffer.from(calendar, "utf8"),
        contentType: `text/calendar; charset=utf-8; method=${withdrawn ? "CANCEL" : "REQUEST"}`,
      },
    ],
  };
}
