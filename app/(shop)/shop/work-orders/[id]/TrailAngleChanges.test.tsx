// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { TrailAngleChanges } from "./TrailAngleChanges";

afterEach(cleanup);

describe("the work order's trail angles", () => {
  it("names each angle by its row and shows now → with these tires, the notes and the caution", () => {
    render(
      <TrailAngleChanges
        angles={{
          rows: [{ label: "Approach angle", change: "45.7° → 48.6°" }],
          notes: ["Departure angle: the rear corner is inside the quoted tire's circle."],
          caution: "Trail angles: check on the vehicle.",
        }}
      />,
    );
    const region = screen.getByRole("region", { name: "Trail angles" });
    const row = within(region).getByRole("row", { name: /Approach angle/ });
    expect(within(row).getByRole("rowheader").textContent).toBe("Approach angle");
    expect(within(row).getByRole("cell").textContent).toBe("45.7° → 48.6°");
    expect(within(region).getByText(/rear corner is inside/)).toBeTruthy();
    expect(within(region).getByText("Trail angles: check on the vehicle.")).toBeTruthy();
  });

  it("shows only the notes when no angle could be worked out", () => {
    render(<TrailAngleChanges angles={{ rows: [], notes: ["Approach angle: no front corner measured."], caution: "c" }} />);
    expect(screen.queryByRole("table")).toBeNull();
    expect(screen.getByText("Approach angle: no front corner measured.")).toBeTruthy();
  });
});
