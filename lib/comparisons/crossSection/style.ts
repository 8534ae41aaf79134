/**
 * How each setup is drawn, told apart by more than colour: current in steel with solid lines and
 * upright figures, planned in ember with dashed lines and italic figures (readable in greyscale
 * and for the common colour-vision types; the hues are the product's setup colours). Widths are
 * in screen pixels at the layout's width and turned into mm by the caller.
 */
import type { Side } from "@/lib/fitment/crossSection";

export interface SideStyle {
  stroke: string;
  fill: string;
  /** Dash pattern in px (none for solid). */
  dashPx: number[] | null;
  fontStyle: "normal" | "italic";
}

export const SIDE_STYLE: Record<Side, SideStyle> = {
  current: { stroke: "#245a88", fill: "rgb(47 114 168 / 0.14)", dashPx: null, fontStyle: "normal" },
  planned: { stroke: "#bd460f", fill: "rgb(226 91 22 / 0.10)", dashPx: [6, 4], fontStyle: "italic" },
};

export const INK = "#181b21";
export const MUTED = "#56616f";
export const LIMIT = "#7d1710";
export const WHEEL_FILL = "rgb(163 172 184 / 0.35)";
export const STATUS_STROKE = { clear: "#1f7a44", tight: "#a86a00", contact: "#c0261b" } as const;

/** A dash pattern in mm for a scale of `mmPerPx`. */
export const dashOf = (px: number[] | null, mmPerPx: number) =>
  px ? px.map((v) => Math.round(v * mmPerPx * 100) / 100).join(" ") : undefined;
