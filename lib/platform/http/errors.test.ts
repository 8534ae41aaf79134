import { describe, expect, it } from "vitest";
import { z } from "zod";
import { forgotPasswordSchema, resetPasswordSchema, roleChangeSchema, signInSchema, signUpSchema } from "@/lib/accounts/schema";
import { fallbackMessage, fieldPlace, withRows } from "./errors";

/** zod 4's own English wording, which must never reach a person. */
const VALIDATOR_WORDING =
  /Invalid input|expected \w+, received|Too (small|big)|Invalid (option|UUID|string|email|format)|Unrecognized key|>=|<=/;

describe("field names in words", () => {
  it("says where a field sits, rows counted from 1", () => {
    expect(fieldPlace(["lines", 8, "discountCents"])).toEqual({ row: "Line 9", field: "discount" });
    expect(fieldPlace(["input", "planned", "wheelWidthIn"])).toEqual({ row: null, field: "planned wheel width (in)" });
    expect(fieldPlace(["input", "vehicle", "cruiseSpeedsMph", 0])).toEqual({ row: "Cruise speed 1", field: "" });
    expect(fieldPlace(["shop_id"])).toEqual({ row: null, field: "shop" });
    expect(fieldPlace("entries.0.itemIds.2".split("."))).toEqual({ row: "Entry 1, item 3", field: "" });
    expect(fieldPlace([])).toEqual({ row: null, field: "the request" });
  });
});

describe("fallback messages for what a schema left unsaid", () => {
  const msg = (issue: Parameters<typeof fallbackMessage>[0]) => fallbackMessage(issue);

  it("name the field in words and never echo the validator", () => {
    const cases: [Parameters<typeof fallbackMessage>[0], string][] = [
      [
        { code: "invalid_type", expected: "number", input: "x", path: ["lines", 8, "discountCents"] },
        "Line 9: enter the discount as a number.",
      ],
      [{ code: "invalid_type", expected: "string", input: undefined, path: ["name"] }, "Enter the name."],
      [{ code: "invalid_type", expected: "null", input: "s", path: ["vehicleId"] }, "Leave the vehicle empty."],
      [{ code: "invalid_type", expected: "boolean", input: "yes", path: ["taxable"] }, "Choose yes or no for the taxable."],
      [
        { code: "too_small", origin: "number", minimum: 1, inclusive: true, input: 0, path: ["lines", 0, "quantity"] },
        "Line 1: the quantity must be at least 1.",
      ],
      [{ code: "too_small", origin: "string", minimum: 1, input: "", path: ["description"] }, "Enter the description."],
      [{ code: "too_big", origin: "string", maximum: 200, input: "…", path: ["notes"] }, "Use at most 200 characters for the notes."],
      [
        { code: "too_big", origin: "number", maximum: 100, inclusive: false, path: ["depositPct"] },
        "The deposit (%) must be less than 100.",
      ],
      [
        { code: "invalid_format", format: "uuid", input: "x", path: ["customerId"] },
        "The customer does not point to anything Hubface knows.",
      ],
      [
        { code: "invalid_format", format: "email", input: "x", path: ["email"] },
        "Enter an e-mail address like name@example.com for the email.",
      ],
      [
        { code: "invalid_value", values: ["member", "shop_staff", "admin"], input: "x", path: ["role"] },
        "Choose the role: member, shop staff or admin.",
      ],
      [{ code: "unrecognized_keys", path: [] }, "The request has a field Hubface does not take; reload the page and try again."],
      [{ code: "custom", path: ["input", "current", "offsetMm"] }, "Check the current offset (mm)."],
    ];
    for (const [issue, expected] of cases) expect(msg(issue), JSON.stringify(issue)).toBe(expected);
  });

  it("replace every default message zod would give, and leave the schema's own messages alone", () => {
    const schema = z.object({
      name: z.string().min(1, "Give it a name."),
      lines: z.array(z.object({ quantity: z.number().int().min(1), taxable: z.boolean() })),
      vehicleId: z.null(),
      kind: z.enum(["tire", "wheel"]),
      id: z.uuid(),
    });
    const bad = {
      name: "",
      lines: [
        { quantity: 1, taxable: true },
        { quantity: 0.5, taxable: "no" },
      ],
      vehicleId: "v",
      kind: "rim",
      id: "x",
    };
    const plain = schema.safeParse(bad);
    expect(plain.error!.issues.some((i) => VALIDATOR_WORDING.test(i.message))).toBe(true); // what zod says by itself
    const human = schema.safeParse(bad, { error: (issue) => fallbackMessage(issue as never) });
    const messages = Object.fromEntries(human.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(messages).toEqual({
      name: "Give it a name.",
      "lines.1.quantity": "Line 2: enter the quantity as a whole number.",
      "lines.1.taxable": "Line 2: choose yes or no for the taxable.",
      vehicleId: "Leave the vehicle empty.",
      kind: "Choose the kind: tire or wheel.",
      id: "The id does not point to anything Hubface knows.",
    });
  });

  it("puts the row in front of a schema's own message about a row", () => {
    expect(
      withRows({
        "lines.8.discount": ["A line's discount cannot exceed the line's amount."],
        name: ["Enter a name."],
        "lines.2.sku": ["Line 3 needs a SKU."],
      }),
    ).toEqual({
      "lines.8.discount": ["Line 9: A line's discount cannot exceed the line's amount."],
      name: ["Enter a name."],
      "lines.2.sku": ["Line 3 needs a SKU."],
    });
  });
});

describe("account forms", () => {
  it("have a message of their own for every field, a wrong type included", () => {
    const wrong = { name: 5, email: 7, password: true, token: 1, confirm: 2, role: "owner", shopId: 3 };
    for (const schema of [signUpSchema, signInSchema, forgotPasswordSchema, resetPasswordSchema, roleChangeSchema]) {
      const result = schema.safeParse(wrong);
      expect(result.success).toBe(false);
      for (const issue of result.error!.issues)
        expect(issue.message, `${issue.path.join(".")}: ${issue.message}`).not.toMatch(VALIDATOR_WORDING);
    }
    expect(
      resetPasswordSchema.safeParse({ token: "x".repeat(43), password: "long enough pw", confirm: undefined }).error!.issues[0]!.message,
    ).toBe("Type the new password again.");
  });
});
