import type { Knex } from "knex";

/**
 * Runs independent reads side by side on the pool, and one after another inside a transaction: a
 * transaction is one connection, and pg deprecates (and from v9 refuses) a query sent on a client
 * while another is running on it. For query functions that take either (`Knex | Knex.Transaction`).
 *
 * @example
 * const [payments, refunds] = await readTogether(db, () => db("payments").where(q), () => db("payment_refunds").where(q));
 */
export async function readTogether<T extends readonly unknown[]>(
  db: Knex | Knex.Transaction,
  ...reads: { [K in keyof T]: () => PromiseLike<T[K]> }
): Promise<T> {
  if (!db.isTransaction) return (await Promise.all(reads.map((read) => read()))) as unknown as T;
  const results: unknown[] = [];
  for (const read of reads) results.push(await read());
  return results as unknown as T;
}
