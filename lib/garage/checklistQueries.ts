import "server-only";
import type { Knex } from "knex";
import type { ComparisonInput } from "@/lib/comparisons/schema";
import { type Checklist, buildChecklist } from "@/lib/garage/checklist";
import { loadProfilesOf } from "@/lib/garage/loadQueries";
import { setupQuery } from "@/lib/setup/url";
import type { VehicleDetail } from "@/lib/garage/types";
import type { Setup } from "@/lib/setup/model";
import { findComparison } from "../comparisons/queries";
import { findChecklist, getVehicleDetail, saveChecklist } from "./queries";
import { bindAppDb } from "@/lib/platform/db/bind";
import { NotFoundError } from "@/lib/platform/errors";

/**
 * What an install checklist is built from: a vehicle of the caller's, and either a saved
 * comparison tied to that vehicle (its planned setup) or a planned setup given directly; the
 * margin is the vehicle's unless the caller tries another. One planned setup has one checklist
 * per vehicle (keyed by the setup's canonical query text), so the ticks are the same whether it
 * is opened from the vehicle page or from the comparison.
 */
export interface ChecklistSource {
  comparisonId?: string | null;
  planned?: Setup | null;
  marginMm?: number | null;
}

export interface ResolvedChecklist {
  ok: true;
  detail: VehicleDetail;
  planned: Setup;
  marginMm: number;
  comparison: { id: string; name: string; input: ComparisonInput } | null;
  checklist: Checklist;
}

/** Neither a saved comparison nor a planned setup was given: there is no checklist to show yet. */
export interface NoPlannedSetup {
  ok: false;
  reason: "planned";
}

/**
 * The checklist for a source. NotFoundError when the vehicle is not the caller's, or the saved
 * comparison is not theirs or is tied to another vehicle.
 */
export async function resolveChecklist(
  db: Knex,
  userId: string,
  vehicleId: string,
  source: ChecklistSource,
): Promise<ResolvedChecklist | NoPlannedSetup> {
  const detail = await getVehicleDetail(db, userId, vehicleId);
  let planned = source.planned ?? null;
  let comparison: { id: string; name: string; input: ComparisonInput } | null = null;
  if (source.comparisonId) {
    const c = await findComparison(db, userId, source.comparisonId);
    // Someone else's comparison, or one of the caller's tied to another vehicle: not this checklist's.
    if (!c || c.vehicleId !== vehicleId) throw new NotFoundError("That saved comparison (for this vehicle)");
    comparison = { id: c.id, name: c.name, input: c.input };
    planned = c.input.planned;
  }
  if (!planned) return { ok: false, reason: "planned" };
  const marginMm = source.marginMm ?? detail.vehicle.clearanceMarginMm;
  const loadProfile = (await loadProfilesOf(db, [vehicleId])).get(vehicleId) ?? null;
  return { ok: true, detail, planned, marginMm, comparison, checklist: buildChecklist({ ...detail, planned, marginMm, loadProfile }) };
}

/** The ticks saved for a resolved checklist. */
export async function checklistTicks(db: Knex, r: ResolvedChecklist): Promise<string[]> {
  const row = await findChecklist(db, r.detail.vehicle.id, setupQuery("p", r.planned));
  return row?.ticked ?? [];
}

/** Saves the ticks; ids must be items of this checklist (the handler reports the others). */
export async function saveChecklistTicks(db: Knex, r: ResolvedChecklist, ticked: string[]): Promise<string[]> {
  const row = await saveChecklist(db, {
    vehicleId: r.detail.vehicle.id,
    plannedKey: setupQuery("p", r.planned),
    planned: r.planned,
    comparisonId: r.comparison?.id ?? null,
    ticked: [...new Set(ticked)],
  });
  return row.ticked;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const checklistQueries = bindAppDb({ checklistTicks, resolveChecklist, saveChecklistTicks });
