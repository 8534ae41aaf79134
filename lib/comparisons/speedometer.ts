/**
 * Reference speeds and the speedometer statement of a comparison, in each reader's own unit.
 *
 * Speed is proportional to the rolling circumference (v = revolutions × π·D, rolling without
 * slip; handbook kinematics, from memory). A speedometer calibrated on the current tire counts
 * revolutions, so with r = D_planned / D_current:
 * - actual speed = indicated × r: actual is (r − 1) above the indicated speed;
 * - the speedometer shows 1/r of the actual speed: it reads (1 − 1/r) low.
 * The two percentages differ (r = 1.17065: 17.1 % above, 14.6 % low), so every statement names
 * which is which.
 *
 * The round speeds are chosen in each unit (mph for imperial readers, km/h for metric ones)
 * rather than converted from the other, so nobody reads a "96.6 km/h" row. Pure.
 */
import { KM_PER_MILE } from "@/lib/fitment/units";

/** The reader's unit system (the display toggle). */
export type SpeedSystem = "imperial" | "metric";
export type SpeedUnit = "mph" | "km/h";

export const SPEED_UNIT: Readonly<Record<SpeedSystem, SpeedUnit>> = Object.freeze({ imperial: "mph", metric: "km/h" });

/** Indicated speed of the headline figure in each unit (a usual open-road speed; common practice, no source). */
export const HEADLINE_SPEED: Readonly<Record<SpeedSystem, number>> = Object.freeze({ imperial: 60, metric: 100 });

/**
 * Indicated speeds of the speedometer and engine-speed rows, each in its own unit: 10–80 mph in
 * 10s; 20–120 km/h in 10s (takes in the usual 30, 50, 80, 100 and 120 km/h limits).
 */
export const REFERENCE_SPEEDS: Readonly<Record<SpeedSystem, readonly number[]>> = Object.freeze({
  imperial: Object.freeze([10, 20, 30, 40, 50, 60, 70, 80]),
  metric: Object.freeze([20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120]),
});

/**
 * A speed in a unit, in mph (the fitment engine's input unit). Only the engine's call sees the
 * converted figure; the rows keep the round value in the reader's unit.
 *
 * @example
 * toMph(100, "metric"); // 62.137… (100 / 1.609344, NIST SP 811)
 */
export function toMph(value: number, system: SpeedSystem): number {
  return system === "metric" ? value / KM_PER_MILE : value;
}

/**
 * The two percentages of the one diameter ratio r = D_planned / D_current.
 *
 * @example
 * speedometerPercents(939.8 / 802.8); // { trueAbovePct: 17.07, readsLowPct: 14.58 }
 */
export function speedometerPercents(ratio: number): { trueAbovePct: number; readsLowPct: number } {
  return { trueAbovePct: (ratio - 1) * 100, readsLowPct: (1 - 1 / ratio) * 100 };
}

/** Below this either percentage shows as 0.0: the statement then says they match. */
const SAME_PCT = 0.05;
const pct = (x: number) => `${Math.abs(x).toFixed(1)} %`;

/** "actual speed is 17.1 % above the speedometer" (lower case; the caller decides the capital). */
export function trueSpeedPhrase(ratio: number): string {
  const { trueAbovePct } = speedometerPercents(ratio);
  if (Math.abs(trueAbovePct) < SAME_PCT) return "actual speed matches the speedometer";
  return `actual speed is ${pct(trueAbovePct)} ${trueAbovePct > 0 ? "above" : "below"} the speedometer`;
}

/** "reads 14.6 % low" / "reads 3.6 % high" / "reads true". */
export function readingPhrase(ratio: number): string {
  const { readsLowPct } = speedometerPercents(ratio);
  if (Math.abs(readsLowPct) < SAME_PCT) return "reads true";
  return `reads ${pct(readsLowPct)} ${readsLowPct > 0 ? "low" : "high"}`;
}

/**
 * Both percentages in one plain sentence.
 *
 * @example
 * speedometerSentence(939.8 / 802.8); // "Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low."
 */
export function speedometerSentence(ratio: number): string {
  const { trueAbovePct, readsLowPct } = speedometerPercents(ratio);
  if (Math.abs(trueAbovePct) < SAME_PCT && Math.abs(readsLowPct) < SAME_PCT) return "Actual speed matches the speedometer (within 0.1 %).";
  const first = trueSpeedPhrase(ratio);
  return `${first[0]!.toUpperCase()}${first.slice(1)}; the speedometer ${readingPhrase(ratio)}.`;
}

/** A speed as the user entered it: its figure and unit. */
export interface EnteredSpeed {
  value: number;
  unit: SpeedUnit;
}

const isTenth = (x: number, tolerance: number) => Math.abs(x * 10 - Math.round(x * 10)) <= tolerance * 10;

/**
 * Recovers how a stored cruise speed (always mph) was typed. Entries are whole or tenths in
 * their unit; the workspace stores a km/h entry as km/h ÷ 1.609344 and a link carries mph to
 * 4 decimals (±0.00005 mph = ±0.00008 km/h), so a figure that is a tenth of an mph was typed
 * in mph, one within 0.001 of a tenth of a km/h in km/h, and anything else shows in mph.
 *
 * @example
 * enteredSpeed(100 / 1.609344); // { value: 100, unit: "km/h" }
 * enteredSpeed(62.1371);        // { value: 100, unit: "km/h" } (from a link)
 * enteredSpeed(65);             // { value: 65, unit: "mph" }
 */
export function enteredSpeed(mph: number): EnteredSpeed {
  if (isTenth(mph, 1e-9)) return { value: Math.round(mph * 10) / 10, unit: "mph" };
  const kmh = mph * KM_PER_MILE;
  if (isTenth(kmh, 1e-3)) return { value: Math.round(kmh * 10) / 10, unit: "km/h" };
  return { value: mph, unit: "mph" };
}
