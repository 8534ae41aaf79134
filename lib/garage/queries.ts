import "server-only";
import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { parseBoltPattern } from "@/lib/fitment";
import type { InstallChecklistRow, Role, VehicleClearanceRow, VehiclePhotoRow, VehicleRow } from "@/lib/platform/db/types";
import { type PhotoStore } from "@/lib/garage/photos/s3";
import type { ProcessedImage } from "@/lib/garage/photos/image";
import { storePhotoObjects } from "@/lib/garage/photos/objects";
import type { ClearanceValues, GarageVehicleValues } from "@/lib/garage/schema";
import type { Setup } from "@/lib/setup/model";
import type { Vehicle, VehicleClearance, VehicleDetail, VehiclePhoto, WorkspaceVehicle } from "@/lib/garage/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { NotFoundError } from "@/lib/platform/errors";
import { iso, rowTimes } from "@/lib/platform/http/isoDates";

// Every query here is scoped by the owner's user id; a vehicle of someone else is "not found"
// (find* returns undefined, the others throw NotFoundError: lib/platform/errors.ts).

export function vehicleDto(r: VehicleRow): Vehicle {
  return {
    id: r.id,
    name: r.name,
    year: r.year,
    make: r.make,
    model: r.model,
    trim: r.trim,
    frontSuspension: r.front_suspension,
    boltPattern: r.bolt_pattern,
    hubBoreMm: r.hub_bore_mm,
    stockSetup: r.stock_setup as Setup,
    currentSetup: r.current_setup as Setup,
    liftHeightMm: r.lift_height_mm,
    kingpinInclinationDeg: r.kingpin_inclination_deg,
    axleRatio: r.axle_ratio,
    transmissionRatio: r.transmission_ratio,
    clearanceMarginMm: r.clearance_margin_mm,
    notes: r.notes,
    ...rowTimes(r),
  };
}

export function clearanceDto(r: VehicleClearanceRow): VehicleClearance {
  return {
    id: r.id,
    label: r.label,
    direction: r.direction,
    distanceMm: r.distance_mm,
    distanceText: r.distance_text,
    suspensionState: r.suspension_state,
    measuredSetup: r.measured_setup as Setup,
    createdAt: iso(r.created_at),
  };
}

export function photoDto(r: VehiclePhotoRow): VehiclePhoto {
  return {
    id: r.id,
    clearanceId: r.clearance_id,
    contentType: r.content_type,
    width: r.width,
    height: r.height,
    bytes: r.bytes,
    name: r.original_name,
    url: `/api/photos/${r.id}`,
    thumbUrl: `/api/photos/${r.id}?variant=thumb`,
    createdAt: iso(r.created_at),
  };
}

function columns(v: GarageVehicleValues) {
  const bp = parseBoltPattern(v.boltPattern);
  return {
    name: v.name,
    year: v.year,
    make: v.make,
    model: v.model,
    trim: v.trim,
    front_suspension: v.frontSuspension,
    bolt_pattern: bp.text,
    bolt_pcd_mm: bp.pcdMm,
    bolt_count: bp.boltCount,
    hub_bore_mm: v.hubBoreMm,
    stock_setup: JSON.stringify(v.stockSetup),
    current_setup: JSON.stringify(v.currentSetup),
    lift_height_mm: v.liftHeightMm,
    kingpin_inclination_deg: v.kingpinInclinationDeg,
    axle_ratio: v.axleRatio,
    transmission_ratio: v.transmissionRatio,
    clearance_margin_mm: v.clearanceMarginMm,
    notes: v.notes,
  };
}

export async function listVehicles(db: Knex, userId: string): Promise<Vehicle[]> {
  const rows = await db<VehicleRow>("vehicles").where({ user_id: userId }).orderBy("created_at", "asc").limit(200);
  return rows.map(vehicleDto);
}

