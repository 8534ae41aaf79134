import { describe, expect, it } from "vitest";
import { orderArabicRuns } from "./text";

describe("Arabic word order", () => {
  it("reverses the words of each Arabic run and leaves everything else as typed", () => {
    expect(orderArabicRuns("سيارة الدفع الرباعي")).toBe("الرباعي الدفع سيارة");
    expect(orderArabicRuns("x سلام عليكم y")).toBe("x عليكم سلام y");
    expect(orderArabicRuns("Trail build")).toBe("Trail build");
    expect(orderArabicRuns("שלום עולם")).toBe("שלום עולם"); // Hebrew is drawn in reading order already
  });
});
