import { describe, expect, it } from "vitest";
import { recheckSlotSchema } from "./recheckSlotSchema";

const messageOf = (minutes: unknown) => {
  const r = recheckSlotSchema.safeParse({ minutes });
  return r.success ? null : r.error.issues[0]!.message;
};

describe("the owner's re-check slot length", () => {
  it("takes whole minutes from 10 to 120, typed or sent (bounds: common practice, no source)", () => {
    expect(recheckSlotSchema.parse({ minutes: "45" })).toEqual({ minutes: 45 });
    expect(recheckSlotSchema.parse({ minutes: 10 })).toEqual({ minutes: 10 });
    expect(recheckSlotSchema.parse({ minutes: "120" })).toEqual({ minutes: 120 });
  });

  it("refuses a fraction or text instead of rounding it, and a length out of bounds, naming the field as the form labels it", () => {
    expect(messageOf("30.5")).toBe("Re-check slot (minutes): enter a whole number of minutes, e.g. 30.");
    expect(messageOf("half an hour")).toBe("Re-check slot (minutes): enter a whole number of minutes, e.g. 30.");
    expect(messageOf("9")).toBe("Re-check slot (minutes): use 10 to 120 minutes.");
    expect(messageOf(121)).toBe("Re-check slot (minutes): use 10 to 120 minutes.");
  });
});
