// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { afterEach, describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { type TirePressureLimits, tirePressureLimits } from "@/lib/shop/workOrders/pressureLimit";
import { pressureFieldLabel } from "@/lib/shop/workOrders/schema";
import { FIELD_LABEL } from "@/lib/shop/workOrders/vocabulary";
import { PressureFields } from "./PressureFields";
import type { StepValues } from "./stepForm";

afterEach(cleanup);

function Probe({ limits }: { limits: TirePressureLimits | null }) {
  const form = useForm<StepValues>({
    defaultValues: { step: "pressure", position: "lf", pressure: "", pressureUnit: "psi", makerTable: false },
  });
  return <PressureFields form={form} idPrefix="t" limits={limits} />;
}

// Flotation load range E: 65 psi (the engine's table, from memory); 1 psi = 6.894757 kPa (NIST SP 811).
const LIMITS = tirePressureLimits("35x12.50R17LT 121Q E")!;
const TO_SET = [
  { axle: "front" as const, kpa: psiToKpa(37.9), decidedBy: "road minimum" as const },
  { axle: "rear" as const, kpa: psiToKpa(40), decidedBy: "axle load" as const },
];

describe("the work order's cold pressure step", () => {
  it("gives the pressure to set per axle from the quote's placard, in the unit chosen, with the tire's maximum", async () => {
    render(<Probe limits={{ ...LIMITS, toSet: TO_SET }} />);
    const field = screen.getByLabelText(pressureFieldLabel("psi"));
    const hint = () => document.getElementById(field.getAttribute("aria-describedby")!.split(" ")[0]!)!.textContent;
    expect(hint()).toMatch(
      /^Cold pressure to set \(from the door placard on the quote\): front 37\.9 psi \(261 kPa\), rear 40 psi \(276 kPa\)\./,
    );
    expect(hint()).toContain("at most 65 psi (448 kPa)");
    await userEvent.selectOptions(screen.getByLabelText(FIELD_LABEL.pressureUnit), "kPa");
    expect(screen.getByLabelText(pressureFieldLabel("kPa")).getAttribute("aria-describedby")).toBeTruthy();
    expect(document.body.textContent).toContain("front 261 kPa (37.9 psi), rear 276 kPa (40 psi)");
  });

  it("without a placard on the quote keeps today's hint", () => {
    render(<Probe limits={LIMITS} />);
    expect(document.body.textContent).not.toContain("Cold pressure to set");
    expect(document.body.textContent).toContain(
      "Cold, to the figure for this tire and load (door placard or the tire maker's load table).",
    );
  });

  it("offers the maker's load table tick only for a figure below the road minimum (0.5833 × 65 psi = 37.9 psi, no source)", async () => {
    render(<Probe limits={LIMITS} />);
    const field = screen.getByLabelText(pressureFieldLabel("psi"));
    await userEvent.type(field, "38");
    expect(screen.queryByLabelText(FIELD_LABEL.makerTable)).toBeNull();
    await userEvent.clear(field);
    await userEvent.type(field, "30");
    expect(screen.getByLabelText(FIELD_LABEL.makerTable)).toBeTruthy();
  });
});
