import type { Knex } from "knex";
import { instant, optionalRef, requiredRef, statusColumn, timestamps, uuidId } from "../lib/columns";
import { workOrderStepColumns } from "../lib/workOrderSteps";

/**
 * Work orders: one per booked quote, the sheet the technician works through in the bay. Each
 * step of each wheel position (and of the vehicle) is one row, signed by the person who did it.
 * The steps a work order has are fixed when it is made (from the quote: a spare, beadlock
 * wheels, an alignment, trimming), so "done" can be checked against them.
 *
 * The re-check after the first miles: the shop's number of days on `shops`, the due date and
 * the mark that its reminder was queued on the work order (set in the transaction that queues
 * the mail, so none goes out twice).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("shops", (t) => {
    t.integer("recheck_after_days").notNullable().defaultTo(7);
    t.check("recheck_after_days between 1 and 90", [], "shops_recheck_days_range");
  });

  await knex.schema.createTable("work_orders", (t) => {
    uuidId(t, knex);
    requiredRef(t, "shop_id", "shops");
    t.uuid("quote_id").notNullable().unique().references("id").inTable("quotes").onDelete("CASCADE");
    statusColumn(t, "work_orders", ["booked", "in_bay", "done"], "booked");
    // What the sheet covers, fixed from the quote when the work order is made.
    t.text("tire_description").notNullable().defaultTo("");
    t.text("wheel_description").notNullable().defaultTo("");
    t.boolean("spare").notNullable().defaultTo(false);
    t.boolean("beadlock").notNullable().defaultTo(false);
    t.boolean("alignment").notNullable().defaultTo(false);
    t.boolean("trimming").notNullable().defaultTo(false);
    // Lug nuts per wheel, from the quote's bolt pattern (the star pattern's size).
    t.integer("lug_count").notNullable();
    instant(t, "started_at").nullable();
    t.text("started_by").nullable();
    instant(t, "done_at").nullable();
    t.text("done_by").nullable();
    instant(t, "recheck_due_at").nullable();
    instant(t, "recheck_queued_at").nullable();
    timestamps(t, knex);
    t.unique(["id", "shop_id"]);
    t.index(["shop_id", "status"]);
    t.check("lug_count between 3 and 12", [], "work_orders_lug_count_range");
    t.check("(status = 'done') = (done_at is not null)", [], "work_orders_done_when_done");
  });

  await knex.schema.createTable("work_order_steps", (t) => {
    uuidId(t, knex);
    // Scoped to the work order's shop by a composite key (see workOrderStepColumns).
    workOrderStepColumns(t, "work_order_steps");
    // What was recorded (validated by lib/shop/workOrders/schema.ts; torque in N·m, pressure in kPa).
    t.jsonb("data").notNullable().defaultTo("{}");
    optionalRef(t, "signed_by_user_id", "users");
    t.text("signed_by").notNullable();
    instant(t, "signed_at").notNullable().defaultTo(knex.fn.now());
    t.unique(["work_order_id", "position", "step"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("work_order_steps");
  await knex.schema.dropTable("work_orders");
  await knex.schema.alterTable("shops", (t) => {
    t.dropChecks(["shops_recheck_days_range"]);
    t.dropColumn("recheck_after_days");
  });
}
