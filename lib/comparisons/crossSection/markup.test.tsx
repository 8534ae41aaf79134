import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { CrossSectionSvg } from "./CrossSectionSvg";
import { buildDrawing } from "./drawing";
import { svgMarkup } from "./markup";

const withSpacer = {
  ...DEFAULT_INPUT,
  planned: { ...DEFAULT_INPUT.planned, spacerMm: 25.4 },
  vehicle: { ...DEFAULT_INPUT.vehicle, kingpinInclinationDeg: 10.5, fenderLineMm: 140 },
};

describe("svgMarkup", () => {
  it("writes the whole drawing exactly as React's server renderer does", () => {
    for (const input of [DEFAULT_INPUT, withSpacer]) {
      const drawing = buildDrawing(computeComparison(input), DEFAULT_PREFS, { innerMm: 90, outerMm: 160 });
      const el = <CrossSectionSvg drawing={drawing} id="q" style={{ maxWidth: "480px" }} className="w-full" />;
      expect(svgMarkup(el)).toBe(renderToStaticMarkup(el));
    }
  });

  it("kebab-cases presentation attributes, keeps viewBox and data-/aria- names, and escapes text", () => {
    const out = svgMarkup(
      <svg viewBox="0 0 2 2" aria-label="a&b" data-x="1">
        <text fontSize={3} strokeLinejoin="round" fontStyle={undefined}>
          {"<5 \"in\" & 'mm'"}
        </text>
      </svg>,
    );
    expect(out).toBe(
      '<svg viewBox="0 0 2 2" aria-label="a&amp;b" data-x="1"><text font-size="3" stroke-linejoin="round">&lt;5 &quot;in&quot; &amp; &#x27;mm&#x27;</text></svg>',
    );
  });

  it("lets a rewrite draw an element twice (paint order emulated for renderers without it)", () => {
    const out = svgMarkup(<text stroke="#fff">x</text>, (type, p) => (type === "text" ? [p, { ...p, stroke: undefined }] : [p]));
    expect(out).toBe('<text stroke="#fff">x</text><text>x</text>');
  });

  it("refuses a component that uses a hook rather than drawing without it", () => {
    function Hooked() {
      return <g>{String(useHook())}</g>;
    }
    function useHook() {
      throw new Error("hooks are not available");
    }
    expect(() => svgMarkup(<Hooked />)).toThrow();
  });
});
