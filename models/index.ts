/**
 * Public API of the Heatsplit model's core: pure TypeScript, browser-safe
 * (no parser). The input layer (unit strings, the zod schema, the design
 * document's JSON Schema) is models/input/ and has its own barrel.
 */
export * from "./losses";
export * from "./policy";
export * from "./gateCharge";
export * from "./gatePower";
export * from "./driveStage";
export * from "./switching";
export * from "./conduction";
export * from "./thermal";
export * from "./waveform";
export * from "./evaluate";
export * from "./compare";
export * from "./bom";
export * from "./demo";
export { junctionPartIds, type PartKind } from "./partIds";
