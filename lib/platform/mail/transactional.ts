import "server-only";
import type { Knex } from "knex";
import type PgBoss from "pg-boss";
import { QUEUES, getBoss } from "@/lib/platform/jobs/boss";
import { type OutgoingMail, toQueued } from "./index";

/**
 * pg-boss's SQL run on a Knex transaction: its `$1…$n` placeholders become Knex's `?` bindings
 * (a literal `?` in its SQL is escaped), so the job row is written by the caller's transaction.
 */
function onTransaction(trx: Knex.Transaction): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const bindings: unknown[] = [];
      const sql = text.replace(/\?/g, "\\?").replace(/\$(\d+)/g, (_, n: string) => {
        const v = values[Number(n) - 1];
        bindings.push(v === undefined ? null : v);
        return "?";
      });
      const result = (await trx.raw(sql, bindings as Knex.RawBinding[])) as { rows: unknown[] };
      return { rows: result.rows };
    },
  };
}

/**
 * Queues a mail inside the caller's transaction: the mail job exists if and only if the
 * transaction commits. For mail that tells of a change (a booking made, moved or cancelled),
 * so a rollback never sends news of a change that did not happen and a commit never loses the
 * news. Returns the job id.
 */
export async function queueMailIn(trx: Knex.Transaction, mail: OutgoingMail): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(QUEUES.mail.name, toQueued(mail) as unknown as object, { db: onTransaction(trx) });
  if (!id) throw new Error("the job queue did not accept the mail");
  return id;
}
