/**
 * The install checklist for a vehicle and a planned setup: the work the change implies, each
 * item with the engine's figures. Pure; the page renders it and the handler checks ticked ids
 * against it. What the change calls for (points to trim, a regear, the load to check) comes from
 * the findings of assessChange (lib/comparisons/assess); figures: predictions
 * (lib/fitment/clearance.ts), speedometer (compareSetups), crisscross order (tighteningSequence).
 */
import {
  type ClearancePrediction,
  DEFAULT_AXLE_RATIO,
  compareSetups,
  formatLength,
  kgToLb,
  parseBoltPattern,
  tighteningSequence,
} from "@/lib/fitment";
import { assessChange } from "@/lib/comparisons/assess/assessChange";
import { REGEAR_WARN_PCT } from "@/lib/comparisons/assess/thresholds";
import { findingsOf } from "@/lib/comparisons/assess/vocabulary";
import { bothUnits } from "@/lib/garage/format";
import type { Vehicle, VehicleClearance } from "@/lib/garage/types";
import { type Setup, toEngineSetup } from "@/lib/setup/model";
import { predictPoints } from "@/lib/garage/predict";
import { type SetupFigures, setupFigures } from "@/lib/garage/loadFigures";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import { PRESSURE_CAUTION, pressureText } from "@/lib/comparisons/pressureText";
import { TRAIL_ANGLE_NAME } from "@/lib/comparisons/trailPlan";

const PSI_FIRST = { units: "imperial", lengths: "decimal" } as const;

/** "front 29.2 psi (201 kPa, 2.01 bar), rear …", or null without a computed plan. */
function pressureToSetText(f: SetupFigures | null): string | null {
  const plan = f?.load?.plan;
  return plan ? plan.axles.map((a) => `${a.axle} ${pressureText(a.pressureToSetKpa, PSI_FIRST)}`).join(", ") : null;
}

/** "approach 43.0° → 48.2° (+5.2°), …", or null without body points. */
function anglesText(f: SetupFigures | null): string | null {
  if (!f || f.angles.length === 0) return null;
  const d = (x: number) => `${x.toFixed(1)}°`;
  return f.angles
    .map(
      (a) =>
        `${TRAIL_ANGLE_NAME[a.kind].toLowerCase()} ${d(a.currentDeg)} → ${d(a.plannedDeg)} (${a.plannedDeg >= a.currentDeg ? "+" : "−"}${d(Math.abs(a.plannedDeg - a.currentDeg))})`,
    )
    .join(", ");
}

export type ChecklistGroup = "fit" | "drivetrain" | "wheels" | "tires";
export const GROUP_TITLE: Record<ChecklistGroup, string> = {
  fit: "Clearance and suspension",
  drivetrain: "Gearing, speedometer and alignment",
  wheels: "Mounting the wheels",
  tires: "Tires, spare, load and pressure",
};

export interface ChecklistItem {
  id: string;
  group: ChecklistGroup;
  title: string;
  detail: string;
  caution?: string;
}

export interface Checklist {
  items: ChecklistItem[];
  predictions: { clearance: VehicleClearance; prediction: ClearancePrediction }[];
}

const DIRECTION_FIX: Record<VehicleClearance["direction"], string> = {
  inboard: "trim or relieve the part, or choose a wheel that sits further outboard (less backspacing)",
  outboard: "trim the lip or fit wider flares, or choose a wheel that sits further inboard (more backspacing)",
  upward: "trim the fender or liner, add lift, or limit up-travel with longer bump stops",
  "fore-aft": "trim the bumper or body mount, or limit steering travel with the stops",
};

