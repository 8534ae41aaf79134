/**
 * The finder's goals, as a form and the route to the engine's constraints. The bolt pattern
 * comes from the vehicle; the measured points go to the engine whole, with their states and the
 * vehicle's steering axis, so it excludes exactly what the vehicle page predicts will not keep the
 * margin (lib/garage/predict.ts, lib/fitment/clearance.ts).
 */
import { z } from "zod";
import { type FitmentConstraints, DEFAULT_WHEEL_WIDTHS_IN, setupGeometry } from "@/lib/fitment";
import type { VehicleClearance, Vehicle } from "@/lib/garage/types";
import { marginSchema } from "@/lib/validation/garage";
import { optionalLengthField, toEngineSetup } from "@/lib/validation/setup";
import { measuredPoints, steeringAxisOf } from "@/lib/garage/predict";

const diameter = (label: string) => optionalLengthField(label, "in", { min: 300, max: 2000 }, "35 in", "mm");

export const finderGoalsSchema = z
  .object({
    targetDiameterMm: diameter("the target diameter"),
    minDiameterMm: diameter("the smallest diameter"),
    maxDiameterMm: diameter("the largest diameter"),
    wheelDiameters: z
      .string()
      .trim()
      .max(60, "List at most a few wheel diameters (e.g. 17, 18).")
      .transform((v, ctx) => {
        if (!v) return null;
        const parts = v.split(/[\s,;]+/).filter(Boolean);
        const nums = parts.map(Number);
        if (nums.some((n) => !Number.isFinite(n) || n < 8 || n > 30)) {
          ctx.addIssue({ code: "custom", message: "List wheel diameters in inches between 8 and 30, e.g. 17, 18." });
          return z.NEVER;
        }
        return [...new Set(nums)];
      }),
    maxPokeMm: optionalLengthField("the most extra poke", "mm", { min: -200, max: 300 }, "25 mm"),
    usePoints: z.boolean(),
    minWidthIn: optionalLengthField("the narrowest rim", "in", { min: 3, max: 20 }, "8"),
    maxWidthIn: optionalLengthField("the widest rim", "in", { min: 3, max: 20 }, "10"),
    margin: marginSchema,
  })
  .superRefine((g, ctx) => {
    if (g.minDiameterMm !== null && g.maxDiameterMm !== null && g.minDiameterMm > g.maxDiameterMm) {
      ctx.addIssue({ code: "custom", path: ["maxDiameterMm"], message: "The largest diameter must not be below the smallest." });
    }
    if (g.minWidthIn !== null && g.maxWidthIn !== null && g.minWidthIn > g.maxWidthIn) {
      ctx.addIssue({ code: "custom", path: ["maxWidthIn"], message: "The widest rim must not be narrower than the narrowest." });
    }
  });
export type FinderGoalsForm = z.input<typeof finderGoalsSchema>;
export type FinderGoals = z.output<typeof finderGoalsSchema>;

export interface FinderPlan {
  constraints: FitmentConstraints;
  wheelWidthsIn: number[] | undefined;
  currentOuterSwingMm: number;
  /** Steering axis at the wheel centre, mm inboard of the hub face (for full-lock points). */
  steeringAxisInboardMm: number;
}

/** The engine's constraints for these goals on this vehicle. */
export function finderPlan(goals: FinderGoals, vehicle: Vehicle, clearances: VehicleClearance[]): FinderPlan {
  const current = setupGeometry(toEngineSetup(vehicle.currentSetup));
  const axis = steeringAxisOf(vehicle);
  const constraints: FitmentConstraints = { boltPattern: vehicle.boltPattern };
  if (goals.targetDiameterMm !== null) constraints.targetDiameterMm = goals.targetDiameterMm;
  if (goals.minDiameterMm !== null) constraints.minDiameterMm = goals.minDiameterMm;
  if (goals.maxDiameterMm !== null) constraints.maxDiameterMm = goals.maxDiameterMm;
  if (goals.wheelDiameters) constraints.wheelDiametersIn = goals.wheelDiameters;
  if (goals.maxPokeMm !== null) constraints.maxOuterSwingMm = Math.max(0, current.outerSwingMm + goals.maxPokeMm);
  if (goals.usePoints && clearances.length > 0) {
    constraints.clearancePoints = measuredPoints(clearances);
    constraints.clearanceMarginMm = goals.margin;
    constraints.steeringAxisInboardMm = axis;
  }
  let widths: number[] | undefined;
  if (goals.minWidthIn !== null || goals.maxWidthIn !== null) {
    const lo = goals.minWidthIn ?? 0;
    const hi = goals.maxWidthIn ?? 99;
    widths = DEFAULT_WHEEL_WIDTHS_IN.filter((w) => w >= lo - 1e-9 && w <= hi + 1e-9);
    if (widths.length === 0) widths = [lo];
  }
  return { constraints, wheelWidthsIn: widths, currentOuterSwingMm: current.outerSwingMm, steeringAxisInboardMm: axis };
}
