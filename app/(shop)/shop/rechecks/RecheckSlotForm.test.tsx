// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { RecheckSlotForm } from "./RecheckSlotForm";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("the re-check slot form", () => {
  it("refuses a fraction before sending, naming the field as it is labelled, tied to the input for screen readers", async () => {
    const fetch = vi.fn();
    vi.stubGlobal("fetch", fetch);
    const user = userEvent.setup();
    render(<RecheckSlotForm minutes={30} />);
    const input = screen.getByLabelText("Re-check slot (minutes)");
    expect((input as HTMLInputElement).value).toBe("30");
    await user.clear(input);
    await user.type(input, "30.5");
    await user.click(screen.getByRole("button", { name: "Save" }));
    const message = await screen.findByText("Re-check slot (minutes): enter a whole number of minutes, e.g. 30.");
    expect(input.getAttribute("aria-describedby")).toContain(message.id || message.closest("[id]")!.id);
    expect(fetch).not.toHaveBeenCalled();
  });

  it("saves the length to the re-checks route and says what the page offers now", async () => {
    const fetch = vi.fn(async () => new Response(JSON.stringify({ minutes: 45 }), { status: 200 }));
    vi.stubGlobal("fetch", fetch);
    const user = userEvent.setup();
    render(<RecheckSlotForm minutes={30} />);
    const input = screen.getByLabelText("Re-check slot (minutes)");
    await user.clear(input);
    await user.type(input, "45");
    await user.click(screen.getByRole("button", { name: "Save" }));
    await screen.findByText("Saved: the re-check page offers 45-minute slots.");
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/shop/rechecks/slot");
    expect(init.method).toBe("PUT");
    expect(JSON.parse(String(init.body))).toEqual({ minutes: 45 });
  });
});
