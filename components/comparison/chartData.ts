import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { LoadPlan } from "@/lib/comparisons/loadPlan";
import { pressureIn } from "@/lib/comparisons/pressureText";
import type { SpeedSystem } from "@/lib/comparisons/speedometer";

/**
 * Ticks of the speed axes, in the reader's unit: every 10 mph; every 20 km/h (ten ticks from
 * 20 to 120 would crowd a third of the page). Explicit, so the axis never picks its own
 * uneven steps from the data (16.1, 46.1 …).
 */
export const SPEED_TICKS: Readonly<Record<SpeedSystem, readonly number[]>> = Object.freeze({
  imperial: Object.freeze([10, 20, 30, 40, 50, 60, 70, 80]),
  metric: Object.freeze([20, 40, 60, 80, 100, 120]),
});

/**
 * The series of the two speed charts in the reader's unit, straight from the result's rows for
 * that unit (round speeds; nothing converted here).
 *
 * @example
 * speedCharts(computeComparison(DEFAULT_INPUT), { units: "metric", lengths: "decimal" }).ticks; // [20, 40, 60, 80, 100, 120]
 */
export function speedCharts(r: ComparisonResult, prefs: DisplayPrefs) {
  const sp = r.speedometer.bySystem[prefs.units];
  const rpmRows = r.gearing.bySystem[prefs.units].rows;
  const ticks = SPEED_TICKS[prefs.units];
  return {
    unit: sp.unit,
    ticks: [...ticks],
    domain: [ticks[0]!, ticks[ticks.length - 1]!] as [number, number],
    speeds: sp.rows.map((x) => ({ indicated: x.indicated, true: Math.round(x.actual * 10) / 10, shown: x.indicated })),
    rpm: rpmRows.map((x) => ({
      speed: x.speed,
      current: Math.round(x.currentRpm),
      planned: Math.round(x.plannedRpm),
      regeared: Math.round(x.regearedRpm),
    })),
  };
}

/** A number axis on round ticks: the ticks it shows and the domain they span. */
export interface RoundAxis {
  ticks: number[];
  domain: [number, number];
}

/**
 * Ticks on round numbers of the unit shown (steps of 1, 2 or 5 × a power of ten, at most
 * `maxTicks` of them) spanning `min` … `max`, so an axis over converted figures (psi from kPa)
 * reads 10, 20, 30 rather than the data's own 10.2, 20.2, 30.2.
 *
 * @example
 * roundAxis(10.15, 50, 8); // { ticks: [10, 20, 30, 40, 50], domain: [10, 50] }
 * roundAxis(70, 344.7, 8); // { ticks: [50, 100, 150, 200, 250, 300, 350], domain: [50, 350] }
 */
export function roundAxis(min: number, max: number, maxTicks = 8): RoundAxis {
  const span = Math.max(max - min, Number.EPSILON);
  const base = 10 ** Math.floor(Math.log10(span / maxTicks));
  const count = (s: number) => Math.ceil(max / s - 1e-9) - Math.floor(min / s + 1e-9) + 1;
  // 20 × base always fits from four ticks up: span ≤ 10 × base × maxTicks, so at most maxTicks / 2 + 2 ticks.
  const step = [1, 2, 5, 10].map((f) => f * base).find((s) => count(s) <= maxTicks) ?? 20 * base;
  const lo = Math.floor(min / step + 1e-9);
  const hi = Math.ceil(max / step - 1e-9);
  // Multiply whole numbers by the step, then round off the binary fractions (0.1 × 3 = 0.30000000000000004).
  const ticks = Array.from({ length: hi - lo + 1 }, (_, i) => Number(((lo + i) * step).toPrecision(12)));
  return { ticks, domain: [ticks[0]!, ticks[ticks.length - 1]!] };
}

/**
 * The load chart's pressure axis in the reader's unit (psi or kPa), on round ticks over the
 * plan's curve.
 *
 * @example
 * pressureAxis(plan, { units: "imperial", lengths: "decimal" }).ticks; // [10, 20, 30, 40, 50] for a 50 psi tire
 */
export function pressureAxis(plan: LoadPlan, prefs: DisplayPrefs): RoundAxis {
  const shown = plan.curve.map((c) => pressureIn(c.pressureKpa, prefs));
  return roundAxis(Math.min(...shown), Math.max(...shown));
}
