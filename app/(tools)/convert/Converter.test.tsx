// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { Converter } from "./Converter";

afterEach(cleanup);

const rows = () => within(screen.getByTestId("equivalents")).getAllByRole("row").slice(1);
const sizeOf = (row: HTMLElement) => within(row).getByRole("rowheader").firstChild?.textContent;

async function enter(text: string) {
  const user = userEvent.setup();
  const field = screen.getByLabelText("Tire size");
  await user.clear(field);
  await user.type(field, text);
}

describe("converter — tire sizes", () => {
  it("states the nominal inch size of a metric size: 285/75R16 ≈ 32.8 × 11.2 in on 16 in (ISO 4000-1 / ETRTO: 406.4 + 427.5 = 833.9 mm)", async () => {
    render(<Converter />);
    await enter("285/75R16");
    expect(screen.getByTestId("nominal").textContent).toBe("285/75R16 ≈ 32.8 × 11.2 in on 16 in");
    // Several inch sizes, the 16 in one first, the others marked as needing other wheels.
    const r = rows();
    expect(r.map(sizeOf)).toEqual(["31x10.50R16LT", "33x10.50R15LT", "32x11.50R15LT", "33x12.50R16.5LT", "33x12.50R15LT", "33x12.50R17LT"]);
    // 31x10.50R16LT: 787.4 − 833.9 = −46.5 mm (−5.6 %); 266.7 − 285 = −18.3 mm (−6.4 %).
    expect(r[0]?.textContent).toContain("−46.5 mm (−5.6 %)");
    expect(r[0]?.textContent).toContain("−18.3 mm (−6.4 %)");
    expect(r[1]?.textContent).toContain("other wheels");
    expect(screen.getByText("Other rim diameters need other wheels")).toBeTruthy();
  });

  it("a pasted 37×12.50R17 lists 315/80R17 first, with its nominal inch size (935.8 mm = 36.8 in, 315 mm = 12.4 in)", async () => {
    render(<Converter />);
    await enter("37×12.50R17");
    expect(screen.getByTestId("nominal").textContent).toBe("37x12.50R17 ≈ 37.0 × 12.5 in on 17 in");
    const first = rows()[0]!;
    expect(sizeOf(first)).toBe("315/80R17");
    expect(within(first).getByRole("rowheader").textContent).toContain("≈ 36.8 × 12.4 in");
    expect(first.textContent).toContain("−4.0 mm (−0.4 %)");
    expect(first.textContent).toContain("−2.5 mm (−0.8 %)");
    expect(rows().map(sizeOf)).not.toContain("365/70R17");
  });

  it("same rim diameter only keeps the 17 in sizes; a bad size names the field", async () => {
    const user = userEvent.setup();
    render(<Converter />);
    await user.click(screen.getByLabelText("Same rim diameter only"));
    await enter("285/75R16");
    expect(rows().map(sizeOf)).toEqual(["31x10.50R16LT"]);
    await enter("285/75R");
    expect(screen.getByText(/^Tire size "285\/75R"/)).toBeTruthy();
  });
});

describe("converter — torque, pressure and length messages name the field as labelled", () => {
  const typeInto = async (label: string, text: string) => {
    const user = userEvent.setup();
    const field = screen.getByLabelText(label);
    await user.clear(field);
    await user.type(field, text);
    return field;
  };

  it("refuses a decimal comma in a torque, naming the field, and converts 18.5 ft·lb to 25.08 N·m (1 ft·lbf = 1.355818 N·m, NIST SP 811)", async () => {
    render(<Converter />);
    await typeInto("Torque (ft·lb)", "18,5");
    expect(screen.getByText(/^Torque \(ft·lb\): "18,5" is ambiguous — a comma can mark decimals or thousands/)).toBeTruthy();
    expect(screen.getByLabelText("Torque (N·m)")).toHaveProperty("value", "");
    await typeInto("Torque (ft·lb)", "18.5");
    // 18.5 × 1.355818 = 25.0826 N·m.
    expect(screen.getByLabelText("Torque (N·m)")).toHaveProperty("value", "25.08");
  });

  it("names the pressure and length fields in their messages", async () => {
    render(<Converter />);
    await typeInto("Pressure (psi)", "lots");
    expect(screen.getByText("Pressure (psi): enter a pressure like 35.")).toBeTruthy();
    await typeInto("Millimetres", "wide");
    expect(screen.getByText("Millimetres: enter a length like 120.65 (or 4-3/4 in).")).toBeTruthy();
  });
});
