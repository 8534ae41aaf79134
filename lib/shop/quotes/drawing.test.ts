import { describe, expect, it } from "vitest";
import { quoteComparison, quoteDrawing } from "./drawing";
import { summarize } from "./fitment";

const current = { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const fit = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: false });

describe("the quote's drawing", () => {
  it("draws the setups the summary was computed from", () => {
    const input = quoteComparison(fit)!;
    expect(input.current).toEqual({
      tire: "265/70R17",
      wheelDiameterIn: 17,
      wheelWidthIn: 8,
      position: { mode: "offset", offsetMm: 25 },
      spacerMm: 0,
    });
    expect(input.planned.position).toEqual({ mode: "offset", offsetMm: -12 });
    const d = quoteDrawing(fit)!;
    expect(d.svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(d.svg).toContain("offset +25 mm");
    expect(d.svg).toContain("offset −12 mm");
    // No paint order in the PDF's reader: each label's halo is a text of its own under it.
    expect(d.svg).not.toContain("paint-order");
    expect(d.svg.split(">offset +25 mm<").length - 1).toBe(2);
  });

  it("reads an older summary (no setups kept) from its own wheel texts, and the same drawing comes out", () => {
    const { setups: _s, ...older } = fit;
    expect(quoteComparison(older)).toEqual(quoteComparison(fit));
    expect(quoteDrawing(older)!.svg).toBe(quoteDrawing(fit)!.svg);
  });

  it("draws nothing rather than a guess when a wheel text is not one it wrote", () => {
    const { setups: _s, ...older } = fit;
    expect(quoteComparison({ ...older, planned: { ...older.planned, wheel: "17 x 9, ET -12" } })).toBeNull();
    expect(quoteDrawing({ ...older, current: { ...older.current, tire: "not a size" } })).toBeNull();
  });
});
