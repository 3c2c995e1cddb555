/**
 * The model's input layer: unit strings parsed to SI (mathjs), the design
 * document's zod schema and JSON Schema, the sweep spec. Server-side and
 * form code only: the browser-side model (models/index.ts) never imports it
 * at run time (tests/unit/browser-imports.test.ts).
 */
export * from "./units";
export * from "./schema";
