/**
 * From the engine's frame (mm, y up from the ground) to SVG user units (mm, y down): only y
 * changes sign. Numbers are rounded to 0.01 mm so that the server's and the browser's markup
 * match to the character (hydration) whatever the last bits of a float.
 */
import type { Outline, Pt } from "@/lib/fitment/wheelSection";

export const r2 = (v: number) => Math.round(v * 100) / 100 + 0;
export const sx = (x: number) => r2(x);
export const sy = (y: number) => r2(-y);

/** An outline as SVG path data. */
export function pathOf(o: Outline): string {
  const p = (q: Pt) => `${sx(q.x)} ${sy(q.y)}`;
  return o.map((c) => (c.op === "Z" ? "Z" : c.op === "C" ? `C ${p(c.c1)} ${p(c.c2)} ${p(c.to)}` : `${c.op} ${p(c.to)}`)).join(" ");
}

/** A polyline as SVG path data. */
export function linePath(...pts: Pt[]): string {
  return pts.map((q, i) => `${i === 0 ? "M" : "L"} ${sx(q.x)} ${sy(q.y)}`).join(" ");
}
