import "server-only";
import type { Knex } from "knex";
import type { ComparisonInput } from "@/lib/comparisons/schema";
import { type Checklist, buildChecklist } from "@/lib/garage/checklist";
import { setupQuery } from "@/lib/setup/url";
import type { VehicleDetail } from "@/lib/garage/types";
import type { Setup } from "@/lib/setup/model";
import { getComparison } from "../comparisons/queries";
import { findChecklist, saveChecklist, vehicleDetail } from "./queries";
import { bindAppDb } from "@/lib/platform/db/bind";

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

export type ResolvedChecklist =
  | { ok: true; detail: VehicleDetail; planned: Setup; marginMm: number; comparison: { id: string; name: string; input: ComparisonInput } | null; checklist: Checklist }
  | { ok: false; reason: "vehicle" | "comparison" | "planned" };

export async function resolveChecklist(db: Knex, userId: string, vehicleId: string, source: ChecklistSource): Promise<ResolvedChecklist> {
  const detail = await vehicleDetail(db, userId, vehicleId);
  if (!detail) return { ok: false, reason: "vehicle" };
  let planned = source.planned ?? null;
  let comparison: { id: string; name: string; input: ComparisonInput } | null = null;
  if (source.comparisonId) {
    const c = await getComparison(db, userId, source.comparisonId);
    // Someone else's comparison, or one of the caller's tied to another vehicle: not this checklist's.
    if (!c || c.vehicleId !== vehicleId) return { ok: false, reason: "comparison" };
    comparison = { id: c.id, name: c.name, input: c.input };
    planned = c.input.planned;
  }
  if (!planned) return { ok: false, reason: "planned" };
  const marginMm = source.marginMm ?? detail.vehicle.clearanceMarginMm;
  return { ok: true, detail, planned, marginMm, comparison, checklist: buildChecklist({ ...detail, planned, marginMm }) };
}

/** The ticks saved for a resolved checklist. */
export async function checklistTicks(db: Knex, r: Extract<ResolvedChecklist, { ok: true }>): Promise<string[]> {
  const row = await findChecklist(db, r.detail.vehicle.id, setupQuery("p", r.planned));
  return row?.ticked ?? [];
}

/** Saves the ticks; ids must be items of this checklist (the handler reports the others). */
export async function saveChecklistTicks(db: Knex, r: Extract<ResolvedChecklist, { ok: true }>, ticked: string[]): Promise<string[]> {
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
