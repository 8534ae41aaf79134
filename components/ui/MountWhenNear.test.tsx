// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { MountWhenNear } from "./MountWhenNear";

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** A stand-in IntersectionObserver and idle callback the test drives by hand. */
function stubBrowser() {
  const observers: { cb: (e: { isIntersecting: boolean }[]) => void; observed: Element[] }[] = [];
  vi.stubGlobal(
    "IntersectionObserver",
    class {
      private entry: (typeof observers)[number];
      constructor(cb: (e: { isIntersecting: boolean }[]) => void) {
        this.entry = { cb, observed: [] };
        observers.push(this.entry);
      }
      observe(el: Element) {
        this.entry.observed.push(el);
      }
      disconnect() {}
    },
  );
  const idle: (() => void)[] = [];
  vi.stubGlobal("requestIdleCallback", (cb: () => void) => idle.push(cb));
  vi.stubGlobal("cancelIdleCallback", () => {});
  return { observers, idle };
}

function Panel() {
  const [text, setText] = useState("");
  return (
    <section aria-label="Load and pressure">
      <input aria-label="Placard tire size" value={text} onChange={(e) => setText(e.target.value)} />
    </section>
  );
}

describe("MountWhenNear", () => {
  it("holds a named placeholder of the reserved height until the spot is near the viewport and the browser idle", () => {
    const { observers, idle } = stubBrowser();
    render(
      <MountWhenNear label="Loading load and pressure" reserve="min-h-[40rem] lg:min-h-[24rem]">
        <Panel />
      </MountWhenNear>,
    );
    const placeholder = screen.getByRole("status", { name: "Loading load and pressure" });
    // The box holds the reserved height and the placeholder fills it.
    expect(placeholder.parentElement!.className).toContain("min-h-[40rem]");
    expect(placeholder.parentElement!.className).toContain("lg:min-h-[24rem]");
    expect(placeholder.className).toContain("grow");
    expect(screen.queryByRole("region", { name: "Load and pressure" })).toBeNull();
    // It watches its own box, which stays in place when the panel arrives.
    expect(observers[0]?.observed[0]).toBe(placeholder.parentElement);

    act(() => observers[0]!.cb([{ isIntersecting: false }]));
    expect(idle).toHaveLength(0);
    act(() => observers[0]!.cb([{ isIntersecting: true }]));
    expect(screen.queryByRole("region", { name: "Load and pressure" })).toBeNull();
    act(() => idle[0]!());
    const panel = screen.getByRole("region", { name: "Load and pressure" });
    expect(screen.queryByRole("status", { name: "Loading load and pressure" })).toBeNull();
    // The reserve stays on the box: a panel whose code is still loading keeps the space.
    expect(panel.parentElement!.className).toContain("min-h-[40rem]");
  });

  it("keeps the mounted panel and what was typed into it when the parent re-renders", () => {
    const { observers, idle } = stubBrowser();
    const { rerender } = render(
      <MountWhenNear label="Loading" reserve="min-h-96">
        <Panel />
      </MountWhenNear>,
    );
    act(() => observers[0]!.cb([{ isIntersecting: true }]));
    act(() => idle[0]!());
    fireEvent.change(screen.getByLabelText("Placard tire size"), { target: { value: "P265/70R17 113S" } });
    rerender(
      <MountWhenNear label="Loading" reserve="min-h-96">
        <Panel />
      </MountWhenNear>,
    );
    expect(screen.getByLabelText<HTMLInputElement>("Placard tire size").value).toBe("P265/70R17 113S");
    expect(screen.queryByRole("status")).toBeNull();
  });

  it("mounts the panel at once where there is no IntersectionObserver", async () => {
    vi.stubGlobal("IntersectionObserver", undefined);
    vi.stubGlobal("requestIdleCallback", undefined);
    render(
      <MountWhenNear label="Loading" reserve="min-h-96">
        <Panel />
      </MountWhenNear>,
    );
    expect(await screen.findByRole("region", { name: "Load and pressure" })).toBeTruthy();
  });
});
