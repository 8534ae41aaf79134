import { describe, expect, it } from "vitest";
import { labelOptions } from "./labelOptions";

describe("labelOptions", () => {
  const UNIT = { ftlb: "ft·lb", nm: "N·m" } as const;

  it("offers every label in the vocabulary's order", () => {
    expect(labelOptions(UNIT)).toEqual([
      { value: "ftlb", label: "ft·lb" },
      { value: "nm", label: "N·m" },
    ]);
  });

  it("offers a subset in the order given, not the vocabulary's", () => {
    const METHOD = { provider: "Card online", cash: "Cash", card: "Card at the counter" } as const;
    expect(labelOptions(METHOD, { values: ["card", "cash"] }).map((o) => o.label)).toEqual(["Card at the counter", "Cash"]);
  });

  it("capitalizes only the first letter of a label written for a sentence", () => {
    expect(labelOptions({ flange: "flange edge", "bead-seat": "bead seat" }, { capitalize: true }).map((o) => o.label)).toEqual([
      "Flange edge",
      "Bead seat",
    ]);
  });
});
