// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { clearanceSchema } from "@/lib/garage/schema";
import { AddPoint } from "./AddPoint";

vi.setConfig({ testTimeout: 20_000 });
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const VEHICLE = "a2000000-0000-4000-8000-000000000001";

/** Renders the form and records what it sends, read through the same schema as the handler. */
function renderForm() {
  const sent: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (_url: string, init?: RequestInit) => {
      sent.push(JSON.parse(String(init?.body ?? "{}")));
      return new Response(JSON.stringify({ clearance: {} }), { status: 201 });
    }),
  );
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={qc}>
      <AddPoint vehicleId={VEHICLE} />
    </QueryClientProvider>,
  );
  return sent;
}

describe("add a measured point: the unit select converts a bare distance", () => {
  it("1.5 typed with inches, switched to millimetres, reads 38.1 and is recorded as 38.1 mm (1 in = 25.4 mm, NIST SP 811)", async () => {
    const user = userEvent.setup();
    const sent = renderForm();
    await user.type(screen.getByLabelText("Point"), "frame rail, full left lock");
    await user.type(screen.getByLabelText("Distance"), "1.5");
    await user.selectOptions(screen.getByLabelText("Unit (when the distance has none)"), "mm");
    expect(screen.getByLabelText("Distance")).toHaveProperty("value", "38.1");
    await user.click(screen.getByRole("button", { name: "Add point" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(clearanceSchema.parse(sent[0]).distanceMm).toBeCloseTo(38.1, 9);
  });

  it("converts back without drift and leaves a distance that names its own unit alone", async () => {
    const user = userEvent.setup();
    renderForm();
    const distance = screen.getByLabelText("Distance");
    const unit = screen.getByLabelText("Unit (when the distance has none)");
    await user.type(distance, "1-1/2");
    await user.selectOptions(unit, "mm");
    expect(distance).toHaveProperty("value", "38.1");
    await user.selectOptions(unit, "in");
    expect(distance).toHaveProperty("value", "1.5");
    await user.clear(distance);
    await user.type(distance, "38 mm");
    await user.selectOptions(unit, "mm");
    expect(distance).toHaveProperty("value", "38 mm");
  });
});
