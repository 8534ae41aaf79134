import "server-only";
import type { Knex } from "knex";
import { setupGeometry } from "@/lib/fitment";
import { bindAppDb } from "@/lib/platform/db/bind";
import type { VehicleLoadProfileRow, VehicleRow } from "@/lib/platform/db/types";
import { InvalidError, NotFoundError } from "@/lib/platform/errors";
import { type CurrentTire, type LoadProfile, checkLoadProfile } from "@/lib/garage/loadProfile";
import { type Setup, toEngineSetup } from "@/lib/setup/model";

// A vehicle's load profile, scoped by the owner's user id like every garage query: another
// owner's vehicle is "not found".

export function loadProfileDto(r: VehicleLoadProfileRow): LoadProfile {
  return {
    units: r.units,
    vehicleKind: r.vehicle_kind,
    placardTire: r.placard_tire,
    placardFrontKpa: r.placard_front_kpa,
    placardRearKpa: r.placard_rear_kpa,
    frontGawrKg: r.front_gawr_kg,
    rearGawrKg: r.rear_gawr_kg,
    frontAxleKg: r.front_axle_kg,
    rearAxleKg: r.rear_axle_kg,
    frontCornerHeightMm: r.front_corner_height_mm,
    frontCornerAheadMm: r.front_corner_ahead_mm,
    rearCornerHeightMm: r.rear_corner_height_mm,
    rearCornerBehindMm: r.rear_corner_behind_mm,
    midHeightMm: r.mid_height_mm,
    wheelbaseMm: r.wheelbase_mm,
  };
}

/** The current tire of a vehicle row: the body points are measured with it. */
export function currentTireOf(v: Pick<VehicleRow, "current_setup">): CurrentTire {
  const s = v.current_setup as Setup;
  return { text: s.tire, diameterMm: setupGeometry(toEngineSetup(s)).overallDiameterMm };
}

async function ownVehicle(db: Knex, userId: string, vehicleId: string): Promise<VehicleRow> {
  const v = await db<VehicleRow>("vehicles").where({ id: vehicleId, user_id: userId }).first();
  if (!v) throw new NotFoundError("That vehicle");
  return v;
}

/** The vehicle's profile, or null when nothing was stored yet; NotFoundError when the vehicle is not the owner's. */
export async function getLoadProfile(db: Knex, userId: string, vehicleId: string): Promise<LoadProfile | null> {
  await ownVehicle(db, userId, vehicleId);
  const row = await db<VehicleLoadProfileRow>("vehicle_load_profiles").where({ vehicle_id: vehicleId }).first();
  return row ? loadProfileDto(row) : null;
}

/**
 * Checks the profile against the vehicle's current tire and stores it whole (InvalidError with a
 * message per field, and nothing written, when any figure is refused). The vehicle row is locked
 * so a concurrent edit of its current tire cannot slip between the check and the write.
 */
export async function saveLoadProfile(db: Knex, userId: string, vehicleId: string, p: LoadProfile): Promise<LoadProfile> {
  return db.transaction(async (trx) => {
    const v = await trx<VehicleRow>("vehicles").where({ id: vehicleId, user_id: userId }).forUpdate().first();
    if (!v) throw new NotFoundError("That vehicle");
    const errors = checkLoadProfile(p, currentTireOf(v));
    if (Object.keys(errors).length > 0) {
      throw InvalidError.fields(Object.fromEntries(Object.entries(errors).map(([k, m]) => [k, [m]])));
    }
    const columns = {
      units: p.units,
      vehicle_kind: p.vehicleKind,
      placard_tire: p.placardTire,
      placard_front_kpa: p.placardFrontKpa,
      placard_rear_kpa: p.placardRearKpa,
      front_gawr_kg: p.frontGawrKg,
      rear_gawr_kg: p.rearGawrKg,
      front_axle_kg: p.frontAxleKg,
      rear_axle_kg: p.rearAxleKg,
      front_corner_height_mm: p.frontCornerHeightMm,
      front_corner_ahead_mm: p.frontCornerAheadMm,
      rear_corner_height_mm: p.rearCornerHeightMm,
      rear_corner_behind_mm: p.rearCornerBehindMm,
      mid_height_mm: p.midHeightMm,
      wheelbase_mm: p.wheelbaseMm,
    };
    const [row] = await trx("vehicle_load_profiles")
      .insert({ vehicle_id: vehicleId, ...columns })
      .onConflict("vehicle_id")
      .merge({ ...columns, updated_at: trx.fn.now() })
      .returning("*");
    return loadProfileDto(row as VehicleLoadProfileRow);
  });
}

/** Forgets the profile (the vehicle stays); NotFoundError when the vehicle is not the owner's. */
export async function deleteLoadProfile(db: Knex, userId: string, vehicleId: string): Promise<void> {
  await ownVehicle(db, userId, vehicleId);
  await db("vehicle_load_profiles").where({ vehicle_id: vehicleId }).del();
}

/** Profiles of several vehicles at once (the share page and quotes look one up by vehicle id). */
export async function loadProfilesOf(db: Knex, vehicleIds: string[]): Promise<Map<string, LoadProfile>> {
  if (vehicleIds.length === 0) return new Map();
  const rows = await db<VehicleLoadProfileRow>("vehicle_load_profiles").whereIn("vehicle_id", vehicleIds);
  return new Map(rows.map((r) => [r.vehicle_id, loadProfileDto(r)]));
}

/**
 * The stored profile and current setup of the vehicle a shared comparison belongs to (same
 * owner), for the share page's pressure and angle figures; undefined when the link is not live or
 * the comparison has no vehicle with a profile. Only figures derived from it reach the page.
 */
export async function sharedVehicleLoad(db: Knex, slug: string): Promise<{ profile: LoadProfile; currentSetup: Setup } | undefined> {
  const row = (await db("comparison_shares as s")
    .join("comparisons as c", "c.id", "s.comparison_id")
    .join("vehicles as v", function () {
      this.on("v.id", "=", "c.vehicle_id").andOn("v.user_id", "=", "c.owner_id");
    })
    .join("vehicle_load_profiles as p", "p.vehicle_id", "v.id")
    .where("s.slug", slug)
    .whereNull("s.revoked_at")
    .first("p.*", "v.current_setup")) as (VehicleLoadProfileRow & { current_setup: unknown }) | undefined;
  return row ? { profile: loadProfileDto(row), currentSetup: row.current_setup as Setup } : undefined;
}

export const loadQueries = bindAppDb({ deleteLoadProfile, getLoadProfile, loadProfilesOf, saveLoadProfile, sharedVehicleLoad });
