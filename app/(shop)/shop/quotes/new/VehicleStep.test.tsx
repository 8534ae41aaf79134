// @vitest-environment jsdom
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { lbToKg, psiToKpa } from "@/lib/fitment";
import type { CustomerVehicle } from "@/lib/shop/customers/api";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { VehicleStep } from "./VehicleStep";
import { useVehicleChoice } from "./useVehicleChoice";

const CUSTOMER = "c1000000-0000-4000-8000-000000000001";
// An invented saved car: placarded for 225/65R17 102H at 35 psi front, 33 psi rear, weighed on a scale.
const SAVED: CustomerVehicle = {
  id: "c1000000-0000-4000-8000-0000000000v1",
  customerId: CUSTOMER,
  description: "Invented wagon",
  boltPattern: "5x114.3",
  currentSetup: { tire: "225/65R17 102H", wheelDiameterIn: 17, wheelWidthIn: 7, position: { mode: "offset", offsetMm: 45 }, spacerMm: 0 },
  axleRatio: null,
  hubBoreMm: 64.1,
  placard: {
    units: "imperial",
    vehicleKind: "passenger-car",
    placardTire: "225/65R17 102H",
    placardFrontKpa: psiToKpa(35),
    placardRearKpa: psiToKpa(33),
    frontGawrKg: null,
    rearGawrKg: null,
    frontAxleKg: lbToKg(2200),
    rearAxleKg: lbToKg(2000),
  },
  // Measured in mm with the current tires.
  bodyPoints: {
    units: "metric",
    frontCornerHeightMm: 750,
    frontCornerAheadMm: 900,
    rearCornerHeightMm: null,
    rearCornerBehindMm: null,
    midHeightMm: 420,
    wheelbaseMm: 2800,
  },
  createdAt: "2026-12-01T10:00:00.000Z",
};

