/** Height of the load–pressure chart's plot, px (kept apart so the placeholder does not import recharts). */
export const LOAD_CHART_HEIGHT = 260;
