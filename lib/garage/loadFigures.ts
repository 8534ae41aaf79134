/**
 * The pressure to set and the trail-angle changes of a planned setup on a garage vehicle, from
 * its stored load profile: the workspace's own plans (lib/comparisons/loadPlan, trailPlan) with
 * the vehicle's placard, its axle loads (scale ticket, else the axle ratings) and its body points
 * measured with the current tires. No lift change: a planned setup is wheels and tires.
 */
import { type LoadErrors, type LoadPlan, planLoad } from "@/lib/comparisons/loadPlan";
import { type TrailAngle, planTrail } from "@/lib/comparisons/trailPlan";
import { FitmentInputError, loadAtPressure, setupGeometry } from "@/lib/fitment";
import { type AxleLoadSource, type LoadProfile, type Units, axleLoadsOf, profileLabels, trailLabelsOf } from "@/lib/garage/loadProfile";
import { type Setup, toEngineSetup } from "@/lib/setup/model";

export interface SetupFigures {
  /** null: no placard or no axle loads stored. */
  load: {
    plan: LoadPlan | null;
    messages: string[];
    /** The planned tire itself was refused (typically: its size names no load index), not the load it must carry. */
    tireRefused: boolean;
    from: AxleLoadSource;
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
      { units, lengths: "decimal" },
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

/** What one planned tire must carry on this vehicle, and which axle and figure decide it. */
export interface LoadToCarry {
  loadKg: number;
  axle: "front" | "rear";
  decidedBy: "placard" | "axle load";
  from: AxleLoadSource;
}

/**
 * The load one planned tire must be able to carry at its maximum pressure: over both axles, the
 * most of what the placard tire carries at the placard pressure (a replacement carries at least
 * what the vehicle maker's tire did — the equivalence behind the pressure to set) and the axle's
 * share (half the axle load). null without a placard or axle loads, or when the placard's own
 * figures are refused (the vehicle page shows why).
 *
 * Sources: TRA load formulas via lib/fitment's loadAtPressure; FMVSS 120 S5.1.2 (÷ 1.10).
 *
 * @example
 * loadToCarry(DEMO_PROFILE); // { loadKg: ≈ 1027.1, axle: "front", decidedBy: "placard", from: "scale ticket" }
 */
export function loadToCarry(profile: LoadProfile): LoadToCarry | null {
  const loads = axleLoadsOf(profile);
  const { placardTire, placardFrontKpa, placardRearKpa } = profile;
  if (!loads || !placardTire || placardFrontKpa === null || placardRearKpa === null) return null;
  const sides = [
    { axle: "front", kpa: placardFrontKpa, share: loads.frontKg / 2 },
    { axle: "rear", kpa: placardRearKpa, share: loads.rearKg / 2 },
  ] as const;
  let best: LoadToCarry | null = null;
  for (const side of sides) {
    let placardKg: number;
    try {
      placardKg = loadAtPressure(placardTire, side.kpa, { vehicle: profile.vehicleKind }).loadKg;
    } catch (e) {
      if (e instanceof FitmentInputError) return null;
      throw e;
    }
    const byPlacard = placardKg >= side.share;
    const loadKg = byPlacard ? placardKg : side.share;
    if (!best || loadKg > best.loadKg) best = { loadKg, axle: side.axle, decidedBy: byPlacard ? "placard" : "axle load", from: loads.from };
  }
  return best;
}
