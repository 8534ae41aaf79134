import "server-only";
import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import type { Role, WorkOrderRow, WorkOrderStepPhotoRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, NotFoundError } from "@/lib/platform/errors";
import type { ProcessedImage } from "@/lib/garage/photos/image";
import { storePhotoObjects } from "@/lib/garage/photos/objects";
import type { PhotoStore } from "@/lib/garage/photos/s3";
import type { Actor } from "@/lib/shop/quotes/queries";
import { type StepPhoto, requiredSteps, stepPhotoDto } from "./api";
import { MAX_PHOTOS_PER_STEP, ONLY_OWNER_REMOVES, type StepPhotoFields, mayRemoveStepPhoto } from "./photoSchema";
import { POSITION_LABEL, STEP_LABEL, WORK_ORDER_STATUS_LABEL } from "./vocabulary";

// Every query here is scoped by the caller's shop: another shop's work order or photo is "not
// found" (NotFoundError), never "forbidden", so its existence is not given away. Customers never
// see step photos: no customer page shows them and the completion e-mail (completionMail.ts)
// links none; they are the shop's record of the work.

type Db = Knex | Knex.Transaction;
const PHOTO = "That photo";

async function orderOfShop(db: Db, shopId: string, id: string, lock = false): Promise<WorkOrderRow> {
  const q = db<WorkOrderRow>("work_orders").where({ id, shop_id: shopId });
  if (lock) q.forUpdate();
  const row = (await q.first()) as WorkOrderRow | undefined;
  if (!row) throw new NotFoundError("That work order");
  return row;
}

/** The rows of a work order's photos, oldest first (getWorkOrder puts them on the sheet). */
export async function stepPhotoRows(db: Db, workOrderId: string): Promise<WorkOrderStepPhotoRow[]> {
  return (await db("work_order_step_photos")
    .where({ work_order_id: workOrderId })
    .orderBy(["created_at", "id"])) as WorkOrderStepPhotoRow[];
}

/** Every photo of a work order of the shop, oldest first. */
export async function listStepPhotos(db: Db, shopId: string, workOrderId: string): Promise<StepPhoto[]> {
  await orderOfShop(db, shopId, workOrderId);
  return (await stepPhotoRows(db, workOrderId)).map(stepPhotoDto);
}

/** Refuses a photo the work order cannot take now; the same check runs again under the lock. */
function refuseAdding(row: WorkOrderRow, at: StepPhotoFields, count: number): void {
  const what = `${POSITION_LABEL[at.position]}: ${STEP_LABEL[at.step].toLowerCase()}`;
  if (row.status !== "in_bay") {
    throw new ConflictError(
      row.status === "done"
        ? "This work order is done: photos can no longer be added."
        : `Mark the work order “${WORK_ORDER_STATUS_LABEL.in_bay}” before adding photos.`,
    );
  }
  if (!requiredSteps(row).some((s) => s.position === at.position && s.step === at.step)) {
    throw InvalidError.fields({ position: [`${what} is not on this work order.`] });
  }
  if (count >= MAX_PHOTOS_PER_STEP) {
    throw new ConflictError(`${what} already has ${MAX_PHOTOS_PER_STEP} photos: remove one before adding another.`);
  }
}

const countOn = async (db: Db, workOrderId: string, at: StepPhotoFields) =>
  Number(
    (
      await db("work_order_step_photos")
        .where({ work_order_id: workOrderId, ...at })
        .count({ n: "*" })
    )[0]!.n,
  );

/** Refuses (NotFound, Conflict, Invalid) a photo this work order's step cannot take now: the route asks before reading the image. */
export async function checkStepTakesPhoto(db: Db, shopId: string, workOrderId: string, at: StepPhotoFields): Promise<void> {
  refuseAdding(await orderOfShop(db, shopId, workOrderId), at, await countOn(db, workOrderId, at));
}

/**
 * Adds a photo to one step of a work order in the bay (signed off or not). The work order is
 * checked before anything is stored, so a refused upload writes nothing; the objects then go
 * first and the row after (lib/garage/photos/objects.ts), the checks repeated under the work
 * order's lock so a photo never lands on a work order marked done in between.
 */
export async function addStepPhoto(
  db: Knex,
  store: PhotoStore,
  shopId: string,
  workOrderId: string,
  input: StepPhotoFields & { image: ProcessedImage; name: string },
  actor: Actor,
): Promise<StepPhoto> {
  const at = { position: input.position, step: input.step };
  await checkStepTakesPhoto(db, shopId, workOrderId, at);
  const id = randomUUID();
  return storePhotoObjects(store, `work-orders/${workOrderId}/${id}`, input.image, input.name, (columns) =>
    db.transaction(async (trx) => {
      refuseAdding(await orderOfShop(trx, shopId, workOrderId, true), at, await countOn(trx, workOrderId, at));
      const [row] = (await trx("work_order_step_photos")
        .insert({
          id,
          work_order_id: workOrderId,
          shop_id: shopId,
          ...at,
          ...columns,
          taken_by_user_id: actor.userId,
          taken_by: actor.label,
        })
        .returning("*")) as WorkOrderStepPhotoRow[];
      return stepPhotoDto(row!);
    }),
  );
}

/** A photo of a work order of the shop, or undefined (another shop's, another work order's, none). */
export async function findStepPhoto(
  db: Db,
  shopId: string,
  workOrderId: string,
  photoId: string,
): Promise<WorkOrderStepPhotoRow | undefined> {
  return (await db("work_order_step_photos").where({ id: photoId, work_order_id: workOrderId, shop_id: shopId }).first()) as
    WorkOrderStepPhotoRow | undefined;
}

/**
 * Removes one photo with its objects (mayRemoveStepPhoto says who may). The row goes in a
 * transaction that also deletes the objects, so a store that fails leaves both in place.
 */
export async function deleteStepPhoto(
  db: Knex,
  store: PhotoStore,
  caller: { shopId: string; role: Role },
  workOrderId: string,
  photoId: string,
): Promise<void> {
  await db.transaction(async (trx) => {
    const order = await orderOfShop(trx, caller.shopId, workOrderId, true);
    const photo = await findStepPhoto(trx, caller.shopId, workOrderId, photoId);
    if (!photo) throw new NotFoundError(PHOTO);
    const signed = await trx("work_order_steps")
      .where({ work_order_id: workOrderId, position: photo.position, step: photo.step })
      .first("id");
    if (!mayRemoveStepPhoto(caller.role, Boolean(signed), order.status === "done")) throw new ConflictError(ONLY_OWNER_REMOVES);
    await trx("work_order_step_photos").where({ id: photo.id }).del();
    await store.deleteMany([photo.object_key, photo.thumb_key]);
  });
}

/** These queries on the app's database handle, for route handlers. */
export const stepPhotoQueries = bindAppDb({ addStepPhoto, checkStepTakesPhoto, deleteStepPhoto, findStepPhoto, listStepPhotos });
