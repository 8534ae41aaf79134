/**
 * The finder's goals, as a form and the route to the engine's constraints. The bolt pattern
 * comes from the vehicle; the measured points go to the engine whole, with their states and the
 * vehicle's steering axis, so it excludes exactly what the vehicle page predicts will not keep the
 * margin (lib/garage/predict.ts, lib/fitment/clearance.ts).
 */
import { z } from "zod";
import { type FitmentConstraints, DEFAULT_WHEEL_WIDTHS_IN, setupGeometry } from "@/lib/fitment";
import type { VehicleClearance, Vehicle } from "@/lib/garage/types";
import { marginField } from "@/lib/garage/schema";
import { SETUP_LIMITS, toEngineSetup } from "@/lib/setup/model";
import { optionalLengthField } from "@/lib/setup/schema";
import { measuredPoints, steeringAxisOf } from "@/lib/garage/predict";

/** The goal fields as the finder form labels them, for the form and for every message. */
export const FINDER_LABEL = {
  targetDiameterMm: "Target diameter (in)",
  minDiameterMm: "From (in)",
  maxDiameterMm: "To (in)",
  wheelDiameters: "Wheel diameters (in)",
  minWidthIn: "Rim width from (in)",
  maxWidthIn: "Rim width to (in)",
  maxPokeMm: "Most extra poke (mm)",
  margin: "Margin",
} as const;
const L = FINDER_LABEL;

const diameter = (label: string) => optionalLengthField(label, "in", { min: 300, max: 2000 }, "35 in", "mm");

export const finderGoalsSchema = z
  .object({
    targetDiameterMm: diameter(L.targetDiameterMm),
    minDiameterMm: diameter(L.minDiameterMm),
    maxDiameterMm: diameter(L.maxDiameterMm),
    wheelDiameters: z
      .string()
      .trim()
      .max(60, `${L.wheelDiameters}: list at most a few, e.g. 17, 18.`)
      .transform((v, ctx) => {
        if (!v) return null;
        const parts = v.split(/[\s,;]+/).filter(Boolean);
        const nums = parts.map(Number);
        const d = SETUP_LIMITS.wheelDiameterIn;
        if (nums.some((n) => !Number.isFinite(n) || n < d.min || n > d.max)) {
          ctx.addIssue({ code: "custom", message: `${L.wheelDiameters}: list diameters between ${d.min} and ${d.max} in, e.g. 17, 18.` });
          return z.NEVER;
        }
        return [...new Set(nums)];
      }),
    maxPokeMm: optionalLengthField(L.maxPokeMm, "mm", { min: -200, max: 300 }, "25 mm"),
    usePoints: z.boolean(),
    minWidthIn: optionalLengthField(L.minWidthIn, "in", SETUP_LIMITS.wheelWidthIn, "8"),
    maxWidthIn: optionalLengthField(L.maxWidthIn, "in", SETUP_LIMITS.wheelWidthIn, "10"),
    margin: marginField(L.margin),
  })
  .superRefine((g, ctx) => {
    if (g.minDiameterMm !== null && g.maxDiameterMm !== null && g.minDiameterMm > g.maxDiameterMm) {
      ctx.addIssue({
        code: "custom",
        path: ["maxDiameterMm"],
        message: `${L.maxDiameterMm}: must not be below ${L.minDiameterMm}, e.g. 33 to 35-1/2.`,
      });
    }
    if (g.minWidthIn !== null && g.maxWidthIn !== null && g.minWidthIn > g.maxWidthIn) {
      ctx.addIssue({
        code: "custom",
        path: ["maxWidthIn"],
        message: `${L.maxWidthIn}: must not be narrower than ${L.minWidthIn}, e.g. 8 to 10.`,
      });
    }
  });
export type FinderGoalsForm = z.input<typeof finderGoalsSchema>;
export type FinderGoals = z.output<typeof finderGoalsSchema>;

/**
 * What the finder's hints quote about the vehicle itself. These depend on the vehicle only, never
 * on the goals, so a goal that does not read leaves them standing (they are not part of the plan).
 */
export interface FinderBaseline {
  /** The current setup's outboard reach from the hub face, mm. */
  currentOuterSwingMm: number;
  /** Steering axis at the wheel centre, mm inboard of the hub face (for full-lock points). */
  steeringAxisInboardMm: number;
}

/** The vehicle's own figures the finder's goals are measured from. */
export function finderBaseline(vehicle: Vehicle): FinderBaseline {
  return {
    currentOuterSwingMm: setupGeometry(toEngineSetup(vehicle.currentSetup)).outerSwingMm,
    steeringAxisInboardMm: steeringAxisOf(vehicle),
  };
}

export interface FinderPlan extends FinderBaseline {
  constraints: FitmentConstraints;
  wheelWidthsIn: number[] | undefined;
}

/** The engine's constraints for these goals on this vehicle. */
export function finderPlan(goals: FinderGoals, vehicle: Vehicle, clearances: VehicleClearance[]): FinderPlan {
  const baseline = finderBaseline(vehicle);
  const constraints: FitmentConstraints = { boltPattern: vehicle.boltPattern };
  if (goals.targetDiameterMm !== null) constraints.targetDiameterMm = goals.targetDiameterMm;
  if (goals.minDiameterMm !== null) constraints.minDiameterMm = goals.minDiameterMm;
  if (goals.maxDiameterMm !== null) constraints.maxDiameterMm = goals.maxDiameterMm;
  if (goals.wheelDiameters) constraints.wheelDiametersIn = goals.wheelDiameters;
  if (goals.maxPokeMm !== null) constraints.maxOuterSwingMm = Math.max(0, baseline.currentOuterSwingMm + goals.maxPokeMm);
  if (goals.usePoints && clearances.length > 0) {
    constraints.clearancePoints = measuredPoints(clearances);
    constraints.clearanceMarginMm = goals.margin;
    constraints.steeringAxisInboardMm = baseline.steeringAxisInboardMm;
  }
  let widths: number[] | undefined;
  if (goals.minWidthIn !== null || goals.maxWidthIn !== null) {
    const lo = goals.minWidthIn ?? 0;
    const hi = goals.maxWidthIn ?? 99;
    widths = DEFAULT_WHEEL_WIDTHS_IN.filter((w) => w >= lo - 1e-9 && w <= hi + 1e-9);
    if (widths.length === 0) widths = [lo];
  }
  return { constraints, wheelWidthsIn: widths, ...baseline };
}
