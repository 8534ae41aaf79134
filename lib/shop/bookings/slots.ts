/**
 * Free install slots and the check of one chosen start, from the shop's week, its bays, the bay
 * time already held and the job's stretches per kind of bay (workload.ts). Pure: the server
 * runs it on rows it read; PostgreSQL's exclusion constraint is what finally decides a race.
 *
 * A job runs its stretches back to back (fabrication bay → lift bay → alignment rack), each in
 * one bay of its kind, and the whole job within one day's opening hours. Offered starts lie on
 * the shop's step (every 15, 30 or 60 minutes) counted from the opening time.
 */
import type { BayKind, BookingKind } from "@/lib/platform/db/types";
import type { Segment } from "./workload";
import { BAY_KIND_LABEL, START_FIELD_LABELS, WEEKDAY_LABEL } from "./vocabulary";
import { addDays, formatDay, formatDuration, formatMinute, wallTime, weekdayOf, zonedInstant } from "./zoned";

export interface Schedule {
  timeZone: string;
  stepMinutes: number;
  /** By ISO weekday (1 = Monday); a weekday left out is closed. */
  hours: Partial<Record<number, { opens: number; closes: number }>>;
  /** "YYYY-MM-DD" dates the shop is shut, with the owner's note. */
  closedDays: ReadonlyMap<string, string>;
}

export interface BayLite {
  id: string;
  name: string;
  kind: BayKind;
}

/** Bay time already held (by other bookings), in UTC milliseconds, end exclusive. */
export interface Held {
  bayId: string;
  start: number;
  end: number;
}

export interface Placement {
  bayId: string;
  bayKind: BayKind;
  start: Date;
  end: Date;
}

export interface Slot {
  start: Date;
  end: Date;
  placements: Placement[];
}

export interface SlotContext {
  schedule: Schedule;
  /** The shop's bays in the order they are tried (the owner's order). */
  bays: readonly BayLite[];
  held: readonly Held[];
  segments: readonly Segment[];
  now: Date;
  /** The last day a start may fall on, counted from today in the shop's zone. */
  horizonDays: number;
  /** A bay the staff pinned for the stretch of its kind. */
  pinnedBayId?: string;
  /** What is being booked, for the field the messages name; an install when left out. */
  job?: BookingKind;
}

export type SlotProblemCode =
  "no_work" | "no_bay" | "past" | "too_far" | "closed_day" | "closed_weekday" | "outside_hours" | "off_step" | "taken";

export interface SlotProblem {
  code: SlotProblemCode;
  /** Names the field as the screens label it. */
  message: string;
}

const MINUTE = 60_000;
const totalOf = (segments: readonly Segment[]) => segments.reduce((n, s) => n + s.minutes, 0);

/**
 * Puts each stretch in the first bay of its kind that is free for it, starting at `start`;
 * null when some stretch finds none.
 */
export function placeAt(start: number, ctx: Pick<SlotContext, "bays" | "held" | "segments" | "pinnedBayId">): Placement[] | null {
  const out: Placement[] = [];
  let t = start;
  for (const seg of ctx.segments) {
    const end = t + seg.minutes * MINUTE;
    const pinned = ctx.bays.find((b) => b.id === ctx.pinnedBayId && b.kind === seg.bayKind);
    const candidates = pinned ? [pinned] : ctx.bays.filter((b) => b.kind === seg.bayKind);
    const free = candidates.find((b) => !ctx.held.some((h) => h.bayId === b.id && h.start < end && t < h.end));
    if (!free) return null;
    out.push({ bayId: free.id, bayKind: seg.bayKind, start: new Date(t), end: new Date(end) });
    t = end;
  }
  return out;
}

/** The kinds of bay the job needs and the shop lacks. */
function missingKinds(ctx: Pick<SlotContext, "bays" | "segments">): BayKind[] {
  return ctx.segments.map((s) => s.bayKind).filter((k) => !ctx.bays.some((b) => b.kind === k));
}

/** "a lift bay", "an alignment rack". */
function aBay(kind: BayKind): string {
  const words = BAY_KIND_LABEL[kind].toLowerCase();
  return `${/^[aeiou]/.test(words) ? "an" : "a"} ${words}`;
}

const problem = (job: BookingKind | undefined, code: SlotProblemCode, text: string): { ok: false; problem: SlotProblem } => ({
  ok: false,
  problem: { code, message: `${START_FIELD_LABELS[job ?? "install"]}: ${text}` },
});

/**
 * Why this job cannot be booked at any time (no bay work, or a kind of bay the shop lacks), or
 * null when some start may do.
 */
