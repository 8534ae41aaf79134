import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL(".", import.meta.url));
const alias = {
  "@": root,
  // "server-only" throws outside React's server bundle; in tests the modules run on Node anyway.
  "server-only": fileURLToPath(new URL("./tests/support/empty.ts", import.meta.url)),
};

const BROWSER_ALONE = ["tests/browser/outage.test.ts", "tests/browser/several-servers.test.ts", "tests/browser/lighthouse.test.ts"];
/** Knex loads migration files itself: tsx lets those TypeScript files load inside the forks. */
const withTsx = { pool: "forks" as const, execArgv: ["--import", "tsx"] };
const browser = {
  ...withTsx,
  include: ["tests/browser/**/*.test.ts"],
  environment: "node" as const,
  testTimeout: 90000,
  hookTimeout: 90000,
  // Two files share the machine with the server and two Chromiums: a page may take more than
  // expect.poll's default second to answer a click.
  expect: { poll: { timeout: 15000 } },
};

export default defineConfig({
  resolve: { alias },
  oxc: { jsx: { runtime: "automatic" } },
  test: {
    // The machine this runs on has two cores; more workers only queue.
    maxWorkers: 2,
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          // Threads start faster than forks, and pure tests need no loader of their own.
          pool: "threads",
          // Pure tests sit beside their module (tests/ holds integration and browser tests, and the
          // integration tests' own helpers, whose tests sit beside them and run here).
          include: ["{app,components,lib,scripts}/**/*.test.{ts,tsx}", "tests/integration/support/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          ...withTsx,
          include: ["tests/integration/**/*.test.ts"],
          exclude: ["tests/integration/support/**"],
          environment: "node",
          // One database per worker, so files run side by side.
          setupFiles: ["tests/integration/support/workerDatabase.ts"],
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        extends: true,
        test: {
          ...browser,
          name: "browser",
          // Two files at a time against the one server: each works on accounts and records of its own
          // or only reads the demo data; steps that change one shared record share a file (shop-work-order).
          exclude: BROWSER_ALONE,
        },
      },
      {
        extends: true,
        test: {
          ...browser,
          name: "browser-alone",
          // Files that stop the database, start servers of their own or load the whole machine
          // (Lighthouse) run after the others, one at a time.
          include: BROWSER_ALONE,
          fileParallelism: false,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
