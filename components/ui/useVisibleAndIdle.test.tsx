// @vitest-environment jsdom
import { act, cleanup, render, screen } from "@testing-library/react";
import { useRef } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { VISIBLE_MARGIN, useVisibleAndIdle } from "./useVisibleAndIdle";

function Probe() {
  const ref = useRef<HTMLDivElement>(null);
  return <div ref={ref}>{useVisibleAndIdle(ref) ? "ready" : "waiting"}</div>;
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("useVisibleAndIdle", () => {
  it("waits for the element to come near the viewport, then for an idle moment", () => {
    let seen: ((e: { isIntersecting: boolean }[]) => void) | null = null;
    const options: IntersectionObserverInit[] = [];
    vi.stubGlobal(
      "IntersectionObserver",
      class {
        constructor(cb: (e: { isIntersecting: boolean }[]) => void, o: IntersectionObserverInit) {
          seen = cb;
          options.push(o);
        }
        observe() {}
        disconnect() {}
      },
    );
    const idle: (() => void)[] = [];
    vi.stubGlobal("requestIdleCallback", (cb: () => void) => idle.push(cb));
    vi.stubGlobal("cancelIdleCallback", () => {});
    render(<Probe />);
    expect(screen.getByText("waiting")).toBeTruthy();
    expect(options[0]?.rootMargin).toBe(VISIBLE_MARGIN);
    act(() => seen!([{ isIntersecting: false }]));
    expect(idle).toHaveLength(0);
    act(() => seen!([{ isIntersecting: true }]));
    expect(screen.getByText("waiting")).toBeTruthy();
    act(() => idle[0]!());
    expect(screen.getByText("ready")).toBeTruthy();
  });

  it("loads at once after mounting where there is no IntersectionObserver", async () => {
    vi.stubGlobal("IntersectionObserver", undefined);
    vi.stubGlobal("requestIdleCallback", undefined);
    render(<Probe />);
    expect(await screen.findByText("ready")).toBeTruthy();
  });
});
