import type { Knex } from "knex";

/**
 * The columns that tie a row to one step of a work order's sheet: `work_order_id` and `shop_id`
 * with a composite foreign key to work_orders (id, shop_id), named `<table>_of_shop`, then the
 * step's `position` (a wheel or the vehicle, checked by `<table>_position_known`) and `step`.
 * The composite key means a row of another shop's work order cannot be written even by a query
 * that forgets the scope. Rows go with their work order.
 */
export function workOrderStepColumns(t: Knex.TableBuilder, table: string): void {
  t.uuid("work_order_id").notNullable();
  t.uuid("shop_id").notNullable();
  t.foreign(["work_order_id", "shop_id"], `${table}_of_shop`).references(["id", "shop_id"]).inTable("work_orders").onDelete("CASCADE");
  t.text("position").notNullable();
  t.text("step").notNullable();
  t.check("position in ('LF','RF','LR','RR','spare','vehicle')", [], `${table}_position_known`);
}