export function buildChecklist(input: {
  vehicle: Vehicle;
  clearances: VehicleClearance[];
  planned: Setup;
  marginMm: number;
  /** The vehicle's stored placard, axle weights and body points, when it keeps them. */
  loadProfile?: LoadProfile | null;
}): Checklist {
  const { vehicle: v, clearances, planned, marginMm } = input;
  const pla = toEngineSetup(planned);
  const cmp = compareSetups(toEngineSetup(v.currentSetup), pla, {
    kingpinInclinationDeg: v.kingpinInclinationDeg ?? undefined,
    axleRatio: v.axleRatio ?? undefined,
    transmissionRatio: v.transmissionRatio ?? undefined,
    speedsMph: [65],
  });
  const fromStock = compareSetups(toEngineSetup(v.stockSetup), pla, { speedsMph: [60] });
  const preds = predictPoints(clearances, planned, marginMm, v);
  const predictions = clearances.map((clearance, i) => ({ clearance, prediction: preds[i]! }));
  const findings = assessChange(cmp, {
    points: predictions.map(({ clearance: c, prediction }) => ({ id: c.id, label: c.label, prediction })),
  });
  const items: ChecklistItem[] = [];

  // --- fit
  const points = findingsOf(findings, "clearance");
  for (const { figures: p } of points) {
    items.push({
      id: `trim:${p.pointId}`,
      group: "fit",
      title: `${p.status === "contact" ? "Contact" : "Tight"} at ${p.label}: gain at least ${bothUnits(p.shortfallMm)}`,
      detail: `Predicted ${bothUnits(p.predictedMm)} against a ${bothUnits(p.marginMm)} margin (measured ${bothUnits(p.measuredMm)} at ${p.state.replace("-", " ")}). To fix: ${DIRECTION_FIX[p.direction]}${p.state === "full-lock" && p.direction !== "fore-aft" ? ", or limit steering travel with the stops" : ""}.`,
    });
  }
  const upShort = Math.max(
    0,
    ...points.filter((f) => f.figures.direction === "upward" || f.figures.direction === "fore-aft").map((f) => f.figures.shortfallMm),
  );
  if (upShort > 0) {
    items.push({
      id: "lift",
      group: "fit",
      title: `Lift or trim: the upward and full-lock points need ${bothUnits(upShort)} more room`,
      detail: `The planned tire is ${bothUnits(Math.abs(cmp.diameterChangeMm))} ${cmp.diameterChangeMm >= 0 ? "taller" : "shorter"} (radius ${bothUnits(Math.abs(cmp.groundClearanceChangeMm))}).${v.liftHeightMm !== null ? ` Current lift: ${bothUnits(v.liftHeightMm)}.` : ""} Lift alone does not cure full-lock rub on a bumper or body mount.`,
      caution:
        "Lift and steering changes alter handling and braking: follow the kit maker's instructions and local rules, and have steering and brake work done or checked by a qualified technician.",
    });
  }
  items.push({
    id: "cycle",
    group: "fit",
    title: "Cycle the suspension and steering with the new tires before driving",
    detail:
      "Full lock both ways at ride height, then with each wheel at full stuff (jack or ramp, vehicle supported), and check every measured point. Predictions assume the suspension moves as when measured.",
    caution: "Never work under a vehicle held only by a jack: use rated stands on firm ground.",
  });

  // --- drivetrain
  const g = cmp.gearing;
  const rpm = g.rpmAt[0];
  const [regear] = findingsOf(findings, "regear");
  const assumed = v.axleRatio === null ? ` (No axle ratio is recorded for the vehicle; ${DEFAULT_AXLE_RATIO.toFixed(2)} was assumed.)` : "";
  if (regear) {
    const x = regear.figures;
    items.push({
      id: "regear",
      group: "drivetrain",
      title: `Regear from ${x.axleRatio.toFixed(2)} to ${x.suggestedRatio.toFixed(2)}`,
      detail: `Restoring today's engine speed needs ${x.ratioToRestore.toFixed(2)}; ${x.suggestedRatio.toFixed(2)} is the nearest common ratio.${rpm ? ` At 65 mph: ${Math.round(rpm.currentRpm)} rpm now, ${Math.round(rpm.plannedRpm)} rpm with the planned tire, ${Math.round(rpm.regearedRpm)} rpm regeared.` : ""}${assumed}`,
      caution: "Ring-and-pinion setup needs the maker's backlash and preload figures; it is specialist work.",
    });
  } else {
    items.push({
      id: "regear",
      group: "drivetrain",
      title: `Gearing: no regear suggested (stays ${g.axleRatio.toFixed(2)})`,
      detail:
        g.suggestedRatio === g.axleRatio
          ? `The ratio that restores engine speed is ${g.ratioToRestore.toFixed(2)}, nearest the current ${g.axleRatio.toFixed(2)}.`
          : `The ratio that restores engine speed is ${g.ratioToRestore.toFixed(2)}, less than ${REGEAR_WARN_PCT} % from the current ${g.axleRatio.toFixed(2)}: a regear is advised from ${REGEAR_WARN_PCT} % (common practice, no source).`,
    });
  }
  const sp = fromStock.speedometer;
  items.push({
    id: "speedometer",
    group: "drivetrain",
    title: `Speedometer correction factor ${sp.ratio.toFixed(3)}`,
    detail: `Planned tire ÷ stock tire diameter. With the speedometer set for the stock tire, an indicated 60 mph is ${sp.rows[0]!.actualMph.toFixed(1)} mph. Recalibrate by the vehicle maker's procedure, or multiply readings by the factor.`,
  });
  items.push({
    id: "alignment",
    group: "drivetrain",
    title: "Alignment after fitting",
    detail:
      v.frontSuspension === "solid-axle"
        ? "Solid front axle: set toe, check caster, steering stops and the steering wheel centre."
        : "Independent front suspension: set camber, caster and toe to the maker's figures; lift kits may list their own.",
  });

  // --- wheels
  const bp = parseBoltPattern(v.boltPattern);
  const order = tighteningSequence(bp.boltCount);
  items.push({
    id: "lug-torque",
    group: "wheels",
    title: `Lug nuts to the vehicle maker's torque, in a star pattern: ${order.join("-")}`,
    detail: `${bp.boltCount} studs on ${bp.text}. Start every nut by hand, snug in that order, then torque in two or three passes in the same order with a torque wrench — not an impact gun alone. Check the wheel maker's seat type (conical, ball or flat) matches the nuts.`,
    caution: "The vehicle maker's (or wheel maker's) torque figure always wins.",
  });
  items.push({
    id: "lug-recheck",
    group: "wheels",
    title: "Re-check lug torque after the first 50–100 miles",
    detail: "Common practice, no source: new wheels can settle on the hub. Re-torque in the same order.",
  });
  if (v.hubBoreMm !== null) {
    items.push({
      id: "hub-bore",
      group: "wheels",
      title: `Hub bore ${formatLength(v.hubBoreMm, { unit: "mm" })}: wheel bore matches or hub-centric rings fitted`,
      detail: "A wheel with a larger bore centres on the lugs only; a ring the size of the hub makes it hub-centric.",
    });
  }
  items.push({
    id: "brakes",
    group: "wheels",
    title: "Spin each wheel by hand: no contact with calipers, brake lines or sensors",
    detail: "Spoke and barrel clearance to the brakes is not predicted from the measured points.",
  });
  items.push({
    id: "beadlock",
    group: "wheels",
    title: "If the wheels are beadlocks: ring bolts to the wheel maker's figure in crisscross order",
    detail: "Several passes, crisscross, to the wheel maker's figure; re-check ring bolts after the first run and after airing down.",
    caution:
      "Seat beads in a cage or with a clip-on chuck while standing clear; never exceed the bead-seating pressure on the sidewall; follow the wheel maker's instructions.",
  });

  // --- tires
  items.push({
    id: "spare",
    group: "tires",
    title: `Spare fits: the planned ${bothUnits(cmp.planned.overallDiameterMm)} tire in the carrier or spare mount`,
    detail:
      "Check the spare location, the carrier's load rating and that the spare can be lowered and lifted. On four-wheel drive, a spare of another diameter is for short distances only.",
  });
  const l = findingsOf(findings, "load")[0]?.figures;
  items.push({
    id: "load",
    group: "tires",
    title:
      !l || l.index === null || l.kg === null
        ? "Load: check the load index against the axle ratings"
        : `Load: index ${l.index} = ${Math.round(l.kg)} kg (${Math.round(kgToLb(l.kg))} lb) per tire`,
    detail:
      "Two tires must carry at least each axle's rating on the door placard (ISO 4000-1 load index table), with the pressure that goes with it.",
  });
  items.push({
    id: "pressure",
    group: "tires",
    title:
      l && l.maxPressurePsi !== null
        ? `Pressure: from the tire maker's load/inflation table, never above the sidewall maximum (load range ${l.loadRange}: ${l.maxPressurePsi} psi)`
        : "Pressure: from the tire maker's load/inflation table, never above the sidewall maximum",
    detail:
      `A bigger tire usually needs a different pressure from the placard's for the same load. ${l && l.maxPressureKpa !== null ? `${l.maxPressurePsi} psi = ${Math.round(l.maxPressureKpa)} kPa (from memory, TRA practice — the sidewall wins).` : ""}`.trim(),
    caution: "Inflate a tire on the vehicle or in a cage, standing clear of the sidewall.",
  });
  const figures = input.loadProfile ? setupFigures(input.loadProfile, v.currentSetup, planned, "imperial") : null;
  const pressureItem = items.find((i) => i.id === "pressure")!;
  const set = pressureToSetText(figures);
  if (set) {
    pressureItem.title = `Pressure: set cold to ${set}`;
    pressureItem.detail = `${pressureItem.detail} From the vehicle's placard and ${figures!.load!.from}: the equivalent pressure, never below the road minimum. ${PRESSURE_CAUTION}`;
  }
  const angles = anglesText(figures);
  if (angles) {
    items.push({
      id: "trail-angles",
      group: "fit",
      title: `Trail angles: ${angles}`,
      detail:
        "From the body points measured with the current tires, raised by the radius change (SAE J1100 definitions). Re-measure after fitting; check bumpers, air dam and skid plates.",
    });
  }
  return { items, predictions };
}
