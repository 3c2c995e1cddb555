/** Operating point from the converter's specs (browser-safe: no parser or schema). */
export { operatingPoint } from "./calculate";
export { toDesignWaveforms } from "./designPoints";
export type * from "./types";
export type * from "./designPoints";
