/** Height of one chart frame (caption + plot + padding), px: reserved while the charts load. */
export const CHART_HEIGHT_RESERVED = 240 + 46;
