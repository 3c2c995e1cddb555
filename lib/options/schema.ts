/**
 * Design options and their revisions: the schemas the editor, the project
 * page's forms and /api/v1 handlers share. The design document itself is
 * the model's (models/input/schema.ts): it is stored as the user typed it (unit
 * strings kept) and accepted only when parseDesign accepts it; its issues
 * come back under "document.<path>" so the editor can place them. An older
 * version (models/schemaUpgrade.ts) is accepted and stored upgraded, so the
 * product only ever writes the current version.
 */
import { z } from "zod";
import { parseDesign } from "@/models/input/schema";
import { upgradeDesignDocument } from "@/models/schemaUpgrade";
import { isTemplateKey } from "./templates";
import { recordIdSchema } from "../projects/schema";

/**
 * Largest design document accepted, as JSON text. It has to fit in a request
 * body (MAX_JSON_BODY_BYTES, 64 KiB, app/_lib/request-guards.ts) with the
 * part references and note; the demo documents are about 5 kB.
 */
export const MAX_DOCUMENT_CHARS = 60 * 1024;
/** Most part references one revision may record (one per element). */
export const MAX_PART_REFS = 400;

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

const pathSegments = (path: string): (string | number)[] => (path === "" ? [] : path.split(".").map((s) => (/^\d+$/.test(s) ? Number(s) : s)));

/** Any JSON value that parseDesign accepts; the raw value is kept (upgraded to the current version), not the parsed one. */
export const designDocumentSchema = z
  .unknown()
  .superRefine((doc, ctx) => {
    if (doc === undefined || doc === null) {
      ctx.addIssue({ code: "custom", message: "a design document is required" });
      return;
    }
    if (JSON.stringify(doc).length > MAX_DOCUMENT_CHARS) {
      ctx.addIssue({ code: "custom", message: `the document is larger than ${MAX_DOCUMENT_CHARS / 1024} kB` });
      return;
    }
    const parsed = parseDesign(doc);
    if (!parsed.ok) for (const i of parsed.issues) ctx.addIssue({ code: "custom", path: pathSegments(i.path), message: i.message });
  })
  .transform((doc) => upgradeDesignDocument(doc).document);

export const partRefsSchema = z
  .record(z.string().min(1).max(200), z.string().min(1).max(80))
  .refine((r) => Object.keys(r).length <= MAX_PART_REFS, `at most ${MAX_PART_REFS} part references`);

const optionName = z.string().trim().min(1, "give the option a name").max(120);
const optionSummary = z.preprocess(blankToUndefined, z.string().trim().max(500).optional());

const optionCreateFields = {
  name: optionName,
  summary: optionSummary,
  template: z.preprocess(blankToUndefined, z.string().max(60).refine(isTemplateKey, "no such template").optional()),
  document: designDocumentSchema.optional(),
};

function checkOneSource(o: { template?: string; document?: unknown }, ctx: z.RefinementCtx): void {
  if (o.template === undefined && o.document === undefined) ctx.addIssue({ code: "custom", path: ["template"], message: "choose a template to start from" });
  if (o.template !== undefined && o.document !== undefined) ctx.addIssue({ code: "custom", path: ["document"], message: "give a template or a document, not both" });
}

/** New option: from a template (demo starting points) or from a document. */
export const optionCreateSchema = z.object(optionCreateFields).strict().superRefine(checkOneSource);
/** The project page's form: the same fields plus the project it posts for. */
export const optionCreateFormSchema = z
  .object({ ...optionCreateFields, projectId: recordIdSchema })
  .strict()
  .superRefine(checkOneSource);
export type OptionCreateInput = z.input<typeof optionCreateSchema>;

export const optionPatchSchema = z
  .object({ name: optionName.optional(), summary: z.string().trim().max(500).optional(), archived: z.boolean().optional() })
  .strict()
  .refine((p) => Object.keys(p).length > 0, "nothing to change");
export type OptionPatch = z.output<typeof optionPatchSchema>;

export const revisionSaveSchema = z
  .object({
    /** The revision the edits started from; 0 only for an option without any. */
    baseRevision: z.coerce.number().int().min(0),
    document: designDocumentSchema,
    partRefs: partRefsSchema.default({}),
    note: z.string().trim().max(500).default(""),
  })
  .strict();
export type RevisionSaveInput = z.input<typeof revisionSaveSchema>;

export const duplicateOptionSchema = z
  .object({ name: z.preprocess(blankToUndefined, optionName.optional()) })
  .strict();
/** The duplicate buttons' form: the option to copy travels with it. */
export const duplicateOptionFormSchema = z
  .object({ optionId: recordIdSchema, name: z.preprocess(blankToUndefined, optionName.optional()) })
  .strict();

export const optionParamsSchema = z.object({ optionId: recordIdSchema });
export const revisionParamsSchema = z.object({ optionId: recordIdSchema, rev: z.coerce.number().int().min(1).max(1_000_000) });
