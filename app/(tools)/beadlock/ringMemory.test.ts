import { describe, expect, it } from "vitest";
import { readRingMemory } from "./ringMemory";

describe("readRingMemory", () => {
  const good = {
    countText: "32",
    torque: { text: "24.4", unit: "nm", exact: { nm: 24.404724, text: "24.4" } },
    ticks: { key: "32|24.404724", done: [[1, 17], []] },
  };

  it("reads back what the helper wrote", () => {
    expect(readRingMemory(JSON.stringify(good))).toEqual(good);
    expect(readRingMemory(JSON.stringify({ ...good, ticks: null }))?.ticks).toBeNull();
  });

  it.each([
    ["nothing stored", null],
    ["not JSON", "{"],
    ["another shape", JSON.stringify({ count: 32 })],
    ["an unknown unit", JSON.stringify({ ...good, torque: { ...good.torque, unit: "kgm" } })],
    ["a tick that is not a bolt", JSON.stringify({ ...good, ticks: { key: "32|1", done: [[0]] } })],
    ["a non-finite exact value", JSON.stringify({ ...good, torque: { ...good.torque, exact: { nm: "x", text: "1" } } })],
  ])("starts clean on %s", (_why, raw) => {
    expect(readRingMemory(raw)).toBeNull();
  });
});