export function cannotBook(ctx: Pick<SlotContext, "bays" | "segments" | "job">): SlotProblem | null {
  if (totalOf(ctx.segments) <= 0)
    return problem(ctx.job, "no_work", "this quote has no work that takes bay time, so there is nothing to book.").problem;
  const lacking = missingKinds(ctx);
  if (lacking.length)
    return problem(ctx.job, "no_bay", `this work needs ${lacking.map(aBay).join(" and ")}, and the shop has none set up.`).problem;
  return null;
}

/**
 * Whether the job can start at `start`, and in which bays. Every refusal names the field and
 * says why in the shop's own hours.
 *
 * @example
 * checkStart(new Date("2027-03-15T15:00:00Z"), ctx); // { ok: true, slot: { start, end, placements: [...] } }
 */
export function checkStart(start: Date, ctx: SlotContext): { ok: true; slot: Slot } | { ok: false; problem: SlotProblem } {
  const { schedule } = ctx;
  const minutes = totalOf(ctx.segments);
  const cannot = cannotBook(ctx);
  if (cannot) return { ok: false, problem: cannot };
  const t = start.getTime();
  if (!Number.isFinite(t) || t <= ctx.now.getTime())
    return problem(ctx.job, "past", "that time has already passed. Pick a time from now on.");
  const local = wallTime(start, schedule.timeZone);
  const today = wallTime(ctx.now, schedule.timeZone).date;
  if (local.date > addDays(today, ctx.horizonDays))
    return problem(
      ctx.job,
      "too_far",
      `bookings open ${ctx.horizonDays} days ahead; pick a day up to ${formatDay(addDays(today, ctx.horizonDays))}.`,
    );
  const closedNote = schedule.closedDays.get(local.date);
  if (closedNote !== undefined)
    return problem(ctx.job, "closed_day", `the shop is closed on ${formatDay(local.date)}${closedNote ? ` (${closedNote})` : ""}.`);
  const hours = schedule.hours[local.weekday];
  if (!hours) return problem(ctx.job, "closed_weekday", `the shop is closed on ${WEEKDAY_LABEL[local.weekday]}s.`);
  const opens = zonedInstant(local.date, hours.opens, schedule.timeZone).getTime();
  const closes = zonedInstant(local.date, hours.closes, schedule.timeZone).getTime();
  const end = t + minutes * MINUTE;
  if (t < opens || end > closes) {
    return problem(
      ctx.job,
      "outside_hours",
      `on ${WEEKDAY_LABEL[local.weekday]}s the shop works ${formatMinute(hours.opens)} to ${formatMinute(hours.closes)}, and this work takes ${formatDuration(minutes)}: pick a start that ends by closing time.`,
    );
  }
  if ((t - opens) % (schedule.stepMinutes * MINUTE) !== 0)
    return problem(ctx.job, "off_step", `pick one of the offered times (every ${schedule.stepMinutes} minutes from opening).`);
  const placements = placeAt(t, ctx);
  if (!placements) return problem(ctx.job, "taken", "that time is already taken in the shop's bays. Pick another time.");
  return { ok: true, slot: { start: new Date(t), end: new Date(end), placements } };
}

export interface SlotDay {
  date: string;
  /** Why there is nothing that day, when the shop is shut. */
  closed?: string;
  slots: Slot[];
}

/**
 * The free starts of `days` days from `fromDate` (the shop's calendar dates), never before
 * `now` nor past the horizon.
 *
 * @example
 * freeSlots({ ...ctx, fromDate: "2027-03-15", days: 7 })[0].slots[0].start; // the first free start on Monday
 */
export function freeSlots(ctx: SlotContext & { fromDate: string; days: number }): SlotDay[] {
  const { schedule } = ctx;
  const minutes = totalOf(ctx.segments);
  const out: SlotDay[] = [];
  if (cannotBook(ctx)) return out;
  const last = addDays(wallTime(ctx.now, schedule.timeZone).date, ctx.horizonDays);
  for (let i = 0; i < ctx.days; i++) {
    const date = addDays(ctx.fromDate, i);
    if (date > last) break;
    const note = schedule.closedDays.get(date);
    if (note !== undefined) {
      out.push({ date, closed: note || "Closed", slots: [] });
      continue;
    }
    const hours = schedule.hours[weekdayOf(date)];
    if (!hours) {
      out.push({ date, closed: "Closed", slots: [] });
      continue;
    }
    const opens = zonedInstant(date, hours.opens, schedule.timeZone).getTime();
    const closes = zonedInstant(date, hours.closes, schedule.timeZone).getTime();
    const slots: Slot[] = [];
    for (let t = opens; t + minutes * MINUTE <= closes; t += schedule.stepMinutes * MINUTE) {
      if (t <= ctx.now.getTime()) continue;
      const placements = placeAt(t, ctx);
      if (placements) slots.push({ start: new Date(t), end: new Date(t + minutes * MINUTE), placements });
    }
    out.push({ date, slots });
  }
  return out;
}
