/** Public API of the Heatsplit model (pure TypeScript, browser and server). */
export * from "./units";
export * from "./schema";
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
