import type { TableColumn } from "@/components/ui/Table";
import { type DisplayPrefs, formatLoad, formatNumber } from "@/lib/comparisons/format";
import { pressureText } from "@/lib/comparisons/pressureText";
import { TRAIL_ANGLE_NAME, type TrailAngle } from "@/lib/comparisons/trailPlan";
import { FitmentInputError, type FitmentMatch, type LoadIndexNeeded, loadIndexNeeded } from "@/lib/fitment";
import { type SetupFigures, loadToCarry, setupFigures } from "@/lib/garage/loadFigures";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import type { Vehicle } from "@/lib/garage/types";
import { candidateSetup } from "./candidate";

const KINDS: TrailAngle["kind"][] = ["approach", "departure", "breakover"];

/**
 * The finder's pressure and angle columns for a vehicle with a stored load profile: per fit, the
 * cold pressure to set (front / rear, every unit), the least load index a tire of that size must
 * have, and each angle with the planned tires and its change. Each sorts, so the fits can be
 * ranked by them. Figures are computed once per fit.
 *
 * The finder's sizes come from a list, not a sidewall: they name no load index, so their pressure
 * cannot be computed (the pressure column says so) — the load index needed is the figure that
 * can, and it differs between fits (a passenger size on a light truck needs 1.10 × the load).
 *
 * @example
 * loadColumns(profile, vehicle, prefs).map((c) => c.id); // ["pressure", "loadIndex", "approach", "departure", "breakover"]
 */
export function loadColumns(profile: LoadProfile | null, vehicle: Vehicle, prefs: DisplayPrefs): TableColumn<FitmentMatch>[] {
  if (!profile) return [];
  const cache = new WeakMap<FitmentMatch, SetupFigures>();
  const figuresOf = (m: FitmentMatch) => {
    let f = cache.get(m);
    if (!f) {
      f = setupFigures(profile, vehicle.currentSetup, candidateSetup(m), prefs.units);
      cache.set(m, f);
    }
    return f;
  };
  const columns: TableColumn<FitmentMatch>[] = [];
  if (profile.placardTire) {
    columns.push({
      id: "pressure",
      header: "Pressure to set (front / rear)",
      sortable: true,
      // The higher axle's pressure; a fit that cannot carry the load has none and sorts last.
      sortValue: (m) => {
        const plan = figuresOf(m).load?.plan;
        return plan ? Math.max(...plan.axles.map((a) => a.pressureToSetKpa)) : null;
      },
      cell: (m) => {
        const load = figuresOf(m).load;
        if (!load) return "—";
        if (!load.plan && load.tireRefused) {
          // The finder's sizes carry no service description: without a load index there is no pressure to compute.
          return (
            <span className="text-basalt-600" title={load.messages[0]}>
              load index not known
            </span>
          );
        }
        if (!load.plan) return <span className="text-contact-700">cannot carry the placard or axle load</span>;
        return (
          <span className="flex flex-col text-xs" data-testid="finder-pressure">
            {load.plan.axles.map((a) => (
              <span key={a.axle} className="whitespace-nowrap">
                {a.axle === "front" ? "F" : "R"} {pressureText(a.pressureToSetKpa, prefs)}
              </span>
            ))}
          </span>
        );
      },
    });
  }
  const carry = loadToCarry(profile);
  if (carry) {
    const needs = new WeakMap<FitmentMatch, LoadIndexNeeded | null>();
    const needOf = (m: FitmentMatch) => {
      if (!needs.has(m)) {
        let n: LoadIndexNeeded | null = null;
        try {
          n = loadIndexNeeded(m.tire, carry.loadKg, { vehicle: profile.vehicleKind });
        } catch (e) {
          if (!(e instanceof FitmentInputError)) throw e;
        }
        needs.set(m, n);
      }
      return needs.get(m) ?? null;
    };
    const basis = `what the placard tire carries at the placard pressure (${carry.axle} axle, ${carry.from})`;
    columns.push({
      id: "loadIndex",
      header: "Load index needed",
      sortable: true,
      sortValue: (m) => needOf(m)?.loadIndex ?? null,
      cell: (m) => {
        const n = needOf(m);
        if (!n) return <span className="text-contact-700">no load index carries {formatLoad(carry.loadKg, prefs)}</span>;
        const why = `${carry.decidedBy === "placard" ? basis : `the ${carry.axle} axle's share (${carry.from})`}: ${formatLoad(carry.loadKg, prefs)} per tire${
          n.derated ? `, × 1.10 for a passenger size on a light truck (FMVSS 120 S5.1.2) = ${formatLoad(n.ratingNeededKg, prefs)}` : ""
        }. ISO 4000-1 load index table.`;
        return (
          <span
            className="flex flex-col text-xs"
            data-testid="finder-load-index"
            title={`At least ${n.loadIndex}: a tire of this size must carry ${why}`}
          >
            <span className="whitespace-nowrap font-semibold">≥ {n.loadIndex}</span>
            <span className="whitespace-nowrap">{formatLoad(n.indexLoadKg, prefs)}</span>
          </span>
        );
      },
    });
  }
  const angleOf = (m: FitmentMatch, kind: TrailAngle["kind"]) => figuresOf(m).angles.find((a) => a.kind === kind);
  const measured: Record<TrailAngle["kind"], boolean> = {
    approach: profile.frontCornerHeightMm !== null,
    departure: profile.rearCornerHeightMm !== null,
    breakover: profile.midHeightMm !== null,
  };
  for (const kind of KINDS.filter((k) => measured[k])) {
    columns.push({
      id: kind,
      header: `${TRAIL_ANGLE_NAME[kind]} (change)`,
      sortable: true,
      sortValue: (m) => angleOf(m, kind)?.plannedDeg ?? null,
      cell: (m) => {
        const a = angleOf(m, kind);
        return a ? (
          <span className="whitespace-nowrap">
            {formatNumber(a.plannedDeg, 1)}° ({formatNumber(a.plannedDeg - a.currentDeg, 1, { signed: true })}°)
          </span>
        ) : (
          "—"
        );
      },
    });
  }
  return columns;
}
