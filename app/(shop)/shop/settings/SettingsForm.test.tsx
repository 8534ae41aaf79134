// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { answerFetch } from "@/tests/support/fetchAnswer";
import { router } from "@/tests/support/navigation";
import { SettingsForm } from "./SettingsForm";

vi.mock("next/navigation", () => import("@/tests/support/navigation"));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.clearAllMocks();
});

const initial = {
  name: "Mesa Flats Tire & Lift",
  address: "12 Caliche Rd",
  phone: "555-0142",
  taxRate: "8.25",
  labourRate: "120.00",
  fabricationRate: "140.00",
  quoteValidityDays: "14",
  depositPct: "25",
  currency: "USD",
  noticeEmail: "",
};

const input = (label: string) => screen.getByLabelText(label) as HTMLInputElement;

describe("SettingsForm", () => {
  it("shows every setting in screen order, each with its input kind and its hint tied to it", () => {
    render(<SettingsForm initial={initial} />);
    // Every field, in the order the form shows them (the phone is a textbox of type tel, the e-mail of type email).
    const all = Array.from(document.querySelectorAll("input")).map((e) => ({
      label: document.querySelector(`label[for="${e.id}"]`)?.textContent,
      name: e.name,
      type: e.type,
      inputMode: e.inputMode || undefined,
      readOnly: e.readOnly,
      value: e.value,
      hint: e
        .getAttribute("aria-describedby")
        ?.split(" ")
        .map((id) => document.getElementById(id)?.textContent)
        .filter(Boolean)
        .join(" "),
    }));
    expect(all).toEqual([
      { label: "Shop name", name: "name", type: "text", inputMode: undefined, readOnly: false, value: initial.name, hint: "" },
      {
        label: "Address",
        name: "address",
        type: "text",
        inputMode: undefined,
        readOnly: false,
        value: initial.address,
        hint: "Printed in the quote header.",
      },
      { label: "Phone", name: "phone", type: "tel", inputMode: undefined, readOnly: false, value: initial.phone, hint: "" },
      {
        label: "E-mail for shop notices",
        name: "noticeEmail",
        type: "email",
        inputMode: undefined,
        readOnly: false,
        value: "",
        hint: "Where we tell the shop that a customer accepted, paid or booked. Leave it empty to use the owners' addresses.",
      },
      {
        label: "Sales tax rate (%)",
        name: "taxRate",
        type: "text",
        inputMode: "decimal",
        readOnly: false,
        value: "8.25",
        hint: "Applied to taxable lines, e.g. 8.25.",
      },
      { label: "Deposit (% of total)", name: "depositPct", type: "text", inputMode: "numeric", readOnly: false, value: "25", hint: "" },
      {
        label: "Labour rate ($ per hour)",
        name: "labourRate",
        type: "text",
        inputMode: "decimal",
        readOnly: false,
        value: "120.00",
        hint: "",
      },
      {
        label: "Fabrication rate ($ per hour)",
        name: "fabricationRate",
        type: "text",
        inputMode: "decimal",
        readOnly: false,
        value: "140.00",
        hint: "Fender trimming and other cutting work.",
      },
      {
        label: "Quote valid for (days)",
        name: "quoteValidityDays",
        type: "text",
        inputMode: "numeric",
        readOnly: false,
        value: "14",
        hint: "",
      },
      {
        label: "Currency",
        name: "currency",
        type: "text",
        inputMode: undefined,
        readOnly: true,
        value: "USD",
        hint: "Quotes and deposits are in US dollars.",
      },
    ]);
  });

  it("sends the text as typed and refreshes the page when the server takes it", async () => {
    const fetch = answerFetch(200, { shop: {} });
    render(<SettingsForm initial={initial} />);
    await userEvent.clear(input("Sales tax rate (%)"));
    await userEvent.type(input("Sales tax rate (%)"), "7.5");
    await userEvent.click(screen.getByRole("button", { name: "Save settings" }));
    await waitFor(() => expect(router.refresh).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0]!;
    expect(url).toBe("/api/shop/settings");
    expect(init.method).toBe("PUT");
    expect(JSON.parse(String(init.body))).toEqual({ ...initial, taxRate: "7.5" });
    expect(await screen.findByText("Settings saved. New quotes use them from now on.")).toBeTruthy();
  });

  it("refuses a tax rate above 30 % on the field, in words, without sending", async () => {
    const fetch = answerFetch(200, {});
    render(<SettingsForm initial={initial} />);
    await userEvent.clear(input("Sales tax rate (%)"));
    await userEvent.type(input("Sales tax rate (%)"), "31");
    await userEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByText("Enter the tax rate in percent, like 8.25 (0 to 30).")).toBeTruthy();
    expect(input("Sales tax rate (%)").getAttribute("aria-invalid")).toBe("true");
    expect(fetch).not.toHaveBeenCalled();
  });

  it("puts the server's field error on its field and says what no field holds", async () => {
    answerFetch(422, {
      error: "Some fields need attention.",
      fieldErrors: { noticeEmail: ["That mailbox refuses mail."], shopId: ["No such shop."] },
    });
    render(<SettingsForm initial={initial} />);
    await userEvent.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByText("That mailbox refuses mail.")).toBeTruthy();
    expect(input("E-mail for shop notices").getAttribute("aria-invalid")).toBe("true");
    expect(screen.getByText("No such shop.")).toBeTruthy();
    expect(router.refresh).not.toHaveBeenCalled();
  });
});
