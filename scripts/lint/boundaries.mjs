// Local ESLint rules that hold the layering described in DEVELOPERS.md (no package: the rules
// only resolve import paths and read the "use client" directive).
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const SOURCE_DIRS = ["app", "components", "lib"];
const EXTENSIONS = [".ts", ".tsx", ".mts", ".js", ".mjs"];

/** Every source file that starts with `import "server-only"`, found once per lint run. */
function findServerOnlyModules() {
  const found = new Set();
  const walk = (dir) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (EXTENSIONS.includes(path.extname(entry.name)) && /^import\s+["']server-only["'];?\s*$/m.test(fs.readFileSync(full, "utf8")))
        found.add(full);
    }
  };
  for (const dir of SOURCE_DIRS) if (fs.existsSync(path.join(ROOT, dir))) walk(path.join(ROOT, dir));
  return found;
}

let serverOnly;
const serverOnlyModules = () => (serverOnly ??= findServerOnlyModules());

/** The file an import names (the "@/" alias is the project root), or null for a package. */
function resolveImport(fromFile, source) {
  let base;
  if (source.startsWith("@/")) base = path.join(ROOT, source.slice(2));
  else if (source.startsWith(".")) base = path.resolve(path.dirname(fromFile), source);
  else return null;
  const candidates = [base, ...EXTENSIONS.map((e) => base + e), ...EXTENSIONS.map((e) => path.join(base, "index" + e))];
  return candidates.find((c) => fs.existsSync(c) && fs.statSync(c).isFile()) ?? base;
}

/** import/export-from declarations and dynamic import("...") of a program, with their source text. */
function eachImport(report) {
  const check = (node, source) => {
    if (typeof source === "string") report(node, source);
  };
  return {
    ImportDeclaration: (node) => check(node, node.source.value),
    ExportNamedDeclaration: (node) => node.source && check(node, node.source.value),
    ExportAllDeclaration: (node) => check(node, node.source.value),
    ImportExpression: (node) => node.source.type === "Literal" && check(node, node.source.value),
  };
}

/** True when the file's directive prologue holds "use client". */
function isClientFile(program) {
  for (const statement of program.body) {
    if (statement.type !== "ExpressionStatement" || typeof statement.directive !== "string") return false;
    if (statement.directive === "use client") return true;
  }
  return false;
}

/** lib/fitment is the pure engine: packages and its own files only. */
const engineSelfContained = {
  meta: {
    type: "problem",
    schema: [],
    messages: { outside: 'The engine (lib/fitment) imports only its own files and packages, not "{{source}}".' },
  },
  create(context) {
    const engineDir = path.join(ROOT, "lib/fitment");
    return eachImport((node, source) => {
      const target = resolveImport(context.filename, source);
      if (target && !target.startsWith(engineDir + path.sep)) context.report({ node, messageId: "outside", data: { source } });
    });
  },
};

/** A "use client" file never imports a server-only module nor a database row type. */
const clientNoServer = {
  meta: {
    type: "problem",
    schema: [{ type: "object", properties: { rowTypes: { type: "boolean" } }, additionalProperties: false }],
    messages: {
      server: 'A client component cannot import the server-only module "{{source}}": take the data from a page or an API route.',
      row: "A client component cannot import the database row type {{name}}: use the feature's API shape (camelCase, ISO dates).",
    },
  },
  create(context) {
    if (!isClientFile(context.sourceCode.ast)) return {};
    const modules = serverOnlyModules();
    const rowTypes = context.options[0]?.rowTypes ?? true;
    return eachImport((node, source) => {
      const target = resolveImport(context.filename, source);
      if (source === "server-only" || (target && modules.has(target))) {
        context.report({ node, messageId: "server", data: { source } });
        return;
      }
      if (rowTypes && target === path.join(ROOT, "lib/platform/db/types.ts") && node.type === "ImportDeclaration") {
        for (const spec of node.specifiers) {
          const name = spec.type === "ImportSpecifier" ? (spec.imported.name ?? spec.imported.value) : "*";
          if (name === "*" || /Row$/.test(name)) context.report({ node: spec, messageId: "row", data: { name } });
        }
      }
    });
  },
};

/**
 * Only query modules touch tables: a call such as `db("quotes")` or `trx("users")` (a Knex handle
 * called with a table name) belongs in a feature's `queries.ts` / `*Queries.ts`, or in the platform
 * code that owns its own tables (lib/platform/**). Services and pages call those modules.
 */
const HANDLE_NAMES = new Set(["db", "trx", "tx", "knex"]);
const tablesInQueries = {
  meta: {
    type: "problem",
    messages: { table: 'Table "{{table}}" is read here: table access belongs in the feature\'s query module (queries.ts or *Queries.ts).' },
    schema: [],
  },
  create(context) {
    const file = path
      .relative(ROOT, context.filename ?? context.getFilename())
      .split(path.sep)
      .join("/");
    if (/(^|\/)(queries|[A-Za-z]+Queries)\.ts$/.test(file) || file.startsWith("lib/platform/") || /\.test\.tsx?$/.test(file)) return {};
    return {
      CallExpression(node) {
        const [arg] = node.arguments;
        if (
          node.callee.type === "Identifier" &&
          HANDLE_NAMES.has(node.callee.name) &&
          arg &&
          arg.type === "Literal" &&
          typeof arg.value === "string"
        ) {
          context.report({ node, messageId: "table", data: { table: arg.value } });
        }
      },
    };
  },
};

export const boundaries = {
  meta: { name: "hubface-boundaries" },
  rules: { "engine-self-contained": engineSelfContained, "client-no-server": clientNoServer, "tables-in-queries": tablesInQueries },
};
