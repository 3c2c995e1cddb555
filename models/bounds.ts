/**
 * Schema bounds that the browser needs too (the what-if knobs check trial
 * values against them without loading the schema, zod or mathjs). The
 * schema reads them from here, so the two cannot drift apart.
 */

/** Corner ambient, °C. */
export const AMBIENT_RANGE_C = { min: -60, max: 200 } as const;
/** Corner switching frequency, Hz: 1 Hz … 100 MHz; outside it the switching models mean nothing. */
export const FSW_RANGE_HZ = { min: 1, max: 1e8 } as const;
