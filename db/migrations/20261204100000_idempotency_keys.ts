import type { Knex } from "knex";
import { createdAt, instant, requiredRef } from "../lib/columns";

/**
 * Idempotency-Key records for the create routes (lib/platform/http/idempotency.ts): one row per caller,
 * route and key, reserved before the create runs and completed with its response after, so a
 * retry of a create whose answer was lost replays that answer instead of creating again.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("idempotency_keys", (t) => {
    requiredRef(t, "user_id", "users");
    // Method and path, e.g. "POST /api/vehicles/<id>/photos": the same key on another route is another request.
    t.text("route").notNullable();
    t.string("key", 200).notNullable();
    // SHA-256 of the raw request body, hex.
    t.string("request_hash", 64).notNullable();
    t.text("state").notNullable().defaultTo("pending");
    // Which attempt holds the reservation: a takeover after a crash gets a new one, so a late
    // completion of the old attempt cannot overwrite the new one's.
    t.uuid("attempt").notNullable();
    t.integer("response_status").nullable();
    t.text("response_type").nullable();
    t.text("response_body").nullable();
    createdAt(t, knex);
    instant(t, "locked_at").notNullable().defaultTo(knex.fn.now());
    instant(t, "expires_at").notNullable().defaultTo(knex.raw("now() + interval '24 hours'"));
    t.primary(["user_id", "route", "key"]);
    t.index(["expires_at"]);
  });
  await knex.raw("alter table idempotency_keys add constraint idempotency_keys_state check (state in ('pending', 'complete'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("idempotency_keys");
}
