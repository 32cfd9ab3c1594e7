/** The longest footage time any request may name (24 hours, in ms); the footage's own duration is checked by the service. */
export const MAX_FOOTAGE_MS = 86_400_000;
