/**
 * The fields sent beside a step photo's file, and the rule on removing one. Plain data, safe for
 * the browser: the sheet shows the Remove button by the same rule the server applies.
 */
import { z } from "zod";
import type { Role } from "@/lib/platform/db/types";
import { WHEEL_POSITIONS } from "@/lib/platform/db/types";
import { VEHICLE_STEPS, WHEEL_STEPS } from "./vocabulary";

/** A technician photographs what a step needs; more than this on one step is a mistake, not a record. */
export const MAX_PHOTOS_PER_STEP = 12;

export const stepPhotoFieldsSchema = z.object({
  position: z.enum([...WHEEL_POSITIONS, "vehicle"], { error: "Position: pick LF, RF, LR, RR, spare or vehicle." }),
  step: z.enum([...WHEEL_STEPS, ...VEHICLE_STEPS], { error: "Step: pick a step of this work order." }),
});
export type StepPhotoFields = z.infer<typeof stepPhotoFieldsSchema>;

export const ONLY_OWNER_REMOVES =
  "A photo of a signed-off step stays with the record: only the shop owner can remove it (and only they can remove one once the work order is done).";

/**
 * Who may remove a step photo. Any of the shop's staff while the step is not signed off and the
 * work order is not done (a blurred shot, the wrong wheel); after that the photo is part of what
 * was signed, and only the shop owner may take it out (a customer's face or a number plate that
 * should not have been kept).
 */
export function mayRemoveStepPhoto(role: Role, stepSigned: boolean, workOrderDone: boolean): boolean {
  return role === "shop_owner" || (role === "shop_staff" && !stepSigned && !workOrderDone);
}
