import type { TorqueEntry } from "@/lib/fitment";

/**
 * What the ring helper keeps across a reload: the bolt count and torque as typed, and the bolts
 * ticked for that ring. A technician halfway round a wheel whose phone reloads the page (a lock
 * screen, a tab the browser put to sleep) finds their place again. Kept in sessionStorage: this
 * tab only, gone when it is closed, so a new ring starts clean.
 */
export interface RingMemory {
  countText: string;
  torque: TorqueEntry;
  /** The ticks and the ring they belong to (see useTickOff's key); null when nothing is ticked. */
  ticks: { key: string; done: number[][] } | null;
}

export const RING_MEMORY_KEY = "hubface.beadlock";

const isNumberLists = (v: unknown): v is number[][] =>
  Array.isArray(v) && v.every((l) => Array.isArray(l) && l.every((n) => Number.isInteger(n) && n > 0));

/**
 * The remembered ring, or null when there is none or it is not one this version wrote (then the
 * helper starts clean rather than guess).
 *
 * @example
 * readRingMemory('{"countText":"32","torque":{"text":"18","unit":"ftlb","exact":null},"ticks":null}');
 * // { countText: "32", torque: { text: "18", unit: "ftlb", exact: null }, ticks: null }
 * readRingMemory("not json"); // null
 */
export function readRingMemory(raw: string | null): RingMemory | null {
  if (!raw) return null;
  let v: unknown;
  try {
    v = JSON.parse(raw);
  } catch {
    return null;
  }
  if (typeof v !== "object" || v === null) return null;
  const m = v as Record<string, unknown>;
  const t = m.torque as Record<string, unknown> | undefined;
  const exact = t?.exact as Record<string, unknown> | null | undefined;
  const ticks = m.ticks as Record<string, unknown> | null | undefined;
  const ok =
    typeof m.countText === "string" &&
    typeof t?.text === "string" &&
    (t.unit === "ftlb" || t.unit === "nm") &&
    (exact === null || (typeof exact?.nm === "number" && Number.isFinite(exact.nm) && typeof exact.text === "string")) &&
    (ticks === null || (typeof ticks?.key === "string" && isNumberLists(ticks.done)));
  return ok ? (v as RingMemory) : null;
}
