// @vitest-environment node
import { renderToString } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { SharedView } from "./SharedView";

// next/dynamic needs Next's runtime; the charts are not what this checks.
vi.mock("@/components/comparison/LazyComparisonCharts", () => ({ LazyComparisonCharts: () => null }));
vi.mock("next/link", () => ({
  default: ({ href, children }: { href: string; children: unknown }) => <a href={href}>{children as string}</a>,
}));

describe("the share page on the server", () => {
  it("renders the cross-section into the HTML, labels, description and table, before any script runs", () => {
    const html = renderToString(<SharedView name="Trail build" slug="AbC" input={DEFAULT_INPUT} />);
    expect(html).toContain('data-testid="cross-section"');
    // The engine's figures in the reader-independent default (inches): 265/70R17 is 31.61 in tall (ISO 4000-1: 802.8 mm).
    expect(html).toContain("diameter 31.61 in");
    expect(html).toContain("Cross-section of both setups at the hub, to scale");
    expect(html).toMatch(/<table[^>]*>/);
  });
});
