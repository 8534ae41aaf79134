import { describe, expect, it } from "vitest";
import { requiredText } from "./requiredText";

// Common practice, no source: a required field says what to enter, whatever was wrong with it.
describe("requiredText", () => {
  const field = requiredText("Enter the customer's name.").max(5, "Use at most 5 characters.");
  const messageOf = (v: unknown) => field.safeParse(v).error?.issues[0]?.message;

  it.each([
    ["missing", undefined],
    ["not text", 42],
    ["empty", ""],
    ["only spaces", "   "],
  ])("refuses a value that is %s with the field's own message", (_what, value) => {
    expect(messageOf(value)).toBe("Enter the customer's name.");
  });

  it("trims, and keeps the caller's further limits", () => {
    expect(field.parse("  Ann ")).toBe("Ann");
    expect(messageOf("Annabel")).toBe("Use at most 5 characters.");
  });
});
