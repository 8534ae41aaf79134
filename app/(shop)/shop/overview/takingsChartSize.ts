/** Height of the takings plot, px: the lazy card reserves it while recharts loads, so nothing moves when the chart arrives. */
export const TAKINGS_CHART_HEIGHT = 260;
