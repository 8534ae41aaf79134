// @vitest-environment jsdom
import { zodResolver } from "@hookform/resolvers/zod";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { afterEach, describe, expect, it } from "vitest";
import { z } from "zod";
import { TextField } from "./TextField";
import { fieldBinder } from "./fieldProps";

afterEach(cleanup);

// An invented form: one top-level field and one nested in a list, as the bays form nests weekday hours.
const schema = z.object({
  name: z.string().min(1, "Shop name: required."),
  days: z.array(z.object({ opens: z.string().min(1, "Monday opens: required.") })),
});
type Values = z.infer<typeof schema>;

function Probe({ onValid }: { onValid: (v: Values) => void }) {
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: "", days: [{ opens: "" }] } });
  const field = fieldBinder(form);
  return (
    <form onSubmit={form.handleSubmit(onValid)} noValidate>
      <TextField label="Shop name" {...field("name")} />
      <TextField label="Monday opens" {...field("days.0.opens")} />
      <button type="submit">Save</button>
    </form>
  );
}

const describedText = (label: string) => {
  const ids = screen.getByLabelText(label).getAttribute("aria-describedby")!.split(" ");
  return ids.map((id) => document.getElementById(id)!.textContent).join(" ");
};

describe("fieldBinder", () => {
  it("registers each field under its name and ties zod's message for that path to it, nested paths too", async () => {
    const user = userEvent.setup();
    const seen: Values[] = [];
    render(<Probe onValid={(v) => seen.push(v)} />);
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(describedText("Shop name")).toBe("Shop name: required.");
    expect(describedText("Monday opens")).toBe("Monday opens: required.");
    expect(screen.getByLabelText("Monday opens").getAttribute("aria-invalid")).toBe("true");
    await user.type(screen.getByLabelText("Shop name"), "North bay");
    await user.type(screen.getByLabelText("Monday opens"), "08:00");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(seen).toEqual([{ name: "North bay", days: [{ opens: "08:00" }] }]);
    expect(describedText("Monday opens")).toBe("");
  });
});
