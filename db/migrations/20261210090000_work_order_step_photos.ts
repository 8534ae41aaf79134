import type { Knex } from "knex";
import { createdAt, optionalRef, storedPhotoColumns, uuidId } from "../lib/columns";
import { workOrderStepColumns } from "../lib/workOrderSteps";

/**
 * Photos a technician takes of a work order's step (the DOT code, the beadlock ring's bolts in
 * their passes, the balance weights, a trimmed corner). The images live in the photo store the
 * garage uses, under `work-orders/<work order>/…`; the row names its objects by key, keys built
 * from ids only. A photo belongs to a step of the sheet (position + step), not to the step's
 * sign-off row: it may be taken before the step is signed, and signing again keeps it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("work_order_step_photos", (t) => {
    uuidId(t, knex);
    // Scoped to the work order's shop by a composite key (see workOrderStepColumns).
    workOrderStepColumns(t, "work_order_step_photos");
    storedPhotoColumns(t);
    optionalRef(t, "taken_by_user_id", "users");
    t.text("taken_by").notNullable();
    createdAt(t, knex);
    t.check("content_type in ('image/jpeg','image/png','image/webp')", [], "work_order_step_photos_type_known");
    t.index(["work_order_id", "position", "step"], "work_order_step_photos_step");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("work_order_step_photos");
}
