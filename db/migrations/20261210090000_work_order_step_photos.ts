import type { Knex } from "knex";
import { createdAt, optionalRef, storedPhotoColumns, uuidId } from "../lib/columns";

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
    t.uuid("work_order_id").notNullable();
    t.uuid("shop_id").notNullable();
    // A photo of another shop's work order cannot be written even by a query that forgets the scope.
    t.foreign(["work_order_id", "shop_id"], "work_order_step_photos_of_shop")
      .references(["id", "shop_id"])
      .inTable("work_orders")
      .onDelete("CASCADE");
    t.text("position").notNullable();
    t.text("step").notNullable();
    storedPhotoColumns(t);
    optionalRef(t, "taken_by_user_id", "users");
    t.text("taken_by").notNullable();
    createdAt(t, knex);
    t.check("position in ('LF','RF','LR','RR','spare','vehicle')", [], "work_order_step_photos_position_known");
    t.check("content_type in ('image/jpeg','image/png','image/webp')", [], "work_order_step_photos_type_known");
    t.index(["work_order_id", "position", "step"], "work_order_step_photos_step");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("work_order_step_photos");
}
