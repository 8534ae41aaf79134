import { type ReactElement, cloneElement } from "react";

/**
 * recharts for component tests: jsdom lays nothing out, so the responsive wrapper would measure
 * 0 × 0 and draw nothing; this one gives its chart a fixed 480 × 240 instead.
 *
 * @example
 * vi.mock("recharts", async (importOriginal) => (await import("@/components/comparison/chartsTestUtil")).fixedSizeRecharts(importOriginal));
 */
export async function fixedSizeRecharts(importOriginal: <T>() => Promise<T>) {
  const actual = await importOriginal<typeof import("recharts")>();
  return {
    ...actual,
    ResponsiveContainer: ({ children }: { children: ReactElement<{ width?: number; height?: number }> }) =>
      cloneElement(children, { width: 480, height: 240 }),
  };
}
