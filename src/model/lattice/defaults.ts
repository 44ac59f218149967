export const DEFAULT_SPAN_COUNT = 20;
export const DEFAULT_CHORD_COUNT = 20;
