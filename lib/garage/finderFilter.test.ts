import { describe, expect, it } from "vitest";
import { parseTireSize } from "@/lib/fitment";
import { matchesFinderFilter } from "./finderFilter";

const fit = (tire: string, diameterIn: number, widthIn: number) => ({
  tire: parseTireSize(tire),
  wheel: { diameterIn, widthIn, offsetMm: 0 },
});

describe("matchesFinderFilter", () => {
  it("finds a tire size by any part of it, in any case", () => {
    expect(matchesFinderFilter(fit("35x12.50R17LT", 17, 9), "35x")).toBe(true);
    expect(matchesFinderFilter(fit("35x12.50R17LT", 17, 9), "r17lt")).toBe(true);
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "70r17")).toBe(true);
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "285/")).toBe(false);
  });

  it("finds a wheel as rim diameter x width, an upper-case X included", () => {
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "17x9")).toBe(true);
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "17X9")).toBe(true);
    expect(matchesFinderFilter(fit("265/70R17", 17, 8.5), "17x9")).toBe(false);
    expect(matchesFinderFilter(fit("265/70R17", 17, 8.5), "17x8.5")).toBe(true);
  });

  it("keeps every fit for empty or blank text", () => {
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "")).toBe(true);
    expect(matchesFinderFilter(fit("265/70R17", 17, 9), "   ")).toBe(true);
  });
});
