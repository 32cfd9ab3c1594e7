/** A 3-hour talk-heavy video makes about 200 kB of WebVTT; 2 MB leaves room for ten times that. */
export const TRANSCRIPT_MAX_BYTES = 2_000_000;

/** About five and a half hours of two-second cues; more is a mistake, and the cap bounds the work. */
export const TRANSCRIPT_MAX_CUES = 10_000;
