import { readFileSync } from "node:fs";
import { afterEach, describe, expect, it, vi } from "vitest";
import { databaseUrl } from "./config";

afterEach(() => vi.unstubAllEnvs());

const scripts = Object.keys((JSON.parse(readFileSync("package.json", "utf8")) as { scripts: Record<string, string> }).scripts);

describe("databaseUrl", () => {
  it("hands back DATABASE_URL as set", () => {
    vi.stubEnv("DATABASE_URL", "postgres://app@db.example.test:5432/hubface");
    expect(databaseUrl()).toBe("postgres://app@db.example.test:5432/hubface");
  });

  it("without DATABASE_URL, names only npm scripts this project has", () => {
    vi.stubEnv("DATABASE_URL", "");
    let message = "";
    try {
      databaseUrl();
    } catch (e) {
      message = (e as Error).message;
    }
    expect(message).toMatch(/^DATABASE_URL is not set\./);
    const named = [...message.matchAll(/`npm (?:run )?([\w:-]+)`/g)].map((m) => m[1]!);
    expect(named.length).toBeGreaterThan(0);
    for (const name of named) expect(scripts, `npm script "${name}"`).toContain(name);
  });
});