/** The caller's vehicles with their measured points, for the workspace's garage panel (two queries). */
export async function workspaceVehicles(db: Knex, userId: string): Promise<WorkspaceVehicle[]> {
  const vehicles = await listVehicles(db, userId);
  if (vehicles.length === 0) return [];
  const points = await db<VehicleClearanceRow>("vehicle_clearances")
    .whereIn(
      "vehicle_id",
      vehicles.map((v) => v.id),
    )
    .orderBy("created_at", "asc");
  return vehicles.map((v) => ({
    id: v.id,
    name: v.name,
    currentSetup: v.currentSetup,
    kingpinInclinationDeg: v.kingpinInclinationDeg,
    axleRatio: v.axleRatio,
    transmissionRatio: v.transmissionRatio,
    clearanceMarginMm: v.clearanceMarginMm,
    clearances: points
      .filter((p) => p.vehicle_id === v.id)
      .map((p) => ({
        id: p.id,
        label: p.label,
        direction: p.direction,
        distanceMm: p.distance_mm,
        suspensionState: p.suspension_state,
        measuredSetup: p.measured_setup as Setup,
      })),
  }));
}

/** How many clearance points each of these vehicles has (vehicles with none are absent). */
export async function clearanceCounts(db: Knex, vehicleIds: string[]): Promise<Map<string, number>> {
  const rows = await db("vehicle_clearances").whereIn("vehicle_id", vehicleIds).groupBy("vehicle_id").select("vehicle_id").count("* as n");
  return new Map(rows.map((r) => [String(r.vehicle_id), Number(r.n)]));
}

export async function findVehicle(db: Knex, userId: string, id: string): Promise<VehicleRow | undefined> {
  return db<VehicleRow>("vehicles").where({ id, user_id: userId }).first();
}

/** The vehicle with its points and photos; NotFoundError when it is not the owner's. */
export async function getVehicleDetail(db: Knex, userId: string, id: string): Promise<VehicleDetail> {
  const v = await findVehicle(db, userId, id);
  if (!v) throw new NotFoundError("That vehicle");
  const [clearances, photos] = await Promise.all([
    db<VehicleClearanceRow>("vehicle_clearances").where({ vehicle_id: id }).orderBy("created_at", "asc"),
    db<VehiclePhotoRow>("vehicle_photos").where({ vehicle_id: id }).orderBy("created_at", "asc"),
  ]);
  return { vehicle: vehicleDto(v), clearances: clearances.map(clearanceDto), photos: photos.map(photoDto) };
}

export async function createVehicle(db: Knex, userId: string, v: GarageVehicleValues): Promise<Vehicle> {
  const [row] = await db<VehicleRow>("vehicles")
    .insert({ user_id: userId, ...columns(v) } as never)
    .returning("*");
  return vehicleDto(row as VehicleRow);
}

export async function updateVehicle(db: Knex, userId: string, id: string, v: GarageVehicleValues): Promise<Vehicle> {
  const [row] = await db<VehicleRow>("vehicles")
    .where({ id, user_id: userId })
    .update({ ...columns(v), updated_at: db.fn.now() } as never)
    .returning("*");
  if (!row) throw new NotFoundError("That vehicle");
  return vehicleDto(row as VehicleRow);
}

/**
 * Deletes a vehicle with its points, photos and checklists. The rows go in a transaction that
 * commits only after the bucket confirmed the objects are gone, so a failure leaves both as
 * they were (apart from objects the store already removed, which it reports as an error).
 */
export async function deleteVehicle(db: Knex, store: PhotoStore, userId: string, id: string): Promise<void> {
  await db.transaction(async (trx) => {
    const v = await trx<VehicleRow>("vehicles").where({ id, user_id: userId }).forUpdate().first("id");
    if (!v) throw new NotFoundError("That vehicle");
    const photos = await trx<VehiclePhotoRow>("vehicle_photos").where({ vehicle_id: id }).select("object_key", "thumb_key");
    await trx("vehicles").where({ id }).del();
    await store.deleteMany(photos.flatMap((p) => [p.object_key, p.thumb_key]));
  });
}

export async function addClearance(db: Knex, vehicleId: string, c: ClearanceValues, measuredSetup: Setup): Promise<VehicleClearance> {
  const [row] = await db<VehicleClearanceRow>("vehicle_clearances")
    .insert({
      vehicle_id: vehicleId,
      label: c.label,
      direction: c.direction,
      distance_mm: c.distanceMm,
      distance_text: c.distanceText,
      suspension_state: c.suspensionState,
      measured_setup: JSON.stringify(measuredSetup),
    } as never)
    .returning("*");
  return clearanceDto(row as VehicleClearanceRow);
}

