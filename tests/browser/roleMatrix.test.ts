import { readFileSync, readdirSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { describe, expect, it } from "vitest";
import type { MatrixCase } from "./matrix/types";
import { EVERYONE, call } from "./support/http";

const modules = import.meta.glob<{ cases: MatrixCase[] }>("./matrix/*.ts", { eager: true });
const CASES = Object.entries(modules)
  .filter(([file]) => !file.endsWith("/types.ts"))
  .flatMap(([, m]) => m.cases);

/** Every route.ts under app/ with the HTTP methods it exports. */
function routesInApp(): { route: string; methods: string[] }[] {
  const out: { route: string; methods: string[] }[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (/^route\.tsx?$/.test(e.name)) {
        const src = readFileSync(p, "utf8");
        const methods = ["GET", "POST", "PUT", "PATCH", "DELETE"].filter((m) =>
          new RegExp(`export\\s+(const|async function|function)\\s+${m}\\b|as\\s+${m}\\b`).test(src),
        );
        const route =
          "/" +
          relative("app", dir)
            .split(sep)
            .filter((s) => !/^\(.*\)$/.test(s))
            .join("/");
        out.push({ route, methods });
      }
    }
  };
  walk("app");
  return out;
}

describe("role matrix", () => {
  it("has a row for every method of every route handler in app/", () => {
    const missing = routesInApp().flatMap(({ route, methods }) =>
      methods.filter((m) => !CASES.some((c) => c.route === route && c.method === m)).map((m) => `${m} ${route}`),
    );
    expect(missing).toEqual([]);
  });

  for (const c of CASES) {
    it(`${c.method} ${c.route}${c.note ? ` (${c.note})` : ""}`, async () => {
      const path = typeof c.path === "function" ? await c.path() : c.path;
      const body = typeof c.body === "function" ? await (c.body as () => Promise<unknown>)() : c.body;
      const got: Record<string, number> = {};
      for (const who of EVERYONE) got[who] = (await call(who, c.method, path, body)).status;
      expect(got).toEqual(c.expect);
    });
  }
});
