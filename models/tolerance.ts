/**
 * The parameters a part's tolerance may name (a relative spread: 0.1 is
 * ±10 %). One list for the design schema (models/input/schemaParts.ts),
 * the Monte Carlo spread (models/spread.ts) and the parts library
 * (lib/parts/kinds.ts).
 */
export const TOLERANCE_KEYS = ["qg", "rdsOn", "vpl", "hfe", "vbe", "iq", "resistance", "rth"] as const;
export type ToleranceKey = (typeof TOLERANCE_KEYS)[number];
