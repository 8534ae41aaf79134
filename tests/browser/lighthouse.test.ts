import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { BASE } from "./support/browser";

/**
 * `npm run measure:lighthouse` against the suite's production server for two pages (the heaviest
 * public one and the signed-in one; all seven take a minute more), its table printed.
 * A timing never decides a test: only that each page was measured is checked, not the scores.
 */
describe("Lighthouse on the pages a phone user opens first", () => {
  it("measures each page and prints its scores", async () => {
    const { stdout } = await promisify(execFile)(
      "npx",
      ["tsx", "scripts/measure-lighthouse.mts", BASE, "--only=workspace-comparison,vehicle"],
      {
        timeout: 600_000,
        maxBuffer: 4 * 1024 * 1024,
      },
    );
    console.info(stdout);
    for (const page of ["/workspace?", "/garage/"]) expect(stdout).toContain(page);
    expect(stdout).not.toContain("/convert");
  }, 660_000);
});
