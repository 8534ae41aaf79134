import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL(".", import.meta.url));
const alias = {
  "@": root,
  // "server-only" throws outside React's server bundle; in tests the modules run on Node anyway.
  "server-only": fileURLToPath(new URL("./tests/support/empty.ts", import.meta.url)),
};

export default defineConfig({
  resolve: { alias },
  oxc: { jsx: { runtime: "automatic" } },
  test: {
    pool: "forks",
    // Knex loads migration files itself: tsx lets those TypeScript files load inside the forks.
    execArgv: ["--import", "tsx"],
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
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
          include: ["tests/integration/**/*.test.ts"],
          exclude: ["tests/integration/support/**"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        extends: true,
        test: {
          name: "browser",
          include: ["tests/browser/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 90000,
          hookTimeout: 90000,
        },
      },
    ],
  },
});
