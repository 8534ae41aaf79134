import { vi } from "vitest";

/**
 * Component tests' server: every fetch answers `status` with `body` as JSON. Returns the mock, so a
 * test reads what was sent (`fetch.mock.calls[0]`). Undo with `vi.unstubAllGlobals()` in afterEach.
 *
 * @example const fetch = answerFetch(422, { error: "Some fields need attention.", fieldErrors: { amount: ["…"] } });
 */
export function answerFetch(status: number, body: unknown) {
  const fetch = vi.fn(async (_url: string, _init: RequestInit) => Response.json(body, { status }));
  vi.stubGlobal("fetch", fetch);
  return fetch;
}
