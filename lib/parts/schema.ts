/**
 * The part record as the form, /api/v1/parts and the CSV import read it, and
 * the library's list filter. One validation (lib/parts/values.ts) behind
 * every schema, so the browser shows the field errors the server would return.
 */
import { z } from "zod";
import { parseQuantity, type Dimension } from "@/models/input/units";
import { PART_KINDS, PART_KIND_DEFS, type PartKind } from "@/lib/parts/kinds";
import { validatePartDraft, type PartDraft, type PartValues } from "@/lib/parts/values";
import { flattenPaths } from "../../models/documentPath";
import { snap } from "@/lib/parts/paramText";

const raw = z.union([z.string(), z.number(), z.null()]).optional();

/** Body of POST /api/v1/parts and of the part form; params nested as stored or keyed "pin.sinkResistance". */
export const partDraftSchema = z.object({
  kind: z.string().max(40),
  manufacturer: z.string().max(400),
  mpn: z.string().max(400),
  description: z.string().max(4000).optional(),
  unitCost: raw,
  params: z.record(z.string(), z.unknown()).default({}),
  tolerance: z.record(z.string(), z.unknown()).default({}),
});
export type PartDraftInput = z.input<typeof partDraftSchema>;

function toValues(d: z.output<typeof partDraftSchema>, ctx: z.RefinementCtx): PartValues {
  const r = validatePartDraft({ ...d, params: flattenPaths(d.params) } satisfies PartDraft);
  if (r.ok) return r.value;
  // keep "params.pin.sinkResistance" one path segment per dot, as zod reports nested paths
  for (const i of r.issues) ctx.addIssue({ code: "custom", path: i.path.split("."), message: i.message });
  return z.NEVER;
}

export const partBodySchema = partDraftSchema.transform(toValues);
export type PartBody = z.output<typeof partBodySchema>;

/** PATCH: any top-level field; given params replace the stored ones (checked as a whole with the kind). */
// (built without .default: zod 4 applies a default even inside .partial(), which would replace params with {})
export const partPatchSchema = z.object({
  kind: z.string().max(40).optional(),
  manufacturer: z.string().max(400).optional(),
  mpn: z.string().max(400).optional(),
  description: z.string().max(4000).optional(),
  unitCost: raw,
  params: z.record(z.string(), z.unknown()).optional(),
  tolerance: z.record(z.string(), z.unknown()).optional(),
});
export type PartPatch = z.output<typeof partPatchSchema>;

// ---- list filter ----------------------------------------------------------

export interface FilterParam {
  key: string;
  label: string;
  /** null for hFE, a plain gain evaluated at the current `ic`. */
  dim: Dimension | null;
}

/** Parameters the table can filter and sort on: every scalar quantity of any kind, plus hFE at a current. */
export const FILTER_PARAMS: FilterParam[] = (() => {
  const out = new Map<string, FilterParam>();
  for (const kind of PART_KINDS)
    for (const f of PART_KIND_DEFS[kind].fields) {
      if (out.has(f.key)) continue;
      if (f.type === "qty") out.set(f.key, { key: f.key, label: f.label, dim: f.dim });
      if (f.type === "hfeCurve") out.set(f.key, { key: f.key, label: "hFE at Ic", dim: null });
    }
  return [...out.values()];
})();

export const SORT_KEYS = ["mpn", "manufacturer", "kind", "unitCost", "updatedAt", "param"] as const;
export type SortKey = (typeof SORT_KEYS)[number];
export const PAGE_SIZES = [10, 25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 25;
export const DEFAULT_HFE_IC = "1 A";

export interface PartListFilter {
  search: string;
  kind: PartKind | null;
  param: { key: string; min: number | null; max: number | null; ic: number | null } | null;
  sort: SortKey;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

// no NUL: PostgreSQL text cannot hold one (route() and proxy.ts refuse it first; this keeps a page that bypassed them from failing)
const opt = z.string().max(100).refine((s) => !s.includes("\u0000"), "contains a NUL character").optional().transform((s) => (s && s.trim() ? s.trim() : undefined));

/** Search params of /parts and GET /api/v1/parts (and the export). */
export const partListQuerySchema = z
  .object({
    q: opt,
    kind: z.enum(PART_KINDS).optional().or(z.literal("").transform(() => undefined)),
    param: opt,
    min: opt,
    max: opt,
    ic: opt,
    sort: z.enum(SORT_KEYS).optional().or(z.literal("").transform(() => undefined)),
    dir: z.enum(["asc", "desc"]).optional().or(z.literal("").transform(() => undefined)),
    page: z.coerce.number().int().min(1).max(100_000).default(1),
    pageSize: z.coerce.number().int().min(1).max(100).default(DEFAULT_PAGE_SIZE),
  })
  .transform((s, ctx): PartListFilter => {
    let param: PartListFilter["param"] = null;
    if (s.param) {
      const def = FILTER_PARAMS.find((p) => p.key === s.param);
      if (!def) ctx.addIssue({ code: "custom", path: ["param"], message: `no parameter "${s.param}" to filter on` });
      else {
        const read = (v: string | undefined, name: "min" | "max" | "ic", dim: Dimension | null): number | null => {
          if (v === undefined) return null;
          try {
            if (dim === null) {
              const n = Number(v);
              if (!Number.isFinite(n)) throw new Error(`expected a plain number (hFE), got "${v}"`);
              return n;
            }
            return snap(parseQuantity(v, dim)); // the same 12 digits as stored values: "20 nC" matches a stored 20 nC
          } catch (e) {
            ctx.addIssue({ code: "custom", path: [name], message: (e as Error).message });
            return null;
          }
        };
        const ic = def.dim === null ? read(s.ic ?? DEFAULT_HFE_IC, "ic", "current") : null;
        param = { key: def.key, min: read(s.min, "min", def.dim), max: read(s.max, "max", def.dim), ic };
      }
    }
    const sort = s.sort === "param" && !param ? "mpn" : (s.sort ?? "mpn");
    return { search: s.q ?? "", kind: s.kind ?? null, param, sort, dir: s.dir ?? "asc", page: s.page, pageSize: s.pageSize };
  });

/** URLSearchParams / Next searchParams -> plain object for partListQuerySchema. */
export function searchParamsObject(sp: URLSearchParams | Record<string, string | string[] | undefined>): Record<string, string> {
  const out: Record<string, string> = {};
  if (sp instanceof URLSearchParams) sp.forEach((v, k) => (out[k] ??= v));
  else for (const [k, v] of Object.entries(sp)) if (v !== undefined) out[k] = Array.isArray(v) ? v[0] : v;
  return out;
}

/** Dynamic segment of /api/v1/parts/:partId and /parts/:partId; anything else is answered 404. */
export const partParamsSchema = z.object({ partId: z.string().regex(/^prt_[A-Za-z0-9_-]{8,40}$/) });
