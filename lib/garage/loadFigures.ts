/**
 * The pressure to set and the trail-angle changes of a planned setup on a garage vehicle, from
 * its stored load profile: the workspace's own plans (lib/comparisons/loadPlan, trailPlan) with
 * the vehicle's placard, its axle loads (scale ticket, else the axle ratings) and its body points
 * measured with the current tires. No lift change: a planned setup is wheels and tires.
 */
import { type LoadErrors, type LoadPlan, planLoad } from "@/lib/comparisons/loadPlan";
import { type TrailAngle, planTrail } from "@/lib/comparisons/trailPlan";
import { setupGeometry } from "@/lib/fitment";
import { type LoadProfile, type Units, axleLoadsOf, profileLabels, trailLabelsOf } from "@/lib/garage/loadProfile";
import { type Setup, toEngineSetup } from "@/lib/setup/model";

export interface SetupFigures {
  /** null: no placard or no axle loads stored. */
  load: {
    plan: LoadPlan | null;
    messages: string[];
    /** The planned tire itself was refused (typically: its size names no load index), not the load it must carry. */
    tireRefused: boolean;
    from: "scale ticket" | "axle ratings (GAWR)";
  } | null;
  /** Angles with the current and the planned tires; empty when no body point is stored. */
  angles: TrailAngle[];
  /** Messages of angles that could not be computed (a body point the planned tire would reach). */
  angleMessages: string[];
}

/** What to tell someone whose profile lacks the figures a part needs (the vehicle page's wording). */
export function missingText(profile: LoadProfile | null): { load: string | null; angles: string | null } {
  const p = profile;
  return {
    load:
      p?.placardTire && axleLoadsOf(p)
        ? null
        : "Add the placard and the axle weights (or the axle ratings) on the vehicle page to see the pressure to set.",
    angles:
      p && (p.frontCornerHeightMm !== null || p.rearCornerHeightMm !== null || p.midHeightMm !== null)
        ? null
        : "Add the body points on the vehicle page to see the approach, departure and breakover angles.",
  };
}

/**
 * @example
 * setupFigures(profile, vehicle.currentSetup, { ...plannedSetup, tire: "37x12.50R17LT 124Q LRD" }, "imperial");
 * // { load: { plan: { axles: [{ axle: "front", pressureToSetKpa: … }, …] }, … }, angles: [{ kind: "approach", currentDeg, plannedDeg }, …] }
 */
export function setupFigures(profile: LoadProfile, current: Setup, planned: Setup, units: Units): SetupFigures {
  const labels = profileLabels(units);
  const loads = axleLoadsOf(profile);
  let load: SetupFigures["load"] = null;
  if (profile.placardTire && profile.placardFrontKpa !== null && profile.placardRearKpa !== null && loads) {
    const scale = loads.from === "scale ticket";
    const { plan, errors } = planLoad(
      {
        placardTire: profile.placardTire,
        plannedTire: planned.tire,
        vehicle: profile.vehicleKind,
        placardFrontKpa: profile.placardFrontKpa,
        placardRearKpa: profile.placardRearKpa,
        frontAxleKg: loads.frontKg,
        rearAxleKg: loads.rearKg,
      },
      {
        placardTire: labels.placardTire,
        placardFront: labels.placardFrontKpa,
        placardRear: labels.placardRearKpa,
        frontAxle: scale ? labels.frontAxleKg : labels.frontGawrKg,
        rearAxle: scale ? labels.rearAxleKg : labels.rearGawrKg,
        plannedTire: "Planned tire",
        plannedMaxLoad: "Planned tire",
        plannedMaxPressure: "Planned tire",
      },
    );
    const errs = errors as LoadErrors;
    load = {
      plan,
      messages: Object.values(errs).filter((m): m is string => Boolean(m)),
      tireRefused: Boolean(errs.plannedTire),
      from: loads.from,
    };
  }
  const d = (s: Setup) => setupGeometry(toEngineSetup(s)).overallDiameterMm;
  const trail = planTrail(
    {
      currentDiameterMm: d(current),
      plannedDiameterMm: d(planned),
      frontHeightMm: profile.frontCornerHeightMm,
      frontAheadMm: profile.frontCornerAheadMm,
      rearHeightMm: profile.rearCornerHeightMm,
      rearBehindMm: profile.rearCornerBehindMm,
      wheelbaseMm: profile.wheelbaseMm,
      midHeightMm: profile.midHeightMm,
      liftMm: 0,
    },
    trailLabelsOf(labels),
  );
  return { load, angles: trail.angles, angleMessages: Object.values(trail.errors).filter((m): m is string => Boolean(m)) };
}
