// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { RecoveringError } from "./RecoveringError";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => {} }) }));

beforeEach(() => {
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => new Response("{}", { status: 200 })),
  );
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  document.cookie = "hubface-error-ref=; Path=/; Max-Age=0";
});

describe("the error panel's reference", () => {
  it("shows the request id a 5xx answer left (the one in the log lines) beside Next's digest, then clears it", async () => {
    document.cookie = "hubface-error-ref=9f2c4a1b0e7d3c55; Path=/";
    const error = Object.assign(new Error("hidden"), { digest: "3141592653" });
    render(<RecoveringError error={error} reset={() => {}} area="garage" />);
    expect(await screen.findByText(/Request id 9f2c4a1b0e7d3c55/)).toBeTruthy();
    expect(screen.getByText(/Reference 3141592653/)).toBeTruthy();
    expect(document.cookie).not.toContain("hubface-error-ref=9f2c");
  });

  it("shows only the digest when no 5xx answer left an id (an error streamed after the page began)", () => {
    render(<RecoveringError error={Object.assign(new Error("x"), { digest: "27182818" })} reset={() => {}} area="garage" />);
    expect(screen.getByText("Reference 27182818")).toBeTruthy();
    expect(screen.queryByText(/Request id/)).toBeNull();
  });
});