let fetchMock: ReturnType<typeof vi.fn>;
beforeEach(() => {
  window.localStorage.clear();
  fetchMock = vi.fn(async (url: string) =>
    url.startsWith("/api/shop/customers/")
      ? Response.json({ customer: { id: CUSTOMER }, vehicles: [SAVED] })
      : Response.json({ vehicle: {}, wheelsFitting: 0, pairs: 0, picks: [] }),
  );
  vi.stubGlobal("fetch", fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** The vehicle step with the quote builder's own state, and the vehicle part of the request it would send. */
function Harness() {
  const choice = useVehicleChoice();
  return (
    <>
      <VehicleStep customerId={CUSTOMER} {...choice.step} onCandidates={(v) => choice.setVehicle(v)} />
      {choice.vehicle && <pre data-testid="request">{JSON.stringify(choice.request())}</pre>}
    </>
  );
}

/** The step with the saved wagon picked. The first render loads the form's modules; the saved list then comes from the mocked server. */
async function openSaved() {
  renderWithQuery(<Harness />);
  await userEvent.click(await screen.findByRole("button", { name: /Invented wagon/ }, { timeout: 5000 }));
}
/** Types `text` over what the labelled field holds; the field, for what it then says. */
async function retype(label: string, text: string) {
  const field = screen.getByLabelText(label);
  await userEvent.clear(field);
  await userEvent.type(field, text);
  return field;
}
const valueOf = (label: string) => (screen.getByLabelText(label) as HTMLInputElement).value;
const request = async () => JSON.parse((await screen.findByTestId("request")).textContent!);

describe("the counter's vehicle step with a saved vehicle", () => {
  it("fills the placard fields from what the vehicle stored, in the screen's units, and its vehicle kind", async () => {
    await openSaved();
    expect(valueOf("Tire size on the placard")).toBe("225/65R17 102H");
    // Stored in SI, shown in psi and lb: 241.3 kPa = 35 psi, 997.9 kg = 2200 lb (NIST SP 811 factors).
    expect(valueOf("Placard cold pressure, front (psi)")).toBe("35");
    expect(valueOf("Placard cold pressure, rear (psi)")).toBe("33");
    expect(valueOf("Front axle weight, scale ticket (lb)")).toBe("2200");
    expect(valueOf("Rear axle weight, scale ticket (lb)")).toBe("2000");
    expect((screen.getByRole("radio", { name: "Car" }) as HTMLInputElement).checked).toBe(true);
    // 750 mm = 29.53 in, 2800 mm = 110.24 in (1 in = 25.4 mm exactly, NIST SP 811), shown rounded.
    expect(valueOf("Front corner height (in)")).toMatch(/^29\.5/);
    expect(valueOf("Wheelbase (in)")).toMatch(/^110\.2/);
    expect(valueOf("Rear corner height (in)")).toBe("");
    const box = screen.getByRole("checkbox", { name: "Save the changes to this saved vehicle" }) as HTMLInputElement;
    expect(box.disabled).toBe(true);
  });

  it("unchanged, the quote names the saved vehicle only, with its placard as stored", async () => {
    await openSaved();
    await userEvent.click(screen.getByRole("button", { name: "Find fitments" }));
    expect(await request()).toEqual({ vehicleId: SAVED.id });
  });

  it("a changed placard pressure and vehicle kind are sent with the saved vehicle's id, to be written over it", async () => {
    await openSaved();
    await retype("Placard cold pressure, front (psi)", "36");
    await userEvent.click(screen.getByRole("radio", { name: "Truck, SUV, van" }));
    const box = screen.getByRole("checkbox", { name: "Save the changes to this saved vehicle" }) as HTMLInputElement;
    expect(box.disabled).toBe(false);
    expect(box.checked).toBe(true);
    await userEvent.click(screen.getByRole("button", { name: "Find fitments" }));
    const sent = await request();
    expect(sent.vehicleId).toBe(SAVED.id);
    expect(sent.saveVehicle).toBe(true);
    // 36 psi = 248.21 kPa (1 psi = 6.894757 kPa, NIST SP 811); the other figures as stored.
    expect(sent.vehicle.placard.placardFrontKpa).toBeCloseTo(36 * 6.894757, 3);
    expect(sent.vehicle.placard.placardRearKpa).toBeCloseTo(SAVED.placard!.placardRearKpa, 6);
    expect(sent.vehicle.placard.frontAxleKg).toBeCloseTo(SAVED.placard!.frontAxleKg!, 6);
    expect(sent.vehicle.placard.vehicleKind).toBe("light-truck");
    // The body points as stored, their exact values kept through the inch fields.
    expect(sent.vehicle.bodyPoints).toMatchObject({ frontCornerHeightMm: expect.closeTo(750, 6), wheelbaseMm: expect.closeTo(2800, 6) });
    expect(sent.vehicle.bodyPoints.rearCornerHeightMm).toBeNull();
    expect(sent.vehicle.description).toBe("Invented wagon");
    await waitFor(() => expect(fetchMock.mock.calls.some(([u]) => u === "/api/shop/fitment/candidates")).toBe(true));
  });

  it("refuses a negative axle weight beside its field, and finds nothing", async () => {
    await openSaved();
    const rear = await retype("Rear axle weight, scale ticket (lb)", "-2000");
    await userEvent.click(screen.getByRole("button", { name: "Find fitments" }));
    expect(await screen.findByText("See the messages beside the placard and body point fields.")).toBeTruthy();
    const described = (rear.getAttribute("aria-describedby") ?? "").split(" ");
    const text = described.map((id) => document.getElementById(id)?.textContent ?? "").join(" ");
    expect(text).toContain("Rear axle weight, scale ticket (lb): must be between 221 and 44092 lb, e.g. 2900.");
    expect(fetchMock.mock.calls.some(([u]) => u === "/api/shop/fitment/candidates")).toBe(false);
    expect(screen.queryByTestId("request")).toBeNull();
  });

  it("refuses a body point inside the current tire beside its field, as labelled, and finds nothing", async () => {
    await openSaved();
    // 4 in high and 2 in ahead of the axle: inside the 362.2 mm (14.3 in) radius of 225/65R17 (17 × 25.4 + 2 × 0.65 × 225 = 724.3 mm across, ISO 4000-1).
    await retype("Front corner height (in)", "4");
    await retype("Front corner ahead of the front axle (in)", "2");
    await userEvent.click(screen.getByRole("button", { name: "Find fitments" }));
    expect(await screen.findByText("See the messages beside the placard and body point fields.")).toBeTruthy();
    const field = screen.getByLabelText("Front corner height (in)");
    const said = (field.getAttribute("aria-describedby") ?? "").split(" ").map((id) => document.getElementById(id)?.textContent ?? "");
    expect(said.join(" ")).toMatch(/Front corner height \(in\): .*measured with the current tire, 225\/65R17 102H/);
    expect(fetchMock.mock.calls.some(([u]) => u === "/api/shop/fitment/candidates")).toBe(false);
  });
});
