/**
 * Policy numbers and datasheet defaults in one place (STYLE: policy numbers
 * live in named constants, not inline). A design document may override the
 * derating policy; the rest are model thresholds.
 */

/** Part types a derating margin applies to. */
export const PART_TYPES = ["controller", "mosfet", "bjt", "driverIc", "clamp"] as const;
export type PartType = (typeof PART_TYPES)[number];

/**
 * Default junction-temperature margin below Tj(max), in K. 25 K is a common
 * company rule ("common practice": many derating guides ask for Tj at least
 * 20–30 K under the rating in the worst corner); a team sets its own.
 */
export const DEFAULT_TJ_MARGIN_K: Record<PartType, number> = {
  controller: 25,
  mosfet: 25,
  bjt: 25,
  driverIc: 25,
  clamp: 25,
};

/** Keep |Vgs| at or below this fraction of Vgs(max) (common practice: 80 %). */
export const DEFAULT_VGS_MAX_FRACTION = 0.8;

/**
 * Minimum gate drive above the Miller plateau, V. Datasheet Rds(on) is rated
 * at Vgs = 10 V for standard-level parts whose plateau sits near 4–5 V, so
 * about 4–5 V above Vpl is where the rated Rds(on) is reached
 * (common practice; 4 V chosen as the default floor).
 */
export const DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V = 4;

/**
 * A gate current limited by the buffer's gain to less than this fraction of
 * what the resistors alone would allow is reported as starved (our choice:
 * a 20 % loss of plateau current is visible in edge times).
 */
export const STARVATION_FRACTION = 0.8;

/** Defaults for values datasheets often leave out (documented in schema). */
export const DATASHEET_DEFAULTS = {
  /** Qg is usually specified at Vgs = 10 V for standard-level MOSFETs. */
  qgTestVoltage: 10,
  /** Rg(int) is often only "typical"; 1 Ω is a middling value (from memory). */
  rgInt: 1,
  /** Body-diode forward drop at rated current, silicon (from memory 0.7–1.2 V). */
  vsd: 0.9,
  /** Silicon Rds(on) rises ~1.5–2× from 25 °C to 125 °C (DOMAIN brief); 1.7× used. */
  rdsHotFactor: 1.7,
  rdsHotTemperature: 125,
  vgsMax: 20,
  tjMax: 150,
  /** Small-signal silicon BJT at a few hundred mA (from memory 0.7–0.9 V). */
  vbe: 0.8,
  vceSat: 0.2,
  steeringDiodeVf: 0.7,
} as const;

/**
 * Edges longer than this fraction of the switching period mean the gate
 * never clears the plateau in time; the edge is capped there and flagged.
 */
export const MAX_EDGE_FRACTION_OF_PERIOD = 0.5;

/** Below this many volts of drive above Vpl the switch is taken as not enhanced. */
export const MIN_ENHANCEMENT_V = 0.05;
