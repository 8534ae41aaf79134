import type { Knex } from "knex";
import { describe, expect, it } from "vitest";
import { readTogether } from "./readTogether";

/** Two reads that log when they start and end; the first takes longer, so overlapping shows in the log. */
function reads(log: string[]) {
  const read = (name: string, ms: number) => () =>
    new Promise<string>((resolve) => {
      log.push(`${name} starts`);
      setTimeout(() => {
        log.push(`${name} ends`);
        resolve(name);
      }, ms);
    });
  return [read("slow", 20), read("quick", 1)] as const;
}

// The behaviour pg asks for (node-postgres 8.x deprecation: one query at a time per client); no other source.
describe("readTogether", () => {
  it("runs the reads side by side on the pool, answers in the order asked", async () => {
    const log: string[] = [];
    const result = await readTogether({ isTransaction: undefined } as unknown as Knex, ...reads(log));
    expect(result).toEqual(["slow", "quick"]);
    expect(log).toEqual(["slow starts", "quick starts", "quick ends", "slow ends"]);
  });

  it("runs them one after another in a transaction (one connection), in the order asked", async () => {
    const log: string[] = [];
    const result = await readTogether({ isTransaction: true } as unknown as Knex.Transaction, ...reads(log));
    expect(result).toEqual(["slow", "quick"]);
    expect(log).toEqual(["slow starts", "slow ends", "quick starts", "quick ends"]);
  });
});
