// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { CUR } from "@/lib/garage/testUtil";
import type { Setup } from "@/lib/setup/model";
import { CounterPlacardFields } from "./CounterPlacardFields";
import { useCounterPlacard } from "./useCounterPlacard";

afterEach(cleanup);
beforeEach(() => window.localStorage.clear());

// The invented counter truck on its placard size.
const CURRENT: Setup = { ...CUR, tire: "265/70R17 113T" };

const sentOf = (v: unknown) => JSON.stringify(v === undefined ? "refused" : v);

/** The fields and what the vehicle step would send (the placard or the body points in SI, null, or "refused"). */
function Probe({ part = "placard" }: { part?: "placard" | "bodyPoints" }) {
  const placard = useCounterPlacard(CURRENT);
  const [sent, setSent] = useState("");
  return (
    <>
      <CounterPlacardFields placard={placard} />
      <button type="button" onClick={() => setSent(sentOf(part === "placard" ? placard.value() : placard.bodyPoints()))}>
        Find
      </button>
      <output>{sent}</output>
    </>
  );
}

const type = async (label: string, text: string) => {
  const f = screen.getByLabelText(label);
  await userEvent.clear(f);
  await userEvent.type(f, text);
};

describe("the counter's door placard fields", () => {
  it("send nothing when left empty", async () => {
    render(<Probe />);
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    expect(screen.getByRole("status").textContent).toBe("null");
  });

  it("send the placard in SI, typed in psi and lb (1 psi = 6.894757 kPa, 1 lb = 0.45359237 kg, NIST SP 811)", async () => {
    render(<Probe />);
    await type("Tire size on the placard", "265/70R17 113T");
    await type("Placard cold pressure, front (psi)", "35");
    await type("Placard cold pressure, rear (psi)", "35");
    await type("Front axle weight, scale ticket (lb)", "3150");
    await type("Rear axle weight, scale ticket (lb)", "2650");
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    const sent = JSON.parse(screen.getByRole("status").textContent!);
    expect(sent.units).toBe("imperial");
    expect(sent.placardFrontKpa).toBeCloseTo(psiToKpa(35), 6);
    expect(sent.frontAxleKg).toBeCloseTo(3150 * 0.45359237, 6);
    expect(sent.frontGawrKg).toBeNull();
  });

  it("send the vehicle kind chosen: truck unless Car is picked (a passenger tire's load is derated on a truck)", async () => {
    render(<Probe />);
    await type("Tire size on the placard", "265/70R17 113T");
    await type("Placard cold pressure, front (psi)", "35");
    await type("Placard cold pressure, rear (psi)", "35");
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    expect(JSON.parse(screen.getByRole("status").textContent!).vehicleKind).toBe("light-truck");
    await userEvent.click(screen.getByRole("radio", { name: "Car" }));
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    expect(JSON.parse(screen.getByRole("status").textContent!).vehicleKind).toBe("passenger-car");
  });

  it("send the body points in mm, typed in inches (1 in = 25.4 mm, NIST SP 811), without a placard", async () => {
    render(<Probe part="bodyPoints" />);
    await type("Front corner height (in)", "29.5");
    await type("Front corner ahead of the front axle (in)", "35.4");
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    const sent = JSON.parse(screen.getByRole("status").textContent!);
    expect(sent.units).toBe("imperial");
    expect(sent.frontCornerHeightMm).toBeCloseTo(29.5 * 25.4, 6);
    expect(sent.frontCornerAheadMm).toBeCloseTo(35.4 * 25.4, 6);
    expect(sent.wheelbaseMm).toBeNull();
  });

  it("refuse a negative lowest point beside its field, named as labelled", async () => {
    render(<Probe part="bodyPoints" />);
    await type("Lowest point midway, height (in)", "-16");
    await type("Wheelbase (in)", "140");
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    expect(screen.getByRole("status").textContent).toBe('"refused"');
    const mid = screen.getByLabelText("Lowest point midway, height (in)");
    const said = (mid.getAttribute("aria-describedby") ?? "").split(" ").map((id) => document.getElementById(id)?.textContent ?? "");
    expect(said.join(" ")).toMatch(/Lowest point midway, height \(in\): /);
  });

  it("convert the figures on a unit switch, and refuse a placard without its rear pressure beside that field", async () => {
    render(<Probe />);
    await type("Tire size on the placard", "265/70R17 113T");
    await type("Placard cold pressure, front (psi)", "35");
    await userEvent.click(screen.getByRole("radio", { name: "Metric" }));
    // 35 psi = 241.3 kPa (NIST SP 811), shown rounded in the kPa field.
    expect((screen.getByLabelText("Placard cold pressure, front (kPa)") as HTMLInputElement).value).toMatch(/^241/);
    await userEvent.click(screen.getByRole("button", { name: "Find" }));
    expect(screen.getByRole("status").textContent).toBe('"refused"');
    const rear = screen.getByLabelText("Placard cold pressure, rear (kPa)");
    expect(document.getElementById(`${rear.id}-error`)?.textContent ?? document.body.textContent).toMatch(
      /Placard cold pressure, rear \(kPa\): enter it too/,
    );
  });
});
