import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
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
