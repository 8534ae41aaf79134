import { describe, expect, it } from "vitest";
import { labelledMessage } from "./labels";

describe("labelled field messages", () => {
  it("puts each labelled field's first message after its label", () => {
    expect(labelledMessage({ shopId: ["Pick a shop.", "Second."] }, { shopId: "Shop" })).toBe("Shop: pick a shop.");
    expect(labelledMessage({ sku: ["SKU T1 is taken."] }, { sku: "SKU" })).toBe("SKU: SKU T1 is taken.");
    expect(labelledMessage({ role: ["Pick a role."], shopId: ["Pick a shop."] }, { role: "Role", shopId: "Shop" })).toBe(
      "Role: pick a role. Shop: pick a shop.",
    );
  });

  it("is null when no labelled field has a message, so the caller keeps its own words", () => {
    expect(labelledMessage({ _: ["Something."] }, { q: "Search" })).toBeNull();
    expect(labelledMessage(undefined, { q: "Search" })).toBeNull();
    expect(labelledMessage({ q: [] }, { q: "Search" })).toBeNull();
  });
});
