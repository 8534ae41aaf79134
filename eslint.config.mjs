import next from "eslint-config-next";
import coreWebVitals from "eslint-config-next/core-web-vitals";
import typescript from "eslint-config-next/typescript";
import { boundaries } from "./scripts/lint/boundaries.mjs";

/** The database handle (and the helper that hands it out) stay inside query modules. */
const DB_HANDLE = [
  {
    name: "@/lib/platform/db",
    importNames: ["db"],
    message:
      "Pages and route handlers call the feature's query module (lib/<feature>/queries.ts, bound as *Queries), never the database handle.",
  },
  {
    name: "@/lib/platform/db/index",
    importNames: ["db"],
    message:
      "Pages and route handlers call the feature's query module (lib/<feature>/queries.ts, bound as *Queries), never the database handle.",
  },
  { name: "@/lib/platform/db/bind", message: "Binding queries to the handle belongs in the query module, not in app/." },
];

const config = [
  { ignores: [".next/**", "node_modules/**", ".data/**", "next-env.d.ts", "tests/browser/screenshots/**"] },
  ...next,
  ...coreWebVitals,
  ...typescript,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" },
      ],
    },
  },
  // Layering (DEVELOPERS.md): engine → nothing of the app; app → no database handle;
  // lib → no app or components; client components → no server-only module, no row type.
  { plugins: { hubface: boundaries } },
  { files: ["lib/fitment/**/*.{ts,tsx}"], rules: { "hubface/engine-self-contained": "error" } },
  { files: ["app/**/*.{ts,tsx}"], rules: { "no-restricted-imports": ["error", { paths: DB_HANDLE }] } },
  {
    files: ["lib/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: ["@/app/*", "@/components/*"], message: "lib/ is below app/ and components/: move the shared code into lib/." },
          ],
        },
      ],
    },
  },
  {
    files: ["app/**/*.{ts,tsx}", "components/**/*.{ts,tsx}", "lib/**/*.{ts,tsx}"],
    rules: { "hubface/client-no-server": "error", "hubface/tables-in-queries": "error" },
  },
  // Query keys come from one factory, so a feature's keys nest and no invalidation names a key nothing reads.
  {
    files: ["app/**/*.{ts,tsx}", "components/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-syntax": [
        "error",
        {
          selector: "Property[key.name='queryKey'] > ArrayExpression",
          message: "Build query keys with queryKeys from @/lib/platform/query/keys.",
        },
      ],
    },
  },
];
export default config;
