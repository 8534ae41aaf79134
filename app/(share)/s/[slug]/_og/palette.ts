/** The image's colours: the app's steel (current setup), ember (planned), ink and paper, as hex for the renderer. */
export const STEEL = "#245a88";
export const EMBER = "#bd460f";
export const INK = "#181b21";
export const PAPER = "#fbf8f3";
