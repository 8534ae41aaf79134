import { describe, expect, it } from "vitest";
import { readErrorRef } from "./errorRef";

describe("the error reference cookie", () => {
  it("reads the id a 5xx answer left among other cookies", () => {
    expect(readErrorRef("theme=dark; hubface-error-ref=9f2c4a1b0e7d3c55; other=1")).toBe("9f2c4a1b0e7d3c55");
  });
  it("ignores a missing cookie and a value that is not an id", () => {
    expect(readErrorRef("theme=dark")).toBeUndefined();
    expect(readErrorRef("hubface-error-ref=<script>")).toBeUndefined();
  });
});
