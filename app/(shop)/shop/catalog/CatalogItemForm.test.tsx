// @vitest-environment jsdom
import { cleanup, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { answerFetch } from "@/tests/support/fetchAnswer";
import { router } from "@/tests/support/navigation";
import { EMPTY_CATALOG_ITEM } from "@/lib/shop/catalog/itemSchema";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { CatalogItemForm } from "./CatalogItemForm";

vi.mock("next/navigation", () => import("@/tests/support/navigation"));
const { refresh, push } = router;
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.clearAllMocks();
});

const ITEM = "c1000000-0000-4000-8000-0000000000aa";
const renderForm = (props: Parameters<typeof CatalogItemForm>[0]) => renderWithQuery(<CatalogItemForm {...props} />);

describe("CatalogItemForm", () => {
  it("checks a new tire with the CSV's messages before sending, each tied to its field", async () => {
    const fetch = answerFetch(201, {});
    renderForm({ initial: EMPTY_CATALOG_ITEM });
    await userEvent.type(screen.getByLabelText("Price ($)"), "12,50");
    await userEvent.click(screen.getByRole("button", { name: "Add item" }));
    const price = screen.getByLabelText("Price ($)");
    expect(await screen.findByText("Price must be dollars like 249.99 (0 to 1,000,000), got “12,50”.")).toBeTruthy();
    expect(price.getAttribute("aria-invalid")).toBe("true");
    const described = price.getAttribute("aria-describedby")!.split(" ");
    expect(described.map((id) => document.getElementById(id)?.textContent)).toContain(
      "Price must be dollars like 249.99 (0 to 1,000,000), got “12,50”.",
    );
    expect(screen.getByText("Enter the tire size, e.g. 35x12.50R17LT or LT285/70R17.")).toBeTruthy();
    expect(screen.getByText("Enter a SKU.")).toBeTruthy();
    expect(fetch).not.toHaveBeenCalled();
  });

  it("shows the wheel's fields for a wheel and the service's for a service", async () => {
    renderForm({ initial: EMPTY_CATALOG_ITEM });
    expect(screen.queryByLabelText("Bolt pattern")).toBeNull();
    await userEvent.selectOptions(screen.getByLabelText("Kind"), "wheel");
    expect(screen.getByLabelText("Bolt pattern")).toBeTruthy();
    expect(screen.queryByLabelText("Tire size")).toBeNull();
    await userEvent.selectOptions(screen.getByLabelText("Kind"), "service");
    expect(screen.getByLabelText("Service type")).toBeTruthy();
    expect(screen.queryByLabelText("On hand")).toBeNull();
  });

  it("sends an edit as typed and puts the server's refusal on the on-hand field", async () => {
    const message = "Accepted quotes hold 4 of this item: on hand cannot be less than 4 until their work is done or they lapse.";
    const fetch = answerFetch(422, { error: "Some fields need attention.", fieldErrors: { qtyOnHand: [message] } });
    renderForm({
      itemId: ITEM,
      initial: {
        ...EMPTY_CATALOG_ITEM,
        sku: "TR-1",
        description: "Invented tire",
        price: "300.00",
        qtyOnHand: "2",
        tireSize: "35x12.50R17LT",
      },
    });
    await userEvent.click(screen.getByRole("button", { name: "Save item" }));
    expect(await screen.findByText(message)).toBeTruthy();
    const [url, init] = fetch.mock.calls[0]!;
    expect(url).toBe(`/api/shop/catalog/${ITEM}`);
    expect(init.method).toBe("PUT");
    expect(JSON.parse(String(init.body))).toMatchObject({ sku: "TR-1", qtyOnHand: "2", tireSize: "35x12.50R17LT", lowStockAt: "4" });
    expect(refresh).not.toHaveBeenCalled();
  });

  it("opens the new item's page once it is added", async () => {
    answerFetch(201, { item: { id: ITEM, sku: "TR-1" } });
    renderForm({
      initial: { ...EMPTY_CATALOG_ITEM, sku: "TR-1", description: "Invented tire", price: "300", tireSize: "35x12.50R17LT" },
    });
    await userEvent.click(screen.getByRole("button", { name: "Add item" }));
    await waitFor(() => expect(push).toHaveBeenCalledWith(`/shop/catalog/${ITEM}`));
  });
});
