import { describe, expect, it } from "vitest";
import { staffInviteSchema } from "./schema";

/** The staff page's field is labelled "E-mail of the person to invite": its messages speak of that person, not of "your" address. */
describe("staff invitation e-mail", () => {
  const message = (email: string) => {
    const r = staffInviteSchema.safeParse({ email });
    return r.success ? null : r.error.issues[0]?.message;
  };
  it("asks for the invited person's address", () => {
    expect(message("")).toBe("Enter the e-mail address of the person to invite.");
    expect(message("   ")).toBe("Enter the e-mail address of the person to invite.");
    expect(message("teo at example")).toBe("Enter an e-mail address like name@example.com.");
    expect(message(`${"a".repeat(250)}@example.test`)).toBe("That e-mail address is too long.");
    expect(message("teo@example.test")).toBeNull();
  });
});
