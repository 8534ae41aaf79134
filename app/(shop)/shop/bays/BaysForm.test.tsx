// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { BaysSetup } from "@/lib/shop/bookings/api";
import { BaysForm } from "./BaysForm";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => undefined }) }));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const setup: BaysSetup = {
  timeZone: "America/Denver",
  slotStepMinutes: 30,
  weekdays: [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, open: weekday <= 5, opens: "08:00", closes: "17:00" })),
  closedDays: [],
  bays: [{ id: "b0000000-0000-4000-8000-000000000001", name: "Lift 1", kind: "lift_bay" }],
  serviceTimes: [
    {
      catalogItemId: "c0000000-0000-4000-8000-000000000001",
      sku: "SV-MB",
      description: "Mount and balance",
      serviceType: "mount_balance",
      unit: "per_wheel",
      minutes: 20,
      bayKind: "lift_bay",
      isDefault: true,
    },
  ],
};

function server(status: number, body: unknown) {
  const calls: { method: string; body: Record<string, unknown> }[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: string, init?: RequestInit) => {
      calls.push({ method: init?.method ?? "GET", body: JSON.parse(String(init?.body ?? "{}")) });
      return new Response(JSON.stringify(body), { status });
    }),
  );
  return calls;
}

describe("the bays-and-hours form", () => {
  it("refuses a closing time before the opening beside the field, tied by aria-describedby, and sends nothing", async () => {
    const calls = server(200, { setup });
    render(<BaysForm initial={setup} />);
    const closes = screen.getByLabelText("Monday closes");
    await userEvent.clear(closes);
    await userEvent.type(closes, "07:00");
    await userEvent.click(screen.getByRole("button", { name: "Save bays and hours" }));
    const message = await screen.findByText("Monday closes before it opens: enter a closing time after 08:00.");
    expect(closes.getAttribute("aria-describedby")).toContain(message.id);
    expect(closes.getAttribute("aria-invalid")).toBe("true");
    expect(calls).toEqual([]);
  });

  it("sends the whole form as typed, adds a bay, and puts the server's field errors beside their fields", async () => {
    const calls = server(422, {
      error: "Some fields need attention.",
      fieldErrors: { "bays.1.name": ["Bay 2: Two bays are called “Lift 1”: give each its own name."] },
    });
    render(<BaysForm initial={setup} />);
    await userEvent.click(screen.getByRole("button", { name: "Add a bay" }));
    await userEvent.type(screen.getByLabelText("Bay 2 name"), "Rack");
    await userEvent.selectOptions(screen.getByLabelText("Bay 2 kind"), "alignment_rack");
    await userEvent.click(screen.getByRole("button", { name: "Save bays and hours" }));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]!.method).toBe("PUT");
    expect(calls[0]!.body).toMatchObject({
      timeZone: "America/Denver",
      slotStepMinutes: "30",
      bays: [{ name: "Lift 1" }, { id: "", name: "Rack", kind: "alignment_rack" }],
      serviceTimes: [{ minutes: "20", bayKind: "lift_bay" }],
    });
    expect(await screen.findByText("Bay 2: Two bays are called “Lift 1”: give each its own name.")).toBeTruthy();
  });
});