export async function deleteClearance(db: Knex, store: PhotoStore, userId: string, vehicleId: string, clearanceId: string): Promise<void> {
  await db.transaction(async (trx) => {
    const c = await trx("vehicle_clearances as c")
      .join("vehicles as v", "v.id", "c.vehicle_id")
      .where({ "c.id": clearanceId, "c.vehicle_id": vehicleId, "v.user_id": userId })
      .first("c.id");
    if (!c) throw new NotFoundError("That clearance point");
    const photos = await trx<VehiclePhotoRow>("vehicle_photos").where({ clearance_id: clearanceId }).select("object_key", "thumb_key");
    await trx("vehicle_clearances").where({ id: clearanceId }).del();
    await store.deleteMany(photos.flatMap((p) => [p.object_key, p.thumb_key]));
  });
}

export async function clearanceBelongs(db: Knex, vehicleId: string, clearanceId: string): Promise<boolean> {
  return Boolean(await db("vehicle_clearances").where({ id: clearanceId, vehicle_id: vehicleId }).first("id"));
}

/** Stores the photo's objects, then its row (lib/garage/photos/objects.ts says why in that order). */
export async function addPhoto(
  db: Knex,
  store: PhotoStore,
  input: { vehicleId: string; clearanceId: string | null; image: ProcessedImage; name: string },
): Promise<VehiclePhoto> {
  const id = randomUUID();
  return storePhotoObjects(store, `vehicles/${input.vehicleId}/${id}`, input.image, input.name, async (columns) => {
    const [row] = await db<VehiclePhotoRow>("vehicle_photos")
      .insert({ id, vehicle_id: input.vehicleId, clearance_id: input.clearanceId, ...columns })
      .returning("*");
    return photoDto(row as VehiclePhotoRow);
  });
}

/** A photo the caller may see: its owner's, or any for an admin. */
export async function findVisiblePhoto(
  db: Knex,
  caller: { userId: string; role: Role },
  photoId: string,
): Promise<VehiclePhotoRow | undefined> {
  const q = db("vehicle_photos as p").join("vehicles as v", "v.id", "p.vehicle_id").where("p.id", photoId).select("p.*");
  if (caller.role !== "admin") q.andWhere("v.user_id", caller.userId);
  return (await q.first()) as VehiclePhotoRow | undefined;
}

export async function deletePhoto(db: Knex, store: PhotoStore, userId: string, photoId: string): Promise<void> {
  await db.transaction(async (trx) => {
    const p = (await trx("vehicle_photos as p")
      .join("vehicles as v", "v.id", "p.vehicle_id")
      .where({ "p.id": photoId, "v.user_id": userId })
      .first("p.id", "p.object_key", "p.thumb_key")) as Pick<VehiclePhotoRow, "id" | "object_key" | "thumb_key"> | undefined;
    if (!p) throw new NotFoundError("That photo");
    await trx("vehicle_photos").where({ id: p.id }).del();
    await store.deleteMany([p.object_key, p.thumb_key]);
  });
}

export async function findChecklist(db: Knex, vehicleId: string, plannedKey: string): Promise<InstallChecklistRow | undefined> {
  return db<InstallChecklistRow>("install_checklists").where({ vehicle_id: vehicleId, planned_key: plannedKey }).first();
}

export async function saveChecklist(
  db: Knex,
  input: { vehicleId: string; plannedKey: string; planned: Setup; comparisonId?: string | null; ticked: string[] },
): Promise<InstallChecklistRow> {
  const ticked = JSON.stringify(input.ticked);
  const [row] = await db("install_checklists")
    .insert({
      vehicle_id: input.vehicleId,
      planned_key: input.plannedKey,
      planned_setup: JSON.stringify(input.planned),
      comparison_id: input.comparisonId ?? null,
      ticked,
    })
    .onConflict(["vehicle_id", "planned_key"])
    // Opened from the vehicle page later, the checklist keeps the comparison it was made from.
    .merge({ ticked, updated_at: db.fn.now(), comparison_id: db.raw("coalesce(excluded.comparison_id, install_checklists.comparison_id)") })
    .returning("*");
  return row as InstallChecklistRow;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const garageQueries = bindAppDb({
  addClearance,
  addPhoto,
  clearanceBelongs,
  clearanceCounts,
  createVehicle,
  deleteClearance,
  deletePhoto,
  deleteVehicle,
  findVehicle,
  findVisiblePhoto,
  getVehicleDetail,
  listVehicles,
  updateVehicle,
  workspaceVehicles,
});
