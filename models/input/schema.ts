/**
 * The design document: what a user writes (unit strings allowed) and what
 * the model computes on (SI numbers). One schema serves the browser form,
 * the API and the file import.
 *
 * Layout: schemaVersion, name, corners[], controller, positions[] (each a
 * MOSFET with its drive stage, gate network and waveforms),
 * thermal.coupling[], derating. See schemaOperating.ts for how corners pick
 * waveform values, schemaUpgrade.ts for the versions: a document without
 * `schemaVersion` is version 1 and is upgraded before validation.
 */
import { z } from "zod";
import { qty } from "./units";
import { controllerSchema, mosfetSchema } from "./schemaParts";
import { driveSchema, gateSchema } from "./schemaDrive";
import { conductionSchema, cornerSchema } from "./schemaOperating";
import { junctionPartIds, POSITION_ID_PATTERN } from "../partIds";
import { CURRENT_SCHEMA_VERSION, upgradeDesignDocument } from "../schemaUpgrade";
import {
  DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V,
  DEFAULT_TJ_MARGIN_K,
  DEFAULT_VGS_MAX_FRACTION,
} from "../policy";

export const positionSchema = z
  .object({
    id: z.string().regex(POSITION_ID_PATTERN, "a short id such as \"Q1\" or \"SR1\" (letters, digits, - or _)"),
    role: z.enum(["primary", "synchronous-rectifier", "other"]),
    label: z.string().max(120).optional(),
    mosfet: mosfetSchema,
    drive: driveSchema,
    gate: gateSchema,
    conduction: conductionSchema,
  })
  .strict();

/**
 * Mutual heating between two junction parts, K/W. A linear thermal network
 * is reciprocal (the transfer impedance from i to j equals that from j to i),
 * so one entry couples both ways; listing the pair twice is refused.
 */
export const couplingSchema = z
  .object({ from: z.string().min(1), to: z.string().min(1), theta: qty("thermalResistance") })
  .strict();

const marginSchema = z
  .object({
    controller: qty("temperatureDifference", { min: 0 }).default(DEFAULT_TJ_MARGIN_K.controller),
    mosfet: qty("temperatureDifference", { min: 0 }).default(DEFAULT_TJ_MARGIN_K.mosfet),
    bjt: qty("temperatureDifference", { min: 0 }).default(DEFAULT_TJ_MARGIN_K.bjt),
    driverIc: qty("temperatureDifference", { min: 0 }).default(DEFAULT_TJ_MARGIN_K.driverIc),
    clamp: qty("temperatureDifference", { min: 0 }).default(DEFAULT_TJ_MARGIN_K.clamp),
  })
  .strict();

export const deratingSchema = z
  .object({
    tjMargin: marginSchema.default(DEFAULT_TJ_MARGIN_K),
    vgsMaxFraction: qty("ratio", { gt: 0, max: 1 }).default(DEFAULT_VGS_MAX_FRACTION),
    minHeadroomAbovePlateau: qty("voltage", { min: 0 }).default(DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V),
  })
  .strict();

const DEFAULT_DERATING = {
  tjMargin: DEFAULT_TJ_MARGIN_K,
  vgsMaxFraction: DEFAULT_VGS_MAX_FRACTION,
  minHeadroomAbovePlateau: DEFAULT_MIN_HEADROOM_ABOVE_PLATEAU_V,
};

/** The current (version 2) document, as validated after any upgrade. */
export const designDocumentV2Schema = z
  .object({
    schemaVersion: z.literal(CURRENT_SCHEMA_VERSION, {
      error: `this server reads design documents of version 1 (no schemaVersion) and ${CURRENT_SCHEMA_VERSION}`,
    }),
    name: z.string().min(1).max(200),
    description: z.string().max(4000).optional(),
    corners: z.array(cornerSchema).min(1).max(50),
    controller: controllerSchema,
    positions: z.array(positionSchema).min(1).max(20),
    thermal: z.object({ coupling: z.array(couplingSchema).max(200).default([]) }).strict().default({ coupling: [] }),
    derating: deratingSchema.default(DEFAULT_DERATING),
  })
  .strict()
  .superRefine((d, ctx) => {
    const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: "custom", path, message });
    const seen = new Set<string>();
    d.corners.forEach((c, i) => {
      if (seen.has(c.id)) issue(["corners", i, "id"], `corner id "${c.id}" is used twice`);
      seen.add(c.id);
    });
    const positionIds = new Set<string>();
    d.positions.forEach((p, i) => {
      if (positionIds.has(p.id) || p.id === "controller") issue(["positions", i, "id"], `position id "${p.id}" is used twice or reserved`);
      positionIds.add(p.id);
    });
    d.corners.forEach((c, i) => {
      for (const key of Object.keys(c.waveforms ?? {}))
        if (!positionIds.has(key)) issue(["corners", i, "waveforms", key], `no position "${key}" to override`);
    });
    const junctions = new Set(junctionPartIds(d.positions));
    const pairs = new Set<string>();
    d.thermal.coupling.forEach((c, i) => {
      for (const end of ["from", "to"] as const)
        if (!junctions.has(c[end])) issue(["thermal", "coupling", i, end], `"${c[end]}" is not a part with a junction (known: ${[...junctions].join(", ")})`);
      if (c.from === c.to) issue(["thermal", "coupling", i, "to"], "a part cannot couple to itself; its own path is its RθJA");
      const key = [c.from, c.to].sort().join("|");
      if (pairs.has(key)) issue(["thermal", "coupling", i], "this pair is already coupled (one entry couples both ways)");
      pairs.add(key);
    });
  });

/**
 * Any version of the document in, the current version's parse out: the
 * upgrade runs first, so the API, the editor and stored revisions share one
 * path. Issue paths are those of the current version.
 */
export const designInputSchema = z.preprocess((raw) => upgradeDesignDocument(raw).document, designDocumentV2Schema);

/** What a user writes (current version): numbers in SI or unit strings. */
export type DesignInput = z.input<typeof designDocumentV2Schema>;
/** What the model computes on: every quantity an SI number, defaults filled. */
export type Design = z.output<typeof designDocumentV2Schema>;
export type Position = Design["positions"][number];
export type Corner = Design["corners"][number];

export interface DesignIssue {
  /** Dotted path such as "positions.0.mosfet.qg". */
  path: string;
  message: string;
}

export type ParseResult = { ok: true; design: Design } | { ok: false; issues: DesignIssue[] };

export function parseDesign(raw: unknown): ParseResult {
  const result = designInputSchema.safeParse(raw);
  if (result.success) return { ok: true, design: result.data };
  return {
    ok: false,
    issues: result.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })),
  };
}

/** JSON Schema of the current input document (unit strings visible), for editors and the API docs. */
export function designJsonSchema(): object {
  return z.toJSONSchema(designDocumentV2Schema, { io: "input", unrepresentable: "any" });
}
