/**
 * The project record as the forms, the server actions and /api/v1/projects
 * all read it: one schema, so the browser shows the same field errors the
 * server would return. Quantities accept a plain number in the field's
 * unit (V, A, Hz, °C) or a string with a unit ("250 kHz", "92 %").
 */
import { z } from "zod";
import { parseQuantity, type Dimension } from "@/models/input/units";

export const TOPOLOGIES = ["flyback", "forward", "active-clamp-forward", "half-bridge", "full-bridge", "buck", "boost", "llc", "other"] as const;
export type Topology = (typeof TOPOLOGIES)[number];
export const TOPOLOGY_LABELS: Record<Topology, string> = {
  flyback: "Flyback",
  forward: "Forward",
  "active-clamp-forward": "Active-clamp forward",
  "half-bridge": "Half-bridge",
  "full-bridge": "Full-bridge",
  buck: "Buck",
  boost: "Boost",
  llc: "LLC",
  other: "Other",
};

export const PROJECT_STATUSES = ["concept", "design", "review", "released", "archived"] as const;
export type ProjectStatus = (typeof PROJECT_STATUSES)[number];
export const STATUS_LABELS: Record<ProjectStatus, string> = {
  concept: "Concept",
  design: "Design",
  review: "Review",
  released: "Released",
  archived: "Archived",
};

const NUMBER_ONLY = /^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?\s*$/;

/** A form string or JSON number in the field's SI unit, or a string with a unit. */
function quantityField(dim: Dimension, bounds: { min?: number; max?: number; gt?: number } = {}) {
  return z.union([z.number(), z.string()]).transform((raw, ctx) => {
    let si: number;
    try {
      si = typeof raw === "string" && NUMBER_ONLY.test(raw) ? Number(raw) : parseQuantity(raw, dim);
      if (dim === "ratio" && typeof raw === "string" && NUMBER_ONLY.test(raw) && si > 1) si = si / 100; // "92" in a % field
    } catch (e) {
      ctx.addIssue({ code: "custom", message: (e as Error).message });
      return z.NEVER;
    }
    if (!Number.isFinite(si)) {
      ctx.addIssue({ code: "custom", message: "enter a number" });
      return z.NEVER;
    }
    if ((bounds.min !== undefined && si < bounds.min) || (bounds.gt !== undefined && si <= bounds.gt) || (bounds.max !== undefined && si > bounds.max)) {
      const parts = [bounds.gt !== undefined && `above ${bounds.gt}`, bounds.min !== undefined && `at least ${bounds.min}`, bounds.max !== undefined && `at most ${bounds.max}`];
      ctx.addIssue({ code: "custom", message: `must be ${parts.filter(Boolean).join(" and ")} (SI units)` });
      return z.NEVER;
    }
    return si;
  });
}

/** Empty form strings mean "not given". */
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
/** A form sends structured fields as one JSON string. */
const jsonString = (v: unknown) => {
  if (typeof v !== "string") return v;
  try {
    return JSON.parse(v);
  } catch {
    return v;
  }
};

export const projectOutputSchema = z
  .object({
    label: z.string().trim().min(1, "name the output, e.g. \"Main\"").max(40),
    voltage: quantityField("voltage", { gt: 0, max: 1e4 }),
    current: quantityField("current", { min: 0, max: 1e4 }),
  })
  .strict();

export const projectFields = {
  name: z.string().trim().min(1, "give the project a name").max(120),
  topology: z.enum(TOPOLOGIES, "choose a topology"),
  vinMin: quantityField("voltage", { gt: 0, max: 1e4 }),
  vinNom: quantityField("voltage", { gt: 0, max: 1e4 }),
  vinMax: quantityField("voltage", { gt: 0, max: 1e4 }),
  outputs: z.preprocess(jsonString, z.array(projectOutputSchema).min(1, "add at least one output").max(8)),
  fsw: quantityField("frequency", { gt: 0, max: 1e8 }),
  ambientMax: quantityField("temperature", { min: -60, max: 200 }),
  efficiencyTarget: z.preprocess(blankToUndefined, quantityField("ratio", { gt: 0, max: 1 }).nullable().optional()),
  notes: z.preprocess(blankToUndefined, z.string().max(4000).optional()),
  status: z.preprocess(blankToUndefined, z.enum(PROJECT_STATUSES).optional()),
};

export interface VinValues {
  vinMin?: number;
  vinNom?: number;
  vinMax?: number;
}

/** Vin min ≤ nom ≤ max; issues name the field to correct. */
export function vinOrderIssues(v: VinValues): { path: string; message: string }[] {
  const out: { path: string; message: string }[] = [];
  if (v.vinMin !== undefined && v.vinNom !== undefined && v.vinMin > v.vinNom) out.push({ path: "vinNom", message: "Vin nom must be at least Vin min" });
  if (v.vinNom !== undefined && v.vinMax !== undefined && v.vinNom > v.vinMax) out.push({ path: "vinMax", message: "Vin max must be at least Vin nom" });
  else if (v.vinMin !== undefined && v.vinMax !== undefined && v.vinMin > v.vinMax) out.push({ path: "vinMax", message: "Vin max must be at least Vin min" });
  return out;
}

const projectObject = z.object(projectFields).strict();

export const projectInputSchema = projectObject.superRefine((p, ctx) => {
  for (const i of vinOrderIssues(p)) ctx.addIssue({ code: "custom", path: [i.path], message: i.message });
});
export type ProjectInput = z.input<typeof projectInputSchema>;
export type ProjectValues = z.output<typeof projectInputSchema>;

/** PATCH: any subset; the merged record is checked for Vin order by the handler. */
export const projectPatchSchema = projectObject.partial().strict();
export type ProjectPatch = z.output<typeof projectPatchSchema>;

export const PROJECT_SORTS = ["name", "topology", "status", "vin", "fsw", "created", "updated"] as const;
export type ProjectSort = (typeof PROJECT_SORTS)[number];
/** Page sizes the list offers; the API refuses anything larger than the last. */
export const PROJECT_PAGE_SIZES = [10, 20, 50, 100] as const;

export const projectListQuerySchema = z.object({
  // no NUL: PostgreSQL text cannot hold one (route() and proxy.ts refuse it first; this keeps a page that bypassed them from failing)
  q: z.preprocess(blankToUndefined, z.string().trim().max(100).refine((v) => !v.includes("\u0000"), "contains a NUL character").optional()),
  status: z.preprocess(blankToUndefined, z.enum(PROJECT_STATUSES).optional()),
  topology: z.preprocess(blankToUndefined, z.enum(TOPOLOGIES).optional()),
  sort: z.preprocess(blankToUndefined, z.enum(PROJECT_SORTS).default("updated")),
  dir: z.preprocess(blankToUndefined, z.enum(["asc", "desc"]).optional()),
  page: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).default(1)),
  pageSize: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(100).default(20)),
});
export type ProjectListQuery = z.output<typeof projectListQuerySchema>;

/** Text columns read naturally A→Z; numbers and dates newest/largest first. */
export function defaultDirection(sort: ProjectSort): "asc" | "desc" {
  return sort === "name" || sort === "topology" || sort === "status" ? "asc" : "desc";
}

/** Record ids in URLs: anything else is answered 404 without a query. */
export const recordIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/);
export const projectParamsSchema = z.object({ projectId: recordIdSchema });
